using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;
using Winding.Core.Materials;

namespace Winding.Core.Characterisation;

/// <summary>
/// A relaxation model (<see cref="RelaxationPermeability"/>: Debye 1929 or Cole &amp; Cole 1941 as used for ferrite
/// spectra, Snelling 1988, from memory) fitted to measured complex permeabilities by non-linear least squares
/// (Levenberg–Marquardt, MathNet <see cref="LevenbergMarquardtMinimizer"/>).
/// <para>
/// The real and imaginary parts are fitted jointly. Each point contributes two residuals, (μ′_model − μ′_meas)/|μ_meas|
/// and (μ″_model − μ″_meas)/|μ_meas|, so every frequency weighs the same whatever the size of μ there (a ferrite's μ
/// spans decades across its dispersion). μ∞ is held at the value given (1 by default); the fitted parameters are
/// ln(μi − μ∞) and ln f_r (which keeps μi &gt; μ∞ and f_r &gt; 0) and, for Cole–Cole, α bounded to 0 … 0.95.
/// Start values: μi from the lowest-frequency μ′, f_r as the median over the points of the Debye identity
/// f_r = f·(μ′ − μ∞)/μ″, α = 0.1.
/// </para>
/// <para>
/// Non-convergence (iteration limit, invalid values) is reported in <see cref="Converged"/> and <see cref="ExitReason"/>,
/// not thrown; the parameters are then the last iterate and should not be trusted.
/// </para>
/// </summary>
public sealed record PermeabilityRelaxationFit
{
    private const int MaximumIterations = 2000;
    private const double MaximumAlpha = 0.95;
    private const double InitialAlpha = 0.1;

    private PermeabilityRelaxationFit(
        PermeabilityRelaxationModel model, RelaxationPermeability parameters, double rmsRelativeResidual, double maxRelativeDeviation,
        int iterations, bool converged, string exitReason, ComplexPermeabilityCurve curve)
    {
        Model = model;
        Parameters = parameters;
        RmsRelativeResidual = rmsRelativeResidual;
        MaxRelativeDeviation = maxRelativeDeviation;
        Iterations = iterations;
        Converged = converged;
        ExitReason = exitReason;
        Curve = curve;
    }

    /// <summary>The model that was fitted.</summary>
    public PermeabilityRelaxationModel Model { get; }

    /// <summary>The fitted μi, f_r, α (0 for Debye) and the μ∞ that was held.</summary>
    public RelaxationPermeability Parameters { get; }

    /// <summary>
    /// Root-mean-square of the 2n relative residuals (see the type summary), dimensionless: 0.01 means the model misses the
    /// points by about 1 % of |μ| on average.
    /// </summary>
    public double RmsRelativeResidual { get; }

    /// <summary>The largest |μ_model − μ_meas|/|μ_meas| over the points (complex distance), dimensionless.</summary>
    public double MaxRelativeDeviation { get; }

    /// <summary>Levenberg–Marquardt iterations used.</summary>
    public int Iterations { get; }

    /// <summary>True when the minimiser stopped on a convergence criterion with finite parameters.</summary>
    public bool Converged { get; }

    /// <summary>Why the minimiser stopped, as MathNet names it (for example "RelativeGradient", "ExceedIterations").</summary>
    public string ExitReason { get; }

    /// <summary>
    /// The fitted model sampled log-evenly from a decade below the lowest to a decade above the highest measured frequency,
    /// 10 points per decade (at least 8), ready to be a material's permeability table.
    /// </summary>
    public ComplexPermeabilityCurve Curve { get; }

