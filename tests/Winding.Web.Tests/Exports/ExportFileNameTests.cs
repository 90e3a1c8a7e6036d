using Winding.Web.Exports;

namespace Winding.Web.Tests.Exports;

public sealed class ExportFileNameTests
{
    [Theory]
    [InlineData("club 1:9 unun", "csv", "club-19-unun.csv")]
    [InlineData("../../etc/passwd", "csv", "etcpasswd.csv")]
    [InlineData("a \"quoted\"\r\nname", "json", "a-quotedname.json")]
    [InlineData("<script>alert(1)</script>", "csv", "scriptalert1script.csv")]
    [InlineData("μi 125 sleeve", "csv", "μi-125-sleeve.csv")]
    [InlineData("", "csv", "plan.csv")]
    [InlineData("   ", "csv", "plan.csv")]
    [InlineData(null, "csv", "plan.csv")]
    [InlineData("/:*?", "csv", "plan.csv")]
    public void For_KeepsLettersDigitsAndHyphens(string? name, string extension, string expected) => Assert.Equal(expected, ExportFileName.For(name, extension));

    [Fact]
    public void For_LongName_IsCut()
    {
        var name = ExportFileName.For(new string('a', 79) + " b" + new string('c', 50), "csv");

        Assert.Equal(new string('a', 79) + ".csv", name);
    }
}
