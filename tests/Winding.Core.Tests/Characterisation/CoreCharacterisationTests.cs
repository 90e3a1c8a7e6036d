using System.Numerics;
using CsCheck;
using Winding.Core.Characterisation;
using Winding.Core.Geometry;
using Winding.Core.Magnetics;
using Winding.Core.Quantities;
using Winding.Core.Windings;

namespace Winding.Core.Tests.Characterisation;

/// <summary>
/// AL = L/N², μe = AL·C1/μ0, μs′ = X·C1/(ω·μ0·N²), μs″ = (R − R_w)·C1/(ω·μ0·N²) (IEC 62044-2:2005 and IEC 60401-3,
/// formulas from memory). Expected values: computed from these formulas in physics-sources.md §12 (script
/// t12_measurement.py) on the ring 10/5/4 mm (C1 = 2.26618 mm⁻¹), printed to five or six significant figures, hence a
/// relative tolerance of 2e-5. The script used μ0 = 4π×10⁻⁷ H/m; the CODATA value differs by 5.5×10⁻¹⁰.
/// </summary>
public sealed class CoreCharacterisationTests
{
    private const double Relative = 2e-5;

    private static readonly EffectiveParameters Ring10x5x4 =
        ToroidCore.Create(Length.FromMillimetres(10), Length.FromMillimetres(5), Length.FromMillimetres(4)).EffectiveParameters();

    [Theory]
    // N, measured L (µH) → AL (nH/turn²), μe: physics-sources.md §12, first check table.
    [InlineData(10, 6.93, 69.3, 124.973)]
    [InlineData(20, 500, 1250, 2254.21)]
    [InlineData(5, 12, 480, 865.617)]
    public void FromInductance_Ring10x5x4_MatchesCheckTable(int turns, double inductanceMicrohenries, double alNanohenries, double muE)
    {
        var result = CoreCharacterisation.FromInductance(Ring10x5x4, turns, inductanceMicrohenries * 1e-6);

        AssertRelative(alNanohenries, result.Al.NanohenriesPerTurnSquared);
        AssertRelative(muE, result.EffectivePermeability);
        Assert.Null(result.Permeability);
    }

    [Theory]
    // f, measured Z = R + jX (Ω) → μs′, μs″, tan δ: physics-sources.md §12, second check table (N = 10, R_w = 0.05 Ω).
    [InlineData(1e6, 0.75, 43.55, 124.995, 2.00911, 0.0160735)]
    [InlineData(10e6, 139.4, 348.4, 99.996, 39.9955, 0.399971)]
    [InlineData(100e6, 2090, 697, 20.0049, 59.9847, 2.99849)]
    public void FromImpedance_Ring10x5x4TenTurns_MatchesCheckTable(
        double frequencyHz, double rOhm, double xOhm, double muPrime, double muDoublePrime, double tanDelta)
    {
        var mu = CoreCharacterisation.FromImpedance(Ring10x5x4, 10, frequencyHz, new Complex(rOhm, xOhm), 0.05);

        AssertRelative(muPrime, mu.MuPrime);
        AssertRelative(muDoublePrime, mu.MuDoublePrime);
        AssertRelative(tanDelta, mu.LossTangent);
        Assert.True(mu.IsInductive);
        Assert.False(mu.IsLossBelowWindingResistance);
    }

    [Fact]
    public void FromImpedances_Sweep_MatchesCheckTableInOrder()
    {
        // physics-sources.md §12, second check table, as one sweep.
        var sweep = new List<(double, Complex)> { (1e6, new(0.75, 43.55)), (10e6, new(139.4, 348.4)), (100e6, new(2090, 697)) };

        var points = CoreCharacterisation.FromImpedances(Ring10x5x4, 10, sweep, 0.05);

        Assert.Equal([1e6, 10e6, 100e6], points.Select(p => p.FrequencyHz));
        AssertRelative(124.995, points[0].MuPrime);
        AssertRelative(39.9955, points[1].MuDoublePrime);
        AssertRelative(20.0049, points[2].MuPrime);
    }

