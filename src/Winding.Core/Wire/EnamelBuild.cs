using MathNet.Numerics.Interpolation;
using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// The overall diameter that enamelled round copper wire is assumed to have when only the conductor diameter is known:
/// the grade 1 maximum overall diameter of IEC 60317-0-1 (Table 1), interpolated linearly in the increase over the
/// conductor between the rows of <see cref="MetricEnamelledWireTable"/> (0.020 mm to 2.000 mm).
/// </summary>
/// <remarks>
/// At a nominal diameter of the table the result is that row's grade 1 value; see
/// <see cref="MetricEnamelledWireTable"/> for which rows were read and which are from memory. Below the first row
/// (0.020 mm → 0.024 mm) the increase is taken in proportion to the diameter (20 %); above the last row (2.000 mm →
/// 2.074 mm) it continues linearly with the slope of the last interval (1.800 → 2.000 mm, +0.002 mm of increase per
/// 0.200 mm). Those two extensions are common practice, no source.
/// </remarks>
public static class EnamelBuild
{
    private static readonly double[] ConductorMm =
        [.. MetricEnamelledWireTable.Sizes.Select(s => s.NominalDiameter.Millimetres)];

    private static readonly double[] Grade1IncreaseMm =
        [.. MetricEnamelledWireTable.Sizes.Select(s => s.Grade1MaximumOverallDiameter.Millimetres - s.NominalDiameter.Millimetres)];

    private static readonly LinearSpline IncreaseMm = LinearSpline.InterpolateSorted(ConductorMm, Grade1IncreaseMm);

    /// <summary>The smallest conductor diameter the table covers directly.</summary>
    public static Length TableStart => Length.FromMillimetres(ConductorMm[0]);

    /// <summary>The largest conductor diameter the table covers directly.</summary>
    public static Length TableEnd => Length.FromMillimetres(ConductorMm[^1]);

    /// <summary>The grade 1 maximum overall diameter for a conductor diameter (see the class remarks).</summary>
    /// <param name="conductorDiameter">Bare conductor diameter, positive.</param>
    /// <exception cref="ArgumentOutOfRangeException">The diameter is not positive.</exception>
    public static Length Grade1OverallDiameter(Length conductorDiameter)
    {
        var dMm = conductorDiameter.Millimetres;
        if (!(dMm > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(conductorDiameter), conductorDiameter, "The conductor diameter must be positive.");
        }

        double increaseMm;
        if (dMm < ConductorMm[0])
        {
            increaseMm = dMm * Grade1IncreaseMm[0] / ConductorMm[0];
        }
        else
        {
            // LinearSpline extrapolates the end interval linearly above the last row.
            increaseMm = IncreaseMm.Interpolate(dMm);
        }

        return Length.FromMillimetres(dMm + increaseMm);
    }
}
