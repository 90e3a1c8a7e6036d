using CsCheck;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class EngineeringFormatEditableTests
{
    [Theory]
    [InlineData(1.234567e-4, "H", "123.457 uH")]
    [InlineData(0.0123, "Ω", "12.3 mΩ")]
    [InlineData(3.5e6, "Hz", "3.5 MHz")]
    [InlineData(3.02, "", "3.02")]
    [InlineData(0.333333333, "", "0.333333")]
    public void Editable_WritesSixFiguresWithAPrefix(double value, string unit, string expected) =>
        Assert.Equal(expected, EngineeringFormat.Editable(value, unit));

    [Fact]
    public void Editable_ReadsBackToTheSameValueToSixFigures() =>
        Gen.Select(Gen.Double[1e-13, 1e11], Gen.OneOf("H", "Ω", "Hz", "F", string.Empty)).Sample((value, unit) =>
        {
            var back = EngineeringNumber.TryParse(EngineeringFormat.Editable(value, unit), unit);
            return back is { } b && Math.Abs(b - value) <= 5e-6 * value;
        });
}
