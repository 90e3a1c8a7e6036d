using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>The shipped demo plans are shared by every visitor: nobody's change may reach another (behaviour; no physics).</summary>
public sealed class DemoPlansTests
{
    [Fact]
    public void Find_ChangingTheDocumentHandedOut_LeavesTheDemoAsShipped()
    {
        var first = DemoPlans.Find("club-end-fed-unun")!;
        var turns = first.Document.Windings![0]!.Turns;
        first.Document.Windings[0]!.Turns = 999;
        first.Document.Name = "changed";

        var again = DemoPlans.Find("club-end-fed-unun")!;

        Assert.Equal(turns, again.Document.Windings![0]!.Turns);
        Assert.Equal(again.Name, again.Document.Name);
        Assert.NotEqual(999, again.Document.Windings[0]!.Turns);
    }

    [Fact]
    public void All_ListsEveryDemoOnce_InNameOrder()
    {
        var all = DemoPlans.All;

        Assert.Equal(all.Select(d => d.Name).Order(StringComparer.Ordinal), all.Select(d => d.Name));
        Assert.Equal(all.Count, all.Select(d => d.Id).Distinct().Count());
        Assert.All(all, d => Assert.Equal(d.Name, d.Document.Name));
    }
}
