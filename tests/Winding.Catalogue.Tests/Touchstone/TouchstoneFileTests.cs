using System.Numerics;
using System.Text;
using Winding.Catalogue.Touchstone;

namespace Winding.Catalogue.Tests.Touchstone;

/// <summary>
/// Reading one-port Touchstone version 1 files (Touchstone File Format Specification 1.1, from memory): every option-line
/// variant against impedances worked out by hand in the comments (Z = R·(1 + Γ)/(1 − Γ) for S; Z = R·z and Z = R/y
/// for the normalised Z and Y of version 1 files), and malformed files against the line the error names. Hand values
/// carry 6 to 8 significant figures, hence a relative tolerance of 1e-6.
/// </summary>
public sealed class TouchstoneFileTests
{
    [Fact]
    public void Parse_MegahertzScatteringRealImaginary_ConvertsReflectionToImpedance()
    {
        // Γ = 0.6: Z = 50·1.6/0.4 = 200 Ω. Γ = j0.6: Z = 50·(1 + j0.6)²/(1 + 0.36) = 50·(0.64 + j1.2)/1.36
        // = 23.529412 + j44.117647 Ω.
        var file = ParseValid("# MHz S RI R 50\n1 0.6 0\n2 0 0.6\n");

        Assert.Equal(TouchstoneOptions.Default with { FrequencyUnit = TouchstoneFrequencyUnit.MHz, Format = TouchstoneDataFormat.RealImaginary }, file.Options);
        Assert.Equal([1e6, 2e6], file.Points.Select(p => p.FrequencyHz));
        AssertImpedance(new Complex(200, 0), file.Points[0].ImpedanceOhm);
        AssertImpedance(new Complex(23.529412, 44.117647), file.Points[1].ImpedanceOhm);
    }

    [Fact]
    public void Parse_ScatteringMagnitudeAngle_NonRightAngle()
    {
        // Γ = 0.3 ∠ 45° = 0.2121320 + j0.2121320; (1 + Γ)·conj(1 − Γ) = 0.910000 + j0.424264, |1 − Γ|² = 0.665736,
        // so Z = 50·(1.366908 + j0.637286) = 68.3454 + j31.8643 Ω.
        var file = ParseValid("# kHz S MA R 50\n250 0.3 45\n");

        Assert.Equal(250e3, file.Points[0].FrequencyHz);
        AssertImpedance(new Complex(68.3454, 31.8643), file.Points[0].ImpedanceOhm, 2e-6);
    }

    [Fact]
    public void Parse_SpecificationZExample_IsNormalisedToR()
    {
        // The specification's version 1 example "# MHz Z MA R 75", 100 MHz 0.99 ∠ −4° (from memory), is 0.99·75 = 74.25 Ω
        // ∠ −4°: 74.25·cos 4° − j74.25·sin 4° = 74.069131 − j5.179418 Ω.
        var file = ParseValid("!1-port Z-parameter file\n# MHz Z MA R 75\n!freq magZ11 angZ11\n100 0.99 -4\n200 0.80 -22\n");

        Assert.Equal(TouchstoneParameter.Impedance, file.Options.Parameter);
        Assert.Equal(75, file.Options.ReferenceResistanceOhm);
        Assert.Equal(100e6, file.Points[0].FrequencyHz);
        AssertImpedance(new Complex(74.069131, -5.179418), file.Points[0].ImpedanceOhm);
        Assert.Equal(60, file.Points[1].ImpedanceOhm.Magnitude, 1e-9);
    }

