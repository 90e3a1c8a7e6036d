using Winding.Web.Sheets;

namespace Winding.Web.Tests.Sheets;

/// <summary>Where the page-size rule goes. The size keywords are those of CSS Paged Media Level 3 (page size, "A4", "letter").</summary>
public sealed class PageSizeStyleTests
{
    [Theory]
    [InlineData(SheetPaper.A4, "A4")]
    [InlineData(SheetPaper.Letter, "letter")]
    public void Keyword_IsTheCssPageSizeName(SheetPaper paper, string keyword) => Assert.Equal(keyword, PageSizeStyle.Keyword(paper));

    [Fact]
    public void Apply_WithHead_PutsTheRuleLastInTheHead()
    {
        var html = PageSizeStyle.Apply("<!DOCTYPE html><html><head><title>t</title></HEAD><body>x</body></html>", SheetPaper.A4);

        Assert.Equal("<!DOCTYPE html><html><head><title>t</title><style>@page { size: A4 !important; }</style></HEAD><body>x</body></html>", html);
    }

    [Fact]
    public void Apply_WithBodyOnly_PutsTheRuleBeforeTheBody()
    {
        var html = PageSizeStyle.Apply("<!doctype html><body>x</body>", SheetPaper.Letter);

        Assert.Equal("<!doctype html><style>@page { size: letter !important; }</style><body>x</body>", html);
    }

    [Fact]
    public void Apply_FragmentAfterDoctype_KeepsTheDoctypeFirst()
    {
        var html = PageSizeStyle.Apply("  <!DOCTYPE html><p>x</p>", SheetPaper.A4);

        Assert.StartsWith("  <!DOCTYPE html><style>", html, StringComparison.Ordinal);
        Assert.EndsWith("</style><p>x</p>", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Apply_BareFragment_PutsTheRuleFirst() =>
        Assert.Equal("<style>@page { size: A4 !important; }</style><p>x</p>", PageSizeStyle.Apply("<p>x</p>", SheetPaper.A4));
}
