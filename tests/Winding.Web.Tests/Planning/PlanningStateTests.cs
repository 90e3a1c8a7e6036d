using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

public sealed class PlanningStateTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    [Fact]
    public void EditWinding_DecimalComma_IsAccepted()
    {
        State.EditWinding(0, w => w.ConductorDiameter = "0,4");

        Assert.Null(State.ErrorFor("windings[0].wire.conductorDiameterMm"));
        Assert.NotNull(State.Result);
        Assert.Equal(0.4, State.Result!.Windings[0].Wire.StrandDiameter.Millimetres, 9);
    }

    [Theory]
    [InlineData("")]
    [InlineData("-3")]
    [InlineData("1e400")]
    [InlineData("NaN")]
    [InlineData("0.5 kg")]
    public void EditWinding_InvalidConductor_GivesAFieldErrorAndNoResult(string text)
    {
        State.EditWinding(0, w => w.ConductorDiameter = text);

        Assert.NotNull(State.ErrorFor("windings[0].wire.conductorDiameterMm"));
        Assert.Null(State.Result);
    }

    [Fact]
    public void EditWinding_OverallSmallerThanConductor_IsAnErrorAtThatField()
    {
        State.EditWinding(0, w =>
        {
            w.ConductorDiameter = "0.5";
            w.OverallDiameter = "0.3";
        });

        Assert.Contains("cannot be smaller", State.ErrorFor("windings[0].wire.overallDiameterMm"), StringComparison.Ordinal);
    }

    [Fact]
    public void SelectCore_Unknown_IsAnErrorAtTheCorePicker()
    {
        State.SelectCore("no-such-core");

        Assert.NotNull(State.ErrorFor("core"));
    }

    [Theory]
    [InlineData("1.8 MHz", 1.8e6)]
    [InlineData("1.8M", 1.8e6)]
    [InlineData("1800k", 1.8e6)]
    [InlineData("1,8 MHz", 1.8e6)]
    [InlineData("1800000", 1.8e6)]
    public void EditOperating_EngineeringNotation_IsUnderstood(string text, double hz)
    {
        State.EditOperating(o => o.MinFrequency = text);

        Assert.Equal(hz, State.Result!.Magnetizing!.FrequencyHz, 1e-6);
    }

    [Fact]
    public void EditOperating_HighestBelowLowest_IsAnErrorAtTheHighestFrequency()
    {
        State.EditOperating(o => o.MaxFrequency = "1 MHz");

        Assert.NotNull(State.ErrorFor("operating.maxFrequencyHz"));
    }

    [Fact]
    public void EditOperating_Disabled_LeavesOutTheOperatingPoint()
    {
        State.EditOperating(o => o.Enabled = false);

        Assert.NotNull(State.Result);
        Assert.Null(State.Result!.Operating);
    }
}
