using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Widgets;
using Winding.Web.Display;

namespace Winding.Web.Tests.Components;

/// <summary>The length input: labels, shown values and what it writes back in either unit system (behaviour).</summary>
public sealed class LengthFieldTests : WindingComponentTestBase
{
    private readonly List<string> _written = [];

    private IRenderedComponent<LengthField> RenderField(string value) =>
        Render<LengthField>(p => p
            .Add(f => f.Label, "Outer diameter")
            .Add(f => f.Id, "measure-od")
            .Add(f => f.Value, value)
            .Add(f => f.ValueChanged, (string v) => _written.Add(v)));

    private Task SwitchTo(UnitSystem system) => Services.GetRequiredService<DisplayUnits>().SetAsync(system);

    [Fact]
    public void LengthField_Metric_LabelSaysMillimetresAndShowsTheDraft()
    {
        var field = RenderField("12.7");

        Assert.Contains("Outer diameter (mm)", field.Markup, StringComparison.Ordinal);
        Assert.Equal("12.7", field.Find("input#measure-od").GetAttribute("value"));
    }

    [Fact]
    public async Task LengthField_SwitchToImperial_RelabelsAndConvertsWithoutWriting()
    {
        var field = RenderField("12.7");

        await SwitchTo(UnitSystem.Imperial);

        // 12.7 mm = 0.5 in exactly.
        field.WaitForAssertion(() => Assert.Equal("0.5", field.Find("input#measure-od").GetAttribute("value")));
        Assert.Contains("Outer diameter (in)", field.Markup, StringComparison.Ordinal);
        await SwitchTo(UnitSystem.Metric);
        field.WaitForAssertion(() => Assert.Equal("12.7", field.Find("input#measure-od").GetAttribute("value")));
        Assert.Empty(_written);
    }

    [Fact]
    public async Task LengthField_PlainNumberTypedInInches_IsWrittenWithItsUnit()
    {
        await SwitchTo(UnitSystem.Imperial);
        var field = RenderField("12.7");

        field.Find("input#measure-od").Input("0.75");

        field.WaitForAssertion(() => Assert.Equal(["0.75 in"], _written));
        field.Render(p => p.Add(f => f.Value, "0.75 in"));
        Assert.Equal("0.75", field.Find("input#measure-od").GetAttribute("value"));
    }

    [Fact]
    public async Task LengthField_UnitTyped_IsWrittenAsTyped_AndStaysOnScreen()
    {
        await SwitchTo(UnitSystem.Imperial);
        var field = RenderField("12.7");

        field.Find("input#measure-od").Input("19.05 mm");

        field.WaitForAssertion(() => Assert.Equal(["19.05 mm"], _written));
        // The parent stores the same length in another spelling: what was typed stays.
        field.Render(p => p.Add(f => f.Value, "19.05"));
        Assert.Equal("19.05 mm", field.Find("input#measure-od").GetAttribute("value"));
    }
}
