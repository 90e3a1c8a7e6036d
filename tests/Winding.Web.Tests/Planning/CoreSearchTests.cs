using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Components.Pages;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>Finding cores by shape, size and material words (behaviour of the search box, no physics).</summary>
public sealed class CoreSearchTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    [Theory]
    [InlineData("toroid 10x5x4 nizn")]
    [InlineData("TOROID 10 × 5 × 4")]
    [InlineData("10x5x4 850")]
    public void Filter_SizeAndMaterialWords_FindTheRing(string query)
    {
        var found = CoreSearch.Filter(State.Cores, query);

        Assert.Contains(found, c => c.Id == "toroid-10x5x4-nizn-850");
        Assert.All(found, c => Assert.Contains("10x5x4", c.Id, StringComparison.Ordinal));
    }

    [Fact]
    public void Filter_EveryWordMustMatch_AndEmptyGivesAll()
    {
        Assert.Equal(State.Cores.Count, CoreSearch.Filter(State.Cores, "  ").Count);
        Assert.All(CoreSearch.Filter(State.Cores, "sleeve"), c => Assert.StartsWith("sleeve", c.Id, StringComparison.Ordinal));
        Assert.Empty(CoreSearch.Filter(State.Cores, "toroid nosuchword"));
    }

    [Fact]
    public void FilterCores_KeepsTheChosenCore_AndThePageListsOnlyMatches()
    {
        State.SelectCore("toroid-10x5x4-nizn-850");

        State.FilterCores("sleeve");

        Assert.Equal("toroid-10x5x4-nizn-850", State.FilteredCores[0].Id);
        Assert.All(State.FilteredCores.Skip(1), c => Assert.StartsWith("sleeve", c.Id, StringComparison.Ordinal));
        var page = Render<PlanPage>();
        Assert.Contains($"{State.FilteredCores.Count} of {State.Cores.Count} cores", page.Markup, StringComparison.Ordinal);
    }
}
