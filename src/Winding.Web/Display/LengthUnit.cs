namespace Winding.Web.Display;

/// <summary>A length unit that may be typed into a length field (see <see cref="LengthText"/>).</summary>
public enum LengthUnit
{
    /// <summary>Millimetre, "mm".</summary>
    Millimetre,

    /// <summary>Inch, "in" or a double prime (<c>"</c>).</summary>
    Inch,

    /// <summary>Mil (thou), one thousandth of an inch, "mil".</summary>
    Mil,
}
