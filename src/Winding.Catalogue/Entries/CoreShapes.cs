namespace Winding.Catalogue.Entries;

/// <summary>The core shape words used in files and the API.</summary>
public static class CoreShapes
{
    /// <summary>A ring core of rectangular section.</summary>
    public const string Toroid = "toroid";

    /// <summary>A sleeve (tube), solid or split clamp-on.</summary>
    public const string Sleeve = "sleeve";

    /// <summary>A two-hole (multi-aperture) core.</summary>
    public const string TwoHole = "two-hole";

    /// <summary>A bobbin core of the E, pot or RM-like families.</summary>
    public const string Bobbin = "bobbin";

    /// <summary>All shape words.</summary>
    public static IReadOnlyList<string> All { get; } = [Toroid, Sleeve, TwoHole, Bobbin];

    /// <summary>The bobbin family words.</summary>
    public static IReadOnlyList<string> BobbinFamilies { get; } = ["E", "pot", "RM", "other"];
}
