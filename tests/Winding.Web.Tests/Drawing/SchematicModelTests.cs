using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;
using Winding.Web.Drawing;

namespace Winding.Web.Tests.Drawing;

/// <summary>The schematic's geometry. The conventions are our own (documented on <see cref="SchematicModel"/>); no source.</summary>
public sealed class SchematicModelTests
{
    [Theory]
    [InlineData(1, new int[0], new[] { 1 })]
    [InlineData(4, new int[0], new[] { 4 })]
    [InlineData(12, new int[0], new[] { 12 })]
    [InlineData(13, new int[0], new[] { 12 })]
    [InlineData(400, new int[0], new[] { 12 })]
    [InlineData(9, new[] { 3 }, new[] { 3, 6 })]
    // 40 turns tapped at 10: L = 12, sections 10 and 30 turns → 3 and 9 loops.
    [InlineData(40, new[] { 10 }, new[] { 3, 9 })]
    // 100 turns tapped at 1 and 2: the short sections still get one loop each; 98·12/100 = 11.76 → 12.
    [InlineData(100, new[] { 1, 2 }, new[] { 1, 1, 12 })]
    public void LoopsFor_FollowsTheRule(int turns, int[] taps, int[] expected) => Assert.Equal(expected, SchematicModel.LoopsFor(turns, taps));

    [Fact]
    public void For_FirstWindingLeft_OthersRightInOrder()
    {
        var model = SchematicModel.For(Plan(Coil("a", 4), Coil("b", 8), Coil("c", 2)));

        Assert.True(model.Coils[0].OnLeft);
        Assert.All(model.Coils.Skip(1), c => Assert.False(c.OnLeft));
        Assert.All(model.Coils[0].Leads, l => Assert.True(l.Line.X2 < model.CoreBars[0].X1));
        Assert.All(model.Coils.Skip(1).SelectMany(c => c.Leads), l => Assert.True(l.Line.X2 > model.CoreBars[1].X1));
        // Top to bottom in winding order on the right, without overlap.
        Assert.True(model.Coils[1].Leads[^1].Line.Y1 < model.Coils[2].NameText.Y - SchematicModel.FontSize);
    }

    [Fact]
    public void For_Leads_StartAtTheTopTapsInOrderFinishAtTheBottom()
    {
        var model = SchematicModel.For(Plan(Coil("p", 9, 3, 6)));

        var leads = model.Coils[0].Leads;
        Assert.Equal([SchematicLeadKind.Start, SchematicLeadKind.Tap, SchematicLeadKind.Tap, SchematicLeadKind.Finish], leads.Select(l => l.Kind));
        Assert.Equal([0, 3, 6, 9], leads.Select(l => l.TurnsFromStart));
        // With one loop per turn, the tap at turn 3 sits three loops below the start.
        Assert.Equal(leads[0].Line.Y1 + (3 * SchematicModel.LoopHeight), leads[1].Line.Y1, 9);
        Assert.Equal(["1S", "1T1 (3 turns)", "1T2 (6 turns)", "1F"], leads.Select(l => l.Label.Text));
    }

    [Fact]
    public void For_Dot_IsBesideTheStartOutsideTheCoil()
    {
        var model = SchematicModel.For(Plan(Coil("p", 3), Coil("s", 6)));

        foreach (var coil in model.Coils)
        {
            var start = coil.Leads[0].Line;
            Assert.Equal(start.Y1, coil.DotY, SchematicModel.LoopHeight / 2);
            // Outside: further from the core than the coil's axis.
            Assert.True(Math.Abs(coil.DotX) > Math.Abs(start.X1));
        }
    }

    [Fact]
    public void For_ViewBox_HoldsEveryLabel()
    {
        var model = SchematicModel.For(Plan(Coil("a rather long primary winding name", 4), Coil("s", 8, 2)));

        foreach (var text in model.Coils.SelectMany(c => c.Leads.Select(l => l.Label).Append(c.NameText)))
        {
            var width = 0.5 * SchematicModel.FontSize * text.Text.Length;
            var (from, to) = text.AlignEnd ? (text.X - width, text.X) : (text.X, text.X + width);
            Assert.InRange(from, model.MinX, model.MinX + model.Width);
            Assert.InRange(to, model.MinX, model.MinX + model.Width);
            Assert.InRange(text.Y, model.MinY + SchematicModel.FontSize * 0.7, model.MinY + model.Height);
        }
    }

    internal static WindingSpec Coil(string name, int turns, params int[] taps) =>
        WindingSpec.Create(name, turns, WindingWire.Enamelled(Length.FromMillimetres(0.5)), taps: taps);

    internal static TransformerPlan Plan(params WindingSpec[] windings) =>
        new("schematic", new PlanCore(ToroidCore.Create(Length.FromMillimetres(36), Length.FromMillimetres(23), Length.FromMillimetres(15)), 1, MagneticMaterial.Create("NiZn, μi 125", 125)), windings, null, WireLengthAllowance.Default);
}
