namespace Winding.Web.Api;

/// <summary>The v1 results of <c>POST /api/v1/evaluate</c>. Names are the contract; SI units, the unit as suffix.</summary>
/// <param name="Core">Core results.</param>
/// <param name="Windings">Per-winding results in winding order.</param>
/// <param name="TurnsRatio">Last winding's turns over the first's (null with a single winding).</param>
/// <param name="ImpedanceRatio">Square of the turns ratio (null with a single winding).</param>
/// <param name="Warnings">Findings, most severe first.</param>
public sealed record EvaluationResponse(
    CoreResponse Core,
    IReadOnlyList<WindingResponse> Windings,
    double? TurnsRatio,
    double? ImpedanceRatio,
    IReadOnlyList<WarningResponse> Warnings);

/// <summary>Core results.</summary>
/// <param name="EffectiveLengthM">le, m (IEC 60205).</param>
/// <param name="EffectiveAreaM2">Ae, m² (IEC 60205).</param>
/// <param name="EffectiveVolumeM3">Ve, m³ (IEC 60205).</param>
/// <param name="WindowAreaM2">Area of the hole, m².</param>
/// <param name="AlH">AL, H per turn².</param>
public sealed record CoreResponse(double EffectiveLengthM, double EffectiveAreaM2, double EffectiveVolumeM3, double WindowAreaM2, double AlH);

/// <summary>Results for one winding.</summary>
/// <param name="Name">Winding name.</param>
/// <param name="Turns">Turns.</param>
/// <param name="InductanceH">L = AL·N², H.</param>
/// <param name="Fits">True when every turn finds room.</param>
/// <param name="Layers">Layers used.</param>
/// <param name="TurnsPerLayer">Turns in each layer, innermost first.</param>
/// <param name="FillFactor">Copper area of this winding over the window area.</param>
/// <param name="RemainingHoleDiameterM">Hole left after this winding, m.</param>
/// <param name="MeanTurnLengthM">Mean turn length, m.</param>
/// <param name="WireLengthM">Length to cut, leads included (2 × 50 mm by default), m.</param>
/// <param name="DcResistanceOhm">DC resistance of the length to cut at 20 °C, Ω.</param>
/// <param name="OverallDiameterM">Overall wire diameter used for the fit, m.</param>
/// <param name="OverallDiameterAssumed">True when the overall diameter was assumed (grade 1 enamel build).</param>
public sealed record WindingResponse(
    string Name,
    int Turns,
    double InductanceH,
    bool Fits,
    int Layers,
    IReadOnlyList<int> TurnsPerLayer,
    double FillFactor,
    double RemainingHoleDiameterM,
    double MeanTurnLengthM,
    double WireLengthM,
    double DcResistanceOhm,
    double OverallDiameterM,
    bool OverallDiameterAssumed);

/// <summary>A finding about the plan.</summary>
/// <param name="Code">Stable code, e.g. <c>wire-does-not-fit</c>.</param>
/// <param name="Severity"><c>info</c>, <c>caution</c> or <c>error</c>.</param>
/// <param name="Field">The request field concerned, e.g. <c>windings[1].turns</c>.</param>
/// <param name="Message">Plain words.</param>
public sealed record WarningResponse(string Code, string Severity, string Field, string Message);
