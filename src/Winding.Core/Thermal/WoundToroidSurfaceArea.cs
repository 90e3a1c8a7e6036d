using Winding.Core.Geometry;
using Winding.Core.Quantities;

namespace Winding.Core.Thermal;

/// <summary>
/// Outer surface area of a wound toroid, the area that sheds heat. The winding adds a uniform build t all round:
/// OD_w = OD + 2t, ID_w = ID − 2t, H_w = H + 2t, and
/// A = 2·(π/4)·(OD_w² − ID_w²) + π·OD_w·H_w + π·ID_w·H_w (two annular faces, the outer and the inner cylinder).
/// Plain geometry (physics-sources.md §10, derived). Units: m². Valid while the winding leaves a hole (t &lt; ID/2);
/// the bore surface is counted in full although little air moves through a small hole.
/// </summary>
public static class WoundToroidSurfaceArea
{
    /// <summary>Surface area of a toroid wound with a build of <paramref name="windingBuild"/> on every side, m².</summary>
    /// <param name="core">The bare core.</param>
    /// <param name="windingBuild">Radial build t of the winding, at least 0 and below ID/2 (use zero for a bare core).</param>
    /// <exception cref="ArgumentOutOfRangeException">The build is negative or closes the hole.</exception>
    public static double AreaM2(ToroidCore core, Length windingBuild)
    {
        ArgumentNullException.ThrowIfNull(core);
        var tM = windingBuild.Metres;
        if (tM < 0 || 2 * tM >= core.InnerDiameter.Metres)
        {
            throw new ArgumentOutOfRangeException(nameof(windingBuild), windingBuild, "The winding build must be at least 0 and below half the inner diameter.");
        }

        var odM = core.OuterDiameter.Metres + 2 * tM;
        var idM = core.InnerDiameter.Metres - 2 * tM;
        var hM = core.Height.Metres + 2 * tM;
        return 2 * (Math.PI / 4) * (odM * odM - idM * idM) + Math.PI * odM * hM + Math.PI * idM * hM;
    }
}
