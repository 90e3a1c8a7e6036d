using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Core.Geometry;
using Winding.Core.Quantities;
using Winding.Core.Windings;

namespace Winding.Catalogue.Validation;

/// <summary>
/// Checks a core's shape, dimensions (mm), entered effective parameters and AL, and builds the engine's
/// <see cref="CoreShape"/>. Sizes from 0.1 mm to 1000 mm are accepted; fields a shape does not use are refused so that a
/// mistake is not silently ignored.
/// </summary>
public static class CoreShapeRules
{
    /// <summary>Smallest accepted dimension, mm.</summary>
    public const double MinimumMm = 0.1;

    /// <summary>Largest accepted dimension, mm.</summary>
    public const double MaximumMm = 1000;

    private static readonly Dictionary<string, string[]> FieldsByShape = new(StringComparer.Ordinal)
    {
        [CoreShapes.Toroid] = ["outerDiameter", "innerDiameter", "height", "coatingThickness"],
        [CoreShapes.Sleeve] = ["outerDiameter", "innerDiameter", "length", "residualGap"],
        [CoreShapes.TwoHole] = ["length", "holeDiameter", "holeSpacing", "width", "height"],
        [CoreShapes.Bobbin] = ["windowBreadth", "windowHeight", "legDiameter", "legWidth", "legDepth", "bobbinWall"],
    };

    /// <summary>Validates a core description under the field path <paramref name="prefix"/> ("" at the top of a file).</summary>
    /// <returns>The shape, or null when an error was added.</returns>
    public static CoreShape? Validate(
        FieldValidator validator, string prefix, string? shape, string? family, DimensionsMmDocument? dimensions,
        EffectiveParametersDocument? effective, double? alNh)
    {
        ArgumentNullException.ThrowIfNull(validator);
        var at = prefix.Length == 0 ? string.Empty : prefix + ".";
        if (shape is null || !FieldsByShape.TryGetValue(shape, out var allowed))
        {
            validator.Add(at + "shape", shape is null
                ? "Required: the core shape, one of " + string.Join(", ", CoreShapes.All) + "."
                : $"Unknown shape '{shape}': use one of " + string.Join(", ", CoreShapes.All) + ".");
            return null;
        }

        var dims = at + "dimensionsMm";
        if (dimensions is null)
        {
            validator.Add(dims, $"Required: the dimensions of the {shape} in millimetres ({string.Join(", ", allowed)}).");
            return null;
        }

        foreach (var (name, value) in Present(dimensions))
        {
            if (!allowed.Contains(name))
            {
                validator.Add($"{dims}.{name}", $"Not used by a {shape}: it takes {string.Join(", ", allowed)}.");
            }
        }

        if (shape != CoreShapes.Bobbin && alNh is not null)
        {
            validator.Add(at + "alNh", $"An entered AL applies to bobbin cores; a {shape}'s AL follows from its material and dimensions.");
        }

        if (shape != CoreShapes.Bobbin && family is not null)
        {
            validator.Add(at + "family", "The family applies to bobbin cores only.");
        }

        if (shape is CoreShapes.Toroid or CoreShapes.Sleeve && effective is not null)
        {
            validator.Add(at + "effective", $"A {shape}'s effective parameters follow from its dimensions (IEC 60205); remove them.");
        }

        var before = validator.Errors.Count;
        CoreShape? result = shape switch
        {
            CoreShapes.Toroid => Toroid(validator, dims, dimensions),
            CoreShapes.Sleeve => Sleeve(validator, dims, dimensions),
            CoreShapes.TwoHole => TwoHole(validator, at, dims, dimensions, effective),
            _ => Bobbin(validator, at, dims, dimensions, effective, alNh, family),
        };
        return validator.Errors.Count == before ? result : null;
    }

    private static ToroidCore? Toroid(FieldValidator v, string dims, DimensionsMmDocument d)
    {
        var od = Size(v, dims, "outerDiameter", d.OuterDiameter);
        var id = Size(v, dims, "innerDiameter", d.InnerDiameter);
        var h = Size(v, dims, "height", d.Height);
        var coating = d.CoatingThickness is null ? 0 : v.Range($"{dims}.coatingThickness", d.CoatingThickness, 0, 10, "mm");
        if (!InnerBelowOuter(v, dims, od, id) || h is null || coating is null)
        {
            return null;
        }

        if (2 * coating >= id)
        {
            v.Add($"{dims}.coatingThickness", "The coating must be thinner than half the inner diameter.");
            return null;
        }

        return ToroidCore.Create(Mm(od!.Value), Mm(id!.Value), Mm(h.Value)).WithCoating(Mm(coating.Value));
    }

    private static SleeveCore? Sleeve(FieldValidator v, string dims, DimensionsMmDocument d)
    {
        var od = Size(v, dims, "outerDiameter", d.OuterDiameter);
        var id = Size(v, dims, "innerDiameter", d.InnerDiameter);
        var length = Size(v, dims, "length", d.Length);
        var gap = d.ResidualGap is null ? 0 : v.Range($"{dims}.residualGap", d.ResidualGap, 0, 10, "mm");
        if (!InnerBelowOuter(v, dims, od, id) || length is null || gap is null)
        {
            return null;
        }

        return SleeveCore.Create(Mm(od!.Value), Mm(id!.Value), Mm(length.Value), Mm(gap.Value));
    }

