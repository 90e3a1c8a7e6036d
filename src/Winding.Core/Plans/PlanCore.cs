using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Windings;

namespace Winding.Core.Plans;

/// <summary>The core of a plan: the shape of one core, how many identical cores are stacked, and the material.</summary>
/// <param name="Shape">The shape of one core.</param>
/// <param name="StackCount">Number of identical cores wound as one (at least 1; 1 for bobbins).</param>
/// <param name="Material">The core material.</param>
public sealed record PlanCore(CoreShape Shape, int StackCount, MagneticMaterial Material)
{
    /// <summary>A measured AL of the wound core; when set it replaces the computed one everywhere.</summary>
    public InductanceFactor? MeasuredAl { get; init; }

    /// <summary>The stacked shape that the windings go around.</summary>
    public CoreShape WoundGeometry => Shape.Stacked(StackCount);

    /// <summary>
    /// Effective relative permeability of the wound core: μi for an ungapped core; with an air gap g in the path
    /// μe = μi / (1 + μi·g/le) (gapped-core formula, Snelling 1988, ch. 2; valid for a small gap, g ≪ le). With a
    /// measured AL, or an entered AL of a bobbin core, μe = AL·C1/μ0 (IEC 60205 AL = μ0·μe/C1), which already holds any
    /// gap.
    /// </summary>
    public double EffectivePermeability
    {
        get
        {
            var shape = WoundGeometry;
            var known = MeasuredAl ?? (shape is BobbinCore { EnteredAl: { } entered } ? entered : null);
            if (known is { } al)
            {
                return al.HenriesPerTurnSquared * shape.EffectiveParameters().CoreFactorC1PerM / PhysicalConstants.VacuumPermeabilityHPerM;
            }

            var mu = Material.InitialPermeability;
            var gapM = shape.GapLengthM;
            return gapM > 0 ? mu / (1 + mu * gapM / shape.EffectiveParameters().EffectiveLengthM) : mu;
        }
    }

    /// <summary>
    /// The complex relative permeability of the wound core at a frequency, μ′ − jμ″, from the material's table. With an
    /// air gap g the gapped-core formula is applied to the complex value, μe = μ / (1 + μ·g/le) (Snelling 1988, ch. 2).
    /// A bobbin core with an entered AL, or any core with a measured AL, scales the material's curve by AL·C1/(μ0·μi).
    /// </summary>
    /// <param name="frequencyHz">Frequency, Hz.</param>
    /// <returns>μ′, μ″ of the wound core and whether the table had to be extrapolated.</returns>
    public (double MuPrime, double MuDoublePrime, bool Extrapolated) PermeabilityAt(double frequencyHz) => PermeabilityFunction()(frequencyHz);

    /// <summary>
    /// <see cref="PermeabilityAt"/> as a function with the core's constants worked out once, for sweeps that ask for many
    /// frequencies.
    /// </summary>
    public Func<double, (double MuPrime, double MuDoublePrime, bool Extrapolated)> PermeabilityFunction()
    {
        var shape = WoundGeometry;
        var effective = shape.EffectiveParameters();
        var curve = Material.Permeability;
        var toAlScale = effective.CoreFactorC1PerM / (PhysicalConstants.VacuumPermeabilityHPerM * Material.InitialPermeability);
        double? scale = MeasuredAl is { } measured
            ? measured.HenriesPerTurnSquared * toAlScale // a measured AL already contains any gap
            : shape is BobbinCore { EnteredAl: { } entered } ? entered.HenriesPerTurnSquared * toAlScale : null;
        var gapOverLength = scale is null && shape.GapLengthM > 0 ? shape.GapLengthM / effective.EffectiveLengthM : 0;
        return frequencyHz =>
        {
            var point = curve.At(frequencyHz);
            var mu = new System.Numerics.Complex(point.MuPrime, -point.MuDoublePrime);
            if (scale is { } s)
            {
                mu *= s;
            }
            else if (gapOverLength > 0)
            {
                mu /= 1 + mu * gapOverLength;
            }

            return (mu.Real, -mu.Imaginary, point.IsExtrapolated);
        };
    }

    /// <summary>AL of the wound core: a measured AL, an entered AL (bobbin cores) or μ0·μe/C1 (IEC 60205; Snelling 1988).</summary>
    public InductanceFactor InductanceFactor =>
        MeasuredAl ?? (WoundGeometry is BobbinCore { EnteredAl: { } entered }
            ? entered
            : InductanceFactor.FromPermeability(EffectivePermeability, WoundGeometry.EffectiveParameters()));
}
