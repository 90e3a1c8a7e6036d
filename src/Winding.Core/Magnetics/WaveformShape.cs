namespace Winding.Core.Magnetics;

/// <summary>The shape of the voltage applied to a winding.</summary>
public enum WaveformShape
{
    /// <summary>Sinusoidal voltage; sinusoidal flux.</summary>
    Sine,

    /// <summary>Symmetric square wave ±V at 50 % duty; triangular flux.</summary>
    Square,

    /// <summary>Unipolar rectangular pulses 0…V at duty cycle D; the flux ramps up during the pulse and is reset linearly during the rest of the period.</summary>
    Pulse,
}
