using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class AwgSizeTests
{
    [Theory]
    // ASTM B258 table values in inches (physics-sources.md §3.1, [MEM]): each table diameter is its gauge.
    [InlineData(0.1019, 10)]
    [InlineData(0.0320, 20)]
    [InlineData(0.0253, 22)]
    [InlineData(0.0201, 24)]
    [InlineData(0.0159, 26)]
    [InlineData(0.0126, 28)]
    [InlineData(0.0100, 30)]
    [InlineData(0.0080, 32)]
    [InlineData(0.0050, 36)]
    [InlineData(0.0031, 40)]
    public void Match_TableDiameter_IsItsGauge(double inches, int gauge)
    {
        Assert.Equal(gauge, AwgSize.Match(inches * 25.4));
    }

    [Theory]
    // Metric sizes between gauges (IEC 60317 R20 nominal diameters): 0.5 mm lies 0.4 mil from AWG 24, 1.0 mm 0.8 mil
    // from AWG 18 (1.0237 mm by the formula).
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(0.45)]
    public void Match_MetricSizeBetweenGauges_IsNone(double mm)
    {
        Assert.Null(AwgSize.Match(mm));
    }

    [Theory]
    [InlineData(24, "AWG 24")]
    [InlineData(0, "AWG 1/0")]
    [InlineData(-3, "AWG 4/0")]
    public void Label_WritesTheGauge(int gauge, string label)
    {
        Assert.Equal(label, AwgSize.Label(gauge));
    }

    [Fact]
    public void Match_FourNoughts_Is0Point46Inch()
    {
        // ASTM B258: AWG 4/0 (0000) is 0.46 in by definition (physics-sources.md §3.1).
        Assert.Equal(-3, AwgSize.Match(0.46 * 25.4));
    }
}
