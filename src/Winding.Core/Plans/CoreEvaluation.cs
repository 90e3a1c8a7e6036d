using Winding.Core.Geometry;
using Winding.Core.Windings;

namespace Winding.Core.Plans;

/// <summary>What the engine derived for the (stacked) core.</summary>
/// <param name="Effective">Effective parameters of the stack (IEC 60205).</param>
/// <param name="WindowAreaM2">Area of the hole the windings pass through, m².</param>
/// <param name="InductanceFactor">AL of the stack.</param>
public sealed record CoreEvaluation(EffectiveParameters Effective, double WindowAreaM2, InductanceFactor InductanceFactor);
