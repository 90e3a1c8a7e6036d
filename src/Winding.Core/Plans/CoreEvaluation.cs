using Winding.Core.Geometry;
using Winding.Core.Windings;

namespace Winding.Core.Plans;

/// <summary>What the engine derived for the (stacked) core.</summary>
/// <param name="ShapeName">Shape word.</param>
/// <param name="Effective">Effective parameters of the stack (IEC 60205 or entered).</param>
/// <param name="WindowAreaM2">Area the windings pass through, m².</param>
/// <param name="EffectivePermeability">μe of the wound core (μi, or reduced by an air gap).</param>
/// <param name="InductanceFactor">AL of the stack.</param>
public sealed record CoreEvaluation(string ShapeName, EffectiveParameters Effective, double WindowAreaM2, double EffectivePermeability, InductanceFactor InductanceFactor);
