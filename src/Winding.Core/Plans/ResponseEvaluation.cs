using Winding.Core.Response;

namespace Winding.Core.Plans;

/// <summary>The frequency response of the plan's equivalent circuit.</summary>
/// <param name="Circuit">The circuit (frequency-dependent parts as functions).</param>
/// <param name="Elements">Element values referred to the primary (frequency-dependent ones at the band's geometric centre).</param>
/// <param name="ElementsFrequencyHz">The frequency the frequency-dependent element values are given at, Hz.</param>
/// <param name="Sweep">The sweep.</param>
/// <param name="Band">Minimum loss and the 1 dB and 3 dB edges.</param>
/// <param name="Tolerance">The 3 dB edges at AL ± its tolerance and capacitances ± 30 %.</param>
public sealed record ResponseEvaluation(
    EquivalentCircuit Circuit,
    IReadOnlyDictionary<string, double> Elements,
    double ElementsFrequencyHz,
    IReadOnlyList<CircuitPoint> Sweep,
    BandEdges Band,
    BandTolerance Tolerance);

/// <summary>The spread of the 3 dB edges over the AL tolerance and ±30 % capacitance.</summary>
/// <param name="LowerCutoffMinHz">Lowest lower edge, Hz (null when an edge lies outside the sweep in every case).</param>
/// <param name="LowerCutoffMaxHz">Highest lower edge, Hz.</param>
/// <param name="UpperCutoffMinHz">Lowest upper edge, Hz.</param>
/// <param name="UpperCutoffMaxHz">Highest upper edge, Hz.</param>
public sealed record BandTolerance(double? LowerCutoffMinHz, double? LowerCutoffMaxHz, double? UpperCutoffMinHz, double? UpperCutoffMaxHz);
