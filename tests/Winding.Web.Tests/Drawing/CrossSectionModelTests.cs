using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;
using Winding.Web.Drawing;

namespace Winding.Web.Tests.Drawing;

public sealed class CrossSectionModelTests
{
    private const double Tolerance = 1e-9;

    private static readonly WindingWire Wire0226 = WindingWire.Solid(Mm(0.2), Mm(0.226));

    [Fact]
    public void Toroid_FourLayers_DrawsTheFitsTurnsPerLayer()
    {
        // physics-sources.md §11 check table: ID 5 mm, d_o 0.226 mm gives 66, 60, 53, 47 turns in layers 1 … 4
        // (layer convention D_k = ID − (2k − 1)·d_o: common practice, no source). 226 = 66 + 60 + 53 + 47.
        var (plan, evaluation) = Evaluate(ToroidCore.Create(Mm(10), Mm(5), Mm(4)), Spec("w", 226, Wire0226));

        var model = CrossSectionModel.For(plan, evaluation);

        Assert.Equal([66, 60, 53, 47], model.Windings[0].Layers.Select(l => l.Wires.Count));
        Assert.Equal(evaluation.Windings[0].Fit.TurnsPerLayer, model.Windings[0].Layers.Select(l => l.Wires.Count));
    }

    [Fact]
    public void Toroid_LayerCircles_LieOnTheLayerDiameters()
    {
        // D_j = ID − (2j − 1)·d (physics-sources.md §11): 5 − 0.226 = 4.774 mm and 5 − 3·0.226 = 4.322 mm.
        var (plan, evaluation) = Evaluate(ToroidCore.Create(Mm(10), Mm(5), Mm(4)), Spec("w", 100, Wire0226));

        var model = CrossSectionModel.For(plan, evaluation);

        Assert.All(model.Windings[0].Layers[0].Wires, w => Assert.Equal(4.774, 2 * Radius(w), 6));
        Assert.All(model.Windings[0].Layers[1].Wires, w => Assert.Equal(4.322, 2 * Radius(w), 6));
        Assert.All(model.Windings[0].Layers.SelectMany(l => l.Wires), w => Assert.Equal(0.226, w.DiameterMm, 9));
    }

    [Fact]
    public void Toroid_SectorWindings_StayInsideTheirArcs()
    {
        var (plan, evaluation) = Evaluate(
            ToroidCore.Create(Mm(20), Mm(10), Mm(5)),
            Spec("a", 40, Wire0226, WindingPlacement.Sector(0, 90)),
            Spec("b", 150, Wire0226, WindingPlacement.Sector(180, 300)));

        var model = CrossSectionModel.For(plan, evaluation);

        Assert.Equal(40, model.Windings[0].DrawnWires);
        Assert.Equal(150, model.Windings[1].DrawnWires);
        Assert.All(model.Windings[0].Layers.SelectMany(l => l.Wires), w => Assert.InRange(AngleDegrees(w), 0, 90));
        Assert.All(model.Windings[1].Layers.SelectMany(l => l.Wires), w => Assert.InRange(AngleDegrees(w), 180, 300));
    }

    [Fact]
    public void Toroid_Imperial_ScaleBarIsARoundLengthInInches()
    {
        var (plan, evaluation) = Evaluate(ToroidCore.Create(Mm(10), Mm(5), Mm(4)), Spec("w", 10, Wire0226));

        var model = CrossSectionModel.For(plan, evaluation, Winding.Web.Display.UnitSystem.Imperial);

        // A quarter of the 10 mm ring is 2.5 mm = 0.098 in: the largest 1, 2 or 5 × 10ⁿ in below it is 0.05 in,
        // drawn 0.05 × 25.4 = 1.27 mm long (1 in = 25.4 mm exactly). OD 10 mm = 0.394 in, ID 5 mm = 0.197 in.
        Assert.Equal("0.05 in", model.Scale.Label);
        Assert.Equal(1.27, model.Scale.LengthMm, Tolerance);
        Assert.Equal("OD 0.394 in, ID 0.197 in", model.Labels[0].Text);
        // The geometry stays in millimetres.
        Assert.Equal(CrossSectionModel.For(plan, evaluation).ViewBox, model.ViewBox);
    }

