using Winding.Core.Quantities;

namespace Winding.Core.Conductors;

/// <summary>
/// The AC resistance factor of a winding, F_R = Rac/Rdc = <see cref="SkinFactor"/> + <see cref="ProximityFactor"/>,
/// with the quantities it was computed from. Produced by <see cref="WindingAcResistance.Evaluate"/>.
/// </summary>
public sealed record AcResistanceFactor
{
    internal AcResistanceFactor(
        AcResistanceMethod method,
        double skinFactor,
        double proximityFactor,
        Length skinDepth,
        double skinDepthRatio,
        double dowellDelta,
        double porosity,
        int layers,
        Length pitch)
    {
        Method = method;
        SkinFactor = skinFactor;
        ProximityFactor = proximityFactor;
        SkinDepth = skinDepth;
        SkinDepthRatio = skinDepthRatio;
        DowellDelta = dowellDelta;
        Porosity = porosity;
        Layers = layers;
        Pitch = pitch;
    }

    /// <summary>The method used.</summary>
    public AcResistanceMethod Method { get; }

    /// <summary>F_R = Rac/Rdc, finite and at least 1.</summary>
    public double RacPerRdc => SkinFactor + ProximityFactor;

    /// <summary>
    /// The skin part of F_R, at least 1: Dowell's single-layer factor Δ·ς1(Δ) for solid and hook-up wire, the
    /// isolated-wire Rac/Rdc of one strand for Litz.
    /// </summary>
    public double SkinFactor { get; }

    /// <summary>The proximity part of F_R (added loss over Rdc from the other layers' field), at least 0.</summary>
    public double ProximityFactor { get; }

    /// <summary>Skin depth δ in the conductor metal at the frequency and temperature.</summary>
    public Length SkinDepth { get; }

    /// <summary>
    /// Conductor diameter over skin depth, d/δ: the bare wire for solid and hook-up wire, one strand for Litz. Above 2
    /// the wire is thicker than two skin depths and its centre carries little current.
    /// </summary>
    public double SkinDepthRatio { get; }

    /// <summary>Dowell's Δ of the round-wire conversion for solid and hook-up wire; NaN for Litz (not used).</summary>
    public double DowellDelta { get; }

    /// <summary>
    /// Layer porosity η = (√π/2)·d/t for solid and hook-up wire (the square-conductor substitution loses accuracy below
    /// 0.5); NaN for Litz (not used).
    /// </summary>
    public double Porosity { get; }

    /// <summary>The number of layers p used.</summary>
    public int Layers { get; }

    /// <summary>The centre-to-centre pitch of neighbouring elements in a layer that was used.</summary>
    public Length Pitch { get; }

    /// <summary>Rac = F_R·Rdc in Ω.</summary>
    /// <param name="dcResistanceOhm">The winding's DC resistance at the same temperature in Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Rdc is NaN, infinite or negative.</exception>
    public double AcResistanceOhm(double dcResistanceOhm)
    {
        if (!double.IsFinite(dcResistanceOhm) || dcResistanceOhm < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(dcResistanceOhm), dcResistanceOhm, "Rdc must be a finite number of at least 0 Ω.");
        }

        return RacPerRdc * dcResistanceOhm;
    }
}