    /// <summary>
    /// Fits the model to measured points (formulas and method in the type summary).
    /// </summary>
    /// <param name="measured">At least 2 points with strictly increasing finite frequencies above 0 Hz and finite μ′, μ″,
    /// not both 0. Points above the winding's self-resonance (μ′ ≤ 0) should be left out: the model cannot follow them.</param>
    /// <param name="model">Debye (fits μi, f_r) or Cole–Cole (fits μi, f_r, α).</param>
    /// <param name="highFrequencyPermeability">μ∞ held during the fit, finite and at least 1 (default 1).</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static PermeabilityRelaxationFit Fit(
        IReadOnlyList<MeasuredPermeability> measured, PermeabilityRelaxationModel model, double highFrequencyPermeability = 1)
    {
        ArgumentNullException.ThrowIfNull(measured);
        Validate(measured, model, highFrequencyPermeability);

        var n = measured.Count;
        var magnitudes = measured.Select(p => Math.Sqrt(p.MuPrime * p.MuPrime + p.MuDoublePrime * p.MuDoublePrime)).ToArray();
        var observed = Vector<double>.Build.Dense(2 * n, i => i < n ? measured[i].MuPrime / magnitudes[i] : measured[i - n].MuDoublePrime / magnitudes[i - n]);
        var indices = Vector<double>.Build.Dense(2 * n, i => i);
        var frequencies = measured.Select(p => p.FrequencyHz).ToArray();
        var muInfinity = highFrequencyPermeability;
        var isColeCole = model == PermeabilityRelaxationModel.ColeCole;

        Vector<double> Predict(Vector<double> p, Vector<double> x)
        {
            var (muI, fr, alpha) = Unpack(p, muInfinity, isColeCole);
            var result = Vector<double>.Build.Dense(x.Count);
            for (var k = 0; k < n; k++)
            {
                var mu = RelaxationPermeability.Evaluate(muI, muInfinity, fr, alpha, frequencies[k]);
                result[k] = mu.Real / magnitudes[k];
                result[k + n] = -mu.Imaginary / magnitudes[k];
            }

            return result;
        }

        var objective = ObjectiveFunction.NonlinearModel(Predict, indices, observed);
        var guess = InitialGuess(measured, muInfinity, isColeCole);
        var minimizer = new LevenbergMarquardtMinimizer(maximumIterations: MaximumIterations);
        var result = isColeCole
            ? minimizer.FindMinimum(
                objective, guess,
                lowerBound: Vector<double>.Build.Dense([-50, -50, 0]),
                upperBound: Vector<double>.Build.Dense([50, 100, MaximumAlpha]))
            : minimizer.FindMinimum(objective, guess);

        var (fittedMuI, fittedFr, fittedAlpha) = Unpack(result.MinimizingPoint, muInfinity, isColeCole);
        var finite = double.IsFinite(fittedMuI) && double.IsFinite(fittedFr) && fittedFr > 0 && fittedMuI > muInfinity;
        if (!finite)
        {
            // Report the start point rather than a meaningless iterate.
            (fittedMuI, fittedFr, fittedAlpha) = Unpack(guess, muInfinity, isColeCole);
        }

        var parameters = RelaxationPermeability.Create(fittedMuI, fittedFr, Math.Clamp(fittedAlpha, 0, MaximumAlpha), muInfinity);
        var residuals = Predict(PackFinite(parameters, isColeCole), indices) - observed;
        var rms = Math.Sqrt(residuals.DotProduct(residuals) / (2 * n));
        var maxDeviation = Enumerable.Range(0, n).Max(k => Math.Sqrt(residuals[k] * residuals[k] + residuals[k + n] * residuals[k + n]));
        var converged = finite
            && result.ReasonForExit is not ExitCondition.ExceedIterations and not ExitCondition.InvalidValues and not ExitCondition.None;

        return new PermeabilityRelaxationFit(
            model, parameters, rms, maxDeviation, result.Iterations, converged, result.ReasonForExit.ToString(),
            SampleAround(parameters, frequencies[0], frequencies[^1]));
    }

    /// <summary>
    /// A material class from the fit: μi and the sampled <see cref="Curve"/>, nothing else known, the default AL
    /// tolerance (<see cref="MagneticMaterial.DefaultAlTolerance"/>).
    /// </summary>
    /// <param name="name">Display name, for example "measured, NiZn-like, μi 120".</param>
    public MagneticMaterial ToMaterial(string name) =>
        MagneticMaterial.Create(name, Parameters.InitialPermeability, Curve, null, null, null, null, MagneticMaterial.DefaultAlTolerance);

    private static void Validate(IReadOnlyList<MeasuredPermeability> measured, PermeabilityRelaxationModel model, double highFrequencyPermeability)
    {
        if (!Enum.IsDefined(model))
        {
            throw new ArgumentOutOfRangeException(nameof(model), model, "Unknown relaxation model.");
        }

        if (!double.IsFinite(highFrequencyPermeability) || highFrequencyPermeability < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(highFrequencyPermeability), highFrequencyPermeability, "μ∞ must be a finite number of at least 1.");
        }

        if (measured.Count < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(measured), measured.Count, "A fit needs at least 2 measured points.");
        }

        for (var i = 0; i < measured.Count; i++)
        {
            var p = measured[i] ?? throw new ArgumentOutOfRangeException(nameof(measured), FormattableString.Invariant($"Point {i} is null."));
            if (!double.IsFinite(p.FrequencyHz) || p.FrequencyHz <= 0 || (i > 0 && p.FrequencyHz <= measured[i - 1].FrequencyHz))
            {
                throw new ArgumentOutOfRangeException(nameof(measured), p.FrequencyHz, FormattableString.Invariant($"Point {i}: frequencies must be finite, above 0 Hz and strictly increasing."));
            }

            if (!double.IsFinite(p.MuPrime) || !double.IsFinite(p.MuDoublePrime) || (p.MuPrime == 0 && p.MuDoublePrime == 0))
            {
                throw new ArgumentOutOfRangeException(nameof(measured), p.MuPrime, FormattableString.Invariant($"Point {i}: μ′ and μ″ must be finite and not both 0."));
            }
        }
    }

    private static (double MuI, double FrequencyHz, double Alpha) Unpack(Vector<double> p, double muInfinity, bool isColeCole) =>
        (muInfinity + Math.Exp(p[0]), Math.Exp(p[1]), isColeCole ? p[2] : 0);

    private static Vector<double> PackFinite(RelaxationPermeability r, bool isColeCole)
    {
        var lnDelta = Math.Log(r.InitialPermeability - r.HighFrequencyPermeability);
        var lnFr = Math.Log(r.RelaxationFrequencyHz);
        return isColeCole ? Vector<double>.Build.Dense([lnDelta, lnFr, r.Alpha]) : Vector<double>.Build.Dense([lnDelta, lnFr]);
    }

    private static Vector<double> InitialGuess(IReadOnlyList<MeasuredPermeability> measured, double muInfinity, bool isColeCole)
    {
        // μi: the lowest-frequency μ′ (at least a little above μ∞).
        var muI = Math.Max(measured[0].MuPrime, muInfinity * 1.01 + 0.01);

        // f_r: Debye identity μ″/(μ′ − μ∞) = f/f_r at each usable point; the median resists outliers.
        var estimates = measured
            .Where(p => p.MuDoublePrime > 0 && p.MuPrime > muInfinity)
            .Select(p => Math.Log(p.FrequencyHz * (p.MuPrime - muInfinity) / p.MuDoublePrime))
            .Where(double.IsFinite)
            .ToArray();
        var lnFr = estimates.Length > 0
            ? MathNet.Numerics.Statistics.Statistics.Median(estimates)
            : (Math.Log(measured[0].FrequencyHz) + Math.Log(measured[^1].FrequencyHz)) / 2;

        var lnDelta = Math.Log(muI - muInfinity);
        return isColeCole ? Vector<double>.Build.Dense([lnDelta, lnFr, InitialAlpha]) : Vector<double>.Build.Dense([lnDelta, lnFr]);
    }

    private static ComplexPermeabilityCurve SampleAround(RelaxationPermeability parameters, double lowestHz, double highestHz)
    {
        var fromHz = lowestHz / 10;
        var toHz = highestHz * 10;
        var decades = Math.Log10(toHz / fromHz);
        var count = Math.Clamp((int)Math.Ceiling(decades * 10) + 1, 8, 1000);
        return parameters.Sample(fromHz, toHz, count);
    }
}
