namespace Winding.Web.Api;

/// <summary>The v1 results of <c>POST /api/v1/evaluate</c>. Names are the contract; SI units, the unit as suffix.</summary>
/// <param name="Core">Core results.</param>
/// <param name="Windings">Per-winding results in winding order.</param>
/// <param name="TurnsRatio">Last winding's turns over the first's (null with a single winding).</param>
/// <param name="ImpedanceRatio">Square of the turns ratio (null with a single winding).</param>
/// <param name="MagnetizingInductanceH">The primary's magnetising inductance at minFrequencyHz, from μ′(f), H (null without operating conditions).</param>
/// <param name="Magnetizing">The reactance rule at minFrequencyHz (null without operating conditions).</param>
/// <param name="OperatingPoint">Flux, losses and temperature (null without operating conditions).</param>
/// <param name="LeakageInductanceH">Leakage inductance between the first and the last winding, referred to the primary, H (an estimate unless measured).</param>
/// <param name="InterwindingCapacitanceF">Capacitance between the first and the last winding, F (an estimate unless measured).</param>
/// <param name="Parasitics">How the leakage and capacitances were found, and which values are measured.</param>
/// <param name="EquivalentCircuit">Element name → value of the equivalent circuit referred to the primary (RS, LM, RCORE, C1, RSERIES, LLK, C2, RL; frequency-dependent values at equivalentCircuitFrequencyHz). Null without operating conditions.</param>
/// <param name="EquivalentCircuitFrequencyHz">The frequency the frequency-dependent element values are given at (the band's geometric centre), Hz.</param>
/// <param name="Band">Minimum insertion loss and the 1 dB and 3 dB edges (null without operating conditions).</param>
/// <param name="Sweep">The frequency response (empty without operating conditions).</param>
/// <param name="Tolerance">The 3 dB edges at AL ± its tolerance and capacitances ± 30 % (null without operating conditions).</param>
/// <param name="Warnings">Findings, most severe first.</param>
public sealed record EvaluationResponse(
    CoreResponse Core,
    IReadOnlyList<WindingResponse> Windings,
    double? TurnsRatio,
    double? ImpedanceRatio,
    double? MagnetizingInductanceH,
    MagnetizingResponse? Magnetizing,
    OperatingPointResponse? OperatingPoint,
    double LeakageInductanceH,
    double InterwindingCapacitanceF,
    ParasiticsResponse Parasitics,
    IReadOnlyDictionary<string, double>? EquivalentCircuit,
    double? EquivalentCircuitFrequencyHz,
    BandResponse? Band,
    IReadOnlyList<SweepPointResponse> Sweep,
    ToleranceResponse? Tolerance,
    IReadOnlyList<WarningResponse> Warnings);

/// <summary>How the parasitic elements were found.</summary>
/// <param name="LeakageMethod">Method and expected accuracy of the leakage inductance.</param>
/// <param name="InterwindingMethod">Method of the interwinding capacitance.</param>
/// <param name="TransformerSelfResonanceHz">Parallel resonance seen from the primary, Hz.</param>
/// <param name="Measured">Which values are measured rather than estimated.</param>
public sealed record ParasiticsResponse(string LeakageMethod, string InterwindingMethod, double? TransformerSelfResonanceHz, IReadOnlyList<string> Measured);

/// <summary>The pass band.</summary>
/// <param name="LowerCutoffHz">Lower 3 dB edge (null when below the sweep).</param>
/// <param name="UpperCutoffHz">Upper 3 dB edge (null when above the sweep).</param>
/// <param name="Lower1DbHz">Lower 1 dB edge.</param>
/// <param name="Upper1DbHz">Upper 1 dB edge.</param>
/// <param name="MinimumInsertionLossDb">Smallest insertion loss, dB.</param>
public sealed record BandResponse(double? LowerCutoffHz, double? UpperCutoffHz, double? Lower1DbHz, double? Upper1DbHz, double MinimumInsertionLossDb);

/// <summary>One point of the sweep.</summary>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="InsertionLossDb">Loss against an ideal lossless transformer of the same ratio between the same source and load, dB.</param>
/// <param name="ReturnLossDb">Return loss at the primary, dB.</param>
/// <param name="InputImpedanceOhm">Impedance into the primary, Ω.</param>
public sealed record SweepPointResponse(double FrequencyHz, double InsertionLossDb, double ReturnLossDb, ComplexResponse InputImpedanceOhm);

/// <summary>A complex number.</summary>
/// <param name="Re">Real part.</param>
/// <param name="Im">Imaginary part.</param>
public sealed record ComplexResponse(double Re, double Im);

