using System.Text.RegularExpressions;
using Winding.Web.Components.Widgets;
using Winding.Web.Drawing;
using static Winding.Web.Tests.Drawing.SchematicModelTests;

namespace Winding.Web.Tests.Components;

public sealed partial class SchematicDrawingTests : WindingComponentTestBase
{
    [Fact]
    public void SchematicDrawing_ThreeWindings_OneDotPerWinding()
    {
        var cut = Render<SchematicDrawing>(p => p.Add(d => d.Plan, Plan(Coil("primary", 4), Coil("secondary", 12), Coil("sense", 2))));

        Assert.Equal(3, cut.FindAll("[data-testid=phasing-dot]").Count);
        for (var i = 0; i < 3; i++)
        {
            Assert.Single(cut.FindAll($"[data-testid=schematic-winding-{i}] [data-testid=phasing-dot]"));
        }
    }

    [Fact]
    public void SchematicDrawing_Taps_OneLabelledLeadPerTap()
    {
        var cut = Render<SchematicDrawing>(p => p.Add(d => d.Plan, Plan(Coil("primary", 9, 3, 6), Coil("secondary", 40, 10))));

        var taps = cut.FindAll("[data-lead=tap]");
        Assert.Equal(3, taps.Count);
        Assert.Equal(["1T1 (3 turns)", "1T2 (6 turns)", "2T1 (10 turns)"], taps.Select(t => t.QuerySelector("text")!.TextContent));
        Assert.Equal(["3", "6", "10"], taps.Select(t => t.GetAttribute("data-turns")));
        Assert.Equal(["1S", "1F", "2S", "2F"], cut.FindAll("[data-lead=start] text, [data-lead=finish] text").Select(t => t.TextContent));
    }

    [Fact]
    public void SchematicDrawing_NamesAndTurns_AreWritten()
    {
        var cut = Render<SchematicDrawing>(p => p.Add(d => d.Plan, Plan(Coil("line in", 1), Coil("line out", 60))));

        Assert.Equal(["line in", "line out"], cut.FindAll("[data-testid=winding-name]").Select(t => t.TextContent));
        Assert.Equal(["1 turn", "60 turns"], cut.FindAll("[data-testid=winding-turns]").Select(t => t.TextContent));
    }

    [Fact]
    public void SchematicDrawing_MarkupInNames_IsEscapedText()
    {
        var name = "<script>alert(1)</script><b>x</b>";

        var cut = Render<SchematicDrawing>(p => p.Add(d => d.Plan, Plan(Coil(name, 4), Coil("a & b", 4))));

        Assert.Empty(cut.FindAll("script"));
        Assert.Empty(cut.FindAll("b"));
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", cut.Markup, StringComparison.Ordinal);
        Assert.Equal(name, cut.Find("[data-testid=winding-name]").TextContent);
        Assert.Equal(name, cut.Find("[data-testid=schematic-winding-0] title").TextContent);
        Assert.Contains("a &amp; b", cut.Markup, StringComparison.Ordinal);
    }

    [Theory]
    // One loop per turn up to 12; then 12 (SchematicModel.LoopsFor).
    [InlineData(1, 1)]
    [InlineData(4, 4)]
    [InlineData(12, 12)]
    [InlineData(13, 12)]
    [InlineData(250, 12)]
    public void SchematicDrawing_Loops_FollowTheTurnsUpToTwelve(int turns, int loops)
    {
        var cut = Render<SchematicDrawing>(p => p.Add(d => d.Plan, Plan(Coil("w", turns))));

        // Each loop is one half-circle arc command in the coil's path.
        Assert.Equal(loops, ArcCommand().Count(cut.Find("[data-testid=schematic-coil]").GetAttribute("d")!));
    }

    [Fact]
    public void SchematicDrawing_IsBlackOnWhite()
    {
        var cut = Render<SchematicDrawing>(p => p.Add(d => d.Plan, Plan(Coil("p", 4, 2), Coil("s", 8))));

        var colours = cut.FindAll("[stroke], [fill]").SelectMany(e => new[] { e.GetAttribute("stroke"), e.GetAttribute("fill") }).Where(c => c is not null).Distinct();
        Assert.All(colours, c => Assert.Contains(c, new[] { "#000000", "#ffffff", "none" }));
    }

    [GeneratedRegex(@"\bA ")]
    private static partial Regex ArcCommand();
}