    [Fact]
    public void Toroid_ViewBox_SpansTheOuterDiameterToScale()
    {
        var core = ToroidCore.Create(Mm(10), Mm(5), Mm(4)).WithCoating(Mm(0.1));
        var (plan, evaluation) = Evaluate(core, Spec("w", 20, Wire0226));

        var model = CrossSectionModel.For(plan, evaluation);

        // OD 10 mm plus 0.1 mm coating each side = 10.2 mm, centred on the origin.
        Assert.True(model.MinXMm <= -5.1 && model.MinXMm + model.WidthMm >= 5.1);
        Assert.True(model.MinYMm <= -5.1 && model.MinYMm + model.HeightMm >= 5.1);
        Assert.InRange(model.WidthMm, 10.2, 10.2 * 1.25);
        var body = Assert.Single(model.Rings, r => r.Role == "core");
        Assert.Equal(10, body.OuterDiameterMm, Tolerance);
        Assert.Equal(5, body.InnerDiameterMm, Tolerance);
        var coating = Assert.Single(model.Rings, r => r.Role == "coating");
        Assert.Equal(10.2, coating.OuterDiameterMm, Tolerance);
        Assert.Equal(4.8, coating.InnerDiameterMm, Tolerance);
        Assert.Equal("-5.712 -5.712 11.424 12.852", model.ViewBox);
    }

    [Fact]
    public void Bobbin_Rows_FitTheWindow()
    {
        var core = Bobbin(breadthMm: 8, heightMm: 3, wallMm: 0.5);
        var (plan, evaluation) = Evaluate(core, Spec("p", 120, Wire0226), Spec("s", 30, WindingWire.Solid(Mm(0.5), Mm(0.55))));

        var model = CrossSectionModel.For(plan, evaluation);

        var window = Assert.Single(model.Rectangles, r => r.Role == "window");
        Assert.Equal(0.5, window.XMm, Tolerance);
        Assert.Equal(3, window.WidthMm, Tolerance);
        Assert.Equal(8, window.HeightMm, Tolerance);
        for (var i = 0; i < 2; i++)
        {
            Assert.Equal(evaluation.Windings[i].Fit.TurnsPerLayer, model.Windings[i].Layers.Select(l => l.Wires.Count));
            Assert.All(model.Windings[i].Layers.SelectMany(l => l.Wires), w =>
            {
                Assert.InRange(w.CentreXMm - w.RadiusMm, window.XMm - Tolerance, window.XMm + window.WidthMm + Tolerance);
                Assert.InRange(w.CentreXMm + w.RadiusMm, window.XMm - Tolerance, window.XMm + window.WidthMm + Tolerance);
                Assert.InRange(w.CentreYMm - w.RadiusMm, -Tolerance, window.HeightMm + Tolerance);
                Assert.InRange(w.CentreYMm + w.RadiusMm, -Tolerance, window.HeightMm + Tolerance);
            });
        }

        // 8 mm / 0.226 mm = 35.4 → 35 turns per row; the first row sits against the wall.
        Assert.Equal(35, model.Windings[0].Layers[0].Wires.Count);
        Assert.All(model.Windings[0].Layers[0].Wires, w => Assert.Equal(0.5 + 0.113, w.CentreXMm, 9));
    }

    [Fact]
    public void Bobbin_ThousandsOfTurns_DrawsAFewHundredPerLayerAndSaysSo()
    {
        var core = Bobbin(breadthMm: 40, heightMm: 3, wallMm: 0.5);
        var (plan, evaluation) = Evaluate(core, Spec("fine", 3000, WindingWire.Solid(Mm(0.05), Mm(0.06))));

        var model = CrossSectionModel.For(plan, evaluation);

        // 40 / 0.06 = 666.7 → 666 turns per layer: every 3rd turn drawn, 222 circles.
        Assert.Equal(666, model.Windings[0].Layers[0].PlacedTurns);
        Assert.Equal(3, model.Windings[0].Layers[0].TurnStep);
        Assert.Equal(222, model.Windings[0].Layers[0].Wires.Count);
        Assert.All(model.Windings[0].Layers, l => Assert.True(l.Wires.Count <= CrossSectionModel.MaximumTurnsPerLayer));
        Assert.Contains(model.Captions, c => c.Contains("1 of 3", StringComparison.Ordinal));
    }

