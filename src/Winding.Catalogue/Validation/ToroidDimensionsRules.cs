using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Core.Geometry;
using Winding.Core.Quantities;

namespace Winding.Catalogue.Validation;

/// <summary>
/// Checks toroid dimensions given in millimetres and builds the engine's <see cref="ToroidCore"/>. Sizes from 0.1 mm
/// to 1000 mm are accepted (beads to large power rings); the inner diameter must be below the outer diameter.
/// </summary>
public static class ToroidDimensionsRules
{
    /// <summary>Smallest accepted dimension, mm.</summary>
    public const double MinimumMm = 0.1;

    /// <summary>Largest accepted dimension, mm.</summary>
    public const double MaximumMm = 1000;

    /// <summary>Validates <paramref name="dimensions"/> under the field path <paramref name="prefix"/>.</summary>
    /// <returns>The toroid, or null when an error was added.</returns>
    public static ToroidCore? Validate(FieldValidator validator, string prefix, DimensionsMmDocument? dimensions)
    {
        ArgumentNullException.ThrowIfNull(validator);
        if (dimensions is null)
        {
            validator.Add(prefix, "Required: give outerDiameter, innerDiameter and height in millimetres.");
            return null;
        }

        var od = validator.Range($"{prefix}.outerDiameter", dimensions.OuterDiameter, MinimumMm, MaximumMm, "mm");
        var id = validator.Range($"{prefix}.innerDiameter", dimensions.InnerDiameter, MinimumMm, MaximumMm, "mm");
        var h = validator.Range($"{prefix}.height", dimensions.Height, MinimumMm, MaximumMm, "mm");
        if (od is not null && id is not null && id >= od)
        {
            validator.Add($"{prefix}.innerDiameter", string.Create(CultureInfo.InvariantCulture, $"The inner diameter ({id} mm) must be smaller than the outer diameter ({od} mm)."));
            return null;
        }

        if (od is null || id is null || h is null)
        {
            return null;
        }

        return ToroidCore.Create(Length.FromMillimetres(od.Value), Length.FromMillimetres(id.Value), Length.FromMillimetres(h.Value));
    }
}
