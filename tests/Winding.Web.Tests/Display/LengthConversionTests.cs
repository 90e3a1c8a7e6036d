using CsCheck;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class LengthConversionTests
{
    [Fact]
    public void Inch_IsExactly25Point4Millimetres()
    {
        // The international inch: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959; NIST SP 811,
        // appendix B: inch → metre 2.54 × 10⁻² exactly).
        Assert.Equal(25.4m, LengthConversion.MillimetresPerInch);
        Assert.Equal(25.4, LengthConversion.ToMillimetres(1.0, LengthUnit.Inch));
        // 1 ft = 12 in = 304.8 mm exactly; 0.5 in = 12.7 mm (both exact decimals of the definition).
        Assert.Equal(304.8, LengthConversion.ToMillimetres(12.0, LengthUnit.Inch));
        Assert.Equal(12.7, LengthConversion.ToMillimetres(0.5, LengthUnit.Inch));
    }

    [Fact]
    public void Mil_IsExactlyOneThousandthOfAnInch()
    {
        // 1 mil = 0.001 in (definition) = 0.0254 mm.
        Assert.Equal(0.0254m, LengthConversion.MillimetresPerMil);
        Assert.Equal(0.0254, LengthConversion.ToMillimetres(1.0, LengthUnit.Mil));
        Assert.Equal(LengthConversion.ToMillimetres(1.0, LengthUnit.Inch), LengthConversion.ToMillimetres(1000.0, LengthUnit.Mil));
        Assert.Equal(0.508, LengthConversion.ToMillimetres(20.0, LengthUnit.Mil));
    }

    [Fact]
    public void AreaAndVolumeFactors_FollowFromTheInch()
    {
        // 1 in² = 25.4² mm² = 645.16 mm² and 1 in³ = 25.4³ mm³ = 16 387.064 mm³, exactly.
        Assert.Equal(645.16m, LengthConversion.MillimetresPerInch * LengthConversion.MillimetresPerInch);
        Assert.Equal((decimal)LengthConversion.SquareMillimetresPerSquareInch, 645.16m);
        Assert.Equal(16387.064m, LengthConversion.MillimetresPerInch * LengthConversion.MillimetresPerInch * LengthConversion.MillimetresPerInch);
        Assert.Equal((decimal)LengthConversion.CubicMillimetresPerCubicInch, 16387.064m);
    }

    [Fact]
    public void CircularMil_IsTheAreaOfACircleOneMilAcross()
    {
        // NIST SP 811 appendix B: circular mil → square metre 5.067075 × 10⁻¹⁰ (from memory) = 5.067075 × 10⁻⁴ mm².
        Assert.Equal(5.067075e-4, LengthConversion.SquareMillimetresPerCircularMil, 5e-10);
    }

    [Fact]
    public void FromMillimetres_OfATypedInchValue_IsThatValueExactly()
    {
        // 0.0201 in (AWG 24 in the ASTM B258 table) is 0.51054 mm; back in inches it is 0.0201 exactly.
        var millimetres = LengthConversion.ToMillimetres(0.0201, LengthUnit.Inch);

        Assert.Equal(0.51054, millimetres);
        Assert.Equal(0.0201m, LengthConversion.FromMillimetres(millimetres, LengthUnit.Inch));
    }

    [Fact]
    public void MillimetresToUnitAndBack_RoundTripsExactly()
    {
        // Property: any stored length converted to inches or mils (all digits decimal holds) and back is the same double.
        Gen.Select(LengthGenerators.Millimetres, Gen.OneOf(LengthUnit.Inch, LengthUnit.Mil, LengthUnit.Millimetre)).Sample((mm, unit) =>
        {
            var there = LengthConversion.FromMillimetres(mm, unit);
            Assert.NotNull(there);
            Assert.Equal(mm, LengthConversion.DecimalToMillimetres(there!.Value, unit));
        });
    }

    [Fact]
    public void ToMillimetres_OutsideDecimalsRange_StillConverts()
    {
        Assert.Equal(2.54e20, LengthConversion.ToMillimetres(1e19, LengthUnit.Inch), 1e6);
        Assert.Null(LengthConversion.FromMillimetres(1e30, LengthUnit.Inch));
        Assert.Equal(1e30 / 25.4, LengthConversion.FromMillimetresApproximately(1e30, LengthUnit.Inch), 1e15);
    }
}
