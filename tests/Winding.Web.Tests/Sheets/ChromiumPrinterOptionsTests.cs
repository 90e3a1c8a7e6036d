using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Sheets;

/// <summary>Where the printer finds Chromium and how long it waits, from configuration; and its registration in the app.</summary>
public sealed class ChromiumPrinterOptionsTests
{
    [Fact]
    public void FromConfiguration_Nothing_IsDebiansChromiumAnd30Seconds()
    {
        var options = ChromiumPrinterOptions.FromConfiguration(Configuration());

        Assert.Equal("/usr/bin/chromium", options.ExecutablePath);
        Assert.Equal(TimeSpan.FromSeconds(30), options.Timeout);
    }

    [Fact]
    public void FromConfiguration_EnvironmentVariable_IsUsed() =>
        Assert.Equal("/opt/chromium/chrome", ChromiumPrinterOptions.FromConfiguration(Configuration(("WINDING_CHROMIUM", "/opt/chromium/chrome"))).ExecutablePath);

    [Fact]
    public void FromConfiguration_ConfigurationKey_WinsOverTheVariable()
    {
        var options = ChromiumPrinterOptions.FromConfiguration(Configuration(("WINDING_CHROMIUM", "/opt/a"), ("Winding:ChromiumPath", "/opt/b"), ("Winding:PdfTimeoutSeconds", "12.5")));

        Assert.Equal("/opt/b", options.ExecutablePath);
        Assert.Equal(TimeSpan.FromSeconds(12.5), options.Timeout);
    }

    [Theory]
    [InlineData("soon")]
    [InlineData("0")]
    [InlineData("601")]
    public void FromConfiguration_BadTimeout_NamesTheKey(string value)
    {
        var failure = Assert.Throws<InvalidOperationException>(() => ChromiumPrinterOptions.FromConfiguration(Configuration(("Winding:PdfTimeoutSeconds", value))));

        Assert.Contains("Winding:PdfTimeoutSeconds", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task App_RegistersTheChromiumPrinterWithTheConfiguredPath()
    {
        await using var factory = new WebApplicationFactory<Program>().WithWebHostBuilder(b => b.UseSetting("Winding:ChromiumPath", "/nowhere/chromium"));

        var printer = factory.Services.GetRequiredService<ISheetPdfPrinter>();

        var failure = await Assert.ThrowsAsync<PdfPrinterUnavailableException>(() => printer.PrintAsync("<p>x</p>", SheetPaper.A4, CancellationToken.None));
        Assert.Equal("PDF printing needs Chromium at /nowhere/chromium; it was not found.", failure.Message);
        Assert.Same(printer, factory.Services.GetRequiredService<ISheetPdfPrinter>());
    }

    private static IConfiguration Configuration(params (string Key, string Value)[] values) =>
        new ConfigurationBuilder().AddInMemoryCollection(values.Select(v => new KeyValuePair<string, string?>(v.Key, v.Value))).Build();
}
