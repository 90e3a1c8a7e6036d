using Winding.Core.Wire;

namespace Winding.Core.Tests.Wire;

/// <summary>
/// Copper resistance per IEC 60028 (ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393 /K). Expected resistance per metre:
/// physics-sources.md §3.2 (script t03_wire.py), six significant figures.
/// </summary>
public sealed class ConductorMaterialTests
{
    [Theory]
    [InlineData(0.1, 20, 2.19524)]
    [InlineData(0.1, 100, 2.88542)]
    [InlineData(0.1, -40, 1.67760)]
    [InlineData(0.5, 20, 0.0878096)]
    [InlineData(1.0, 20, 0.0219524)]
    [InlineData(1.0, 100, 0.0288542)]
    public void DcResistance_PerMetre_MatchesIec60028(double diameterMm, double temperatureC, double ohmPerMetre)
    {
        var areaM2 = Math.PI * Math.Pow(diameterMm * 1e-3, 2) / 4;

        var r = ConductorMaterial.Copper.DcResistanceOhm(1.0, areaM2, temperatureC);

        Assert.Equal(ohmPerMetre, r, ohmPerMetre * 1e-5);
    }

    [Fact]
    public void DcResistance_TwentyTurnsOnRing10x5x4_MatchesCheckValue()
    {
        // physics-sources.md §11: 20 turns of 0.2 mm copper need 0.2742 m; R_dc(20 °C) = 150.484 mΩ (leads excluded).
        var areaM2 = Math.PI * Math.Pow(0.2e-3, 2) / 4;

        Assert.Equal(0.150484, ConductorMaterial.Copper.DcResistanceOhm(0.2742, areaM2), 0.150484 * 1e-5);
    }
}
