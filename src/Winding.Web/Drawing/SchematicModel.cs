using System.Globalization;
using System.Text;
using Winding.Core.Plans;

namespace Winding.Web.Drawing;

/// <summary>
/// A schematic of the plan's windings on their core, as drawable primitives in drawing units (not to scale; y downwards,
/// as in SVG). Our own conventions:
/// <list type="bullet">
/// <item>the core is two parallel vertical bars (the usual mark of a magnetic core, drawn the same for every shape);</item>
/// <item>the first winding is a coil left of the core, every other winding a coil right of it, top to bottom in winding
/// order; each coil is a row of half-circle loops bulging towards the core;</item>
/// <item>loops: <see cref="LoopsFor"/> — as many loops as turns up to <see cref="MaximumLoops"/>; above that,
/// <see cref="MaximumLoops"/> shared among the sections between start, taps and finish in proportion to their turns,
/// at least one each, so a tap always sits between two loops;</item>
/// <item>every winding is taken as wound in the same sense from its start: the start is the coil's top end and carries the
/// phasing dot, the finish is the bottom end;</item>
/// <item>leads run out horizontally from the coil to a terminal, labelled "1S" (start of winding 1), "1F" (finish),
/// and for taps "1T1 (10 turns)" (winding 1's first tap from the start, with its turns from the start);</item>
/// <item>the winding's name and "N turns" stand above its coil.</item>
/// </list>
/// Nothing is told by colour alone: everything is black on white, and each mark has its text.
/// </summary>
/// <param name="MinX">Left edge of the view box.</param>
/// <param name="MinY">Top edge of the view box.</param>
/// <param name="Width">Width of the view box.</param>
/// <param name="Height">Height of the view box.</param>
/// <param name="CoreBars">The core's bars.</param>
/// <param name="Coils">One coil per winding, in winding order.</param>
public sealed record SchematicModel(double MinX, double MinY, double Width, double Height, IReadOnlyList<SchematicLine> CoreBars, IReadOnlyList<SchematicCoil> Coils)
{
    /// <summary>Most loops a coil shows (unless it has more sections than that).</summary>
    public const int MaximumLoops = 12;

    /// <summary>Height of one loop, drawing units.</summary>
    public const double LoopHeight = 10;

    /// <summary>Font size of all text, drawing units.</summary>
    public const double FontSize = 6;

    /// <summary>Radius of the phasing dot, drawing units.</summary>
    public const double DotRadius = 1.8;

    /// <summary>Radius of a lead's terminal circle, drawing units.</summary>
    public const double TerminalRadius = 1.5;

    /// <summary>Width of every line, drawing units.</summary>
    public const double LineWidth = 0.8;

    private const double CoreBarX = 4;
    private const double CoilX = 18;
    private const double LeadEndX = 50;
    private const double LabelGap = 3.5;
    private const double HeaderHeight = 20;
    private const double BlockGap = 12;

    /// <summary>The view box as an SVG attribute value (invariant culture).</summary>
    public string ViewBox => string.Join(' ', Number(MinX), Number(MinY), Number(Width), Number(Height));

    /// <summary>A coordinate written for SVG: invariant culture, at most three decimals.</summary>
    public static string Number(double value) => value.ToString("0.###", CultureInfo.InvariantCulture);

    /// <summary>
    /// Loops drawn for each section of a winding of <paramref name="turns"/> turns with taps at <paramref name="taps"/>
    /// (turns from the start, ascending): with L = min(N, <see cref="MaximumLoops"/>), a section of s turns gets
    /// max(1, round(s·L/N)) loops (halves round up). Up to 12 turns every turn is one loop.
    /// </summary>
    public static IReadOnlyList<int> LoopsFor(int turns, IReadOnlyList<int> taps)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        ArgumentNullException.ThrowIfNull(taps);
        var budget = Math.Min(turns, MaximumLoops);
        var bounds = taps.Prepend(0).Append(turns).ToArray();
        var loops = new int[bounds.Length - 1];
        for (var i = 0; i < loops.Length; i++)
        {
            var section = bounds[i + 1] - bounds[i];
            loops[i] = Math.Max(1, (int)Math.Round((double)section * budget / turns, MidpointRounding.AwayFromZero));
        }

