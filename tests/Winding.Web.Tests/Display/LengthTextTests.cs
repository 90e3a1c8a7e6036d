using System.Globalization;
using CsCheck;
using Winding.Web.Display;

namespace Winding.Web.Tests.Display;

public sealed class LengthTextTests
{
    [Theory]
    // 0.5 in = 12.7 mm; 20 mil = 0.508 mm; 0.02" = 0.508 mm (1 in = 25.4 mm exactly, 1 mil = 0.001 in).
    [InlineData("12.7 mm", 12.7)]
    [InlineData("12.7mm", 12.7)]
    [InlineData("12,7 MM", 12.7)]
    [InlineData("0.5 in", 12.7)]
    [InlineData("0.5in", 12.7)]
    [InlineData(".5 IN", 12.7)]
    [InlineData("0.5\"", 12.7)]
    [InlineData("0.5 ″", 12.7)]
    [InlineData("20 mil", 0.508)]
    [InlineData("20 mils", 0.508)]
    [InlineData("0.02\"", 0.508)]
    [InlineData("5e-1 in", 12.7)]
    public void Read_EachUnitSuffix_GivesTheExactMillimetres(string text, double millimetres)
    {
        var reading = LengthText.Read(text, LengthUnit.Millimetre);

        Assert.Null(reading.Problem);
        Assert.Equal(millimetres, reading.Millimetres);
    }

    [Theory]
    [InlineData(LengthUnit.Millimetre, 0.5)]
    [InlineData(LengthUnit.Inch, 12.7)]
    [InlineData(LengthUnit.Mil, 0.0127)]
    public void Read_PlainNumber_IsInTheFieldsUnit(LengthUnit unit, double millimetres)
    {
        Assert.Equal(millimetres, LengthText.Read("0.5", unit).Millimetres);
    }

    [Fact]
    public void Read_MAlone_IsRefusedAsAmbiguous()
    {
        // "m" is milli in engineering notation elsewhere; in a length it could also be metres, so it is refused.
        var reading = LengthText.Read("1m", LengthUnit.Millimetre);

        Assert.Null(reading.Millimetres);
        Assert.Contains("ambiguous", reading.Problem, StringComparison.Ordinal);
        Assert.Equal(1e-3, EngineeringNumber.TryParse("1m", string.Empty));
    }

    [Theory]
    [InlineData("500u")]
    [InlineData("2k")]
    [InlineData("50 µm")]
    [InlineData("1 cm")]
    [InlineData("1 ft")]
    [InlineData("0.5 kg")]
    [InlineData("NaN")]
    [InlineData("1e400")]
    [InlineData("abc")]
    public void Read_NotALength_SaysWhy(string text)
    {
        var reading = LengthText.Read(text, LengthUnit.Millimetre);

        Assert.Null(reading.Millimetres);
        Assert.False(string.IsNullOrWhiteSpace(reading.Problem));
    }

    [Fact]
    public void Read_TypedNumberWithEachSuffix_IsAccepted()
    {
        // Property: whatever number a person types, each unit spelling is read, and the three spellings of the inch agree.
        Gen.Select(LengthGenerators.TypedNumbers, Gen.OneOf("mm", " mm", "in", " in", "\"", " mil", "mils")).Sample((number, suffix) =>
        {
            Assert.True(LengthText.Read(number + suffix, LengthUnit.Millimetre).IsLength, number + suffix);
        });
        LengthGenerators.TypedNumbers.Sample(number =>
        {
            var inch = LengthText.Read(number + " in", LengthUnit.Millimetre).Millimetres;
            Assert.Equal(inch, LengthText.Read(number + "\"", LengthUnit.Millimetre).Millimetres);
            Assert.Equal(inch, LengthText.Read(number, LengthUnit.Inch).Millimetres);
        });
    }

    [Fact]
    public void Read_InchesTyped_EqualsTheExactMillimetresTyped()
    {
        // Property: typing a value in inches stores the same double as typing its exact millimetre equivalent
        // (value × 25.4, computed here in decimal, independently of the code under test).
        LengthGenerators.TypedNumbers.Sample(number =>
        {
            var exactMm = decimal.Parse(number.Replace(',', '.'), CultureInfo.InvariantCulture) * 25.4m;
            var typedMm = LengthText.Read(exactMm.ToString(CultureInfo.InvariantCulture), LengthUnit.Millimetre).Millimetres;
            Assert.Equal(typedMm, LengthText.Read(number + " in", LengthUnit.Millimetre).Millimetres);
        });
    }

