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

    [Fact]
    public void Aluminium_OneMillimetreWire_ResistancePerMetreAt20C()
    {
        // IEC 60889 (from memory): ρ20 = 0.028264 Ω·mm²/m. For d = 1.000 mm, A = π/4 mm² = 0.785398 mm², so
        // R′ = 0.028264 / 0.785398 = 0.0359868 Ω/m (hand calculation, six significant figures).
        var areaM2 = Math.PI * Math.Pow(1.0e-3, 2) / 4;

        Assert.Equal(0.0359868, ConductorMaterial.Aluminium.DcResistanceOhm(1.0, areaM2), 0.0359868 * 1e-5);
    }

    [Fact]
    public void Aluminium_Is61PercentIacsWithItsOwnTemperatureCoefficient()
    {
        // IEC 60889 (from memory): 61.0 % IACS, so ρAl/ρCu = 1/0.610 = 1.6393. ρ20 = 0.028264 is given to five
        // significant figures (rounding error up to 1.8e-5 relative), hence a tolerance of 5e-5 relative.
        // α20 = 0.00403 /K, so from 20 °C to 100 °C the resistance rises by 1 + 80·0.00403 = 1.3224.
        Assert.Equal(1.6393, ConductorMaterial.Aluminium.Resistivity20OhmM / ConductorMaterial.Copper.Resistivity20OhmM, 1.6393 * 5e-5);
        Assert.Equal(1.3224, ConductorMaterial.Aluminium.ResistivityOhmM(100) / ConductorMaterial.Aluminium.Resistivity20OhmM, 1e-9);
    }
}
