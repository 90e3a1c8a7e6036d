using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;
using Winding.Web.Display;
using Winding.Web.Hosting;
using Winding.Web.Planning;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Sheets;

public sealed class SheetViewBuilderTests : WindingComponentTestBase
{
    private static readonly DateOnly Day = new(2025, 3, 14);

    private (TransformerPlan Plan, PlanEvaluation Evaluation) Read(string demoId)
    {
        var catalogue = Services.GetRequiredService<CatalogueProvider>().Catalogue;
        var plan = PlanReader.Read(DemoPlans.Find(demoId)!.Document, catalogue).Plan!;
        return (plan, PlanEvaluator.Evaluate(plan));
    }

    [Fact]
    public void Build_DateAndRevision_AreShownAsGiven()
    {
        var (plan, evaluation) = Read("club-gate-drive");

        var view = SheetViewBuilder.Build(plan, evaluation, "Toroid 16 × 10 × 6 mm", Day, 4, "revision 4");

        Assert.Equal("2025-03-14", view.DateText);
        Assert.Equal("revision 4", view.RevisionText);
        Assert.Equal(4, view.Sheet.Revision);
        Assert.Equal("Toroid 16 × 10 × 6 mm", view.CoreFacts[0].Value);
    }

    [Fact]
    public void Build_InlineCore_IsNamedByItsShape()
    {
        var (plan, evaluation) = Read("club-gate-drive");

        Assert.Equal("Ring core (toroid)", SheetViewBuilder.Build(plan, evaluation, null, Day, 0, "not saved").CoreFacts[0].Value);
    }

    [Fact]
    public void Build_ChecksFormatTheirValuesLikeThePlanPage()
    {
        var (plan, evaluation) = Read("club-end-fed-unun");

        var view = SheetViewBuilder.Build(plan, evaluation, null, Day, 0, "not saved");

        for (var i = 0; i < view.Checks.Count; i++)
        {
            var check = view.Sheet.Checks[i];
            Assert.Equal(SheetViewBuilder.Value(check.Expected, check.Unit), view.Checks[i].Expected);
            Assert.Equal((i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), view.Checks[i].Number);
        }

        Assert.Equal(EngineeringFormat.Format(evaluation.Windings[0].InductanceH, "H"), view.Checks.Single(c => c.Id == "w0-inductance").Expected);
        Assert.Equal("3.000", SheetViewBuilder.Value(3, string.Empty));
    }

    [Fact]
    public void Build_RepeatedSource_RefersToTheFirstCheckWithIt()
    {
        var (plan, evaluation) = Read("club-end-fed-unun");

        var checks = SheetViewBuilder.Build(plan, evaluation, null, Day, 0, "not saved").Checks;

        Assert.Equal("as for check 1.", checks.Single(c => c.Id == "w1-inductance").Source);
        Assert.Contains("IEC 60205", checks.Single(c => c.Id == "w0-inductance").Source, StringComparison.Ordinal);
    }

    [Fact]
    public void LengthToCut_IsWholeMillimetresAsOnThePlanPage() =>
        Assert.Equal("522 mm", SheetViewBuilder.LengthToCut(0.52249));
}
