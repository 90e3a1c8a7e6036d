using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Sheets;

/// <summary>
/// The numbered build instructions generated from a plan: prepare the core, insulate it, then for each winding in
/// winding order the wrap under it, cutting its wire and winding it (bifilar partners are cut first and wound together),
/// then measure and terminate the leads, mark them, and make the bench checks. Multilayer windings are wound back and
/// forth, layer over layer, because that is what the engine's self-capacitance estimate assumes ((4/3)·C_l·(n − 1)/n²,
/// physics-sources §7.2). Practical advice without a source is marked as common practice in the text.
/// </summary>
public static class BuildSteps
{
    /// <summary>Length of bared lead end, m (5 mm; common practice, no source).</summary>
    public const double StripLengthM = 5e-3;

    /// <summary>The steps for <paramref name="plan"/>, numbered from 1.</summary>
    public static IReadOnlyList<BuildStep> For(TransformerPlan plan, PlanEvaluation evaluation, IReadOnlyList<SheetWindingRow> rows)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        ArgumentNullException.ThrowIfNull(rows);
        var steps = new List<(BuildStepKind Kind, int? Winding, string Text)>
        {
            (BuildStepKind.PrepareCore, null, Prepare(plan.Core)),
        };
        if (plan.Windings[0].Wrap is null)
        {
            steps.Add((BuildStepKind.InsulateCore, null, InsulateBareCore(plan)));
        }

        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            if (spec.Placement.Kind == PlacementKind.Bifilar)
            {
                steps.Add((BuildStepKind.Mark, i, SheetText.Text(
                    $"Winding {i + 1} ({spec.Name}) was wound together with winding {spec.Placement.OtherWinding + 1}. Find its two ends with an ohmmeter: mark the one beside {BenchSheetBuilder.StartMark(spec.Placement.OtherWinding + 1)} as {rows[i].StartMark} and the other as {rows[i].FinishMark}.")));
                continue;
            }

            var partners = Enumerable.Range(i + 1, plan.Windings.Count - i - 1)
                .Where(j => plan.Windings[j].Placement is { Kind: PlacementKind.Bifilar } p && p.OtherWinding == i)
                .ToList();
            foreach (var k in (int[])[i, .. partners])
            {
                if (plan.Windings[k].Wrap is { } wrap)
                {
                    steps.Add((k == 0 ? BuildStepKind.InsulateCore : BuildStepKind.Insulate, k, WrapText(k, wrap)));
                }
            }

            foreach (var k in (int[])[i, .. partners])
            {
                steps.Add((BuildStepKind.CutWire, k, Cut(plan, rows[k])));
            }

