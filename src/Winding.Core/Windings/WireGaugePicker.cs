using System.Globalization;
using Winding.Core.Conductors;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Windings;

/// <summary>
/// Picks standard wires for one winding of a plan and ranks them, best first.
/// </summary>
/// <remarks>
/// <para><b>Candidates.</b> Every standard wire (<see cref="StandardWireTable"/>, or
/// <see cref="WireChoiceOptions.Candidates"/>) as a single wire. When none of the single wires that are accepted (below)
/// meets every rule, also strands in hand of a thinner standard wire: for each accepted single wire above the
/// skin-depth limit and each standard wire S within it, n = ⌈A_wire/A_S⌉ strands of S (the fewest with the same or more
/// copper), kept when 2 ≤ n ≤ 8.</para>
/// <para><b>Placing.</b> Each candidate replaces the winding's wire (same turns, placement, wrap and taps; the other
/// windings unchanged) and <see cref="WindingLayout.Place"/> places the whole plan.</para>
/// <para><b>Rules.</b> All limits are rules of thumb (common practice, no source).</para>
/// <list type="number">
/// <item><description>Fit (rejects): a candidate that leaves any winding of the plan "does not fit" is not listed;
/// "tight" is listed, said in the reasons and ranked lower.</description></item>
/// <item><description>Window share (rejects): N·A ≤ s·W_a·K_u, with N the turns, A the conductor area of one turn (all
/// strands in hand), s the winding's share of the window (<see cref="WireChoiceOptions.WindowShare"/>, by default
/// 1/number of windings), W_a the window area (<see cref="Geometry.CoreShape.WindowAreaM2"/>) and K_u = 0.4 the
/// utilisation hand winding reaches (<see cref="WindingLayout.HandWindingUtilisation"/>; McLyman's K_u ≈ 0.4, from
/// memory; common practice). Areas in m².</description></item>
/// <item><description>Current density (listed, ranked lower): J = I_rms/A ≤ J_max, A/m², by default 4 A/mm²
/// (common practice for small naturally cooled windings, no source).</description></item>
/// <item><description>Skin depth (listed, ranked lower): d ≤ r·δ with d the conductor (strand) diameter, δ the skin
/// depth of the metal at the frequency and 20 °C (<see cref="Conductors.SkinDepth"/>) and r by default 2; the reasons
/// of a wire above it suggest strands in hand or Litz.</description></item>
/// </list>
/// <para><b>Figures.</b> Length to cut from the plan's <see cref="WireLengthAllowance"/> and the fit's mean turn length;
/// Rdc = ρ20·ℓ/A (IEC 60028); Rac = F_R·Rdc with F_R from <see cref="WindingAcResistance"/> (Dowell 1966) for the fit's
/// layers, at 20 °C; copper loss I_rms²·Rac (sinusoidal current).</para>
/// <para><b>Ranking</b>, each step breaking ties of the one before: (1) every rule met first; (2) within the skin-depth
/// limit before above it; (3) within the current-density limit before above it, and above it the lower density first;
/// (4) fits before tight; (5) lower copper loss (the same current flows in every candidate, so this is the order of
/// Rac); (6) fewer layers; (7) more room left (the smallest hole or window height left over all windings); then by
/// standard id (ordinal) and fewer strands, so that the result does not depend on the order of the table.</para>
/// <para>Never throws for a valid plan; when nothing is accepted the list is empty and
/// <see cref="WireChoiceReport.Summary"/> says why.</para>
/// </remarks>
public static class WireGaugePicker
{
    /// <summary>Fewest strands in hand suggested.</summary>
    public const int MinimumStrandsInHand = 2;

    /// <summary>Most strands in hand suggested; beyond this, Litz is the practical choice (common practice, no source).</summary>
    public const int MaximumStrandsInHand = 8;

    /// <summary>The highest RMS current accepted, 10⁶ A: far beyond any wound component, and it keeps I²·R finite.</summary>
    public const double MaximumCurrentA = 1e6;

