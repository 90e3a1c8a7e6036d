using System.Numerics;
using MathNet.Numerics;
using Winding.Core.Characterisation;

namespace Winding.Core.Tests.Characterisation;

/// <summary>
/// Fitting the relaxation model μ = μ∞ + (μi − μ∞)/(1 + (j·f/f_r)^(1−α)) (Debye 1929; Cole &amp; Cole 1941; Snelling 1988,
/// all from memory) by Levenberg–Marquardt.
/// <para>
/// The "measurements" here are synthetic: generated from the model itself with known parameters, then optionally
/// disturbed by ±0.5 % uniform noise from a seeded generator. That is a fair test of the fitting code — not of the model's
/// physics — because the true answer is known exactly: a correct fit must recover the parameters it was generated from
/// (to within the noise), while a wrong residual (sign of μ″, real/imaginary mix-up, weighting), a bad start value or a
/// minimiser stopping early would land elsewhere. The 1 % tolerance is twice the noise amplitude; with 30 points the
/// fitted parameters are averaged over many noisy values and fall well inside it.
/// </para>
/// </summary>
public sealed class PermeabilityRelaxationFitTests
{
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Fit_DebyeSynthetic_RecoversParametersAndCurve(bool noisy)
    {
        // A NiZn-like spectrum: μi = 125, f_r = 20 MHz, μ∞ = 1, measured 1 MHz … 500 MHz.
        var truth = RelaxationPermeability.Create(125, 20e6);
        var measured = Synthesise(truth, 1e6, 500e6, 30, noisy ? 0.005 : 0);

        var fit = PermeabilityRelaxationFit.Fit(measured, PermeabilityRelaxationModel.Debye);

        Assert.True(fit.Converged, fit.ExitReason);
        AssertWithin(125, fit.Parameters.InitialPermeability, 0.01);
        AssertWithin(20e6, fit.Parameters.RelaxationFrequencyHz, 0.01);
        Assert.Equal(0, fit.Parameters.Alpha);
        AssertCurveFollows(truth, fit);
        Assert.True(fit.RmsRelativeResidual < (noisy ? 0.005 : 1e-6), $"rms residual {fit.RmsRelativeResidual}");
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Fit_ColeColeSynthetic_RecoversParametersAndCurve(bool noisy)
    {
        // A MnZn-like spectrum: μi = 2000, f_r = 1.5 MHz, α = 0.25, measured 10 kHz … 100 MHz.
        var truth = RelaxationPermeability.Create(2000, 1.5e6, 0.25);
        var measured = Synthesise(truth, 10e3, 100e6, 30, noisy ? 0.005 : 0);

        var fit = PermeabilityRelaxationFit.Fit(measured, PermeabilityRelaxationModel.ColeCole);

        Assert.True(fit.Converged, fit.ExitReason);
        AssertWithin(2000, fit.Parameters.InitialPermeability, 0.01);
        AssertWithin(1.5e6, fit.Parameters.RelaxationFrequencyHz, 0.01);
        AssertWithin(0.25, fit.Parameters.Alpha, 0.01);
        AssertCurveFollows(truth, fit);
    }

    [Fact]
    public void Fit_DebyeToBroadenedSpectrum_ReportsTheMisfit()
    {
        // The same Cole–Cole data (α = 0.25) through the narrower Debye model: the fit converges but cannot follow the
        // broad loss peak, and the residual says so (several per cent, far above the 1e-6 of an exact model).
        var truth = RelaxationPermeability.Create(2000, 1.5e6, 0.25);
        var measured = Synthesise(truth, 10e3, 100e6, 30, 0);

        var fit = PermeabilityRelaxationFit.Fit(measured, PermeabilityRelaxationModel.Debye);

        Assert.True(fit.RmsRelativeResidual > 0.02, $"rms residual {fit.RmsRelativeResidual}");
    }

    [Fact]
    public void Fit_Curve_SpansADecadeEitherSideWithAtLeastEightPoints()
    {
        var truth = RelaxationPermeability.Create(125, 20e6);
        var fit = PermeabilityRelaxationFit.Fit(Synthesise(truth, 5e6, 10e6, 3, 0), PermeabilityRelaxationModel.Debye);

        Assert.True(fit.Curve.Points.Count >= 8);
        Assert.Equal(0.5e6, fit.Curve.Points[0].FrequencyHz, 1e-3);
        Assert.Equal(100e6, fit.Curve.Points[^1].FrequencyHz, 1e-1);
    }

    [Fact]
    public void ToMaterial_CarriesFittedMuIAndCurve()
    {
        var truth = RelaxationPermeability.Create(125, 20e6);
        var fit = PermeabilityRelaxationFit.Fit(Synthesise(truth, 1e6, 100e6, 10, 0), PermeabilityRelaxationModel.Debye);

        var material = fit.ToMaterial("measured, μi 125");

        Assert.Equal(fit.Parameters.InitialPermeability, material.InitialPermeability);
        Assert.Same(fit.Curve, material.Permeability);
        Assert.True(material.HasPermeabilityTable);
    }

    [Fact]
    public void Model_DebyeLimits_AreTextbookValues()
    {
        // Debye 1929 (from memory): μ → μi as f → 0; at f = f_r, μ′ = (μi + μ∞)/2 and μ″ = (μi − μ∞)/2 (the loss peak).
        var model = RelaxationPermeability.Create(101, 1e6);

        Assert.Equal(new Complex(101, 0), model.ComplexAt(0));
        var atPeak = model.At(1e6);
        Assert.Equal(51, atPeak.MuPrime, 12);
        Assert.Equal(50, atPeak.MuDoublePrime, 12);
    }

    [Fact]
    public void Fit_InvalidInput_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PermeabilityRelaxationFit.Fit([new(1e6, 100, 1)], PermeabilityRelaxationModel.Debye));
        Assert.Throws<ArgumentOutOfRangeException>(() => PermeabilityRelaxationFit.Fit([new(2e6, 100, 1), new(1e6, 100, 1)], PermeabilityRelaxationModel.Debye));
        Assert.Throws<ArgumentOutOfRangeException>(() => PermeabilityRelaxationFit.Fit([new(1e6, double.NaN, 1), new(2e6, 100, 1)], PermeabilityRelaxationModel.Debye));
        Assert.Throws<ArgumentOutOfRangeException>(() => PermeabilityRelaxationFit.Fit([new(1e6, 100, 1), new(2e6, 100, 1)], PermeabilityRelaxationModel.Debye, 0.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => RelaxationPermeability.Create(1, 1e6));
        Assert.Throws<ArgumentOutOfRangeException>(() => RelaxationPermeability.Create(100, 1e6, 0.99));
    }

