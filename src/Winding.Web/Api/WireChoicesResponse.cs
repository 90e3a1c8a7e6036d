namespace Winding.Web.Api;

/// <summary>The answer of <c>POST /api/v1/wire-choices</c>: for each winding, the standard wires ranked best first.</summary>
/// <param name="Windings">One entry per winding, in winding order.</param>
public sealed record WireChoicesResponse(IReadOnlyList<WindingWireChoicesResponse> Windings);

/// <summary>Wire choices for one winding.</summary>
/// <param name="Index">Winding index.</param>
/// <param name="Name">Winding name.</param>
/// <param name="RmsCurrentA">The RMS current the choice is made for (stated or derived), A.</param>
/// <param name="FrequencyHz">The frequency for skin and proximity effect (maxFrequencyHz), Hz.</param>
/// <param name="Summary">Why wires were passed over, in plain words.</param>
/// <param name="Choices">Ranked choices, best first.</param>
public sealed record WindingWireChoicesResponse(int Index, string Name, double RmsCurrentA, double FrequencyHz, string Summary, IReadOnlyList<WireChoiceResponse> Choices);

/// <summary>One ranked wire.</summary>
/// <param name="Rank">1 for the best.</param>
/// <param name="StandardId">The standard wire's id (usable as <c>wire.standardId</c>).</param>
/// <param name="Description">Plain description, with the strands in hand.</param>
/// <param name="StrandsInHand">Wires in hand per turn.</param>
/// <param name="Passes">True when every rule is met (fit, window share, current density, skin depth).</param>
/// <param name="FitOutcome"><c>fits</c> or <c>tight</c>.</param>
/// <param name="Layers">Layers this winding would take.</param>
/// <param name="CurrentDensityAPerM2">RMS current over copper area, A/m².</param>
/// <param name="SkinDepthRatio">Conductor diameter over skin depth.</param>
/// <param name="DcResistanceOhm">DC resistance of the length to cut at 20 °C, Ω.</param>
/// <param name="AcResistanceOhm">AC resistance at the frequency, Ω.</param>
/// <param name="CopperLossW">I²·Rac, W.</param>
/// <param name="Reasons">What passes and what does not, in plain words.</param>
public sealed record WireChoiceResponse(
    int Rank,
    string StandardId,
    string Description,
    int StrandsInHand,
    bool Passes,
    string FitOutcome,
    int Layers,
    double CurrentDensityAPerM2,
    double SkinDepthRatio,
    double DcResistanceOhm,
    double AcResistanceOhm,
    double CopperLossW,
    IReadOnlyList<string> Reasons);
