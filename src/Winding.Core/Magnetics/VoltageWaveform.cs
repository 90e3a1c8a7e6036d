namespace Winding.Core.Magnetics;

/// <summary>A voltage waveform shape with its duty cycle (the fraction of the period during which the flux rises).</summary>
public sealed record VoltageWaveform
{
    /// <summary>Shortest pulse duty cycle accepted, 0.001.</summary>
    public const double MinPulseDutyCycle = 0.001;

    /// <summary>Longest pulse duty cycle accepted, 0.999.</summary>
    public const double MaxPulseDutyCycle = 0.999;

    private VoltageWaveform(WaveformShape shape, double dutyCycle)
    {
        Shape = shape;
        DutyCycle = dutyCycle;
    }

    /// <summary>Sine, square or pulse.</summary>
    public WaveformShape Shape { get; }

    /// <summary>Fraction D of the period during which the flux rises: 0.5 for sine and square, the pulse duty otherwise.</summary>
    public double DutyCycle { get; }

    /// <summary>A sine wave (D = 0.5).</summary>
    public static VoltageWaveform Sine { get; } = new(WaveformShape.Sine, 0.5);

    /// <summary>A symmetric ±V square wave (D = 0.5).</summary>
    public static VoltageWaveform Square { get; } = new(WaveformShape.Square, 0.5);

    /// <summary>
    /// Unipolar pulses at duty cycle D, which must lie in [0.001, 0.999]: narrower pulses drive dB/dt so far beyond any
    /// Steinmetz fit that a loss figure would be meaningless (common practice, no source).
    /// </summary>
    /// <param name="dutyCycle">D = pulse width × frequency, in [0.001, 0.999].</param>
    /// <exception cref="ArgumentOutOfRangeException">D is not finite or outside [0.001, 0.999].</exception>
    public static VoltageWaveform Pulse(double dutyCycle)
    {
        if (!double.IsFinite(dutyCycle) || dutyCycle < MinPulseDutyCycle || dutyCycle > MaxPulseDutyCycle)
        {
            throw new ArgumentOutOfRangeException(nameof(dutyCycle), dutyCycle, "The duty cycle must lie in [0.001, 0.999].");
        }

        return new VoltageWaveform(WaveformShape.Pulse, dutyCycle);
    }
}
