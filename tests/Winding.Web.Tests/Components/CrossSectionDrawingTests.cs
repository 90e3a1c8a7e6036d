using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Windings;
using Winding.Core.Wire;
using Winding.Web.Components.Widgets;
using Winding.Web.Tests.Drawing;
using static Winding.Web.Tests.Drawing.CrossSectionModelTests;

namespace Winding.Web.Tests.Components;

public sealed class CrossSectionDrawingTests : WindingComponentTestBase
{
    private static readonly WindingWire Wire = WindingWire.Solid(Mm(0.2), Mm(0.226));

    public static TheoryData<string> Shapes => ["toroid", "coated toroid", "sleeve", "bobbin", "two-hole"];

    [Theory]
    [MemberData(nameof(Shapes))]
    public void CrossSectionDrawing_EveryShape_RendersSvgGroupsAndLegend(string shape)
    {
        CoreShape core = shape switch
        {
            "toroid" => ToroidCore.Create(Mm(10), Mm(5), Mm(4)),
            "coated toroid" => ToroidCore.Create(Mm(10), Mm(5), Mm(4)).WithCoating(Mm(0.05)),
            "sleeve" => SleeveCore.Create(Mm(12), Mm(6), Mm(20), Mm(0)),
            "bobbin" => Bobbin(breadthMm: 8, heightMm: 3, wallMm: 0.5),
            _ => TwoHoleCore.Create(Mm(6), Mm(1.5), Mm(3), Mm(6.5), Mm(4)),
        };
        var (plan, evaluation) = CrossSectionModelTests.Evaluate(core, Spec("primary", 8, Wire), Spec("secondary", 3, Wire, WindingPlacement.Over(0)));

        var drawing = Render<CrossSectionDrawing>(p => p.Add(c => c.Plan, plan).Add(c => c.Evaluation, evaluation));

        var svg = drawing.Find("[data-testid=cross-section-svg]");
        Assert.Equal("svg", svg.TagName, ignoreCase: true);
        Assert.Equal(4, svg.GetAttribute("viewBox")!.Split(' ').Length);
        var groups = drawing.FindAll("svg g[data-winding]");
        Assert.Equal(["0", "1"], groups.Select(g => g.GetAttribute("data-winding")));
        Assert.Equal(8 * (shape == "two-hole" ? 2 : 1), groups[0].QuerySelectorAll("circle").Length);
        var legend = drawing.Find("[data-testid=cross-section-legend]");
        Assert.Contains("primary", legend.TextContent, StringComparison.Ordinal);
        Assert.Contains("8 turns", legend.TextContent, StringComparison.Ordinal);
        Assert.Contains("mm", drawing.Find("[data-testid=cross-section-scale]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void CrossSectionDrawing_Toroid_ViewBoxIsInMillimetres()
    {
        var (plan, evaluation) = CrossSectionModelTests.Evaluate(ToroidCore.Create(Mm(10), Mm(5), Mm(4)), Spec("w", 10, Wire));

        var drawing = Render<CrossSectionDrawing>(p => p.Add(c => c.Plan, plan).Add(c => c.Evaluation, evaluation));

        // OD 10 mm with a 6 % margin of 10 mm each side, and a 14 % band below for the scale bar.
        Assert.Equal("-5.6 -5.6 11.2 12.6", drawing.Find("[data-testid=cross-section-svg]").GetAttribute("viewBox"));
        // Scale bar: the largest 1, 2 or 5 mm step not above a quarter of the 10 mm core, so 2 mm.
        Assert.Equal("2 mm", drawing.Find("[data-testid=cross-section-scale] text").TextContent.Trim());
    }

    [Fact]
    public void CrossSectionDrawing_HostileNames_AppearOnlyEscaped()
    {
        const string script = "<script>alert(1)</script>";
        const string breakout = "\"><svg onload=x>";
        var (plan, evaluation) = CrossSectionModelTests.Evaluate(
            ToroidCore.Create(Mm(10), Mm(5), Mm(4)),
            Spec(script, 5, Wire),
            Spec(breakout, 5, Wire));

        var drawing = Render<CrossSectionDrawing>(p => p.Add(c => c.Plan, plan).Add(c => c.Evaluation, evaluation));

        Assert.Empty(drawing.FindAll("script"));
        Assert.Empty(drawing.FindAll("[onload]"));
        Assert.Single(drawing.FindAll("svg"), e => e.GetAttribute("data-testid") == "cross-section-svg");
        Assert.DoesNotContain("<script", drawing.Markup, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<svg onload", drawing.Markup, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", drawing.Markup, StringComparison.Ordinal);
        var legend = drawing.Find("[data-testid=cross-section-legend]").TextContent;
        Assert.Contains(script, legend, StringComparison.Ordinal);
        Assert.Contains(breakout, legend, StringComparison.Ordinal);
        Assert.Equal(breakout, drawing.Find("g[data-winding='1'] > title").TextContent);
    }
}
