using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>A solid round wire: its bare conductor diameter and its overall diameter over the insulation.</summary>
public sealed record RoundWire
{
    private RoundWire(Length conductorDiameter, Length overallDiameter, bool overallDiameterAssumed)
    {
        ConductorDiameter = conductorDiameter;
        OverallDiameter = overallDiameter;
        OverallDiameterAssumed = overallDiameterAssumed;
    }

    /// <summary>Bare conductor diameter (sets the resistance).</summary>
    public Length ConductorDiameter { get; }

    /// <summary>Overall diameter over the insulation (sets the fit).</summary>
    public Length OverallDiameter { get; }

    /// <summary>True when the overall diameter was not given and the standard enamel build was assumed.</summary>
    public bool OverallDiameterAssumed { get; }

    /// <summary>Conductor cross-section π·d²/4 in m².</summary>
    public double ConductorAreaM2 => Math.PI * ConductorDiameter.Metres * ConductorDiameter.Metres / 4;

    /// <summary>Overall cross-section π·d_o²/4 in m².</summary>
    public double OverallAreaM2 => Math.PI * OverallDiameter.Metres * OverallDiameter.Metres / 4;

    /// <summary>A wire with a stated overall diameter, which must not be smaller than the conductor.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A diameter is not positive, or overall &lt; conductor.</exception>
    public static RoundWire Create(Length conductorDiameter, Length overallDiameter)
    {
        if (conductorDiameter.Metres <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(conductorDiameter), conductorDiameter, "The conductor diameter must be positive.");
        }

        if (overallDiameter < conductorDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(overallDiameter), overallDiameter, "The overall diameter cannot be smaller than the conductor diameter.");
        }

        return new RoundWire(conductorDiameter, overallDiameter, overallDiameterAssumed: false);
    }

    /// <summary>An enamelled wire whose overall diameter is the assumed grade 1 build (<see cref="EnamelBuild"/>).</summary>
    public static RoundWire Enamelled(Length conductorDiameter) =>
        new(conductorDiameter, EnamelBuild.Grade1OverallDiameter(conductorDiameter), overallDiameterAssumed: true);
}
