using System.Numerics;

namespace Winding.Core.Response;

/// <summary>The equivalent circuit's response at one frequency.</summary>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="InsertionLossDb">Loss against an ideal lossless transformer of the same ratio, dB (≥ 0 for a passive circuit).</param>
/// <param name="ReturnLossDb">Return loss at the primary, dB.</param>
/// <param name="InputImpedanceOhm">Impedance into the primary (source excluded), Ω.</param>
/// <param name="OutputVoltage">Voltage across the referred load for a 1 V source, V.</param>
public readonly record struct CircuitPoint(double FrequencyHz, double InsertionLossDb, double ReturnLossDb, Complex InputImpedanceOhm, Complex OutputVoltage);