    [Fact]
    public void Parse_HertzAdmittanceRealImaginary_InvertsTheNormalisedAdmittance()
    {
        // y = 0.5 − j0.5 normalised to 50 Ω: Z = 50/(0.5 − j0.5) = 50·(0.5 + j0.5)/0.5 = 50 + j50 Ω. 1.0E+03 Hz = 1 kHz.
        var file = ParseValid("# Hz Y RI R 50\n1.0E+03 0.5 -0.5\n");

        Assert.Equal(1e3, file.Points[0].FrequencyHz);
        AssertImpedance(new Complex(50, 50), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_GigahertzScatteringDecibel_ConvertsDecibelsToMagnitude()
    {
        // −6.020599913 dB = 10^(−0.30103) = 0.5; ∠180° gives Γ = −0.5, Z = 50·0.5/1.5 = 16.666667 Ω.
        var file = ParseValid("# GHz S DB R 50\n1 -6.020599913 180\n");

        Assert.Equal(1e9, file.Points[0].FrequencyHz);
        AssertImpedance(new Complex(16.666667, 0), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_ImpedanceDecibel_RightAngle()
    {
        // z = 0 dB ∠ 90° = j, so Z = j50 Ω.
        var file = ParseValid("# MHz Z DB R 50\n3 0 90\n");

        AssertImpedance(new Complex(0, 50), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_ReferenceOtherThan50_UsesIt()
    {
        // Γ = 0.2 against 75 Ω: Z = 75·1.2/0.8 = 112.5 Ω.
        var file = ParseValid("# MHz S MA R 75\n1 0.2 0\n");

        AssertImpedance(new Complex(112.5, 0), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_NoOptionLine_UsesGigahertzScatteringMagnitudeAngle50()
    {
        // Defaults GHz S MA R 50: 0.5 GHz, Γ = 0.2 ∠ 90° = j0.2: Z = 50·(1 + j0.2)²/1.04 = 50·(0.96 + j0.4)/1.04
        // = 46.153846 + j19.230769 Ω.
        var file = ParseValid("0.5 0.2 90\n");

        Assert.False(file.HasOptionLine);
        Assert.Equal(TouchstoneOptions.Default, file.Options);
        Assert.Equal(5e8, file.Points[0].FrequencyHz);
        AssertImpedance(new Complex(46.153846, 19.230769), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_PartialLowerCaseOptionLine_FillsTheRestWithDefaults()
    {
        // "# mhz ri": S and R 50 by default; Γ = 0 is the matched load, Z = 50 Ω.
        var file = ParseValid("# mhz ri\n10 0 0\n");

        Assert.Equal(new TouchstoneOptions(TouchstoneFrequencyUnit.MHz, TouchstoneParameter.Scattering, TouchstoneDataFormat.RealImaginary, 50), file.Options);
        AssertImpedance(new Complex(50, 0), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_OptionsInAnyOrder()
    {
        // "# R 25 Z RI khz": z = 2 − j1 normalised to 25 Ω, Z = 50 − j25 Ω at 1 kHz.
        var file = ParseValid("# R 25 Z RI khz\n1 2 -1\n");

        Assert.Equal(1e3, file.Points[0].FrequencyHz);
        AssertImpedance(new Complex(50, -25), file.Points[0].ImpedanceOhm);
    }

    [Fact]
    public void Parse_CommentsBlankLinesTabsAndCrLf_AreIgnored()
    {
        // Z RI R 50: z = 1 + j1 → 50 + j50 Ω; z = 2 → 100 Ω. Line numbers count every physical line.
        var text = "! measured on the bench\r\n\r\n# MHz Z RI R 50 ! option line comment\r\n  ! indented comment\r\n1\t1\t1 ! first\r\n\r\n2 2 0\r\n";
        var file = ParseValid(text);

        Assert.Equal(2, file.Points.Count);
        AssertImpedance(new Complex(50, 50), file.Points[0].ImpedanceOhm);
        AssertImpedance(new Complex(100, 0), file.Points[1].ImpedanceOhm);
        Assert.Equal([5, 7], file.Points.Select(p => p.LineNumber));
        Assert.Equal([(1e6, new Complex(50, 50)), (2e6, new Complex(100, 0))], file.Impedances());
    }

    [Theory]
    [InlineData("# MHz S RI\n1 0.5\n", 2, "Expected 3 numbers")]
    [InlineData("# MHz S RI\n1 0.5 0 0.1 0 0.1 0 0.5 0\n", 2, "two-port")]
    [InlineData("# MHz S RI\n1 0.5 abc\n", 2, "'abc' is not a number")]
    [InlineData("# MHz S RI\n1 0,5 0\n", 2, "'0,5' is not a number")]
    [InlineData("# MHz S RI\n1 NaN 0\n", 2, "'NaN' is not a number")]
    [InlineData("# MHz S RI\n! c\n# MHz S RI\n1 0 0\n", 3, "second option line")]
    [InlineData("1 0.5 0\n# MHz S RI\n", 2, "after data")]
    [InlineData("# MHz S RI\n1 0 0\n2 0 0\n2 0 0\n", 4, "Frequencies must increase")]
    [InlineData("# MHz S RI\n2 0 0\n1 0 0\n", 3, "Frequencies must increase")]
    [InlineData("# MHz S RI\n1 0.5 0\n2 1 0\n", 3, "open circuit")]
    [InlineData("# MHz S MA\n1 1 360\n", 2, "open circuit")]
    [InlineData("# MHz Y RI\n1 0 0\n", 2, "open circuit")]
    [InlineData("# MHz S MA\n1 -0.5 0\n", 2, "must not be negative")]
    [InlineData("# MHz S RI\n-1 0 0\n", 2, "at least 0")]
    [InlineData("# MHz S XX\n1 0 0\n", 1, "'XX' is not an option")]
    [InlineData("# MHz H RI\n1 0 0\n", 1, "two-ports")]
    [InlineData("# MHz S RI R\n1 0 0\n", 1, "'R' must be followed")]
    [InlineData("# MHz S RI R -50\n1 0 0\n", 1, "'R' must be followed")]
    [InlineData("# MHz GHz S RI\n1 0 0\n", 1, "twice")]
    [InlineData("[Version] 2.0\n# MHz S RI\n1 0 0\n", 1, "version 2")]
    public void Parse_Malformed_NamesTheLine(string text, int lineNumber, string reasonPart)
    {
        var result = TouchstoneFile.Parse(text);

        Assert.False(result.IsValid);
        Assert.Null(result.File);
        Assert.Equal(lineNumber, result.Error!.LineNumber);
        Assert.Contains(reasonPart, result.Error.Reason, StringComparison.OrdinalIgnoreCase);
    }

    [Theory]
    [InlineData("")]
    [InlineData("! only a comment\n\n")]
    [InlineData("# MHz S RI R 50\n")]
    public void Parse_NoData_IsAnErrorOfTheWholeFile(string text)
    {
        var result = TouchstoneFile.Parse(text);

        Assert.False(result.IsValid);
        Assert.Null(result.Error!.LineNumber);
        Assert.Contains("no data", result.Error.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_LargerThanTwoMegabytes_IsRefusedWithAClearMessage()
    {
        var result = TouchstoneFile.Parse(new string(' ', TouchstoneFile.MaximumCharacters + 1));

        Assert.Null(result.Error!.LineNumber);
        Assert.Contains("at most 2 MB", result.Error.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_MoreThanTheMaximumPoints_NamesTheFirstLineTooMany()
    {
        var text = new StringBuilder("# Hz S RI\n");
        for (var i = 1; i <= TouchstoneFile.MaximumPoints + 1; i++)
        {
            text.Append(i).Append(" 0 0\n");
        }

        var result = TouchstoneFile.Parse(text.ToString());

        Assert.Equal(TouchstoneFile.MaximumPoints + 2, result.Error!.LineNumber);
        Assert.Contains("100000", result.Error.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_ExactlyTheMaximumPoints_IsAccepted()
    {
        var text = new StringBuilder("# Hz S RI\n");
        for (var i = 1; i <= TouchstoneFile.MaximumPoints; i++)
        {
            text.Append(i).Append(" 0 0\n");
        }

        Assert.Equal(TouchstoneFile.MaximumPoints, TouchstoneFile.Parse(text.ToString()).File!.Points.Count);
    }

    private static TouchstoneFile ParseValid(string text)
    {
        var result = TouchstoneFile.Parse(text);
        Assert.True(result.IsValid, result.Error?.Reason);
        return result.File!;
    }

    private static void AssertImpedance(Complex expected, Complex actual, double relative = 1e-6)
    {
        var tolerance = relative * Math.Max(1, expected.Magnitude);
        Assert.True(Complex.Abs(actual - expected) <= tolerance, $"expected {expected}, got {actual}");
    }
}