    [Fact]
    public void TwoHole_Bundles_LieInsideBothHoles()
    {
        var core = TwoHoleCore.Create(Mm(6), Mm(1.5), Mm(3), Mm(6.5), Mm(4));
        var (plan, evaluation) = Evaluate(core, Spec("p", 6, Wire0226), Spec("s", 4, WindingWire.Solid(Mm(0.3), Mm(0.33))));

        var model = CrossSectionModel.For(plan, evaluation);

        Assert.Equal(2, model.Rings.Count(r => r.Role == "hole"));
        Assert.Equal(12, model.Windings[0].DrawnWires); // 6 turns, each seen in both holes
        Assert.Equal(8, model.Windings[1].DrawnWires);
        Assert.All(model.Windings.SelectMany(w => w.Layers).SelectMany(l => l.Wires), w =>
        {
            var holeX = w.CentreXMm < 0 ? -1.5 : 1.5;
            var reach = Math.Sqrt(Math.Pow(w.CentreXMm - holeX, 2) + Math.Pow(w.CentreYMm, 2)) + w.RadiusMm;
            Assert.True(reach <= 0.75 + Tolerance, $"wire reaches {reach} mm from the hole centre");
        });
        Assert.Equal(6.5, Assert.Single(model.Rectangles).WidthMm, Tolerance);
    }

    [Fact]
    public void Legend_HasOneDistinctColourPerWinding()
    {
        var specs = Enumerable.Range(0, 8).Select(i => Spec("w" + i, 2, Wire0226)).ToArray();
        var (plan, evaluation) = Evaluate(ToroidCore.Create(Mm(20), Mm(10), Mm(5)), specs);

        var model = CrossSectionModel.For(plan, evaluation);

        Assert.Equal(8, model.Legend.Select(e => e.Colour).Distinct(StringComparer.OrdinalIgnoreCase).Count());
        Assert.Equal(Enumerable.Range(0, 8), model.Legend.Select(e => e.WindingIndex));
        Assert.All(model.Legend, e => Assert.Equal(2, e.Turns));
    }

    [Fact]
    public void Bifilar_Pair_SharesTheLayersWithoutOverlapping()
    {
        var (plan, evaluation) = Evaluate(
            ToroidCore.Create(Mm(10), Mm(5), Mm(4)),
            Spec("a", 20, Wire0226),
            Spec("b", 20, Wire0226, WindingPlacement.Bifilar(0)));

        var model = CrossSectionModel.For(plan, evaluation);

        var all = model.Windings.SelectMany(w => w.Layers).SelectMany(l => l.Wires).ToArray();
        Assert.Equal(40, all.Length);
        Assert.Equal(40, all.Select(w => (Math.Round(w.CentreXMm, 6), Math.Round(w.CentreYMm, 6))).Distinct().Count());
    }

    internal static (TransformerPlan Plan, PlanEvaluation Evaluation) Evaluate(CoreShape shape, params WindingSpec[] windings)
    {
        var plan = new TransformerPlan("test", new PlanCore(shape, 1, MagneticMaterial.Create("test", 125)), windings, null, WireLengthAllowance.Default);
        return (plan, PlanEvaluator.Evaluate(plan));
    }

    internal static WindingSpec Spec(string name, int turns, WindingWire wire, WindingPlacement? placement = null) =>
        WindingSpec.Create(name, turns, wire, placement);

    internal static BobbinCore Bobbin(double breadthMm, double heightMm, double wallMm) =>
        BobbinCore.Create("E", 20e-6, 40e-3, null, Mm(breadthMm), Mm(heightMm), CentreLeg.Rectangular(Mm(5), Mm(5)), Mm(wallMm));

    internal static Length Mm(double value) => Length.FromMillimetres(value);

    private static double Radius(DrawnCircle w) => Math.Sqrt((w.CentreXMm * w.CentreXMm) + (w.CentreYMm * w.CentreYMm));

    private static double AngleDegrees(DrawnCircle w)
    {
        var degrees = Math.Atan2(-w.CentreYMm, w.CentreXMm) * 180 / Math.PI;
        return degrees < 0 ? degrees + 360 : degrees;
    }
}
