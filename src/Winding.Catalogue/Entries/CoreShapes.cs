namespace Winding.Catalogue.Entries;

/// <summary>The core shape words used in files and the API.</summary>
public static class CoreShapes
{
    /// <summary>A ring core of rectangular section.</summary>
    public const string Toroid = "toroid";
}
