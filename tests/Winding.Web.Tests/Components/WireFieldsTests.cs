using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;
using Winding.Web.Display;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

/// <summary>The wire fields of a winding on the plan page, for each wire kind (behaviour and consistency, no physics).</summary>
public sealed class WireFieldsTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    [Fact]
    public void Litz_TypedIntoItsFields_IsTheWireInTheResults()
    {
        var page = Render<PlanPage>();
        State.EditWinding(0, w => w.WireForm = WireForm.Litz);
        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#windings-0-litz-strands")));
        Assert.Contains("Litz", page.Find("[data-testid=windings-0-wire-kind]").OuterHtml, StringComparison.Ordinal);

        page.Find("input#windings-0-litz-strands").Input("20");
        page.Find("input#windings-0-litz-strand").Input("0.1");
        page.Find("input#windings-0-litz-bundle").Input("0.6");

        page.WaitForAssertion(() => Assert.Contains("Litz 20 × 0.1 mm", page.Find("[data-testid=value-w0-wire]").TextContent, StringComparison.Ordinal));
        Assert.Empty(page.FindAll("input#windings-0-conductor"));
    }

    [Fact]
    public void Litz_BundleTooSmall_ShowsTheErrorAtTheBundleField()
    {
        var page = Render<PlanPage>();
        State.EditWinding(0, w => { w.WireForm = WireForm.Litz; w.LitzStrands = "20"; w.LitzStrandDiameter = "0.1"; });

        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#windings-0-litz-bundle")));
        page.Find("input#windings-0-litz-bundle").Input("0.2");

        page.WaitForAssertion(() => Assert.Contains("too small", FieldText(page, "windings-0-litz-bundle"), StringComparison.Ordinal));
        Assert.NotNull(page.Find("[data-testid=no-result]"));
    }

    [Fact]
    public void Awg_TypedGauge_IsTheWireInTheResults_AndANonsenseGaugeIsAnErrorThere()
    {
        var page = Render<PlanPage>();
        State.EditWinding(0, w => w.WireForm = WireForm.Awg);
        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#windings-0-awg")));

        page.Find("input#windings-0-awg").Input("24");
        page.WaitForAssertion(() => Assert.Contains("AWG 24", page.Find("[data-testid=value-w0-wire]").TextContent, StringComparison.Ordinal));

        page.Find("input#windings-0-awg").Input("60");
        page.WaitForAssertion(() => Assert.Contains("out of range", FieldText(page, "windings-0-awg"), StringComparison.Ordinal));
    }

    [Fact]
    public void Metric_SizeOutsideTheSeries_ShowsTheErrorAtTheSize()
    {
        var page = Render<PlanPage>();
        State.EditWinding(0, w => w.WireForm = WireForm.Metric);
        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#windings-0-metric-size")));

        page.Find("input#windings-0-metric-size").Input("0.51");

        page.WaitForAssertion(() => Assert.Contains("IEC 60317", FieldText(page, "windings-0-metric-size"), StringComparison.Ordinal));
    }

    [Fact]
    public void HookUp_NegativeInsulation_ShowsTheErrorAtTheInsulation()
    {
        var page = Render<PlanPage>();
        State.EditWinding(0, w => { w.WireForm = WireForm.HookUp; w.HookUpConductor = "0.6"; });
        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#windings-0-hookup-insulation")));

        page.Find("input#windings-0-hookup-insulation").Input("-0.2");

        page.WaitForAssertion(() => Assert.Contains("out of range", FieldText(page, "windings-0-hookup-insulation"), StringComparison.Ordinal));
    }

    [Fact]
    public async Task LengthFieldsOfEveryKind_FollowTheUnitSwitch()
    {
        var page = Render<PlanPage>();
        State.EditWinding(0, w => { w.WireForm = WireForm.Litz; w.LitzStrandDiameter = "0.254"; });
        State.EditWinding(1, w => { w.WireForm = WireForm.HookUp; w.HookUpInsulation = "0.508"; });

        await Services.GetRequiredService<DisplayUnits>().SetAsync(UnitSystem.Imperial);

        page.WaitForAssertion(() => Assert.Equal("Strand (in)", page.Find("label[for=windings-0-litz-strand]").TextContent.Trim()));
        // 0.254 mm = 0.01 in and 0.508 mm = 0.02 in exactly (1 in = 25.4 mm).
        Assert.Equal("0.01", page.Find("input#windings-0-litz-strand").GetAttribute("value"));
        Assert.Equal("Insulation (in)", page.Find("label[for=windings-1-hookup-insulation]").TextContent.Trim());
        Assert.Equal("0.02", page.Find("input#windings-1-hookup-insulation").GetAttribute("value"));
    }

    [Fact]
    public void LoadedHookUpDemo_IsEditableInItsFields()
    {
        var page = Render<PlanPage>();

        State.Load(DemoPlans.Find("club-current-sense")!.Document);

        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#windings-0-hookup-conductor")));
        Assert.Empty(page.FindAll("[data-testid=windings-0-imported-wire]"));
        Assert.Equal(
            LengthText.ForDraft(DemoPlans.Find("club-current-sense")!.Document.Windings![0]!.Wire!.HookUp!.ConductorDiameterMm),
            page.Find("input#windings-0-hookup-conductor").GetAttribute("value"));
    }

    [Theory]
    [InlineData("windings-0-wire-kind")]
    [InlineData("windings-0-metal")]
    public void WireSelects_CarryTheirDefinition(string id)
    {
        var page = Render<PlanPage>();

        Assert.Contains(page.FindAll("[title]"), e => e.GetAttribute("title") == InputHelp.For(id));
    }

    /// <summary>The text of the field around the input <paramref name="id"/> (label, value's helper and error).</summary>
    private static string FieldText(IRenderedComponent<PlanPage> page, string id) => page.Find($"input#{id}").Closest(".mud-input-control")!.TextContent;
}
