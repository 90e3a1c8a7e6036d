using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;
using Winding.Web.Display;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Components;

/// <summary>The core panel of the plan page: a catalogue core, or a core typed on the page.</summary>
public sealed class CorePickerTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    [Fact]
    public void TypedRingWithMeasuredAl_ResultsFollow_AndSwitchingBackShowsTheCatalogue()
    {
        var page = Render<PlanPage>();
        page.Find("input[data-testid=core-source-typed]").Click();
        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#core-outerDiameter")));

        page.Find("input#core-outerDiameter").Input("23");
        page.Find("input#core-innerDiameter").Input("14");
        page.Find("input#core-height").Input("7");
        page.Find("input#core-measured-al").Input("120");

        // L = AL·N² (definition of AL): 120 nH × 4² = 1.92 µH for the 4-turn primary.
        page.WaitForAssertion(() => Assert.Equal("1.92 µH", page.Find("[data-testid=value-w0-inductance]").TextContent.Trim()));
        Assert.Contains("measured AL", page.Find("[data-testid=value-shape]").TextContent, StringComparison.Ordinal);
        Assert.NotNull(page.Find("[data-testid=cross-section-svg]"));

        page.Find("input[data-testid=core-source-catalogue]").Click();
        page.WaitForAssertion(() => Assert.NotNull(page.Find("[data-testid=core-select]")));
        Assert.Equal(CoreSource.Catalogue, State.CoreSource);
        Assert.Equal(PlanningState.DefaultCoreId, State.ToDocument().Core!.CatalogueId);
    }

    [Fact]
    public void TypedRing_InnerLargerThanOuter_ShowsTheErrorAtTheInnerDiameter()
    {
        var page = Render<PlanPage>();
        State.EditTypedCore(c => { c.Dimensions["outerDiameter"] = "14"; c.Dimensions["height"] = "7"; c.MeasuredAl = "120"; });
        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#core-innerDiameter")));

        page.Find("input#core-innerDiameter").Input("23");

        page.WaitForAssertion(() => Assert.Contains("must be smaller", FieldText(page, "core-innerDiameter"), StringComparison.Ordinal));
        Assert.NotNull(page.Find("[data-testid=no-result]"));
    }

    [Fact]
    public void TypedSleeve_ShowsTheSleeveFields()
    {
        var page = Render<PlanPage>();

        State.EditTypedCore(c => c.Shape = "sleeve");

        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#core-residualGap")));
        Assert.NotNull(page.Find("input#core-length"));
        Assert.Empty(page.FindAll("input#core-height"));
    }

    [Fact]
    public void TypedBobbin_ShowsEffectiveParametersAndItsAl()
    {
        var page = Render<PlanPage>();

        State.EditTypedCore(c => c.Shape = "bobbin");

        page.WaitForAssertion(() => Assert.NotNull(page.Find("input#core-effective-area")));
        Assert.NotNull(page.Find("input#core-effective-length"));
        Assert.NotNull(page.Find("input#core-datasheet-al"));
        Assert.NotNull(page.Find("input#core-windowBreadth"));
    }

    [Fact]
    public async Task TypedDimensions_FollowTheUnitSwitch()
    {
        var page = Render<PlanPage>();
        State.EditTypedCore(c => c.Dimensions["outerDiameter"] = "25.4");

        await Services.GetRequiredService<DisplayUnits>().SetAsync(UnitSystem.Imperial);

        page.WaitForAssertion(() => Assert.Equal("Outer diameter (in)", page.Find("label[for=core-outerDiameter]").TextContent.Trim()));
        Assert.Equal("1", page.Find("input#core-outerDiameter").GetAttribute("value"));
        Assert.Contains(page.FindAll("[title]"), e => e.GetAttribute("title") == InputHelp.For("core-outerDiameter"));
    }

    [Theory]
    [InlineData("core-outerDiameter")]
    [InlineData("core-measured-al")]
    [InlineData("core-stack")]
    [InlineData("core-material-basis")]
    public void TypedCoreInputs_CarryTheirDefinition(string id)
    {
        var page = Render<PlanPage>();
        State.EditTypedCore(c => c.Shape = "toroid");

        page.WaitForAssertion(() => Assert.Contains(page.FindAll("[title]"), e => e.GetAttribute("title") == InputHelp.For(id)));
        Assert.False(string.IsNullOrWhiteSpace(InputHelp.For(id)));
    }

    /// <summary>The text of the field around the input <paramref name="id"/> (label, value's helper and error).</summary>
    private static string FieldText(IRenderedComponent<PlanPage> page, string id) => page.Find($"input#{id}").Closest(".mud-input-control")!.TextContent;
}
