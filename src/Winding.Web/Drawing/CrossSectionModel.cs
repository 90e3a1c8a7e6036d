using System.Globalization;
using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Windings;
using Winding.Web.Display;

namespace Winding.Web.Drawing;

/// <summary>
/// A to-scale cross-section of a wound core as drawable primitives in millimetres:
/// <list type="bullet">
/// <item>ring cores (toroid, sleeve): the face view with the core, its coating, and each winding's wires in the hole on
/// circles of diameter D_j = D0 − (2j − 1)·d (D0 the hole left under the winding, d the element overall diameter), the
/// turns of each layer evenly spaced over the winding's arc (its sector, or 360°). Angles count anticlockwise from the
/// right (3 o'clock);</item>
/// <item>bobbins: the window section (radial height across, breadth along the leg) with each winding's layers as rows of
/// circles from the leg side;</item>
/// <item>two-hole cores: the end face with both holes and each winding's bundle packed ring by ring from the hole wall
/// inwards (a simple drawing packing, not the fit's area rule).</item>
/// </list>
/// A layer with more than <see cref="MaximumTurnsPerLayer"/> turns shows only every n-th turn and says so in a caption.
/// The geometry is always in millimetres; only the dimension label and the scale bar follow the unit system (in imperial
/// the bar is a round length in inches, drawn at its length in millimetres).
/// </summary>
/// <param name="MinXMm">Left edge of the view box, mm.</param>
/// <param name="MinYMm">Top edge of the view box, mm.</param>
/// <param name="WidthMm">Width of the view box, mm.</param>
/// <param name="HeightMm">Height of the view box, mm.</param>
/// <param name="LineWidthMm">Outline stroke width, mm.</param>
/// <param name="Rectangles">Rectangles, drawn first.</param>
/// <param name="Rings">Rings and discs, drawn over the rectangles.</param>
/// <param name="Windings">The wires of each winding, in winding order.</param>
/// <param name="Labels">Text on the drawing (dimensions).</param>
/// <param name="Scale">The scale bar.</param>
/// <param name="Legend">One entry per winding.</param>
/// <param name="Captions">Remarks in plain words (turns left out, turns that find no room).</param>
public sealed record CrossSectionModel(
    double MinXMm,
    double MinYMm,
    double WidthMm,
    double HeightMm,
    double LineWidthMm,
    IReadOnlyList<DrawnRectangle> Rectangles,
    IReadOnlyList<DrawnRing> Rings,
    IReadOnlyList<WindingDrawing> Windings,
    IReadOnlyList<DrawingLabel> Labels,
    ScaleBar Scale,
    IReadOnlyList<LegendEntry> Legend,
    IReadOnlyList<string> Captions)
{
    /// <summary>Most turns drawn in one layer; fuller layers show every n-th turn.</summary>
    public const int MaximumTurnsPerLayer = 300;

    private const string CoreFill = "#767b84";
    private const string CoatingFill = "#a9cbb8";
    private const string HoleFill = "#ffffff";
    private const string WindowFill = "#f4f0e6";
    private const string WallFill = "#d8cfb8";

    /// <summary>The view box as an SVG attribute value, "minX minY width height" in mm (invariant culture).</summary>
    public string ViewBox => string.Join(' ', Number(MinXMm), Number(MinYMm), Number(WidthMm), Number(HeightMm));

    /// <summary>A length in mm written for SVG: invariant culture, at most four decimals.</summary>
    public static string Number(double valueMm) => valueMm.ToString("0.####", CultureInfo.InvariantCulture);

    /// <summary>Builds the drawing of <paramref name="plan"/> from its evaluation, labelled in <paramref name="units"/>.</summary>
    /// <exception cref="ArgumentException">The evaluation does not have one result per winding of the plan.</exception>
    public static CrossSectionModel For(TransformerPlan plan, PlanEvaluation evaluation, UnitSystem units = UnitSystem.Metric)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        if (plan.Windings.Count != evaluation.Windings.Count)
        {
            throw new ArgumentException("The evaluation must have one result per winding of the plan.", nameof(evaluation));
        }

        var captions = new List<string>();
        var shape = plan.Core.WoundGeometry;
        var (rectangles, rings, layers, labelText, bounds) = shape switch
        {
            ToroidCore toroid => Ring(plan, evaluation, toroid.OuterDiameter.Millimetres, toroid.InnerDiameter.Millimetres, toroid.CoatingThickness.Millimetres, "OD {0} {2}, ID {1} {2}", units),
            SleeveCore sleeve => Ring(plan, evaluation, sleeve.OuterDiameter.Millimetres, sleeve.BoreDiameter.Millimetres, 0, "OD {0} {2}, bore {1} {2}", units),
            BobbinCore bobbin => Bobbin(plan, evaluation, bobbin, units),
            TwoHoleCore twoHole => TwoHole(plan, evaluation, twoHole, captions, units),
            _ => throw new ArgumentOutOfRangeException(nameof(plan), shape, "Unknown core shape."),
        };

        var windings = new List<WindingDrawing>();
        var legend = new List<LegendEntry>();
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            var colour = WindingPalette.Of(i);
            windings.Add(new WindingDrawing(i, spec.Name, colour, layers[i]));
            legend.Add(new LegendEntry(i, spec.Name, spec.Turns, colour));
            var step = layers[i].Count == 0 ? 1 : layers[i].Max(l => l.TurnStep);
            if (step > 1)
            {
                captions.Add(string.Create(CultureInfo.InvariantCulture, $"{spec.Name}: 1 of {step} turns shown in layers of more than {MaximumTurnsPerLayer} turns."));
            }

            var unplaced = evaluation.Windings[i].Fit.UnplacedTurns;
            if (unplaced > 0)
            {
                captions.Add(string.Create(CultureInfo.InvariantCulture, $"{spec.Name}: {unplaced} turn{(unplaced == 1 ? string.Empty : "s")} find no room and are not drawn."));
            }
        }

        var (minX, minY, width, height) = bounds;
        var size = Math.Max(width, height);
        var margin = 0.06 * size;
        var band = 0.14 * size;
        var fontMm = 0.045 * size;
        var barY = minY + height + margin + band * 0.35;
        var scale = Bar(minX, barY, size / 4, units);
        var labels = new List<DrawingLabel> { new(minX + width, barY + fontMm * 0.4, labelText, fontMm, true) };
        return new CrossSectionModel(
            minX - margin,
            minY - margin,
            width + 2 * margin,
            height + 2 * margin + band,
            size / 400,
            rectangles,
            rings,
            windings,
            labels,
            scale,
            legend,
            captions);
    }

    /// <summary>
    /// The scale bar: the largest of 1, 2 or 5 × 10ⁿ of the system's unit (mm or in) not above <paramref name="targetMm"/>.
    /// </summary>
    private static ScaleBar Bar(double xMm, double yMm, double targetMm, UnitSystem units)
    {
        var mmPerUnit = units == UnitSystem.Imperial ? (double)LengthConversion.MillimetresPerInch : 1;
        var length = NiceLength(targetMm / mmPerUnit);
        return new ScaleBar(xMm, yMm, length * mmPerUnit, string.Create(CultureInfo.InvariantCulture, $"{length:0.####} {LengthFormat.Symbol(units)}"));
    }

    /// <summary>The largest of 1, 2 or 5 × 10ⁿ not above <paramref name="target"/>.</summary>
    private static double NiceLength(double target)
    {
        var power = Math.Pow(10, Math.Floor(Math.Log10(target)));
        return target >= 5 * power ? 5 * power : target >= 2 * power ? 2 * power : power;
    }

    private static (List<DrawnRectangle>, List<DrawnRing>, List<WireLayer>[], string, (double, double, double, double)) Ring(
        TransformerPlan plan, PlanEvaluation evaluation, double outerMm, double holeMm, double coatingMm, string labelFormat, UnitSystem units)
    {
        var rings = new List<DrawnRing>();
        if (coatingMm > 0)
        {
            rings.Add(new DrawnRing(0, 0, outerMm + 2 * coatingMm, holeMm - 2 * coatingMm, "coating", CoatingFill));
        }

        rings.Add(new DrawnRing(0, 0, outerMm, holeMm, "core", CoreFill));
        var layers = new List<WireLayer>[plan.Windings.Count];
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var (leader, members) = Group(plan.Windings, i);
            var fit = evaluation.Windings[leader].Fit;
            var (startDeg, endDeg) = PlacementRegion.Of(plan.Windings, i);
            var pitchMm = members.Max(m => plan.Windings[m].Wire.ElementOverallDiameter.Millimetres);
            var places = members.Sum(m => plan.Windings[m].Wire.ElementsInHand);
            var offset = members.TakeWhile(m => m != i).Sum(m => plan.Windings[m].Wire.ElementsInHand);
            var wire = plan.Windings[i].Wire;
            var dMm = wire.ElementOverallDiameter.Millimetres;
            var startHoleMm = holeMm - 2 * fit.BuildBelowM * 1e3;
            layers[i] = [];
            for (var j = 1; j <= fit.TurnsPerLayer.Count; j++)
            {
                var turns = fit.TurnsPerLayer[j - 1];
                var radiusMm = (startHoleMm - (2 * j - 1) * pitchMm) / 2;
                var step = StepFor(turns);
                var pitchDeg = (endDeg - startDeg) / ((double)turns * places);
                var wires = new List<DrawnCircle>();
                for (var t = 0; t < turns; t += step)
                {
                    for (var e = 0; e < wire.ElementsInHand; e++)
                    {
                        var angle = (startDeg + ((t * places) + offset + e + 0.5) * pitchDeg) * Math.PI / 180;
                        wires.Add(new DrawnCircle(radiusMm * Math.Cos(angle), -radiusMm * Math.Sin(angle), dMm));
                    }
                }

                layers[i].Add(new WireLayer(turns, step, wires));
            }
        }

        var extentMm = outerMm / 2 + coatingMm;
        var label = string.Format(CultureInfo.InvariantCulture, labelFormat, LengthFormat.DimensionNumber(outerMm, units), LengthFormat.DimensionNumber(holeMm, units), LengthFormat.Symbol(units));
        return ([], rings, layers, label, (-extentMm, -extentMm, 2 * extentMm, 2 * extentMm));
    }

    private static (List<DrawnRectangle>, List<DrawnRing>, List<WireLayer>[], string, (double, double, double, double)) Bobbin(
        TransformerPlan plan, PlanEvaluation evaluation, BobbinCore core, UnitSystem units)
    {
        var breadthMm = core.WindowBreadth.Millimetres;
        var heightMm = core.WindowHeight.Millimetres;
        var wallMm = core.BobbinWall.Millimetres;
        var legMm = core.Leg.Width.Millimetres / 2;
        var rectangles = new List<DrawnRectangle>
        {
            new(-legMm, 0, legMm, breadthMm, "leg", CoreFill),
            new(0, 0, wallMm, breadthMm, "wall", WallFill),
            new(wallMm, 0, heightMm, breadthMm, "window", WindowFill),
        };
        var layers = new List<WireLayer>[plan.Windings.Count];
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var (leader, members) = Group(plan.Windings, i);
            var fit = evaluation.Windings[leader].Fit;
            var pitchMm = members.Max(m => plan.Windings[m].Wire.ElementOverallDiameter.Millimetres);
            var places = members.Sum(m => plan.Windings[m].Wire.ElementsInHand);
            var offset = members.TakeWhile(m => m != i).Sum(m => plan.Windings[m].Wire.ElementsInHand);
            var wire = plan.Windings[i].Wire;
            var dMm = wire.ElementOverallDiameter.Millimetres;
            layers[i] = [];
            for (var k = 1; k <= fit.TurnsPerLayer.Count; k++)
            {
                var turns = fit.TurnsPerLayer[k - 1];
                var xMm = wallMm + fit.BuildBelowM * 1e3 + (k - 0.5) * pitchMm;
                var step = StepFor(turns);
                var wires = new List<DrawnCircle>();
                for (var t = 0; t < turns; t += step)
                {
                    for (var e = 0; e < wire.ElementsInHand; e++)
                    {
                        wires.Add(new DrawnCircle(xMm, ((t * places) + offset + e + 0.5) * pitchMm, dMm));
                    }
                }

                layers[i].Add(new WireLayer(turns, step, wires));
            }
        }

        var label = $"window {LengthFormat.DimensionNumber(breadthMm, units)} × {LengthFormat.DimensionNumber(heightMm, units)} {LengthFormat.Symbol(units)}";
        return (rectangles, [], layers, label, (-legMm, 0, legMm + wallMm + heightMm, breadthMm));
    }

    private static (List<DrawnRectangle>, List<DrawnRing>, List<WireLayer>[], string, (double, double, double, double)) TwoHole(
        TransformerPlan plan, PlanEvaluation evaluation, TwoHoleCore core, List<string> captions, UnitSystem units)
    {
        var widthMm = core.Width.Millimetres;
        var heightMm = core.Height.Millimetres;
        var holeMm = core.HoleDiameter.Millimetres;
        var halfSpacingMm = core.HoleSpacing.Millimetres / 2;
        var rectangles = new List<DrawnRectangle> { new(-widthMm / 2, -heightMm / 2, widthMm, heightMm, "core", CoreFill) };
        var rings = new List<DrawnRing>
        {
            new(-halfSpacingMm, 0, holeMm, 0, "hole", HoleFill),
            new(halfSpacingMm, 0, holeMm, 0, "hole", HoleFill),
        };
        var layers = new List<WireLayer>[plan.Windings.Count];
        var freeMm = holeMm;
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            var (leader, _) = Group(plan.Windings, i);
            var placedTurns = Math.Max(0, spec.Turns - evaluation.Windings[leader].Fit.UnplacedTurns);
            var perTurn = spec.Wire.ElementsInHand;
            var dMm = spec.Wire.ElementOverallDiameter.Millimetres;
            var remaining = placedTurns;
            layers[i] = [];
            while (remaining > 0 && freeMm >= dMm)
            {
                var centreMm = freeMm - dMm;
                var capacity = centreMm >= dMm ? (int)Math.Floor(Math.PI * centreMm / dMm) / perTurn : freeMm >= dMm * perTurn ? 1 : 0;
                if (capacity < 1)
                {
                    break;
                }

                var turns = Math.Min(capacity, remaining);
                var step = StepFor(turns);
                var wires = new List<DrawnCircle>();
                var count = turns * perTurn;
                for (var t = 0; t < turns; t += step)
                {
                    for (var e = 0; e < perTurn; e++)
                    {
                        var q = (t * perTurn) + e;
                        var angle = 2 * Math.PI * (q + 0.5) / count;
                        var r = count == 1 ? 0 : centreMm / 2;
                        foreach (var hole in new[] { -halfSpacingMm, halfSpacingMm })
                        {
                            wires.Add(new DrawnCircle(hole + r * Math.Cos(angle), -r * Math.Sin(angle), dMm));
                        }
                    }
                }

                layers[i].Add(new WireLayer(turns, step, wires));
                remaining -= turns;
                freeMm -= 2 * dMm;
            }

            if (remaining > 0)
            {
                captions.Add(string.Create(CultureInfo.InvariantCulture, $"{spec.Name}: {remaining} of {placedTurns} turns not drawn (the drawing's ring-by-ring packing ran out of room)."));
            }
        }

        var symbol = LengthFormat.Symbol(units);
        var label = $"{LengthFormat.DimensionNumber(widthMm, units)} × {LengthFormat.DimensionNumber(heightMm, units)} {symbol}, holes {LengthFormat.DimensionNumber(holeMm, units)} {symbol}";
        return (rectangles, rings, layers, label, (-widthMm / 2, -heightMm / 2, widthMm, heightMm));
    }

    /// <summary>1, or the step that keeps a layer at most <see cref="MaximumTurnsPerLayer"/> drawn turns.</summary>
    private static int StepFor(int turns) => turns <= MaximumTurnsPerLayer ? 1 : (turns + MaximumTurnsPerLayer - 1) / MaximumTurnsPerLayer;

    /// <summary>
    /// The bifilar group winding <paramref name="index"/> belongs to: its leader (the earliest winding of the pair, whose
    /// fit the layout shares) and all members in winding order.
    /// </summary>
    private static (int Leader, List<int> Members) Group(IReadOnlyList<WindingSpec> windings, int index)
    {
        var placement = windings[index].Placement;
        var leader = placement.Kind == PlacementKind.Bifilar && placement.OtherWinding < index ? placement.OtherWinding : index;
        var members = new List<int> { leader };
        for (var j = leader + 1; j < windings.Count; j++)
        {
            if (windings[j].Placement.Kind == PlacementKind.Bifilar && windings[j].Placement.OtherWinding == leader)
            {
                members.Add(j);
            }
        }

        return (leader, members);
    }
}
