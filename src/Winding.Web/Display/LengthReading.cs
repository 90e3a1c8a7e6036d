namespace Winding.Web.Display;

/// <summary>What <see cref="LengthText.Read"/> made of a length as typed.</summary>
/// <param name="Millimetres">The length in millimetres, or null when the text is not a length.</param>
/// <param name="Unit">The unit the text was in: the one typed after the number, or the field's unit for a plain number.</param>
/// <param name="Problem">Why the text is not a length (plain words, to follow "'text' "), or null.</param>
public readonly record struct LengthReading(double? Millimetres, LengthUnit Unit, string? Problem)
{
    /// <summary>True when the text is a length.</summary>
    public bool IsLength => Millimetres is not null;
}
