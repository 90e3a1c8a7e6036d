namespace Winding.Core.Magnetics;

/// <summary>
/// The flux density a voltage drives in a core, from Faraday's law v = N·Ae·dB/dt (any transformer text, e.g.
/// C. W. T. McLyman, Transformer and Inductor Design Handbook, 3rd ed. 2004, ch. 1; Snelling, Soft Ferrites, 2nd ed.
/// 1988; both from memory). B is the effective flux density Φ/Ae (IEC 60205), so Ae, not the geometric section, is used.
/// <list type="bullet">
/// <item>Sine: B̂ = V_rms/(√2·π·f·N·Ae), the familiar V_rms/(4.44·f·N·Ae) with the exact constant √2·π = 4.442883.</item>
/// <item>Square (±V, 50 %): B̂ = V/(4·f·N·Ae); the volt-seconds of one half period, V/(2f), give ΔB = 2·B̂.</item>
/// <item>Pulse (0…V, duty D): ΔB = V·D/(f·N·Ae), the volt-seconds of one pulse; B̂ is taken as ΔB/2.</item>
/// </list>
/// <para>
/// For the pulse, B̂ = ΔB/2 because in steady state the flux swings by ΔB about its own mean; Steinmetz data are
/// quoted for a symmetric swing of ±B̂, so ΔB/2 is the amplitude the loss laws expect. Where the core is reset only to
/// its remanence (a single-ended circuit), compare <see cref="PeakToPeakT"/> with B_sat − B_r for saturation instead.
/// V·D/f is the full volt-seconds of the pulse; a drive through a coupling capacitor removes the mean and sees only
/// V·D·(1 − D)/f, so the value here is the larger, safer one. DC bias is not covered.
/// </para>
/// <para>
/// Units: V, Hz, m², T. In a ring the flux density is highest at the inner radius, by ln k/(1 − 1/k) over the effective
/// value (physics-sources.md §8.1), so saturation starts there.
/// </para>
/// </summary>
public sealed record PeakFluxDensity
{
    /// <summary>The exact sine form factor √2·π = 4.442883… (the "4.44" of the transformer equation).</summary>
    public static readonly double SineConstant = Math.Sqrt(2) * Math.PI;

    private PeakFluxDensity(VoltageWaveform waveform, double frequencyHz, double amplitudeT)
    {
        Waveform = waveform;
        FrequencyHz = frequencyHz;
        AmplitudeT = amplitudeT;
    }

    /// <summary>The drive waveform.</summary>
    public VoltageWaveform Waveform { get; }

    /// <summary>Frequency (repetition rate) f, Hz.</summary>
    public double FrequencyHz { get; }

    /// <summary>Peak flux density B̂ (the amplitude, half the peak-to-peak swing), T.</summary>
    public double AmplitudeT { get; }

    /// <summary>Peak-to-peak flux density swing ΔB = 2·B̂, T.</summary>
    public double PeakToPeakT => 2 * AmplitudeT;

    /// <summary>Sine: B̂ = V_rms/(√2·π·f·N·Ae).</summary>
    /// <param name="voltageRms">RMS voltage across the winding, V, at least 0.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <param name="turns">Turns N, at least 1.</param>
    /// <param name="effectiveAreaM2">Effective area Ae, m², above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static PeakFluxDensity Sine(double voltageRms, double frequencyHz, int turns, double effectiveAreaM2)
    {
        Validate(voltageRms, frequencyHz, turns, effectiveAreaM2, nameof(voltageRms));
        return new PeakFluxDensity(VoltageWaveform.Sine, frequencyHz, voltageRms / (SineConstant * frequencyHz * turns * effectiveAreaM2));
    }

    /// <summary>Symmetric square wave ±V at 50 % duty: B̂ = V/(4·f·N·Ae).</summary>
    /// <param name="voltage">Amplitude V of the ±V square wave, V, at least 0.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <param name="turns">Turns N, at least 1.</param>
    /// <param name="effectiveAreaM2">Effective area Ae, m², above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static PeakFluxDensity Square(double voltage, double frequencyHz, int turns, double effectiveAreaM2)
    {
        Validate(voltage, frequencyHz, turns, effectiveAreaM2, nameof(voltage));
        return new PeakFluxDensity(VoltageWaveform.Square, frequencyHz, voltage / (4 * frequencyHz * turns * effectiveAreaM2));
    }

    /// <summary>Unipolar pulses of amplitude V at duty D: ΔB = V·D/(f·N·Ae), B̂ = ΔB/2 (see the type summary).</summary>
    /// <param name="voltage">Pulse amplitude V, V, at least 0.</param>
    /// <param name="dutyCycle">Duty cycle D = pulse width × f, in [0.001, 0.999].</param>
    /// <param name="frequencyHz">Repetition frequency, Hz, above 0.</param>
    /// <param name="turns">Turns N, at least 1.</param>
    /// <param name="effectiveAreaM2">Effective area Ae, m², above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static PeakFluxDensity Pulse(double voltage, double dutyCycle, double frequencyHz, int turns, double effectiveAreaM2)
    {
        var waveform = VoltageWaveform.Pulse(dutyCycle);
        Validate(voltage, frequencyHz, turns, effectiveAreaM2, nameof(voltage));
        var swingT = voltage * dutyCycle / (frequencyHz * turns * effectiveAreaM2);
        return new PeakFluxDensity(waveform, frequencyHz, swingT / 2);
    }

    /// <summary>
    /// Flux density for a waveform given by its RMS voltage: V_rms itself for a sine, V = V_rms for a ±V square wave, and
    /// V = V_rms/√D for unipolar pulses (whose RMS value is V·√D).
    /// </summary>
    /// <param name="waveform">Shape and duty cycle.</param>
    /// <param name="voltageRms">RMS voltage across the winding, V, at least 0.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <param name="turns">Turns N, at least 1.</param>
    /// <param name="effectiveAreaM2">Effective area Ae, m², above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside the ranges above.</exception>
    public static PeakFluxDensity FromRmsVoltage(VoltageWaveform waveform, double voltageRms, double frequencyHz, int turns, double effectiveAreaM2)
    {
        ArgumentNullException.ThrowIfNull(waveform);
        return waveform.Shape switch
        {
            WaveformShape.Sine => Sine(voltageRms, frequencyHz, turns, effectiveAreaM2),
            WaveformShape.Square => Square(voltageRms, frequencyHz, turns, effectiveAreaM2),
            WaveformShape.Pulse => Pulse(voltageRms / Math.Sqrt(waveform.DutyCycle), waveform.DutyCycle, frequencyHz, turns, effectiveAreaM2),
            _ => throw new ArgumentOutOfRangeException(nameof(waveform), waveform.Shape, "Unknown waveform shape."),
        };
    }

    private static void Validate(double voltage, double frequencyHz, int turns, double effectiveAreaM2, string voltageName)
    {
        if (!double.IsFinite(voltage) || voltage < 0)
        {
            throw new ArgumentOutOfRangeException(voltageName, voltage, "The voltage must be a finite number of at least 0 V.");
        }

        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (!double.IsFinite(effectiveAreaM2) || effectiveAreaM2 <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(effectiveAreaM2), effectiveAreaM2, "The effective area must be a finite number above 0 m².");
        }
    }
}
