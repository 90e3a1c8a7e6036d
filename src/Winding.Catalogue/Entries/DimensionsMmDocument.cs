namespace Winding.Catalogue.Entries;

/// <summary>Core dimensions in millimetres, as measured with a caliper (JSON: <c>dimensionsMm</c>).</summary>
public sealed class DimensionsMmDocument
{
    /// <summary>Outer diameter, mm.</summary>
    public double? OuterDiameter { get; set; }

    /// <summary>Inner diameter, mm.</summary>
    public double? InnerDiameter { get; set; }

    /// <summary>Height (axial thickness), mm.</summary>
    public double? Height { get; set; }
}
