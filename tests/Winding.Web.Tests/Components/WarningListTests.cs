using Bunit;
using Winding.Core.Plans;
using Winding.Web.Components.Widgets;
using Winding.Web.Display;

namespace Winding.Web.Tests.Components;

/// <summary>The warnings list: severity, and the way to the field each warning is about (behaviour; no physics).</summary>
public sealed class WarningListTests : WindingComponentTestBase
{
    [Fact]
    public void GoToTheField_Click_FocusesTheWarningsInput()
    {
        var module = JSInterop.SetupModule(FieldFocus.ModulePath);
        module.Setup<string?>("focusFirst", _ => true).SetResult("windings-1-turns");
        var warnings = new[] { new PlanWarning("test", WarningSeverity.Caution, "windings[1].turns", "Too few turns.") };
        var list = Render<WarningList>(p => p.Add(l => l.Warnings, warnings));

        list.Find("[data-testid=warning-target]").Click();

        var call = module.VerifyInvoke("focusFirst");
        var ids = Assert.IsAssignableFrom<IReadOnlyList<string>>(call.Arguments[0]);
        Assert.Equal("windings-1-turns", ids[0]);
        Assert.Equal("windings[1].turns", list.Find(".mud-alert").GetAttribute("data-field"));
    }

    [Fact]
    public void Warning_WithoutAFieldOnThePage_HasNoLink()
    {
        var warnings = new[] { new PlanWarning("test", WarningSeverity.Info, "sweep", "The sweep was clipped.") };

        var list = Render<WarningList>(p => p.Add(l => l.Warnings, warnings));

        Assert.Empty(list.FindAll("[data-testid=warning-target]"));
        Assert.Contains("The sweep was clipped.", list.Markup, StringComparison.Ordinal);
    }
}
