using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

public sealed class PlanningStateTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    [Fact]
    public void SetConductorDiameter_DecimalComma_IsAccepted()
    {
        State.SetConductorDiameter("0,4");

        Assert.Null(State.ErrorFor(PlanField.ConductorDiameter));
        Assert.NotNull(State.Result);
        Assert.Equal(0.4, State.Result!.Windings[0].Wire.StrandDiameter.Millimetres, 9);
    }

    [Theory]
    [InlineData("")]
    [InlineData("-3")]
    [InlineData("1e400")]
    [InlineData("NaN")]
    public void SetConductorDiameter_Invalid_GivesAFieldErrorAndNoResult(string text)
    {
        State.SetConductorDiameter(text);

        Assert.NotNull(State.ErrorFor(PlanField.ConductorDiameter));
        Assert.Null(State.Result);
    }

    [Fact]
    public void SetOverallDiameter_SmallerThanConductor_IsAnErrorAtThatField()
    {
        State.SetConductorDiameter("0.5");
        State.SetOverallDiameter("0.3");

        Assert.Contains("cannot be smaller", State.ErrorFor(PlanField.OverallDiameter), StringComparison.Ordinal);
    }

    [Fact]
    public void SelectCore_Unknown_IsAnErrorAtTheCorePicker()
    {
        State.SelectCore("no-such-core");

        Assert.NotNull(State.ErrorFor(PlanField.Core));
    }
}
