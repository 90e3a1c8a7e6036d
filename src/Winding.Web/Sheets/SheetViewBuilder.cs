using System.Globalization;
using Winding.Core.Plans;
using Winding.Core.Sheets;
using Winding.Core.Wire;
using Winding.Web.Display;

namespace Winding.Web.Sheets;

/// <summary>
/// Formats a <see cref="BenchSheet"/> for display: values with SI prefixes (<see cref="EngineeringFormat"/>, as the plan
/// page's results), lengths to cut in whole millimetres, dates in ISO 8601.
/// </summary>
public static class SheetViewBuilder
{
    /// <summary>Builds the view of the sheet of <paramref name="plan"/>.</summary>
    /// <param name="plan">The plan.</param>
    /// <param name="evaluation">The engine's evaluation of it.</param>
    /// <param name="coreName">The catalogue core's name, or null for an inline core.</param>
    /// <param name="date">The sheet's date.</param>
    /// <param name="revision">The saved plan's version, or 0 when the sheet is not of a saved version.</param>
    /// <param name="revisionText">The revision in words.</param>
    public static SheetView Build(TransformerPlan plan, PlanEvaluation evaluation, string? coreName, DateOnly date, int revision, string revisionText)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        ArgumentNullException.ThrowIfNull(revisionText);
        var sheet = BenchSheetBuilder.Build(plan, evaluation, date, revision);
        var first = sheet.Windings[0];
        return new SheetView(
            sheet,
            sheet.Title,
            date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
            revisionText,
            CoreFacts(sheet.Core, coreName),
            [.. sheet.Windings.Select(Line)],
            Invariant($"Lengths to cut include a {first.LeadLengthPerEndM * 1e3:0} mm lead at each end and a {plan.Allowance.MarginFraction * 100:0.#} % margin on the wound length. S marks the start of a winding, its phasing-dot end; F its finish; T a tap."),
            sheet.Steps,
            CheckLines(sheet),
            [.. sheet.Cautions.Select(c => c.Text)],
            plan,
            evaluation,
            DrawingNote(plan));
    }

    /// <summary>The catalogue core's name when <paramref name="document"/> names a catalogue core, else null.</summary>
    public static string? CoreName(Catalogue.Plans.PlanDocument document, Catalogue.Loading.CoreCatalogue catalogue)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(catalogue);
        return document.Core?.CatalogueId is { } id && catalogue.CoresById.TryGetValue(id, out var core) ? core.Name : null;
    }

    /// <summary>Today's date from <paramref name="time"/>, local time.</summary>
    public static DateOnly Today(TimeProvider time)
    {
        ArgumentNullException.ThrowIfNull(time);
        return DateOnly.FromDateTime(time.GetLocalNow().DateTime);
    }

    /// <summary>A value with its unit as the sheet shows it: SI prefix, or three decimals for a plain ratio.</summary>
    public static string Value(double value, string unit) =>
        unit.Length == 0 ? value.ToString("F3", CultureInfo.InvariantCulture) : EngineeringFormat.Format(value, unit);

    /// <summary>A length to cut as the sheet shows it, in whole millimetres (as the plan page's results).</summary>
    public static string LengthToCut(double metres) => EngineeringFormat.Fixed(metres * 1e3, 0, "mm");

    private static List<SheetFact> CoreFacts(SheetCoreSummary core, string? coreName)
    {
        var facts = new List<SheetFact>
        {
            new("core", "Core", coreName ?? char.ToUpperInvariant(core.ShapeText[0]) + core.ShapeText[1..]),
            new("shape", "Shape", core.ShapeText),
            new("dimensions", "Dimensions of one core", string.Join(" · ", core.Dimensions.Select(d => d.Name + " " + Invariant($"{d.Metres * 1e3:0.###} mm")))),
        };
        if (core.StackCount > 1)
        {
            facts.Add(new("stack", "Stack", Invariant($"{core.StackCount} cores face to face, wound as one")));
        }

        facts.Add(new("material", "Material class", core.MaterialName));
        var mu = Invariant($"μi {core.InitialPermeability:0.#}");
        if (Math.Abs(core.EffectivePermeability - core.InitialPermeability) > 1e-6 * core.InitialPermeability)
        {
            mu += Invariant($" · μe {core.EffectivePermeability:0.#} (with the gap)");
        }

        facts.Add(new("permeability", "Permeability", mu));
        facts.Add(new("al", "AL", EngineeringFormat.Format(core.AlHenriesPerTurnSquared, "H") + "/turn² ± " + Invariant($"{core.AlTolerance * 100:0.#}") + " %"));
        facts.Add(new("al-basis", "AL from", core.AlBasis));
        facts.Add(new("effective", "Effective length and area", Invariant($"le {core.EffectiveLengthM * 1e3:0.##} mm · Ae {core.EffectiveAreaM2 * 1e6:0.##} mm²")));
        return facts;
    }

    private static SheetWindingLine Line(SheetWindingRow row)
    {
        var kind = row.WireKind switch
        {
            WireKind.Litz => "Litz",
            WireKind.HookUp => "hook-up wire, " + row.MetalName,
            _ => "enamelled " + row.MetalName,
        };
        var strands = row.WireKind == WireKind.Litz ? Invariant($"{row.StrandsPerElement} strands of {row.ConductorDiameterM * 1e3:0.###} mm") : "1";
        if (row.ElementsInHand > 1)
        {
            strands += Invariant($"; {row.ElementsInHand} wires in hand");
        }

        var layers = row.Layers > 1
            ? Invariant($"{row.Layers} ({string.Join(" + ", row.TurnsPerLayer)})")
            : row.Layers.ToString(CultureInfo.InvariantCulture);
        if (row.Fit == Core.Windings.FitOutcome.DoesNotFit)
        {
            layers += " — does not fit";
        }

        return new SheetWindingLine(
            row.Number.ToString(CultureInfo.InvariantCulture),
            row.Name,
            row.Turns.ToString(CultureInfo.InvariantCulture),
            row.WireDescription + " (" + kind + ")",
            strands,
            LengthToCut(row.LengthToCutM),
            layers,
            row.PlacementText,
            row.DirectionText,
            row.StartMark + " / " + row.FinishMark,
            row.Taps.Count == 0 ? "—" : string.Join(", ", row.Taps.Select(t => Invariant($"{t.Mark} at turn {t.Turn}"))),
            row.InsulationUnder is { } wrap ? Invariant($"{wrap.Name}, {wrap.Thickness.Millimetres:0.###} mm") : "—");
    }

    /// <summary>The check rows; a source already given for an earlier check is referred to by that check's number.</summary>
    private static List<SheetCheckLine> CheckLines(BenchSheet sheet)
    {
        var lines = new List<SheetCheckLine>();
        var firstWith = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var i = 0; i < sheet.Checks.Count; i++)
        {
            var line = Line(sheet.Checks[i], i + 1, sheet);
            if (firstWith.TryGetValue(line.Source, out var earlier))
            {
                line = line with { Source = Invariant($"as for check {earlier}.") };
            }
            else
            {
                firstWith[line.Source] = i + 1;
            }

            lines.Add(line);
        }

        return lines;
    }

    private static SheetCheckLine Line(BenchCheck check, int number, BenchSheet sheet)
    {
        string Winding(int index) => Invariant($"winding {index + 1} ({sheet.Windings[index].Name})");
        var lastIndex = sheet.Windings.Count - 1;
        var what = check.Quantity switch
        {
            BenchQuantity.Inductance => "Inductance of " + Winding(check.WindingIndex!.Value),
            BenchQuantity.DcResistance => "DC resistance of " + Winding(check.WindingIndex!.Value) + " at 20 °C",
            BenchQuantity.LeakageInductance => Invariant($"Leakage inductance at winding 1, winding {lastIndex + 1} shorted"),
            BenchQuantity.TurnsRatio => Invariant($"Turns ratio as voltage ratio V{check.WindingIndex + 1}/V1 ({sheet.Windings[check.WindingIndex!.Value].Name} to {sheet.Windings[0].Name})"),
            BenchQuantity.SelfResonance => "Self-resonant frequency seen from winding 1",
            _ => check.Id,
        };
        return new SheetCheckLine(
            check.Id,
            number.ToString(CultureInfo.InvariantCulture),
            what,
            check.Condition,
            Value(check.Expected, check.Unit),
            Value(check.Lower, check.Unit),
            Value(check.Upper, check.Unit),
            check.Basis,
            check.Source);
    }

    private static string DrawingNote(TransformerPlan plan) => plan.Core.Shape switch
    {
        Core.Geometry.BobbinCore => "To scale. Without colour: winding 1 lies next to the centre leg, each later winding further out; the windings table gives the order.",
        Core.Geometry.TwoHoleCore => "To scale. Without colour: winding 1 lies against the hole walls, each later winding further in; the windings table gives the order.",
        _ => "To scale. Without colour: winding 1 lies on the core, each later winding over the ones before it (sectors side by side at the angles in the windings table).",
    };

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