    private static List<MeasuredPermeability> Synthesise(RelaxationPermeability truth, double fromHz, double toHz, int count, double noise)
    {
        var random = new Random(20240611);
        return Generate.LogSpaced(count, Math.Log10(fromHz), Math.Log10(toHz))
            .Select(f =>
            {
                var mu = truth.At(f);
                return new MeasuredPermeability(
                    f,
                    mu.MuPrime * (1 + noise * (2 * random.NextDouble() - 1)),
                    mu.MuDoublePrime * (1 + noise * (2 * random.NextDouble() - 1)));
            })
            .ToList();
    }

    private static void AssertCurveFollows(RelaxationPermeability truth, PermeabilityRelaxationFit fit)
    {
        // Every sampled point of the fitted curve (measured range and a decade beyond) within 1 % of |μ| of the truth.
        foreach (var p in fit.Curve.Points)
        {
            var expected = truth.ComplexAt(p.FrequencyHz);
            var deviation = Complex.Abs(new Complex(p.MuPrime, -p.MuDoublePrime) - expected) / Complex.Abs(expected);
            Assert.True(deviation < 0.01, $"at {p.FrequencyHz} Hz the curve is {deviation:P2} off");
        }
    }

    private static void AssertWithin(double expected, double actual, double relative) =>
        Assert.True(Math.Abs(actual - expected) <= relative * Math.Abs(expected), $"expected {expected}, got {actual}");
}
