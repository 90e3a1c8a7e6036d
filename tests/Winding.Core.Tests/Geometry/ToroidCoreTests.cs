using Winding.Core.Geometry;
using Winding.Core.Quantities;

namespace Winding.Core.Tests.Geometry;

/// <summary>
/// Ring-core effective parameters against the IEC 60205 ring-core formulas (clause 5.1). The expected values were
/// computed independently by numerical integration of the 1/r field over the section (∫B²dV, ∫B³dV), which agrees with
/// the closed forms to all printed digits: physics-sources.md §1.2, script t01_core_geometry.py. Six significant figures
/// are printed there, so the tolerance is 1e-5 relative.
/// </summary>
public sealed class ToroidCoreTests
{
    private const double Relative = 1e-5;

    [Theory]
    // OD, ID, h (mm) → C1 (mm⁻¹), C2 (mm⁻³), le (mm), Ae (mm²), Ve (mm³)
    [InlineData(10, 5, 4, 2.26618, 0.235838, 21.7759, 9.60906, 209.246)]
    [InlineData(25, 15, 10, 1.23001, 0.0251397, 60.1802, 48.9268, 2944.42)]
    [InlineData(30, 10, 5, 1.14384, 0.0252723, 51.7709, 45.2606, 2343.18)]
    [InlineData(6, 3, 10, 0.906472, 0.0628901, 13.0655, 14.4136, 188.321)]
    public void EffectiveParameters_MatchIec60205RingCoreCheckValues(
        double odMm, double idMm, double hMm, double c1PerMm, double c2PerMm3, double leMm, double aeMm2, double veMm3)
    {
        var core = ToroidCore.Create(Length.FromMillimetres(odMm), Length.FromMillimetres(idMm), Length.FromMillimetres(hMm));

        var p = core.EffectiveParameters();

        AssertRelative(c1PerMm, p.CoreFactorC1PerM / 1e3);
        AssertRelative(c2PerMm3, p.CoreFactorC2PerM3 / 1e9);
        AssertRelative(leMm, p.EffectiveLengthM * 1e3);
        AssertRelative(aeMm2, p.EffectiveAreaM2 * 1e6);
        AssertRelative(veMm3, p.EffectiveVolumeM3 * 1e9);
    }

    [Fact]
    public void Stacked_TwoShortTubesEqualOneLongTube()
    {
        // physics-sources.md §1.3 (IEC 60205 C1 = Σ l/A): two 5 mm tubes OD 6 / ID 3 have C1 = 1.81294 mm⁻¹ each;
        // stacked they equal one 10 mm tube with C1 = 0.906472 mm⁻¹.
        var single = ToroidCore.Create(Length.FromMillimetres(6), Length.FromMillimetres(3), Length.FromMillimetres(5));

        AssertRelative(1.81294, single.EffectiveParameters().CoreFactorC1PerM / 1e3);
        AssertRelative(0.906472, single.Stacked(2).EffectiveParameters().CoreFactorC1PerM / 1e3);
        AssertRelative(0.906472, single.EffectiveParameters().Stacked(2).CoreFactorC1PerM / 1e3);
    }

    [Fact]
    public void WindowArea_IsTheAreaOfTheHole()
    {
        // Plane geometry: a 23 mm hole has area π·23²/4 = 415.4756 mm².
        var core = ToroidCore.Create(Length.FromMillimetres(36), Length.FromMillimetres(23), Length.FromMillimetres(15));

        AssertRelative(415.4756, core.WindowAreaM2 * 1e6);
    }

    [Theory]
    [InlineData(10, 10, 4)]
    [InlineData(5, 10, 4)]
    [InlineData(10, 0, 4)]
    [InlineData(10, 5, 0)]
    [InlineData(10, 5, -1)]
    public void Create_RejectsImpossibleGeometry(double odMm, double idMm, double hMm)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() =>
            ToroidCore.Create(Length.FromMillimetres(odMm), Length.FromMillimetres(idMm), Length.FromMillimetres(hMm)));
    }

    private static void AssertRelative(double expected, double actual) =>
        Assert.True(Math.Abs(actual - expected) <= Relative * Math.Abs(expected), $"expected {expected}, got {actual}");
}
