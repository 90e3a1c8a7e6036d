using System.Numerics;

namespace Winding.Core.Characterisation;

/// <summary>
/// One bench reading of an N-turn test winding on an unknown core: the turns, the test frequency, and either a series
/// inductance (optionally with the series resistance or the quality factor the meter shows) or a complex series
/// impedance, plus the winding's own resistance R_w at that frequency (skin effect included; 0 when neglected).
/// <para>
/// Series form throughout: Z = R + jX with X = ω·L, Q = X/R (IEC 62044-2:2005, low-excitation measurement; notation of
/// IEC 60401-3, from memory). Units: Ω, H, Hz. The reading is taken as given: fixture compensation (open/short) and a low
/// excitation (B ≲ 0.1 mT, Rayleigh region) are the operator's business (physics-sources.md §12, common practice).
/// </para>
/// </summary>
public sealed record TestWindingMeasurement
{
    private TestWindingMeasurement(int turns, double frequencyHz, double seriesInductanceH, double? seriesResistanceOhm, double windingResistanceOhm)
    {
        Turns = turns;
        FrequencyHz = frequencyHz;
        SeriesInductanceH = seriesInductanceH;
        SeriesResistanceOhm = seriesResistanceOhm;
        WindingResistanceOhm = windingResistanceOhm;
    }

    /// <summary>Number of test turns N.</summary>
    public int Turns { get; }

    /// <summary>Test frequency f, Hz.</summary>
    public double FrequencyHz { get; }

    /// <summary>Series inductance L_s = X/ω, H.</summary>
    public double SeriesInductanceH { get; }

    /// <summary>Total series resistance R (core loss plus winding), Ω; null when only the inductance was read.</summary>
    public double? SeriesResistanceOhm { get; }

    /// <summary>The winding's own resistance R_w at the test frequency, Ω (0 when neglected).</summary>
    public double WindingResistanceOhm { get; }

    /// <summary>Angular frequency ω = 2π·f, rad/s.</summary>
    public double AngularFrequencyRadPerS => 2 * Math.PI * FrequencyHz;

    /// <summary>Series reactance X = ω·L_s, Ω.</summary>
    public double SeriesReactanceOhm => AngularFrequencyRadPerS * SeriesInductanceH;

    /// <summary>Complex series impedance Z = R + jX, Ω; null when the resistance is unknown.</summary>
    public Complex? SeriesImpedanceOhm => SeriesResistanceOhm is { } r ? new Complex(r, SeriesReactanceOhm) : null;

    /// <summary>Quality factor Q = X/R (dimensionless); null when the resistance is unknown or zero.</summary>
    public double? QualityFactor => SeriesResistanceOhm is { } r && r > 0 ? SeriesReactanceOhm / r : null;

    /// <summary>An inductance reading only (no loss information).</summary>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="frequencyHz">Test frequency, Hz, finite and above 0.</param>
    /// <param name="inductanceH">Measured series inductance, H, finite and above 0.</param>
    /// <param name="windingResistanceOhm">R_w, Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static TestWindingMeasurement FromInductance(int turns, double frequencyHz, double inductanceH, double windingResistanceOhm = 0) =>
        Create(turns, frequencyHz, inductanceH, null, windingResistanceOhm);

    /// <summary>An inductance reading with the series resistance R the meter shows (R includes R_w).</summary>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="frequencyHz">Test frequency, Hz, finite and above 0.</param>
    /// <param name="inductanceH">Measured series inductance, H, finite and above 0.</param>
    /// <param name="seriesResistanceOhm">Measured series resistance R, Ω, finite and at least 0.</param>
    /// <param name="windingResistanceOhm">R_w, Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static TestWindingMeasurement FromInductanceAndResistance(
        int turns, double frequencyHz, double inductanceH, double seriesResistanceOhm, double windingResistanceOhm = 0)
    {
        if (!double.IsFinite(seriesResistanceOhm) || seriesResistanceOhm < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(seriesResistanceOhm), seriesResistanceOhm, "The series resistance must be a finite number of at least 0 Ω.");
        }

        return Create(turns, frequencyHz, inductanceH, seriesResistanceOhm, windingResistanceOhm);
    }

    /// <summary>An inductance reading with the quality factor Q = ω·L/R the meter shows, so that R = ω·L/Q.</summary>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="frequencyHz">Test frequency, Hz, finite and above 0.</param>
    /// <param name="inductanceH">Measured series inductance, H, finite and above 0.</param>
    /// <param name="qualityFactor">Measured Q, finite and above 0.</param>
    /// <param name="windingResistanceOhm">R_w, Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static TestWindingMeasurement FromInductanceAndQuality(
        int turns, double frequencyHz, double inductanceH, double qualityFactor, double windingResistanceOhm = 0)
    {
        if (!double.IsFinite(qualityFactor) || qualityFactor <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(qualityFactor), qualityFactor, "The quality factor must be a finite number above 0.");
        }

        var measurement = Create(turns, frequencyHz, inductanceH, null, windingResistanceOhm);
        return new TestWindingMeasurement(turns, frequencyHz, inductanceH, measurement.SeriesReactanceOhm / qualityFactor, windingResistanceOhm);
    }

    /// <summary>A complex series impedance reading Z = R + jX (an impedance analyser or a one-port sweep).</summary>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="frequencyHz">Test frequency, Hz, finite and above 0.</param>
    /// <param name="impedanceOhm">Measured Z, Ω: finite, R ≥ 0 and X &gt; 0 (inductive, below the winding's self-resonance).</param>
    /// <param name="windingResistanceOhm">R_w, Ω, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static TestWindingMeasurement FromImpedance(int turns, double frequencyHz, Complex impedanceOhm, double windingResistanceOhm = 0)
    {
        if (!double.IsFinite(impedanceOhm.Real) || !double.IsFinite(impedanceOhm.Imaginary) || impedanceOhm.Real < 0 || impedanceOhm.Imaginary <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(impedanceOhm), impedanceOhm, "The impedance must be finite with R ≥ 0 Ω and X > 0 Ω (inductive).");
        }

        ValidateFrequency(frequencyHz);
        return Create(turns, frequencyHz, impedanceOhm.Imaginary / (2 * Math.PI * frequencyHz), impedanceOhm.Real, windingResistanceOhm);
    }

    private static TestWindingMeasurement Create(int turns, double frequencyHz, double inductanceH, double? seriesResistanceOhm, double windingResistanceOhm)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        ValidateFrequency(frequencyHz);
        if (!double.IsFinite(inductanceH) || inductanceH <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(inductanceH), inductanceH, "The inductance must be a finite number above 0 H.");
        }

        if (!double.IsFinite(windingResistanceOhm) || windingResistanceOhm < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(windingResistanceOhm), windingResistanceOhm, "The winding resistance must be a finite number of at least 0 Ω.");
        }

        return new TestWindingMeasurement(turns, frequencyHz, inductanceH, seriesResistanceOhm, windingResistanceOhm);
    }

    private static void ValidateFrequency(double frequencyHz)
    {
        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }
    }
}
