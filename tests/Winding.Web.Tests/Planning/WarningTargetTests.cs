using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>The field each warning leads to on the plan page (page ids, behaviour; no physics).</summary>
public sealed class WarningTargetTests
{
    [Theory]
    [InlineData("windings[0].turns", "windings-0-turns")]
    [InlineData("windings[2].taps", "windings-2-turns")]
    [InlineData("windings[1].rmsCurrentA", "windings-1-current")]
    [InlineData("windings[1]", "windings-1-turns")]
    [InlineData("operating.driveVoltageRms", "drive-voltage")]
    [InlineData("operating.minFrequencyHz", "min-frequency")]
    [InlineData("operating", "min-frequency")]
    [InlineData("core.materialId", "core-measured-al")]
    public void Candidates_KnownFields_StartWithTheirInput(string field, string first)
    {
        Assert.Equal(first, WarningTarget.Candidates(field)[0]);
    }

    [Fact]
    public void Candidates_Wire_TriesEveryWireKindsFieldThenTheTurns()
    {
        var ids = WarningTarget.Candidates("windings[3].wire");

        Assert.Contains("windings-3-conductor", ids);
        Assert.Contains("windings-3-awg", ids);
        Assert.Contains("windings-3-litz-strand", ids);
        Assert.Equal("windings-3-turns", ids[^1]);
        Assert.All(ids, id => Assert.StartsWith("windings-3-", id, StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("sweep")]
    [InlineData("windings")]
    public void Candidates_FieldsThePageDoesNotHave_AreEmpty(string? field)
    {
        Assert.Empty(WarningTarget.Candidates(field));
    }
}
