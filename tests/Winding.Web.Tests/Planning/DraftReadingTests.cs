using CsCheck;
using Winding.Web.Display;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>How stored values come back into the form's fields (round trips; no physics).</summary>
public sealed class DraftReadingTests
{
    [Theory]
    [InlineData(3.5e6, "3.5 MHz")]
    [InlineData(1.8e6, "1.8 MHz")]
    [InlineData(100e3, "100 kHz")]
    [InlineData(50, "50 Hz")]
    [InlineData(123456789.123, "123456789.123")]
    public void ShowWithUnit_Frequency_IsEngineeringNotationWhenExact(double hz, string shown)
    {
        Assert.Equal(shown, DraftReading.ShowWithUnit(hz, "Hz"));
    }

    [Fact]
    public void ShowWithUnit_AnyFrequency_ReadsBackToTheSameDouble()
    {
        Gen.Double[1e-3, 1e12].Sample(hz => EngineeringNumber.TryParse(DraftReading.ShowWithUnit(hz, "Hz"), "Hz") == hz);
    }
}