    /// <summary>The ranked choices for winding <paramref name="windingIndex"/> (see the class remarks).</summary>
    /// <param name="plan">The plan.</param>
    /// <param name="windingIndex">Index of the winding in <see cref="TransformerPlan.Windings"/>.</param>
    /// <param name="rmsCurrentA">RMS current in the winding, A, above 0 and at most <see cref="MaximumCurrentA"/>.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0 and at most <see cref="WindingAcResistance.MaximumFrequencyHz"/>.</param>
    /// <param name="options">The limits; null for <see cref="WireChoiceOptions.Default"/>.</param>
    /// <returns>At most <see cref="WireChoiceOptions.MaximumChoices"/> choices, best first; empty when nothing fits.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument lies outside its range.</exception>
    public static IReadOnlyList<WireChoice> Choose(TransformerPlan plan, int windingIndex, double rmsCurrentA, double frequencyHz, WireChoiceOptions? options = null) =>
        ChooseWithReport(plan, windingIndex, rmsCurrentA, frequencyHz, options).Choices;

    /// <summary>As <see cref="Choose"/>, with counts per rule of the candidates tried and a summary in plain words.</summary>
    /// <param name="plan">The plan.</param>
    /// <param name="windingIndex">Index of the winding in <see cref="TransformerPlan.Windings"/>.</param>
    /// <param name="rmsCurrentA">RMS current in the winding, A, above 0 and at most <see cref="MaximumCurrentA"/>.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0 and at most <see cref="WindingAcResistance.MaximumFrequencyHz"/>.</param>
    /// <param name="options">The limits; null for <see cref="WireChoiceOptions.Default"/>.</param>
    /// <returns>The choices and the counts.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument lies outside its range.</exception>
    public static WireChoiceReport ChooseWithReport(TransformerPlan plan, int windingIndex, double rmsCurrentA, double frequencyHz, WireChoiceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentOutOfRangeException.ThrowIfNegative(windingIndex);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(windingIndex, plan.Windings.Count);
        if (!double.IsFinite(rmsCurrentA) || rmsCurrentA <= 0 || rmsCurrentA > MaximumCurrentA)
        {
            throw new ArgumentOutOfRangeException(nameof(rmsCurrentA), rmsCurrentA, "The RMS current must be above 0 A and at most 1e6 A.");
        }

        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0 || frequencyHz > WindingAcResistance.MaximumFrequencyHz)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be above 0 Hz and at most 1e12 Hz.");
        }

        options ??= WireChoiceOptions.Default;
        var shape = plan.Core.WoundGeometry;
        var share = options.WindowShare ?? 1.0 / plan.Windings.Count;
        var context = new Context(plan, windingIndex, rmsCurrentA, frequencyHz, options, share, share * shape.WindowAreaM2 * WindingLayout.HandWindingUtilisation);

        // Sorted by id first, so that nothing below depends on the order of the table.
        var standards = (options.Candidates ?? StandardWireTable.All)
            .DistinctBy(w => w.Id, StringComparer.Ordinal)
            .OrderBy(w => w.Id, StringComparer.Ordinal)
            .ToArray();
        var thinEnough = standards.Where(s => WithinSkinLimit(context, s)).ToArray();

        var singles = standards.Select(s => Try(context, s, 1)).ToList();
        var strandSets = new List<Trial>();
        if (!singles.Any(t => t.Accepted && t.MeetsCurrentDensity && t.MeetsSkinDepth))
        {
            var sets = new SortedSet<(string Id, int Count)>();
            foreach (var single in singles.Where(t => t.Accepted && !t.MeetsSkinDepth))
            {
                foreach (var strand in thinEnough)
                {
                    var count = StrandsForSameCopper(single.Standard, strand);
                    if (count is >= MinimumStrandsInHand and <= MaximumStrandsInHand)
                    {
                        sets.Add((strand.Id, count));
                    }
                }
            }

            var byId = standards.ToDictionary(s => s.Id, StringComparer.Ordinal);
            strandSets.AddRange(sets.Select(set => Try(context, byId[set.Id], set.Count)));
        }

        var trials = singles.Concat(strandSets).ToList();
        var accepted = trials
            .Where(t => t.Accepted)
            .Select(t => ToChoice(context, t, thinEnough))
            .ToList();
        accepted.Sort(Compare);
        var choices = accepted
            .Take(options.MaximumChoices)
            .Select((c, i) => c with { Rank = i + 1 })
            .ToArray();

        var doesNotFit = trials.Count(t => t.LeavesWindingThatDoesNotFit);
        var overShare = trials.Count(t => t.OverShare);
        var aboveJ = trials.Count(t => !t.MeetsCurrentDensity);
        var aboveSkin = trials.Count(t => !t.MeetsSkinDepth);
        var passing = accepted.Count(c => c.Passes);
        var summary = Summary(context, singles.Count, strandSets.Count, doesNotFit, overShare, aboveJ, aboveSkin, accepted.Count, passing);
        return new WireChoiceReport(
            Array.AsReadOnly(choices), singles.Count, strandSets.Count, doesNotFit, overShare, aboveJ, aboveSkin, accepted.Count, passing, context.CopperLimitM2, summary);
    }

    private static Trial Try(Context context, StandardWire standard, int inHand)
    {
        var plan = context.Plan;
        var wire = standard.ToWindingWire().InHand(inHand);
        var original = plan.Windings[context.Index];
        var replaced = WindingSpec.Create(original.Name, original.Turns, wire, original.Placement, original.Wrap, original.Taps);
        var windings = plan.Windings.Select((w, i) => i == context.Index ? replaced : w).ToArray();
        var fits = WindingLayout.Place(plan.Core.WoundGeometry, windings);

        var copperInWindowM2 = original.Turns * wire.ConductorAreaM2;
        var skinDepth = SkinDepth.Of(wire.Metal, context.FrequencyHz);
        var ratio = wire.StrandDiameter.Metres / skinDepth.Metres;
        var densityAPerM2 = context.CurrentA / wire.ConductorAreaM2;
        return new Trial(
            standard,
            wire,
            fits,
            windings,
            fits.Any(f => f.Outcome == FitOutcome.DoesNotFit),
            copperInWindowM2 > context.CopperLimitM2,
            copperInWindowM2,
            densityAPerM2,
            densityAPerM2 <= context.Options.MaximumCurrentDensityAPerM2,
            skinDepth,
            ratio,
            ratio <= context.Options.MaximumSkinDepthRatio);
    }

    private static WireChoice ToChoice(Context context, Trial trial, IReadOnlyList<StandardWire> thinEnough)
    {
        var plan = context.Plan;
        var spec = trial.Windings[context.Index];
        var fit = trial.Fits[context.Index];
        var wire = trial.Wire;
        var lengthM = plan.Allowance.LengthToCutM(spec.Turns, fit.MeanTurnLengthM);
        var rdcOhm = wire.Metal.DcResistanceOhm(lengthM, wire.ConductorAreaM2);
        var factor = WindingAcResistance.Evaluate(wire, Math.Max(1, fit.Layers), context.FrequencyHz);
        var racOhm = factor.AcResistanceOhm(rdcOhm);
        var lossW = context.CurrentA * context.CurrentA * racOhm;
        var roomM = trial.Fits.Min(f => f.RemainingHoleDiameter?.Metres ?? f.RemainingWindowHeightM ?? 0);
        var outcome = trial.Fits.Any(f => f.Outcome == FitOutcome.Tight) ? FitOutcome.Tight : FitOutcome.Fits;
        var description = trial.Wire.ElementsInHand == 1
            ? trial.Standard.Description
            : Invariant($"{trial.Wire.ElementsInHand} × {trial.Standard.Description} in hand");

        return new WireChoice(
            0,
            trial.Standard.Id,
            description,
            wire,
            outcome,
            fit,
            wire.ConductorAreaM2,
            trial.CopperInWindowM2,
            trial.CurrentDensityAPerM2,
            trial.SkinDepth,
            trial.SkinDepthRatio,
            lengthM,
            rdcOhm,
            racOhm,
            lossW,
            roomM,
            trial.MeetsCurrentDensity,
            trial.MeetsSkinDepth,
            Reasons(context, trial, thinEnough));
    }

    private static string[] Reasons(Context context, Trial trial, IReadOnlyList<StandardWire> thinEnough)
    {
        var plan = context.Plan;
        var options = context.Options;
        var fit = trial.Fits[context.Index];
        var spec = trial.Windings[context.Index];
        var reasons = new List<string>();
        if (trial.Wire.ElementsInHand > 1)
        {
            reasons.Add(Invariant($"Suggestion: {trial.Wire.ElementsInHand} strands of {trial.Standard.Description} wound side by side as one turn, {trial.Wire.ConductorAreaM2 * 1e6:0.####} mm² of copper in all."));
        }

        reasons.Add(fit.Outcome == FitOutcome.Tight ? Invariant($"Tight: {fit.Reason}") : Invariant($"Fits: {fit.Reason}"));
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            if (i != context.Index && trial.Fits[i].Outcome == FitOutcome.Tight)
            {
                reasons.Add(Invariant($"Winding '{plan.Windings[i].Name}' is tight with this wire: {trial.Fits[i].Reason}"));
            }
        }

        reasons.Add(Invariant($"Copper {spec.Turns} × {trial.Wire.ConductorAreaM2 * 1e6:0.####} mm² = {trial.CopperInWindowM2 * 1e6:0.###} mm², within this winding's share of the window ({context.CopperLimitM2 * 1e6:0.###} mm² = {context.Share:0.###} × {plan.Core.WoundGeometry.WindowAreaM2 * 1e6:0.###} mm² × {WindingLayout.HandWindingUtilisation:0.0})."));

        var jLimit = options.MaximumCurrentDensityAPerM2 * 1e-6;
        reasons.Add(trial.MeetsCurrentDensity
            ? Invariant($"Current density {trial.CurrentDensityAPerM2 * 1e-6:0.##} A/mm², at or under {jLimit:0.##} A/mm².")
            : Invariant($"Current density {trial.CurrentDensityAPerM2 * 1e-6:0.##} A/mm² is above {jLimit:0.##} A/mm²: the winding would run hot; it needs more copper."));

        var conductor = trial.Wire.ElementsInHand > 1 ? "Each strand" : "The conductor";
        var depths = SkinDepthWords(options.MaximumSkinDepthRatio);
        var frequency = FrequencyWords(context.FrequencyHz);
        reasons.Add(trial.MeetsSkinDepth
            ? Invariant($"{conductor} ({trial.Wire.StrandDiameter.Millimetres:0.###} mm) is within {depths} skin depths at {frequency} (d/δ = {trial.SkinDepthRatio:0.##}).")
            : Invariant($"Thicker than {depths} skin depths at {frequency} (d/δ = {trial.SkinDepthRatio:0.##}): {StrandAdvice(trial.Standard, thinEnough)}"));
        return [.. reasons];
    }

    /// <summary>The advice for a wire above the skin-depth limit: the fewest strands of a standard wire within it with
    /// the same or more copper (thicker strand, then thinner insulation, then id on a tie), or Litz.</summary>
    private static string StrandAdvice(StandardWire wire, IReadOnlyList<StandardWire> thinEnough)
    {
        var best = thinEnough
            .Select(s => (Strand: s, Count: StrandsForSameCopper(wire, s)))
            .OrderBy(x => x.Count)
            .ThenByDescending(x => x.Strand.ConductorDiameter.Metres)
            .ThenBy(x => x.Strand.OverallDiameter.Metres)
            .ThenBy(x => x.Strand.Id, StringComparer.Ordinal)
            .FirstOrDefault();
        if (best.Strand is null)
        {
            return "no standard wire is thin enough for strands in hand; consider Litz.";
        }

        return best.Count <= MaximumStrandsInHand
            ? Invariant($"consider {best.Count} strands of {best.Strand.SizeLabel} in hand, or Litz.")
            : Invariant($"consider Litz (strands in hand would take {best.Count} of {best.Strand.SizeLabel}, more than {MaximumStrandsInHand}).");
    }

    /// <summary>n = ⌈A_wire/A_strand⌉, the fewest strands with the same or more copper (a relative 10⁻⁹ allowed for
    /// rounding, so that four strands of half the diameter count as the same copper).</summary>
    private static int StrandsForSameCopper(StandardWire wire, StandardWire strand)
    {
        var ratio = wire.ConductorAreaM2 / strand.ConductorAreaM2;
        return (int)Math.Min(int.MaxValue, Math.Ceiling(ratio * (1 - 1e-9)));
    }

    private static bool WithinSkinLimit(Context context, StandardWire standard)
    {
        var wire = standard.ToWindingWire();
        return wire.StrandDiameter.Metres / SkinDepth.Of(wire.Metal, context.FrequencyHz).Metres <= context.Options.MaximumSkinDepthRatio;
    }

    /// <summary>The ranking of the class remarks.</summary>
    private static int Compare(WireChoice a, WireChoice b)
    {
        var c = b.Passes.CompareTo(a.Passes);
        if (c == 0)
        {
            c = b.MeetsSkinDepth.CompareTo(a.MeetsSkinDepth);
        }

        if (c == 0)
        {
            c = b.MeetsCurrentDensity.CompareTo(a.MeetsCurrentDensity);
        }

        if (c == 0 && !a.MeetsCurrentDensity)
        {
            c = a.CurrentDensityAPerM2.CompareTo(b.CurrentDensityAPerM2);
        }

        if (c == 0)
        {
            c = (a.Outcome == FitOutcome.Tight).CompareTo(b.Outcome == FitOutcome.Tight);
        }

        if (c == 0)
        {
            c = a.AcResistanceOhm.CompareTo(b.AcResistanceOhm);
        }

        if (c == 0)
        {
            c = a.Layers.CompareTo(b.Layers);
        }

        if (c == 0)
        {
            c = b.RoomLeftM.CompareTo(a.RoomLeftM);
        }

        if (c == 0)
        {
            c = string.CompareOrdinal(a.StandardId, b.StandardId);
        }

        return c != 0 ? c : a.StrandsInHand.CompareTo(b.StrandsInHand);
    }

    private static string Summary(Context context, int singles, int strandSets, int doesNotFit, int overShare, int aboveJ, int aboveSkin, int accepted, int passing)
    {
        var name = context.Plan.Windings[context.Index].Name;
        var tried = strandSets > 0
            ? Invariant($"{singles} standard wires and {strandSets} sets of strands in hand")
            : Invariant($"{singles} standard wires");
        var outcome = accepted == 0
            ? "None fits."
            : Invariant($"{accepted} fit within the share, {passing} of them meeting every rule.");
        return Invariant($"Winding '{name}': tried {tried}. {doesNotFit} would leave a winding that does not fit; {overShare} need more copper than the winding's share of the window ({context.CopperLimitM2 * 1e6:0.###} mm²); {aboveJ} are above {context.Options.MaximumCurrentDensityAPerM2 * 1e-6:0.##} A/mm²; {aboveSkin} are thicker than {SkinDepthWords(context.Options.MaximumSkinDepthRatio)} skin depths at {FrequencyWords(context.FrequencyHz)} (a wire can break several rules). {outcome}");
    }

    private static string SkinDepthWords(double ratio) => ratio == 2 ? "two" : Invariant($"{ratio:0.##}");

    private static string FrequencyWords(double frequencyHz) => frequencyHz switch
    {
        >= 1e9 => Invariant($"{frequencyHz / 1e9:0.###} GHz"),
        >= 1e6 => Invariant($"{frequencyHz / 1e6:0.###} MHz"),
        >= 1e3 => Invariant($"{frequencyHz / 1e3:0.###} kHz"),
        _ => Invariant($"{frequencyHz:0.###} Hz"),
    };

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    private sealed record Context(TransformerPlan Plan, int Index, double CurrentA, double FrequencyHz, WireChoiceOptions Options, double Share, double CopperLimitM2);

    private sealed record Trial(
        StandardWire Standard,
        WindingWire Wire,
        IReadOnlyList<WindingFit> Fits,
        IReadOnlyList<WindingSpec> Windings,
        bool LeavesWindingThatDoesNotFit,
        bool OverShare,
        double CopperInWindowM2,
        double CurrentDensityAPerM2,
        bool MeetsCurrentDensity,
        Length SkinDepth,
        double SkinDepthRatio,
        bool MeetsSkinDepth)
    {
        public bool Accepted => !LeavesWindingThatDoesNotFit && !OverShare;
    }
}
