using System.Numerics;
using MathNet.Numerics;
using Winding.Core.Materials;

namespace Winding.Core.Characterisation;

/// <summary>
/// A relaxation model of the series complex permeability μs = μs′ − jμs″ against frequency:
/// <code>
/// μ(f) = μ∞ + (μi − μ∞) / (1 + (j·f/f_r)^(1−α))
/// </code>
/// With α = 0 this is the single-pole relaxation of P. Debye, <i>Polar Molecules</i>, Chemical Catalog Co., New York,
/// 1929 (written there for the permittivity); 0 &lt; α &lt; 1 is the symmetric broadening of K. S. Cole and R. H. Cole,
/// "Dispersion and absorption in dielectrics I", J. Chem. Phys. 9:341–351, 1941, eq. (1). Both are used for the
/// permeability spectra of ferrites, for example in E. C. Snelling, <i>Soft Ferrites</i>, 2nd ed. 1988, ch. 2 (all from
/// memory). With the engineering sign convention (time factor e^{jωt}), μs′ = Re μ and μs″ = −Im μ ≥ 0; the loss peak
/// μs″ lies at f = f_r, where μs′ has fallen half-way from μi to μ∞.
/// <para>
/// Units: Hz; μ values dimensionless. A phenomenological description of one dispersion region at low excitation: it
/// has no domain-wall resonance (μs′ never overshoots μi), no dimensional resonance and no winding effects.
/// </para>
/// </summary>
public sealed record RelaxationPermeability
{
    private RelaxationPermeability(double initialPermeability, double highFrequencyPermeability, double relaxationFrequencyHz, double alpha)
    {
        InitialPermeability = initialPermeability;
        HighFrequencyPermeability = highFrequencyPermeability;
        RelaxationFrequencyHz = relaxationFrequencyHz;
        Alpha = alpha;
    }

    /// <summary>Static (low-frequency) permeability μi (dimensionless).</summary>
    public double InitialPermeability { get; }

    /// <summary>Permeability well above the relaxation, μ∞ (dimensionless; 1 for a ferrite far above its dispersion).</summary>
    public double HighFrequencyPermeability { get; }

    /// <summary>Relaxation frequency f_r, Hz (the μs″ peak).</summary>
    public double RelaxationFrequencyHz { get; }

    /// <summary>Cole–Cole broadening α (dimensionless, 0 ≤ α &lt; 1; 0 for a Debye relaxation).</summary>
    public double Alpha { get; }

    /// <summary>Creates the model.</summary>
    /// <param name="initialPermeability">μi, finite and above μ∞.</param>
    /// <param name="relaxationFrequencyHz">f_r, Hz, finite and above 0.</param>
    /// <param name="alpha">α, 0 ≤ α ≤ 0.95 (0 for Debye).</param>
    /// <param name="highFrequencyPermeability">μ∞, finite and at least 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public static RelaxationPermeability Create(double initialPermeability, double relaxationFrequencyHz, double alpha = 0, double highFrequencyPermeability = 1)
    {
        if (!double.IsFinite(highFrequencyPermeability) || highFrequencyPermeability < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(highFrequencyPermeability), highFrequencyPermeability, "μ∞ must be a finite number of at least 1.");
        }

        if (!double.IsFinite(initialPermeability) || initialPermeability <= highFrequencyPermeability)
        {
            throw new ArgumentOutOfRangeException(nameof(initialPermeability), initialPermeability, "μi must be a finite number above μ∞.");
        }

        if (!double.IsFinite(relaxationFrequencyHz) || relaxationFrequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(relaxationFrequencyHz), relaxationFrequencyHz, "The relaxation frequency must be a finite number above 0 Hz.");
        }

        if (!(alpha >= 0 && alpha <= 0.95))
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "α must lie between 0 and 0.95.");
        }

        return new RelaxationPermeability(initialPermeability, highFrequencyPermeability, relaxationFrequencyHz, alpha);
    }

    /// <summary>μ(f) = μs′ − jμs″ as a complex number (formula in the type summary).</summary>
    /// <param name="frequencyHz">Frequency, Hz, finite and at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is not finite or negative.</exception>
    public Complex ComplexAt(double frequencyHz)
    {
        if (!double.IsFinite(frequencyHz) || frequencyHz < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number of at least 0 Hz.");
        }

        return Evaluate(InitialPermeability, HighFrequencyPermeability, RelaxationFrequencyHz, Alpha, frequencyHz);
    }

    /// <summary>μs′ and μs″ at a frequency as a table row.</summary>
    /// <param name="frequencyHz">Frequency, Hz, finite and above 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is not finite or not positive.</exception>
    public ComplexPermeabilityPoint At(double frequencyHz)
    {
        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        var mu = ComplexAt(frequencyHz);
        return new ComplexPermeabilityPoint(frequencyHz, mu.Real, Math.Max(0, -mu.Imaginary));
    }

    /// <summary>
    /// The model sampled at <paramref name="count"/> frequencies spaced evenly in log f from
    /// <paramref name="fromHz"/> to <paramref name="toHz"/> (MathNet <see cref="Generate.LogSpaced"/>), as a
    /// <see cref="ComplexPermeabilityCurve"/> that the rest of the engine can use.
    /// </summary>
    /// <param name="fromHz">Lowest frequency, Hz, finite and above 0.</param>
    /// <param name="toHz">Highest frequency, Hz, finite and above <paramref name="fromHz"/>.</param>
    /// <param name="count">Number of points, 2 to 1000.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is outside the ranges above.</exception>
    public ComplexPermeabilityCurve Sample(double fromHz, double toHz, int count)
    {
        if (!double.IsFinite(fromHz) || fromHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(fromHz), fromHz, "The lowest frequency must be a finite number above 0 Hz.");
        }

        if (!double.IsFinite(toHz) || toHz <= fromHz)
        {
            throw new ArgumentOutOfRangeException(nameof(toHz), toHz, "The highest frequency must be finite and above the lowest.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(count, 2);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(count, 1000);
        var frequencies = Generate.LogSpaced(count, Math.Log10(fromHz), Math.Log10(toHz));
        return ComplexPermeabilityCurve.Create(frequencies.Select(At));
    }

    internal static Complex Evaluate(double muI, double muInfinity, double relaxationFrequencyHz, double alpha, double frequencyHz)
    {
        // (j·x)^(1−α) = x^(1−α)·e^{j·π(1−α)/2}; written out so that x = 0 gives exactly μi.
        var exponent = 1 - alpha;
        var x = frequencyHz / relaxationFrequencyHz;
        var power = Complex.FromPolarCoordinates(Math.Pow(x, exponent), Math.PI * exponent / 2);
        return muInfinity + (muI - muInfinity) / (1 + power);
    }
}
