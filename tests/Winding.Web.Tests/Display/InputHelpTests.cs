using Winding.Web.Components.Pages;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

/// <summary>Every input on the plan page carries its definition as a tooltip (behaviour, no physics).</summary>
public sealed class InputHelpTests : WindingComponentTestBase
{
    [Theory]
    [InlineData("min-frequency")]
    [InlineData("max-frequency")]
    [InlineData("source-resistance")]
    [InlineData("load-resistance")]
    [InlineData("drive-voltage")]
    [InlineData("ambient")]
    [InlineData("windings-0-turns")]
    [InlineData("windings-1-conductor")]
    [InlineData("windings-1-overall")]
    [InlineData("windings-0-in-hand")]
    [InlineData("windings-0-current")]
    [InlineData("windings-1-taps")]
    public void PlanPageInput_HasItsDefinitionAsTooltip(string id)
    {
        var page = Render<PlanPage>();

        var definition = InputHelp.For(id);

        Assert.False(string.IsNullOrWhiteSpace(definition));
        Assert.Contains(page.FindAll("[title]"), e => e.GetAttribute("title") == definition);
    }

    [Fact]
    public void For_UnknownField_IsNull()
    {
        Assert.Null(InputHelp.For("windings-0-nothing"));
        Assert.Null(InputHelp.For(null));
    }

    [Theory]
    [InlineData("windings-0-conductor")]
    [InlineData("windings-1-overall")]
    [InlineData("windings-0-wrap-thickness")]
    [InlineData("measure-od")]
    [InlineData("measure-id")]
    [InlineData("measure-length")]
    [InlineData("measure-gap")]
    [InlineData("edit-outerDiameter")]
    [InlineData("edit-innerDiameter")]
    [InlineData("edit-height")]
    [InlineData("edit-coatingThickness")]
    [InlineData("edit-length")]
    [InlineData("edit-residualGap")]
    [InlineData("edit-holeDiameter")]
    [InlineData("edit-holeSpacing")]
    [InlineData("edit-width")]
    [InlineData("edit-windowBreadth")]
    [InlineData("edit-windowHeight")]
    [InlineData("edit-legDiameter")]
    [InlineData("edit-legWidth")]
    [InlineData("edit-legDepth")]
    [InlineData("edit-bobbinWall")]
    [InlineData("windings-0-metric-size")]
    [InlineData("windings-0-litz-strand")]
    [InlineData("windings-0-litz-bundle")]
    [InlineData("windings-0-hookup-conductor")]
    [InlineData("windings-0-hookup-insulation")]
    [InlineData("core-outerDiameter")]
    [InlineData("core-residualGap")]
    [InlineData("core-effective-length")]
    public void LengthField_Help_NamesTheUnitsItTakes(string id)
    {
        var help = InputHelp.For(id);

        Assert.NotNull(help);
        Assert.EndsWith(InputHelp.Units, help, StringComparison.Ordinal);
        Assert.Contains("mm / inch", help, StringComparison.Ordinal);
        Assert.Contains("mil", help, StringComparison.Ordinal);
    }

    [Fact]
    public void MeasurePageLengthInputs_HaveTheirDefinitionAsTooltip()
    {
        var page = Render<CharacterisePage>();

        foreach (var id in new[] { "measure-od", "measure-id", "measure-length", "measure-gap" })
        {
            Assert.Contains(page.FindAll("[title]"), e => e.GetAttribute("title") == InputHelp.For(id));
        }
    }
}
