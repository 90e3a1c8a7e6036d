using Winding.Core.Sheets;
using Winding.Core.Wire;
using static Winding.Core.Tests.Sheets.SheetPlans;

namespace Winding.Core.Tests.Sheets;

public sealed class ConductorToleranceTests
{
    [Theory]
    // IEC 60317-0-1 conductor tolerance: ±0.003 mm at 0.100 mm read (physics-sources §3.3); the other rows from memory.
    [InlineData(0.100, 0.003)]
    [InlineData(0.020, 0.001)]
    [InlineData(0.050, 0.002)]
    [InlineData(0.200, 0.003)]
    [InlineData(0.315, 0.004)]
    [InlineData(0.500, 0.005)]
    [InlineData(1.000, 0.010)]
    public void Metric_GivesTheIec60317Tolerance(double diameterMm, double toleranceMm)
    {
        var (tolerance, source) = ConductorTolerance.For(WindingWire.Enamelled(Mm(diameterMm)));

        Assert.Equal(toleranceMm * 1e-3, tolerance, 1e-12);
        Assert.Contains("IEC 60317-0-1", source, StringComparison.Ordinal);
    }

    [Theory]
    // ASTM B3 (from memory): ±1 % from 0.010 in up, ±0.0001 in below; AWG 24 is 0.51056 mm and AWG 36 0.127 mm
    // (ASTM B258 formula, physics-sources §3.1).
    [InlineData(24, 0.0051056)]
    [InlineData(36, 0.00254)]
    public void Awg_GivesTheAstmB3Tolerance(int gauge, double toleranceMm)
    {
        var (tolerance, source) = ConductorTolerance.For(AwgWireTable.Wire(gauge, AwgBuild.Single));

        Assert.Equal(toleranceMm * 1e-3, tolerance, 1e-9);
        Assert.Contains("ASTM B3", source, StringComparison.Ordinal);
    }
}