        return loops;
    }

    /// <summary>Builds the schematic of <paramref name="plan"/>.</summary>
    public static SchematicModel For(TransformerPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var windings = plan.Windings;
        var sections = windings.Select(w => LoopsFor(w.Turns, w.Taps)).ToArray();
        double BlockHeight(int i) => HeaderHeight + (sections[i].Sum() * LoopHeight);

        // Right side: windings 1 … n−1 stacked; left side: winding 0, centred on the right-hand stack.
        var tops = new double[windings.Count];
        var y = 0.0;
        for (var i = 1; i < windings.Count; i++)
        {
            tops[i] = y + HeaderHeight;
            y += BlockHeight(i) + BlockGap;
        }

        var rightHeight = windings.Count > 1 ? y - BlockGap : 0;
        tops[0] = (Math.Max(0, (rightHeight - BlockHeight(0)) / 2)) + HeaderHeight;
        var coils = new List<SchematicCoil>(windings.Count);
        for (var i = 0; i < windings.Count; i++)
        {
            coils.Add(Coil(i, windings[i], sections[i], tops[i]));
        }

        var coilTop = coils.Min(c => c.Leads[0].Line.Y1);
        var coilBottom = coils.Max(c => c.Leads[^1].Line.Y1);
        var bars = new[]
        {
            new SchematicLine(-CoreBarX, coilTop - 5, -CoreBarX, coilBottom + 5),
            new SchematicLine(CoreBarX, coilTop - 5, CoreBarX, coilBottom + 5),
        };

        // Text widths are estimated (0.6 em a character) so that the view box holds the labels and names.
        var minX = -LeadEndX;
        var maxX = LeadEndX;
        foreach (var text in coils.SelectMany(c => c.Leads.Select(l => l.Label).Append(c.NameText).Append(c.TurnsText)))
        {
            var width = 0.6 * FontSize * text.Text.Length;
            minX = Math.Min(minX, text.AlignEnd ? text.X - width : text.X);
            maxX = Math.Max(maxX, text.AlignEnd ? text.X : text.X + width);
        }

        var minY = Math.Min(coilTop - 5, coils.Min(c => c.NameText.Y) - FontSize) - 4;
        var maxY = coilBottom + 5 + FontSize;
        return new SchematicModel(minX - 4, minY, maxX - minX + 8, maxY - minY, bars, coils);
    }

    private static SchematicCoil Coil(int index, WindingSpec winding, IReadOnlyList<int> sections, double top)
    {
        var left = index == 0;
        var side = left ? -1 : 1;
        var x = side * CoilX;
        var loops = sections.Sum();
        var bottom = top + (loops * LoopHeight);
        var path = new StringBuilder(FormattableString.Invariant($"M {Number(x)} {Number(top)}"));
        var radius = LoopHeight / 2;
        // Going down the coil, a clockwise arc (sweep flag 1 in SVG's y-down frame) bulges to the right: towards the core
        // for the left coil.
        var sweep = left ? 1 : 0;
        for (var k = 1; k <= loops; k++)
        {
            path.Append(FormattableString.Invariant($" A {Number(radius)} {Number(radius)} 0 0 {sweep} {Number(x)} {Number(top + (k * LoopHeight))}"));
        }

        var number = (index + 1).ToString(CultureInfo.InvariantCulture);
        var leads = new List<SchematicLead> { Lead(SchematicLeadKind.Start, 0, side, top, number + "S") };
        var loopsSoFar = 0;
        for (var t = 0; t < winding.Taps.Count; t++)
        {
            loopsSoFar += sections[t];
            var turns = winding.Taps[t];
            leads.Add(Lead(SchematicLeadKind.Tap, turns, side, top + (loopsSoFar * LoopHeight), FormattableString.Invariant($"{number}T{t + 1} ({turns} {TurnsWord(turns)})")));
        }

        leads.Add(Lead(SchematicLeadKind.Finish, winding.Turns, side, bottom, number + "F"));
        var headerX = side * (CoilX - radius);
        return new SchematicCoil(
            index,
            winding.Name,
            winding.Turns,
            left,
            loops,
            path.ToString(),
            side * (CoilX + 5),
            top + 5,
            leads,
            new SchematicText(headerX, top - 14, winding.Name, left),
            new SchematicText(headerX, top - 6, FormattableString.Invariant($"{winding.Turns} {TurnsWord(winding.Turns)}"), left));
    }

    /// <summary>"turn" for one, "turns" otherwise.</summary>
    private static string TurnsWord(int turns) => turns == 1 ? "turn" : "turns";

    private static SchematicLead Lead(SchematicLeadKind kind, int turns, int side, double y, string label) =>
        new(kind, turns, new SchematicLine(side * CoilX, y, side * LeadEndX, y), new SchematicText(side * (LeadEndX + TerminalRadius + LabelGap), y + (FontSize * 0.35), label, side < 0));
}