    [Fact]
    public void FromMeasurement_InductanceAndQuality_GivesTheSameAsTheImpedance()
    {
        // The 1 MHz row of physics-sources.md §12 entered as a meter shows it: L = X/ω = 43.55 Ω/(2π·1 MHz),
        // Q = X/R = 43.55/0.75. Expected μs′ = 124.995, μs″ = 2.00911 as in the table; μe equals μs′ (same X).
        var inductanceH = 43.55 / (2 * Math.PI * 1e6);
        var reading = TestWindingMeasurement.FromInductanceAndQuality(10, 1e6, inductanceH, 43.55 / 0.75, 0.05);

        var result = CoreCharacterisation.FromMeasurement(Ring10x5x4, reading);

        AssertRelative(124.995, result.EffectivePermeability);
        AssertRelative(124.995, result.Permeability!.MuPrime);
        AssertRelative(2.00911, result.Permeability.MuDoublePrime);
        AssertRelative(0.75, reading.SeriesResistanceOhm!.Value);
    }

    [Fact]
    public void FromMeasurement_InductanceAndResistance_MatchesCheckTable()
    {
        // The 10 MHz row of physics-sources.md §12: R = 139.4 Ω, L = 348.4 Ω/(2π·10 MHz) → μs″ = 39.9955, tan δ = 0.399971.
        var reading = TestWindingMeasurement.FromInductanceAndResistance(10, 10e6, 348.4 / (2 * Math.PI * 10e6), 139.4, 0.05);

        var result = CoreCharacterisation.FromMeasurement(Ring10x5x4, reading);

        AssertRelative(39.9955, result.Permeability!.MuDoublePrime);
        AssertRelative(0.399971, result.Permeability.LossTangent);
        AssertRelative(348.4 / 139.4, reading.QualityFactor!.Value);
    }

    [Fact]
    public void FromMeasurement_InductanceOnly_HasNoPermeabilityPoint()
    {
        // physics-sources.md §12, first table, N = 10: 6.93 µH → μe = 124.973.
        var result = CoreCharacterisation.FromMeasurement(Ring10x5x4, TestWindingMeasurement.FromInductance(10, 10e3, 6.93e-6));

        AssertRelative(124.973, result.EffectivePermeability);
        Assert.Null(result.Permeability);
    }

    [Fact]
    public void FromImpedance_ResistanceBelowWinding_IsKeptAndFlagged()
    {
        // R = 0.04 Ω < R_w = 0.05 Ω: μs″ comes out negative (−0.01 Ω over ωL0 = 0.348414 Ω, physics-sources.md §2.2:
        // L0 = 55.4518 nH at 1 MHz, so μs″ = −0.0287015) and the point cannot enter a table.
        var mu = CoreCharacterisation.FromImpedance(Ring10x5x4, 10, 1e6, new Complex(0.04, 43.55), 0.05);

        Assert.True(mu.IsLossBelowWindingResistance);
        AssertRelative(-0.0287015, mu.MuDoublePrime);
        Assert.Null(mu.ToPoint());
    }

    [Fact]
    public void FromImpedance_CapacitiveReading_IsFlaggedNotInductive()
    {
        var mu = CoreCharacterisation.FromImpedance(Ring10x5x4, 10, 300e6, new Complex(500, -200), 0);

        Assert.False(mu.IsInductive);
        Assert.Null(mu.ToPoint());
    }

    [Fact]
    public void InductanceRoundTrip_LEqualsAlTimesNSquared()
    {
        // Textbook relation L = AL·N² (IEC 60050-221): AL taken from a reading gives the reading back at the same N, and
        // μe → AL = μ0·μe/C1 (IEC 60205) → L closes the loop through the forward formula.
        Gen.Int[1, 500].Select(Gen.Double[1e-9, 1]).Sample((turns, inductanceH) =>
        {
            var result = CoreCharacterisation.FromInductance(Ring10x5x4, turns, inductanceH);
            var viaPermeability = InductanceFactor.FromPermeability(Math.Max(1, result.EffectivePermeability), Ring10x5x4);

            return Math.Abs(result.Al.InductanceH(turns) / inductanceH - 1) < 1e-12
                && (result.EffectivePermeability < 1 || Math.Abs(viaPermeability.InductanceH(turns) / inductanceH - 1) < 1e-12);
        });
    }

