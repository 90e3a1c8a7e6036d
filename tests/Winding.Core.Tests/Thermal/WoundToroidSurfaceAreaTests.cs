using Winding.Core.Geometry;
using Winding.Core.Quantities;
using Winding.Core.Thermal;

namespace Winding.Core.Tests.Thermal;

/// <summary>
/// Surface area of a wound toroid, A = 2·(π/4)(OD_w² − ID_w²) + π·OD_w·H_w + π·ID_w·H_w with the build t added all round.
/// Expected values: computed from this geometry in physics-sources.md §10 (script t10_thermal.py), six significant
/// figures, hence 1e-5 relative.
/// </summary>
public sealed class WoundToroidSurfaceAreaTests
{
    [Theory]
    // OD, ID, h, build (mm) → A (cm²)
    [InlineData(10, 5, 4, 0, 3.06305)]
    [InlineData(10, 5, 4, 0.5, 4.00553)]
    [InlineData(25, 15, 10, 1.0, 23.8761)]
    [InlineData(30, 10, 5, 0, 18.8496)]
    public void AreaM2_MatchesCheckValues(double odMm, double idMm, double hMm, double buildMm, double areaCm2)
    {
        var core = ToroidCore.Create(Length.FromMillimetres(odMm), Length.FromMillimetres(idMm), Length.FromMillimetres(hMm));

        var area = WoundToroidSurfaceArea.AreaM2(core, Length.FromMillimetres(buildMm));

        Assert.Equal(areaCm2, area * 1e4, areaCm2 * 1e-5);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(2.5)]
    [InlineData(3)]
    public void AreaM2_BuildOutOfRange_Throws(double buildMm)
    {
        var core = ToroidCore.Create(Length.FromMillimetres(10), Length.FromMillimetres(5), Length.FromMillimetres(4));

        Assert.Throws<ArgumentOutOfRangeException>(() => WoundToroidSurfaceArea.AreaM2(core, Length.FromMillimetres(buildMm)));
    }
}
