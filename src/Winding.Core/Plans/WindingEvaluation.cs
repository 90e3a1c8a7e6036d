using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Plans;

/// <summary>What the engine derived for one winding.</summary>
/// <param name="Name">Winding name.</param>
/// <param name="Turns">Number of turns.</param>
/// <param name="Wire">The wire (with its assumed or stated overall diameter).</param>
/// <param name="InductanceH">L = AL·N², H.</param>
/// <param name="Fit">Layer-by-layer fit.</param>
/// <param name="FillFactor">Copper cross-section of this winding over the core's window area (dimensionless).</param>
/// <param name="WoundLengthM">N·MLT, m.</param>
/// <param name="WireLengthM">Length to cut: wound length with margin, plus leads, m.</param>
/// <param name="DcResistanceOhm">DC resistance of the whole length to cut at 20 °C, Ω.</param>
/// <param name="Taps">Turn counts where taps are brought out.</param>
/// <param name="TurnsForTarget">Turns for the winding's target inductance: nominal AL and the low end of its tolerance
/// (null when no target was asked for).</param>
/// <param name="Electrical">AC resistance, skin depth, current and current density at the operating point (null without
/// operating conditions).</param>
public sealed record WindingEvaluation(
    string Name,
    int Turns,
    WindingWire Wire,
    double InductanceH,
    WindingFit Fit,
    double FillFactor,
    double WoundLengthM,
    double WireLengthM,
    double DcResistanceOhm,
    IReadOnlyList<int> Taps,
    (int Nominal, int Guaranteed)? TurnsForTarget,
    WindingElectrical? Electrical);