    [Fact]
    public void ImpedanceRoundTrip_InvertsTheWindingImpedance()
    {
        // Z = jω·L0·(μs′ − jμs″) (physics-sources.md §2.2, WindingImpedance) followed by §12 gives μs′, μs″ back.
        Gen.Select(Gen.Int[1, 100], Gen.Double[1e3, 1e9], Gen.Double[1, 20000], Gen.Double[0, 5000]).Sample((turns, f, muP, muPp) =>
        {
            var z = WindingImpedance.Calculate(turns, Ring10x5x4, f, muP, muPp).ImpedanceOhm;
            var mu = CoreCharacterisation.FromImpedance(Ring10x5x4, turns, f, z, 0);
            return Math.Abs(mu.MuPrime / muP - 1) < 1e-12 && Math.Abs(mu.MuDoublePrime - muPp) <= 1e-12 * (muP + muPp);
        });
    }

    [Fact]
    public void NearestMaterialClasses_RanksByLogRatio()
    {
        // |ln(1000/μi)|: 850 → 0.163, 2000 → 0.693, 5000 → 1.609, 125 → 2.079, 40 → 3.219.
        (string, string, double)[] classes =
        [
            ("nizn-125", "NiZn, μi 125", 125), ("mnzn-5000", "MnZn, μi 5000", 5000), ("nizn-850", "NiZn, μi 850", 850),
            ("nizn-40", "NiZn, μi 40", 40), ("mnzn-2000", "MnZn, μi 2000", 2000),
        ];

        var nearest = CoreCharacterisation.NearestMaterialClasses(1000, classes, 3);

        Assert.Equal(["nizn-850", "mnzn-2000", "mnzn-5000"], nearest.Select(m => m.Id));
        Assert.Equal(Math.Log(1000.0 / 850), nearest[0].LogDistance, 12);
    }

    [Fact]
    public void NearestMaterialClasses_FactorTwoEitherWayTies_BrokenByIdWhateverTheOrder()
    {
        (string, string, double)[] classes = [("b-200", "μi 200", 200), ("a-50", "μi 50", 50), ("c-1000", "μi 1000", 1000)];

        var forward = CoreCharacterisation.NearestMaterialClasses(100, classes, 5);
        var reversed = CoreCharacterisation.NearestMaterialClasses(100, classes.Reverse(), 5);

        Assert.Equal(["a-50", "b-200", "c-1000"], forward.Select(m => m.Id));
        Assert.Equal(forward, reversed);
    }

    [Theory]
    [InlineData(0, 1e-6)]
    [InlineData(10, 0)]
    [InlineData(10, double.NaN)]
    [InlineData(10, double.PositiveInfinity)]
    public void FromInductance_OutOfRange_Throws(int turns, double inductanceH) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => CoreCharacterisation.FromInductance(Ring10x5x4, turns, inductanceH));

    [Fact]
    public void Measurement_OutOfRange_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => TestWindingMeasurement.FromInductance(10, 0, 1e-6));
        Assert.Throws<ArgumentOutOfRangeException>(() => TestWindingMeasurement.FromInductance(10, 1e6, 1e-6, -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => TestWindingMeasurement.FromInductanceAndQuality(10, 1e6, 1e-6, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => TestWindingMeasurement.FromInductanceAndResistance(10, 1e6, 1e-6, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => TestWindingMeasurement.FromImpedance(10, 1e6, new Complex(1, -1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => CoreCharacterisation.FromImpedance(Ring10x5x4, 10, 1e6, new Complex(double.NaN, 1), 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => CoreCharacterisation.NearestMaterialClasses(100, [("x", "x", 0.0)], 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => CoreCharacterisation.NearestMaterialClasses(100, [("x", "x", 10.0)], 0));
    }

    private static void AssertRelative(double expected, double actual) =>
        Assert.True(Math.Abs(actual - expected) <= Relative * Math.Abs(expected), $"expected {expected}, got {actual}");
}
