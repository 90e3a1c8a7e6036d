using System.Numerics;

namespace Winding.Catalogue.Touchstone;

/// <summary>One frequency of a one-port Touchstone file, converted to the port's impedance.</summary>
/// <param name="FrequencyHz">Frequency, Hz (at least 0).</param>
/// <param name="ImpedanceOhm">The one-port's impedance Z = R + jX, Ω, finite.</param>
/// <param name="LineNumber">The 1-based line of the file it came from.</param>
public readonly record struct TouchstonePoint(double FrequencyHz, Complex ImpedanceOhm, int LineNumber);
