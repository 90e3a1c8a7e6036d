using CsCheck;
using Winding.Core.Conductors;
using Winding.Core.Plans;
using Winding.Core.Wire;
using Winding.Core.Quantities;

namespace Winding.Core.Tests.Plans;

public sealed class ResponseAnalysisTests
{
    [Fact]
    public void TabulatedSeries_AgreesWithDirectDowellWithin0p1Percent()
    {
        // The sweep reads Rac from a log–log Akima table; it must stay within 0.1 % of Dowell computed directly.
        var wire = WindingWire.Solid(Length.FromMillimetres(0.5), Length.FromMillimetres(0.544));
        var op = new OperatingConditions(1e5, 3e7, 50, 50, 1);
        double Exact(double f) => 0.1 * WindingAcResistance.Evaluate(wire, 3, f, 25).RacPerRdc + 0.05 * WindingAcResistance.Evaluate(wire, 1, f, 25).RacPerRdc;
        var table = ResponseAnalysis.TabulatedSeries(Exact, op);

        Gen.Double[Math.Log10(op.MinFrequencyHz) - 3, Math.Log10(op.MaxFrequencyHz) + 3].Sample(x =>
        {
            var f = Math.Pow(10, x);
            Assert.Equal(Exact(f), table(f), Exact(f) * 1e-3);
        }, iter: 500);
    }
}
