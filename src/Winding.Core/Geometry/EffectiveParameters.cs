namespace Winding.Core.Geometry;

/// <summary>
/// Effective magnetic dimensions of a core: the dimensions of a hypothetical thin uniform ring that is magnetically
/// equivalent to the real core (IEC 60050-221, IEV 221-04-31; IEC 60205). All values SI.
/// </summary>
/// <param name="CoreFactorC1PerM">Core factor C1 = Σ l/A in m⁻¹.</param>
/// <param name="CoreFactorC2PerM3">Core factor C2 = Σ l/A² in m⁻³.</param>
public sealed record EffectiveParameters(double CoreFactorC1PerM, double CoreFactorC2PerM3)
{
    /// <summary>Effective magnetic path length le = C1²/C2 in m (IEC 60205, IEV 221-04-31).</summary>
    public double EffectiveLengthM => CoreFactorC1PerM * CoreFactorC1PerM / CoreFactorC2PerM3;

    /// <summary>Effective cross-section Ae = C1/C2 in m² (IEC 60205, IEV 221-04-31).</summary>
    public double EffectiveAreaM2 => CoreFactorC1PerM / CoreFactorC2PerM3;

    /// <summary>Effective volume Ve = C1³/C2² = le·Ae in m³ (IEC 60205, IEV 221-04-31).</summary>
    public double EffectiveVolumeM3 => EffectiveLengthM * EffectiveAreaM2;

    /// <summary>
    /// The effective parameters of <paramref name="count"/> identical cores placed side by side and wound as one:
    /// the cross-sections add in parallel, so C1 → C1/n and C2 → C2/n² (le unchanged, Ae and Ve × n). This follows from
    /// the IEC 60205 definitions Σ l/A and Σ l/A² with A → n·A.
    /// </summary>
    /// <param name="count">Number of identical cores, at least 1.</param>
    public EffectiveParameters Stacked(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        return new EffectiveParameters(CoreFactorC1PerM / count, CoreFactorC2PerM3 / ((double)count * count));
    }
}