    [Fact]
    public void Exact_ReadBackInItsUnit_RoundTripsEveryStoredLength()
    {
        // Property: a stored length written out in inches or mils with all its digits reads back as the same double.
        Gen.Select(LengthGenerators.Millimetres, Gen.OneOf(LengthUnit.Inch, LengthUnit.Mil, LengthUnit.Millimetre)).Sample((mm, unit) =>
        {
            var text = LengthText.Exact(mm, unit) + " " + LengthConversion.Symbol(unit);
            Assert.Equal(mm, LengthText.Read(text, LengthUnit.Millimetre).Millimetres);
        });
    }

    [Fact]
    public void ForDraft_OfAStoredLength_RoundTripsExactly()
    {
        LengthGenerators.Millimetres.Sample(mm => Assert.Equal(mm, LengthText.Read(LengthText.ForDraft(mm), LengthUnit.Millimetre).Millimetres));
    }

    [Fact]
    public void ShowThenType_InEitherSystem_KeepsWhatWasTyped()
    {
        // Property: what is typed into a field (a plain number in the field's unit) is what the field shows back, and the
        // draft it becomes is the same length whichever system shows it.
        Gen.Select(LengthGenerators.TypedNumbers, Gen.OneOf(UnitSystem.Metric, UnitSystem.Imperial)).Sample((number, system) =>
        {
            var draft = LengthText.ForDraft(number, system);
            Assert.Equal(number, LengthText.Show(draft, system));
            var unit = LengthConversion.FieldUnit(system);
            Assert.Equal(LengthText.Read(number, unit).Millimetres, LengthText.Read(draft, LengthUnit.Millimetre).Millimetres);
        });
    }

    [Theory]
    [InlineData("0.5", UnitSystem.Imperial, "0.019685")]
    [InlineData("12.7", UnitSystem.Imperial, "0.5")]
    [InlineData("0.51054", UnitSystem.Imperial, "0.0201")]
    [InlineData("0.0201 in", UnitSystem.Metric, "0.51054")]
    [InlineData("20 mil", UnitSystem.Imperial, "0.02")]
    [InlineData("20 mil", UnitSystem.Metric, "0.508")]
    [InlineData("0,5", UnitSystem.Metric, "0,5")]
    [InlineData("0.5 kg", UnitSystem.Imperial, "0.5 kg")]
    public void Show_DraftInASystem_IsTheNumberInItsFieldUnit(string draft, UnitSystem system, string shown)
    {
        // 0.5 mm = 0.0196850… in (÷ 25.4), shown to six significant digits.
        Assert.Equal(shown, LengthText.Show(draft, system));
    }

    [Fact]
    public void Number_ToSixDigits_IsWithinHalfAUnitOfTheSixthDigit()
    {
        LengthGenerators.Millimetres.Sample(mm =>
        {
            var shown = double.Parse(LengthText.Number(mm, LengthUnit.Inch, 6), CultureInfo.InvariantCulture);
            Assert.InRange(Math.Abs((shown * 25.4) - mm) / mm, 0, 5.0001e-6);
        });
    }

    [Theory]
    [InlineData("0.02", UnitSystem.Imperial, "0.02 in")]
    [InlineData(" 0.02 ", UnitSystem.Imperial, "0.02 in")]
    [InlineData("0.5 mm", UnitSystem.Imperial, "0.5 mm")]
    [InlineData("20 mil", UnitSystem.Imperial, "20 mil")]
    [InlineData("abc", UnitSystem.Imperial, "abc")]
    [InlineData("0.5", UnitSystem.Metric, "0.5")]
    [InlineData("0.02 in", UnitSystem.Metric, "0.02 in")]
    public void ForDraft_Typed_KeepsTheUnitItWasTypedIn(string typed, UnitSystem system, string draft)
    {
        Assert.Equal(draft, LengthText.ForDraft(typed, system));
    }
}
