using System.Collections.ObjectModel;
using MathNet.Numerics.Interpolation;

namespace Winding.Core.Materials;

/// <summary>
/// The series complex permeability μs(f) = μs′(f) − jμs″(f) of a material as a table of points (IEC 60401-3 notation;
/// Snelling, Soft Ferrites, 2nd ed. 1988), or a frequency-independent constant.
/// <para>
/// Between points, μs′ and μs″ are interpolated linearly in log10 f (MathNet <see cref="LinearSpline"/>). Linear
/// interpolation was chosen over cubic or Akima splines because it reproduces the table points exactly, never overshoots
/// (so a monotone stretch of the table stays monotone, μs′ stays positive and μs″ non-negative, which a spline cannot
/// promise near the sharp loss peak of a ferrite), and works with as few as two points. Datasheet curves are drawn on a
/// logarithmic frequency axis, so log10 f is the natural abscissa: the value at the geometric mean of two tabulated
/// frequencies is the arithmetic mean of their values.
/// </para>
/// <para>
/// Outside the table the nearest end value is held and the result is flagged
/// (<see cref="ComplexPermeability.IsExtrapolated"/>); this is a plausible guess, not a model.
/// Valid for low excitation (Rayleigh region); the values are those of the material as measured, without winding
/// effects.
/// </para>
/// </summary>
public sealed class ComplexPermeabilityCurve : IEquatable<ComplexPermeabilityCurve>
{
    private readonly ComplexPermeabilityPoint[] _points;
    private readonly double[] _frequenciesHz;
    private readonly LinearSpline? _muPrimeOfLogF;
    private readonly LinearSpline? _muDoublePrimeOfLogF;
    private readonly double _constantMuPrime;

    private ComplexPermeabilityCurve(ComplexPermeabilityPoint[] points)
    {
        _points = points;
        _frequenciesHz = points.Select(p => p.FrequencyHz).ToArray();
        var logF = _frequenciesHz.Select(Math.Log10).ToArray();
        _muPrimeOfLogF = LinearSpline.InterpolateSorted(logF, points.Select(p => p.MuPrime).ToArray());
        _muDoublePrimeOfLogF = LinearSpline.InterpolateSorted(logF, points.Select(p => p.MuDoublePrime).ToArray());
        Points = Array.AsReadOnly(points);
    }

    private ComplexPermeabilityCurve(double constantMuPrime)
    {
        _points = [];
        _frequenciesHz = [];
        _constantMuPrime = constantMuPrime;
        Points = ReadOnlyCollection<ComplexPermeabilityPoint>.Empty;
    }

    /// <summary>The table points in increasing frequency; empty for a frequency-independent curve.</summary>
    public IReadOnlyList<ComplexPermeabilityPoint> Points { get; }

    /// <summary>True for a curve made by <see cref="Constant"/>: μs′ = μi and μs″ = 0 at every frequency.</summary>
    public bool IsFrequencyIndependent => _muPrimeOfLogF is null;

    /// <summary>
    /// Builds a curve from a table. Requires at least 2 points, strictly increasing finite positive frequencies,
    /// finite μs′ &gt; 0 and finite μs″ ≥ 0.
    /// </summary>
    /// <param name="points">The table rows.</param>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 points, or a point outside the ranges above.</exception>
    public static ComplexPermeabilityCurve Create(IEnumerable<ComplexPermeabilityPoint> points)
    {
        ArgumentNullException.ThrowIfNull(points);
        var table = points.ToArray();
        if (table.Length < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(points), table.Length, "A permeability table needs at least 2 points.");
        }

        for (var i = 0; i < table.Length; i++)
        {
            var p = table[i];
            if (!double.IsFinite(p.FrequencyHz) || p.FrequencyHz <= 0)
            {
                throw new ArgumentOutOfRangeException(nameof(points), p.FrequencyHz, FormattableString.Invariant($"Point {i}: the frequency must be a finite number above 0 Hz."));
            }

            if (i > 0 && p.FrequencyHz <= table[i - 1].FrequencyHz)
            {
                throw new ArgumentOutOfRangeException(nameof(points), p.FrequencyHz, FormattableString.Invariant($"Point {i}: frequencies must be strictly increasing."));
            }

            if (!double.IsFinite(p.MuPrime) || p.MuPrime <= 0)
            {
                throw new ArgumentOutOfRangeException(nameof(points), p.MuPrime, FormattableString.Invariant($"Point {i}: μ′ must be a finite number above 0."));
            }

            if (!double.IsFinite(p.MuDoublePrime) || p.MuDoublePrime < 0)
            {
                throw new ArgumentOutOfRangeException(nameof(points), p.MuDoublePrime, FormattableString.Invariant($"Point {i}: μ″ must be a finite number of at least 0."));
            }
        }

        return new ComplexPermeabilityCurve(table);
    }

    /// <summary>
    /// A frequency-independent, lossless curve: μs′ = μi and μs″ = 0 at every frequency (the low-frequency limit; adequate
    /// well below the material's loss peak). Never flagged as extrapolated.
    /// </summary>
    /// <param name="initialPermeability">μi (dimensionless), finite and at least 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">μi is not finite or below 1.</exception>
    public static ComplexPermeabilityCurve Constant(double initialPermeability)
    {
        if (!double.IsFinite(initialPermeability) || initialPermeability < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(initialPermeability), initialPermeability, "The initial permeability must be a finite number of at least 1.");
        }

        return new ComplexPermeabilityCurve(initialPermeability);
    }

    /// <summary>
    /// μs′ and μs″ at a frequency: the table value at a table frequency, linear in log10 f between points, the end value
    /// held (and flagged) outside the table.
    /// </summary>
    /// <param name="frequencyHz">Frequency in Hz, finite and positive.</param>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is not finite or not positive.</exception>
    public ComplexPermeability At(double frequencyHz)
    {
        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be a finite number above 0 Hz.");
        }

        if (_muPrimeOfLogF is null || _muDoublePrimeOfLogF is null)
        {
            return new ComplexPermeability(frequencyHz, _constantMuPrime, 0, false);
        }

        if (frequencyHz < _frequenciesHz[0])
        {
            return new ComplexPermeability(frequencyHz, _points[0].MuPrime, _points[0].MuDoublePrime, true);
        }

        if (frequencyHz > _frequenciesHz[^1])
        {
            return new ComplexPermeability(frequencyHz, _points[^1].MuPrime, _points[^1].MuDoublePrime, true);
        }

        var index = Array.BinarySearch(_frequenciesHz, frequencyHz);
        if (index >= 0)
        {
            return new ComplexPermeability(frequencyHz, _points[index].MuPrime, _points[index].MuDoublePrime, false);
        }

        var logF = Math.Log10(frequencyHz);
        return new ComplexPermeability(frequencyHz, _muPrimeOfLogF.Interpolate(logF), _muDoublePrimeOfLogF.Interpolate(logF), false);
    }

    /// <summary>Two curves are equal when both are constant with the same μi, or both hold the same points.</summary>
    public bool Equals(ComplexPermeabilityCurve? other) =>
        other is not null
        && IsFrequencyIndependent == other.IsFrequencyIndependent
        && _constantMuPrime.Equals(other._constantMuPrime)
        && _points.AsSpan().SequenceEqual(other._points);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as ComplexPermeabilityCurve);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(_constantMuPrime);
        foreach (var p in _points)
        {
            hash.Add(p);
        }

        return hash.ToHashCode();
    }
}
