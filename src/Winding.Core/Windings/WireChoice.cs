using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Windings;

/// <summary>
/// One wire <see cref="WireGaugePicker"/> proposes for a winding: a standard wire, or strands of a thinner standard wire
/// in hand, with how the plan fits with it, its current density, skin-depth ratio, resistances and copper loss, its
/// rank and the reasons in plain words. Every listed choice fits (possibly tight) and keeps within the winding's share
/// of the window; <see cref="Passes"/> says whether it also meets the current-density and skin-depth rules.
/// </summary>
/// <param name="Rank">Place in the list, 1 for the best.</param>
/// <param name="StandardId">Id of the standard wire (of one strand when several are in hand), as in
/// <see cref="StandardWireTable"/>.</param>
/// <param name="Description">Plain description, e.g. "0.500 mm, grade 1" or "4 × 0.125 mm, grade 1 in hand".</param>
/// <param name="Wire">The winding wire (with its strands in hand).</param>
/// <param name="Outcome">The worst fit outcome over every winding of the plan with this wire: fits or tight.</param>
/// <param name="Fit">How this winding lies on the core with this wire.</param>
/// <param name="CopperAreaM2">Conductor cross-section of one turn (all strands in hand), m².</param>
/// <param name="CopperInWindowM2">Turns × conductor area of one turn, m², compared with the winding's share.</param>
/// <param name="CurrentDensityAPerM2">J = I_rms / copper area of one turn, A/m².</param>
/// <param name="SkinDepth">δ in the wire's metal at the frequency, at 20 °C.</param>
/// <param name="SkinDepthRatio">Conductor (strand) diameter over skin depth, d/δ.</param>
/// <param name="LengthToCutM">N·MLT·(1 + margin) + 2·lead with the plan's allowance and the fit's mean turn length, m.</param>
/// <param name="DcResistance20COhm">Rdc of the length to cut at 20 °C, Ω.</param>
/// <param name="AcResistanceOhm">Rac at the frequency (20 °C), F_R·Rdc with F_R from <see cref="Conductors.WindingAcResistance"/>
/// for the fit's layers, Ω.</param>
/// <param name="CopperLossW">I_rms²·Rac, W.</param>
/// <param name="RoomLeftM">The smallest hole diameter (ring and two-hole cores) or window height (bobbins) left over
/// all windings of the plan with this wire, m.</param>
/// <param name="MeetsCurrentDensity">True when J is at or under the limit.</param>
/// <param name="MeetsSkinDepth">True when d/δ is at or under the limit.</param>
/// <param name="Reasons">What passes and what does not, in plain words: fit, window share, current density, skin depth.</param>
public sealed record WireChoice(
    int Rank,
    string StandardId,
    string Description,
    WindingWire Wire,
    FitOutcome Outcome,
    WindingFit Fit,
    double CopperAreaM2,
    double CopperInWindowM2,
    double CurrentDensityAPerM2,
    Length SkinDepth,
    double SkinDepthRatio,
    double LengthToCutM,
    double DcResistance20COhm,
    double AcResistanceOhm,
    double CopperLossW,
    double RoomLeftM,
    bool MeetsCurrentDensity,
    bool MeetsSkinDepth,
    IReadOnlyList<string> Reasons)
{
    /// <summary>Strands of the standard wire wound in hand as one turn (1 for a single wire).</summary>
    public int StrandsInHand => Wire.ElementsInHand;

    /// <summary>Number of layers of this winding.</summary>
    public int Layers => Fit.Layers;

    /// <summary>True when every rule is met: fits (tight allowed), within the window share, J and d/δ within limits.</summary>
    public bool Passes => Outcome != FitOutcome.DoesNotFit && MeetsCurrentDensity && MeetsSkinDepth;
}
