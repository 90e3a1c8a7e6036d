using MathNet.Numerics.Interpolation;
using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// The overall diameter that enamelled round copper wire is assumed to have when only the conductor diameter is known:
/// the grade 1 maximum overall diameter of IEC 60317-0-1 (Table 1), interpolated linearly in the increase over the
/// conductor between the table rows below.
/// </summary>
/// <remarks>
/// Rows (nominal conductor → grade 1 maximum overall diameter, mm): 0.100 → 0.117, 0.112 → 0.130, 0.125 → 0.144 read in
/// the IS 13730-0-1 reproduction of IEC 60317-0-1; 0.200 → 0.226, 0.315 → 0.349, 0.500 → 0.544, 1.000 → 1.062 from
/// memory, confirmed indirectly through the SWG rows of the same Indian adoption. Below 0.100 mm the increase is taken
/// in proportion to the diameter (17 %); above 1.000 mm it continues with the slope of the last interval. Those two
/// extensions are common practice, no source.
/// </remarks>
public static class EnamelBuild
{
    private static readonly double[] ConductorMm = [0.100, 0.112, 0.125, 0.200, 0.315, 0.500, 1.000];
    private static readonly double[] Grade1MaximumOverallMm = [0.117, 0.130, 0.144, 0.226, 0.349, 0.544, 1.062];
    private static readonly LinearSpline IncreaseMm = LinearSpline.InterpolateSorted(
        ConductorMm, [.. ConductorMm.Select((d, i) => Grade1MaximumOverallMm[i] - d)]);

    /// <summary>The smallest conductor diameter the table covers directly.</summary>
    public static Length TableStart => Length.FromMillimetres(ConductorMm[0]);

    /// <summary>The grade 1 maximum overall diameter for a conductor diameter (see the class remarks).</summary>
    /// <param name="conductorDiameter">Bare conductor diameter, positive.</param>
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
            increaseMm = dMm * (Grade1MaximumOverallMm[0] - ConductorMm[0]) / ConductorMm[0];
        }
        else
        {
            // LinearSpline extrapolates the end interval linearly above the last row.
            increaseMm = IncreaseMm.Interpolate(dMm);
        }

        return Length.FromMillimetres(dMm + increaseMm);
    }
}