/// <summary>The spread of the 3 dB edges.</summary>
/// <param name="LowerCutoffHz">Lower edge range.</param>
/// <param name="UpperCutoffHz">Upper edge range.</param>
public sealed record ToleranceResponse(RangeResponse LowerCutoffHz, RangeResponse UpperCutoffHz);

/// <summary>A range; an end is null when the edge left the sweep.</summary>
/// <param name="Min">Lowest value.</param>
/// <param name="Max">Highest value.</param>
public sealed record RangeResponse(double? Min, double? Max);

/// <summary>The primary's reactance at the bottom of the band against the rule X ≥ k·Z.</summary>
/// <param name="FrequencyHz">minFrequencyHz.</param>
/// <param name="ReactanceOhm">2π·f·L_m, Ω.</param>
/// <param name="SeriesLossResistanceOhm">Core-loss resistance in series with the magnetising inductance at minFrequencyHz, Ω.</param>
/// <param name="ParallelLossResistanceOhm">The same loss as a resistance across the primary, Ω (null without μ″).</param>
/// <param name="ImpedanceSeenOhm">2·(RS ∥ RL′), the impedance the magnetising inductance works against (R when matched; RL′ with RS = 0), Ω.</param>
/// <param name="ReactanceFactor">k.</param>
/// <param name="PrimaryTurnsNeeded">Primary turns meeting the rule at the low end of the AL tolerance.</param>
public sealed record MagnetizingResponse(double FrequencyHz, double ReactanceOhm, double SeriesLossResistanceOhm, double? ParallelLossResistanceOhm, double ImpedanceSeenOhm, double ReactanceFactor, int PrimaryTurnsNeeded);

/// <summary>The operating point at the worst case.</summary>
/// <param name="PeakFluxDensityT">B̂ at minFrequencyHz, T.</param>
/// <param name="SaturationFluxDensityT">B_sat at the hot temperature, T (null when unknown).</param>
/// <param name="SaturationMargin">1 − B̂/B_sat (null when unknown).</param>
/// <param name="CoreLossW">Core loss, W (null when the material has no loss data).</param>
/// <param name="CoreLossMethod">How the core loss was found.</param>
/// <param name="CopperLossW">Copper loss with AC resistance at maxFrequencyHz, W.</param>
/// <param name="CopperLossDcW">Copper loss with DC resistance, W.</param>
/// <param name="TemperatureRiseK">Temperature rise over ambient, K.</param>
/// <param name="HotTemperatureC">Ambient plus rise, °C.</param>
/// <param name="SurfaceAreaM2">Surface the heat leaves from, m².</param>
public sealed record OperatingPointResponse(
    double PeakFluxDensityT,
    double? SaturationFluxDensityT,
    double? SaturationMargin,
    double? CoreLossW,
    string CoreLossMethod,
    double CopperLossW,
    double CopperLossDcW,
    double TemperatureRiseK,
    double HotTemperatureC,
    double SurfaceAreaM2);

/// <summary>Core results.</summary>
/// <param name="EffectiveLengthM">le, m (IEC 60205).</param>
/// <param name="EffectiveAreaM2">Ae, m² (IEC 60205).</param>
/// <param name="EffectiveVolumeM3">Ve, m³ (IEC 60205).</param>
/// <param name="WindowAreaM2">Area the windings pass through (ring hole, one hole of a two-hole core, bobbin window), m².</param>
/// <param name="AlH">AL, H per turn².</param>
/// <param name="Shape">Shape word: toroid, sleeve, two-hole or bobbin.</param>
/// <param name="EffectivePermeability">μe of the wound core (μi, or reduced by an air gap).</param>
public sealed record CoreResponse(double EffectiveLengthM, double EffectiveAreaM2, double EffectiveVolumeM3, double WindowAreaM2, double AlH, string Shape, double EffectivePermeability);

