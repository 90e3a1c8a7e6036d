using MathNet.Numerics.Interpolation;

namespace Winding.Core.Materials;

/// <summary>
/// Saturation flux density B_sat of a material at the two temperatures datasheets give, 25 °C and 100 °C. B_sat falls
/// with temperature and reaches zero at the Curie temperature (Snelling, Soft Ferrites, 2nd ed. 1988, from memory).
/// Generic ferrite values lie around 0.25…0.53 T at 25 °C (physics-sources.md §8.2, common practice).
/// </summary>
public sealed record SaturationFluxDensity
{
    /// <summary>The lower reference temperature, 25 °C.</summary>
    public const double LowerTemperatureC = 25;

    /// <summary>The upper reference temperature, 100 °C.</summary>
    public const double UpperTemperatureC = 100;

    private SaturationFluxDensity(double at25CT, double at100CT)
    {
        At25CT = at25CT;
        At100CT = at100CT;
    }

    /// <summary>B_sat at 25 °C, T.</summary>
    public double At25CT { get; }

    /// <summary>B_sat at 100 °C, T.</summary>
    public double At100CT { get; }

    /// <summary>Creates the pair. Both values must be finite and lie in (0, 3] T.</summary>
    /// <param name="at25CT">B_sat at 25 °C, T.</param>
    /// <param name="at100CT">B_sat at 100 °C, T.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or outside (0, 3] T.</exception>
    public static SaturationFluxDensity Create(double at25CT, double at100CT)
    {
        if (!double.IsFinite(at25CT) || at25CT <= 0 || at25CT > 3)
        {
            throw new ArgumentOutOfRangeException(nameof(at25CT), at25CT, "B_sat at 25 °C must lie in (0, 3] T.");
        }

        if (!double.IsFinite(at100CT) || at100CT <= 0 || at100CT > 3)
        {
            throw new ArgumentOutOfRangeException(nameof(at100CT), at100CT, "B_sat at 100 °C must lie in (0, 3] T.");
        }

        return new SaturationFluxDensity(at25CT, at100CT);
    }

    /// <summary>
    /// B_sat at a temperature, T: linear between the 25 °C and 100 °C values (MathNet <see cref="LinearSpline"/>), the end
    /// value held below 25 °C and above 100 °C. Holding rather than extrapolating is common practice, no source: the
    /// real curve flattens towards low temperature and falls ever faster towards the Curie point, so a straight line
    /// would mislead on both sides.
    /// </summary>
    /// <param name="temperatureC">Temperature in °C, finite.</param>
    /// <exception cref="ArgumentOutOfRangeException">The temperature is not finite.</exception>
    public double AtTemperatureT(double temperatureC)
    {
        if (!double.IsFinite(temperatureC))
        {
            throw new ArgumentOutOfRangeException(nameof(temperatureC), temperatureC, "The temperature must be a finite number.");
        }

        if (temperatureC <= LowerTemperatureC)
        {
            return At25CT;
        }

        if (temperatureC >= UpperTemperatureC)
        {
            return At100CT;
        }

        return LinearSpline.InterpolateSorted([LowerTemperatureC, UpperTemperatureC], [At25CT, At100CT]).Interpolate(temperatureC);
    }
}