    private static TwoHoleCore? TwoHole(FieldValidator v, string at, string dims, DimensionsMmDocument d, EffectiveParametersDocument? effective)
    {
        var length = Size(v, dims, "length", d.Length);
        var hole = Size(v, dims, "holeDiameter", d.HoleDiameter);
        var spacing = Size(v, dims, "holeSpacing", d.HoleSpacing);
        var width = Size(v, dims, "width", d.Width);
        var height = Size(v, dims, "height", d.Height);
        var entered = effective is null ? null : Effective(v, at, effective);
        if (length is null || hole is null || spacing is null || width is null || height is null || (effective is not null && entered is null))
        {
            return null;
        }

        var ok = true;
        if (spacing <= hole)
        {
            v.Add($"{dims}.holeSpacing", Text($"The hole spacing ({spacing} mm, centre to centre) must exceed the hole diameter ({hole} mm)."));
            ok = false;
        }

        if (width <= spacing + hole)
        {
            v.Add($"{dims}.width", Text($"The width ({width} mm) must exceed the hole spacing plus one hole diameter ({spacing + hole} mm)."));
            ok = false;
        }

        if (height <= hole)
        {
            v.Add($"{dims}.height", Text($"The height ({height} mm) must exceed the hole diameter ({hole} mm)."));
            ok = false;
        }

        return ok ? TwoHoleCore.Create(Mm(length.Value), Mm(hole.Value), Mm(spacing.Value), Mm(width.Value), Mm(height.Value), entered) : null;
    }

    private static BobbinCore? Bobbin(FieldValidator v, string at, string dims, DimensionsMmDocument d, EffectiveParametersDocument? effective, double? alNh, string? family)
    {
        if (family is not null && !CoreShapes.BobbinFamilies.Contains(family))
        {
            v.Add(at + "family", "Unknown family: use one of " + string.Join(", ", CoreShapes.BobbinFamilies) + ".");
        }

        var breadth = Size(v, dims, "windowBreadth", d.WindowBreadth);
        var height = Size(v, dims, "windowHeight", d.WindowHeight);
        var wall = d.BobbinWall is null ? 0 : v.Range($"{dims}.bobbinWall", d.BobbinWall, 0, 10, "mm");
        CentreLeg? leg = null;
        if (d.LegDiameter is not null && (d.LegWidth is not null || d.LegDepth is not null))
        {
            v.Add($"{dims}.legDiameter", "Give legDiameter for a round leg, or legWidth and legDepth for a rectangular one, not both.");
        }
        else if (d.LegDiameter is not null)
        {
            var diameter = Size(v, dims, "legDiameter", d.LegDiameter);
            leg = diameter is null ? null : CentreLeg.Round(Mm(diameter.Value));
        }
        else
        {
            var legWidth = Size(v, dims, "legWidth", d.LegWidth);
            var legDepth = Size(v, dims, "legDepth", d.LegDepth);
            leg = legWidth is null || legDepth is null ? null : CentreLeg.Rectangular(Mm(legWidth.Value), Mm(legDepth.Value));
        }

        if (effective is null)
        {
            v.Add(at + "effective", "Required for a bobbin core: the datasheet's effective area (areaMm2) and length (lengthMm).");
            return null;
        }

        var entered = Effective(v, at, effective);
        var al = alNh is null ? null : v.Range(at + "alNh", alNh, 1, 1e6, "nH");
        if (breadth is null || height is null || wall is null || leg is null || entered is null || (alNh is not null && al is null))
        {
            return null;
        }

        return BobbinCore.Create(
            family ?? "other",
            entered.EffectiveAreaM2,
            entered.EffectiveLengthM,
            al is null ? null : InductanceFactor.FromHenriesPerTurnSquared(al.Value * 1e-9),
            Mm(breadth.Value),
            Mm(height.Value),
            leg,
            Mm(wall.Value));
    }

    private static EffectiveParameters? Effective(FieldValidator v, string at, EffectiveParametersDocument effective)
    {
        var area = v.Range(at + "effective.areaMm2", effective.AreaMm2, 0.01, 1e5, "mm²");
        var length = v.Range(at + "effective.lengthMm", effective.LengthMm, 0.1, 5000, "mm");
        if (area is null || length is null)
        {
            return null;
        }

        var areaM2 = area.Value * 1e-6;
        var lengthM = length.Value * 1e-3;
        return new EffectiveParameters(lengthM / areaM2, lengthM / (areaM2 * areaM2));
    }

    private static bool InnerBelowOuter(FieldValidator v, string dims, double? od, double? id)
    {
        if (od is not null && id is not null && id >= od)
        {
            v.Add($"{dims}.innerDiameter", Text($"The inner diameter ({id} mm) must be smaller than the outer diameter ({od} mm)."));
            return false;
        }

        return od is not null && id is not null;
    }

    private static double? Size(FieldValidator v, string dims, string name, double? value) =>
        v.Range($"{dims}.{name}", value, MinimumMm, MaximumMm, "mm");

    private static Length Mm(double millimetres) => Length.FromMillimetres(millimetres);

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    private static IEnumerable<(string Name, double? Value)> Present(DimensionsMmDocument d)
    {
        (string, double?)[] all =
        [
            ("outerDiameter", d.OuterDiameter), ("innerDiameter", d.InnerDiameter), ("height", d.Height),
            ("coatingThickness", d.CoatingThickness), ("length", d.Length), ("residualGap", d.ResidualGap),
            ("holeDiameter", d.HoleDiameter), ("holeSpacing", d.HoleSpacing), ("width", d.Width),
            ("windowBreadth", d.WindowBreadth), ("windowHeight", d.WindowHeight), ("legDiameter", d.LegDiameter),
            ("legWidth", d.LegWidth), ("legDepth", d.LegDepth), ("bobbinWall", d.BobbinWall),
        ];
        return all.Where(x => x.Item2 is not null);
    }
}