/// <summary>Results for one winding.</summary>
/// <param name="Name">Winding name.</param>
/// <param name="Turns">Turns.</param>
/// <param name="InductanceH">L = AL·N², H.</param>
/// <param name="Fits">True when every turn finds room (fits or tight).</param>
/// <param name="FitOutcome"><c>fits</c>, <c>tight</c> or <c>does-not-fit</c>.</param>
/// <param name="FitReason">The fit in plain words.</param>
/// <param name="Layers">Layers used.</param>
/// <param name="TurnsPerLayer">Turns in each layer, innermost first.</param>
/// <param name="FillFactor">Copper area of this winding over the window area.</param>
/// <param name="RemainingHoleDiameterM">Hole left after this winding, m (ring cores; two-hole: a circle of the free area; null for bobbins).</param>
/// <param name="RemainingWindowHeightM">Bobbin window height left after this winding, m (null for other shapes).</param>
/// <param name="MeanTurnLengthM">Mean turn length, m.</param>
/// <param name="LayerMeanTurnLengthsM">Mean turn length of each layer, m.</param>
/// <param name="WoundLengthM">N·MLT, m.</param>
/// <param name="WireLengthM">Length to cut: wound length plus margin (5 % by default) plus two leads (50 mm each by default), m.</param>
/// <param name="DcResistanceOhm">DC resistance of the length to cut at 20 °C, Ω.</param>
/// <param name="OverallDiameterM">Overall wire diameter used for the fit, m.</param>
/// <param name="OverallDiameterAssumed">True when the overall diameter was assumed (grade 1 enamel build).</param>
/// <param name="Wire">The wire as understood by the engine.</param>
/// <param name="Taps">Turn counts where taps are brought out.</param>
/// <param name="AcResistanceOhm">Resistance at maxFrequencyHz and ambient temperature, Ω (null without operating conditions).</param>
/// <param name="AcResistanceMethod">How Rac was found (Dowell round-wire, or Litz per strand).</param>
/// <param name="SkinDepthM">Skin depth at maxFrequencyHz, m.</param>
/// <param name="SkinDepthRatio">Conductor (strand) diameter over skin depth.</param>
/// <param name="RmsCurrentA">RMS current, A (stated or derived).</param>
/// <param name="CurrentDensityAPerM2">RMS current over the copper cross-section, A/m².</param>
/// <param name="CopperLossW">I²·Rac, W.</param>
/// <param name="SelfCapacitanceF">Self-capacitance of the winding, F (an estimate unless measured).</param>
/// <param name="SelfResonanceHz">Self-resonant frequency with its own capacitance, Hz (null when the capacitance is 0).</param>
/// <param name="TurnsForTargetInductance">Turns for the winding's targetInductanceH with the nominal AL and at the low end of its tolerance (null without a target).</param>
public sealed record WindingResponse(
    string Name,
    int Turns,
    double InductanceH,
    bool Fits,
    string FitOutcome,
    string FitReason,
    int Layers,
    IReadOnlyList<int> TurnsPerLayer,
    double FillFactor,
    double? RemainingHoleDiameterM,
    double? RemainingWindowHeightM,
    double MeanTurnLengthM,
    IReadOnlyList<double> LayerMeanTurnLengthsM,
    double WoundLengthM,
    double WireLengthM,
    double DcResistanceOhm,
    double OverallDiameterM,
    bool OverallDiameterAssumed,
    WireResponse Wire,
    IReadOnlyList<int> Taps,
    double? AcResistanceOhm,
    string? AcResistanceMethod,
    double? SkinDepthM,
    double? SkinDepthRatio,
    double? RmsCurrentA,
    double? CurrentDensityAPerM2,
    double? CopperLossW,
    double SelfCapacitanceF,
    double? SelfResonanceHz,
    TurnsForTargetResponse? TurnsForTargetInductance);

/// <summary>Turns that reach a target inductance.</summary>
/// <param name="Nominal">With the nominal AL: ⌈√(L/AL)⌉.</param>
/// <param name="Guaranteed">At the low end of the AL tolerance: ⌈√(L/(AL·(1 − t)))⌉.</param>
public sealed record TurnsForTargetResponse(int Nominal, int Guaranteed);

/// <summary>The wire of a winding as the engine understood it.</summary>
/// <param name="Description">Plain description.</param>
/// <param name="Kind"><c>solid</c>, <c>litz</c> or <c>hook-up</c>.</param>
/// <param name="Metal">Conductor metal.</param>
/// <param name="StrandDiameterM">Bare diameter of each conductor strand, m.</param>
/// <param name="ParallelConductors">Conductors in parallel per turn (strands in hand × Litz strands).</param>
/// <param name="ElementOverallDiameterM">Overall diameter of one wire or bundle, m.</param>
/// <param name="StrandsInHand">Wires wound side by side as one turn.</param>
/// <param name="ConductorAreaM2">Copper cross-section per turn, m².</param>
public sealed record WireResponse(string Description, string Kind, string Metal, double StrandDiameterM, int ParallelConductors, double ElementOverallDiameterM, int StrandsInHand, double ConductorAreaM2);

/// <summary>A finding about the plan.</summary>
/// <param name="Code">Stable code, e.g. <c>wire-does-not-fit</c>.</param>
/// <param name="Severity"><c>info</c>, <c>caution</c> or <c>error</c>.</param>
/// <param name="Field">The request field concerned, e.g. <c>windings[1].turns</c>.</param>
/// <param name="Message">Plain words.</param>
public sealed record WarningResponse(string Code, string Severity, string Field, string Message);
