namespace Winding.Core.Quantities;

/// <summary>
/// A length, stored in metres. Use the unit-named factories and readers so that millimetres and metres cannot be
/// confused at a call site. Rejects NaN and infinity.
/// </summary>
public readonly record struct Length : IComparable<Length>
{
    private Length(double metres) => Metres = metres;

    /// <summary>The length in metres (SI).</summary>
    public double Metres { get; }

    /// <summary>The length in millimetres.</summary>
    public double Millimetres => Metres * 1e3;

    /// <summary>A length of zero.</summary>
    public static Length Zero => default;

    /// <summary>Creates a length from metres.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN or infinite.</exception>
    public static Length FromMetres(double metres)
    {
        if (!double.IsFinite(metres))
        {
            throw new ArgumentOutOfRangeException(nameof(metres), metres, "A length must be a finite number.");
        }

        return new Length(metres);
    }

    /// <summary>Creates a length from millimetres.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN or infinite.</exception>
    public static Length FromMillimetres(double millimetres)
    {
        if (!double.IsFinite(millimetres))
        {
            throw new ArgumentOutOfRangeException(nameof(millimetres), millimetres, "A length must be a finite number.");
        }

        return new Length(millimetres * 1e-3);
    }

    /// <inheritdoc />
    public int CompareTo(Length other) => Metres.CompareTo(other.Metres);

    /// <summary>Sum of two lengths.</summary>
    public static Length operator +(Length left, Length right) => new(left.Metres + right.Metres);

    /// <summary>Difference of two lengths.</summary>
    public static Length operator -(Length left, Length right) => new(left.Metres - right.Metres);

    /// <summary>A length scaled by a number.</summary>
    public static Length operator *(double factor, Length length) => FromMetres(factor * length.Metres);

    /// <summary>Compares two lengths.</summary>
    public static bool operator <(Length left, Length right) => left.Metres < right.Metres;

    /// <summary>Compares two lengths.</summary>
    public static bool operator >(Length left, Length right) => left.Metres > right.Metres;

    /// <summary>Compares two lengths.</summary>
    public static bool operator <=(Length left, Length right) => left.Metres <= right.Metres;

    /// <summary>Compares two lengths.</summary>
    public static bool operator >=(Length left, Length right) => left.Metres >= right.Metres;

    /// <summary>Named alternate for the + operator.</summary>
    public static Length Add(Length left, Length right) => left + right;

    /// <summary>Named alternate for the - operator.</summary>
    public static Length Subtract(Length left, Length right) => left - right;

    /// <summary>Named alternate for the * operator.</summary>
    public static Length Multiply(double factor, Length length) => factor * length;

    /// <summary>Shows the length in millimetres (invariant culture); for diagnostics, not for the UI.</summary>
    public override string ToString() => FormattableString.Invariant($"{Millimetres} mm");
}