            steps.Add((BuildStepKind.Wind, i, Wind(plan, evaluation, rows, i, partners)));
        }

        steps.Add((BuildStepKind.Terminate, null, Terminate(plan)));
        steps.Add((BuildStepKind.Mark, null,
            "Secure the last layer with a turn of tape. Label every lead with its mark from the windings table on tape or sleeving — written letters, not colours. The S leads are the phasing-dot ends: with every winding wound in the same sense, all S ends swing together. Tie a tag to the part with the plan's name, revision and date."));
        steps.Add((BuildStepKind.Check, null,
            "Make the bench checks below. Write each reading in the measured column and tick its box when it lies between the limits."));
        return [.. steps.Select((s, n) => new BuildStep(n + 1, s.Kind, s.Winding, s.Text))];
    }

    private static string Prepare(PlanCore core)
    {
        var stack = core.StackCount > 1
            ? SheetText.Text($" Stack the {core.StackCount} cores face to face, hole on hole, and bind them with tape so they wind as one.")
            : string.Empty;
        return core.Shape switch
        {
            ToroidCore => "Check the ring core for chips and cracks." + stack,
            SleeveCore { IsSplit: true } s => SheetText.Text($"Check both halves of the sleeve for chips and cracks and wipe their faces clean: the plan assumes they close to a gap of {SheetText.Mm(s.ResidualGap.Metres)}.") + stack,
            SleeveCore => "Check the sleeve for chips and cracks." + stack,
            TwoHoleCore => "Check the core for chips and cracks and that both holes are clear." + stack,
            BobbinCore => "Check the core halves and the bobbin for cracks. Wind on the bobbin alone; fit the core halves only after the last winding.",
            _ => "Check the core for chips and cracks." + stack,
        };
    }

    private static string InsulateBareCore(TransformerPlan plan)
    {
        var conductive = plan.Core.Material.ResistivityOhmM is { } rho && rho <= ParasiticEstimator.ConductiveCoreResistivityOhmM;
        return plan.Core.Shape switch
        {
            BobbinCore => "The bobbin is the insulation between the core and winding 1: check that it has no cracks and that its flanges are whole.",
            ToroidCore { CoatingThickness.Metres: > 0 } t => SheetText.Text($"The core's coating ({SheetText.Mm(t.CoatingThickness.Metres)}) is its insulation: check that it is unbroken and that no sharp edge shows through."),
            _ when conductive => "This core's material conducts (resistivity of 100 Ω·m or less), so bare ferrite must not be the only thing between turns: wrap it with one layer of thin insulating tape before winding 1. The plan does not count this tape; it adds a little build.",
            _ => "The plan puts nothing under winding 1. Feel the core's edges: a sharp ferrite edge can cut enamel. Rounding it with fine abrasive paper or one layer of thin tape is the usual safeguard (common practice); tape adds a little build the plan does not count.",
        };
    }

    private static string WrapText(int index, InsulationWrap wrap) => index == 0
        ? SheetText.Text($"Insulate the core: wrap it with {wrap.Name} to {SheetText.Mm(wrap.Thickness.Metres)} in all, overlapping each turn of tape, before winding 1.")
        : SheetText.Text($"Insulate between windings: wrap {wrap.Name} to {SheetText.Mm(wrap.Thickness.Metres)} in all over the windings so far, before winding {index + 1}. Overlap the tape so no wire shows through.");

    private static string Cut(TransformerPlan plan, SheetWindingRow row)
    {
        var pieces = row.ElementsInHand > 1 ? SheetText.Text($"{row.ElementsInHand} pieces, each ") : string.Empty;
        return SheetText.Text(
            $"Cut {pieces}{SheetText.CutLength(row.LengthToCutM)} of {row.WireDescription} for winding {row.Number} ({row.Name}, {row.Turns} turns). That is the wound length with a {plan.Allowance.MarginFraction * 100:0.#} % margin and a {SheetText.Mm(row.LeadLengthPerEndM)} lead at each end.");
    }

    private static string Wind(TransformerPlan plan, PlanEvaluation evaluation, IReadOnlyList<SheetWindingRow> rows, int i, List<int> partners)
    {
        var row = rows[i];
        var spec = plan.Windings[i];
        var fit = evaluation.Windings[i].Fit;
        var parts = new List<string>();
        var together = partners.Count > 0
            ? SheetText.Text($" together with the wire of {string.Join(" and ", partners.Select(p => SheetText.Text($"winding {p + 1} ({plan.Windings[p].Name})")))}, laid side by side (or lightly twisted) and wound as one")
            : string.Empty;
        var inHand = row.ElementsInHand > 1 ? SheetText.Text($", its {row.ElementsInHand} wires side by side as one turn") : string.Empty;
        parts.Add(SheetText.Text($"Wind winding {row.Number} ({row.Name}){together}{inHand}. Leave a {SheetText.Mm(row.LeadLengthPerEndM)} lead at the start and mark it {row.StartMark}{(partners.Count > 0 ? " (the partner's start lies beside it)" : string.Empty)}."));
        var how = plan.Core.Shape is TwoHoleCore ? " (one turn goes through one hole and back through the other)" : string.Empty;
        var sense = i == 0
            ? " Wind in one sense of your choice; every later winding goes the same way."
            : " Wind in the same sense as winding 1.";
        var over = i > 0 && spec.Wrap is null && spec.Placement.Kind is PlacementKind.Spread or PlacementKind.Over && plan.Core.Shape is not TwoHoleCore
            ? " It goes straight over the windings before it: the plan has no wrap between them."
            : string.Empty;
        parts.Add(SheetText.Text($"Wind {row.Turns} turns {row.PlacementText}{how}, {Layers(fit)}.{sense}{over}"));
        if (fit.UnplacedTurns > 0)
        {
            parts.Add(SheetText.Text($"The plan finds room for only {row.Turns - fit.UnplacedTurns} of these turns: change the plan before winding."));
        }

        if (row.Taps.Count > 0)
        {
            parts.Add("Bring out a short twisted loop " + string.Join(", ", row.Taps.Select(t => SheetText.Text($"at turn {t.Turn} (mark it {t.Mark})"))) + ".");
        }

        parts.Add(SheetText.Text($"Leave a {SheetText.Mm(row.LeadLengthPerEndM)} lead at the finish and mark it {row.FinishMark}."));
        return string.Join(' ', parts);
    }

    private static string Layers(WindingFit fit) => fit.Layers switch
    {
        0 => "where there is room",
        1 => "in one layer, turns evenly spaced",
        _ => SheetText.Text($"in {fit.Layers} layers ({string.Join(" + ", fit.TurnsPerLayer)} turns), each layer wound back over the one before"),
    };

    private static string Terminate(TransformerPlan plan)
    {
        var text = new List<string>
        {
            "Before trimming anything, measure each winding's DC resistance end to end across its leads: the bench checks expect the whole piece as cut.",
            SheetText.Text($"Then trim the leads to the length you need and bare the last {SheetText.Mm(StripLengthM)} or so of each (common practice)."),
        };
        var solid = Numbers(plan, WireKind.Solid);
        var litz = Numbers(plan, WireKind.Litz);
        var hookUp = Numbers(plan, WireKind.HookUp);
        if (solid.Length > 0)
        {
            text.Add(SheetText.Text($"Enamelled wire ({Windings(solid)}): scrape the enamel off, or melt it off with a hot iron if it is solderable enamel, and tin the end."));
        }

        if (litz.Length > 0)
        {
            text.Add(SheetText.Text($"Litz ({Windings(litz)}): every strand must be bared and tinned, or the strands left out carry no current and the resistance rises."));
        }

        if (hookUp.Length > 0)
        {
            text.Add(SheetText.Text($"Hook-up wire ({Windings(hookUp)}): strip the insulation and tin the end."));
        }

        if (plan.Windings.Count > 1)
        {
            text.Add("Check each winding for continuity, and on the meter's highest resistance range that no winding connects to another.");
        }

        return string.Join(' ', text);
    }

    private static int[] Numbers(TransformerPlan plan, WireKind kind) =>
        [.. plan.Windings.Select((w, i) => (w, i)).Where(x => x.w.Wire.Kind == kind).Select(x => x.i + 1)];

    private static string Windings(int[] numbers) => (numbers.Length == 1 ? "winding " : "windings ") + string.Join(", ", numbers);
}
