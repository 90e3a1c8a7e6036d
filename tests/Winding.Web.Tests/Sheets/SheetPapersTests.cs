using Winding.Web.Sheets;

namespace Winding.Web.Tests.Sheets;

public sealed class SheetPapersTests
{
    [Theory]
    [InlineData(null, SheetPaper.A4)]
    [InlineData("", SheetPaper.A4)]
    [InlineData("a4", SheetPaper.A4)]
    [InlineData("A4", SheetPaper.A4)]
    [InlineData(" Letter ", SheetPaper.Letter)]
    public void TryParse_KnownWords_GiveThePaper(string? text, SheetPaper expected)
    {
        Assert.True(SheetPapers.TryParse(text, out var paper));
        Assert.Equal(expected, paper);
    }

    [Theory]
    [InlineData("a3")]
    [InlineData("legal")]
    public void TryParse_OtherWords_AreRefused(string text) => Assert.False(SheetPapers.TryParse(text, out _));

    [Fact]
    public void PageRule_IsTheCssPageSize()
    {
        // CSS Paged Media: size accepts the page-size names A4 and letter (W3C css-page-3).
        Assert.Equal("@page { size: A4 portrait; margin: 10mm; }", SheetPapers.PageRule(SheetPaper.A4));
        Assert.Equal("@page { size: letter portrait; margin: 10mm; }", SheetPapers.PageRule(SheetPaper.Letter));
    }
}
