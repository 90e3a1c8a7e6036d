using System.Net;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using AngleSharp.Dom;
using AngleSharp.Html.Parser;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;
using Winding.Web.Display;
using Winding.Web.Hosting;
using Winding.Web.Planning;
using Winding.Web.Sheets;

namespace Winding.Web.Tests.Api;

public sealed class SheetApiTests : IClassFixture<TempDataFactory>
{
    private readonly TempDataFactory _factory;

    public SheetApiTests(TempDataFactory factory) => _factory = factory;

    public static TheoryData<string> Demos => [.. DemoPlans.All.Select(d => d.Id)];

    [Theory]
    [MemberData(nameof(Demos))]
    public async Task Sheet_EachDemo_NumbersEqualTheEnginesEvaluationFormattedAlike(string demoId)
    {
        // Consistency of presentation, not physics: the oracle is the engine's own evaluation of the same plan
        // (PlanReader + PlanEvaluator with the same catalogue), formatted as the plan page formats it.
        var demo = DemoPlans.Find(demoId)!;
        using var response = await Post(JsonSerializer.Serialize(demo.Document, CatalogueJson.Options));
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/html", response.Content.Headers.ContentType!.MediaType);
        var document = Parse(await response.Content.ReadAsStringAsync());
        var catalogue = _factory.Services.GetRequiredService<CatalogueProvider>().Catalogue;
        var plan = PlanReader.Read(demo.Document, catalogue).Plan!;
        var evaluation = PlanEvaluator.Evaluate(plan);
        var tolerance = plan.Core.Material.AlTolerance;

        Assert.Equal(demo.Document.Name, document.QuerySelector("[data-testid=sheet-title]")!.TextContent);
        Assert.Equal(catalogue.CoresById[demo.Document.Core!.CatalogueId!].Name, Cell(document, "core-core", "dd"));
        Assert.Equal(EngineeringFormat.Format(evaluation.Core.InductanceFactor.HenriesPerTurnSquared, "H") + "/turn² ± " + (tolerance * 100).ToString("0.#", System.Globalization.CultureInfo.InvariantCulture) + " %", Cell(document, "core-al", "dd"));
        for (var i = 0; i < evaluation.Windings.Count; i++)
        {
            var w = evaluation.Windings[i];
            var row = $"winding-{i + 1}";
            Assert.Equal(plan.Windings[i].Name, Cell(document, row, "[data-cell=name]"));
            Assert.Equal(w.Turns.ToString(System.Globalization.CultureInfo.InvariantCulture), Cell(document, row, "[data-cell=turns]"));
            Assert.Equal(EngineeringFormat.Fixed(w.WireLengthM * 1e3, 0, "mm"), Cell(document, row, "[data-cell=length]"));
            Assert.StartsWith(w.Fit.Layers.ToString(System.Globalization.CultureInfo.InvariantCulture), Cell(document, row, "[data-cell=layers]"), StringComparison.Ordinal);
            Assert.Equal(EngineeringFormat.Format(w.InductanceH, "H"), Cell(document, $"check-w{i}-inductance", "[data-cell=expected]"));
            Assert.Equal(EngineeringFormat.Format(w.InductanceH * (1 - tolerance), "H"), Cell(document, $"check-w{i}-inductance", "[data-cell=lower]"));
            Assert.Equal(EngineeringFormat.Format(w.InductanceH * (1 + tolerance), "H"), Cell(document, $"check-w{i}-inductance", "[data-cell=upper]"));
            Assert.Equal(EngineeringFormat.Format(w.DcResistanceOhm, "Ω"), Cell(document, $"check-w{i}-resistance", "[data-cell=expected]"));
        }

        Assert.Equal(EngineeringFormat.Format(evaluation.Parasitics.LeakageInductanceH, "H"), Cell(document, "check-leakage", "[data-cell=expected]"));
        Assert.Equal(EngineeringFormat.Format(evaluation.Parasitics.TransformerSelfResonanceHz!.Value, "Hz"), Cell(document, "check-srf", "[data-cell=expected]"));
        Assert.All(document.QuerySelectorAll("[data-cell=measured]"), c => Assert.Equal(string.Empty, c.TextContent.Trim()));
    }

    [Fact]
    public async Task Sheet_ScriptAndMarkupInEveryName_AreEscapedInTheHtmlAndTheSvg()
    {
        const string planName = "<script>alert(1)</script>\"><img src=x onerror=alert(4)>'";
        const string firstName = "\"><svg onload=alert(2)>";
        const string secondName = "</title><script>alert(3)</script>";
        var body = JsonSerializer.Serialize(new
        {
            name = planName,
            core = new { shape = "toroid", dimensionsMm = new { outerDiameter = 10, innerDiameter = 5, height = 4 }, initialPermeability = 125 },
            windings = new object[]
            {
                new { name = firstName, turns = 10, wire = new { conductorDiameterMm = 0.2 }, taps = new[] { 5 } },
                new { name = secondName, turns = 30, wire = new { conductorDiameterMm = 0.2 }, insulation = new { material = "polyester", thicknessMm = 0.05 } },
            },
            operating = new { minFrequencyHz = 1.8e6, maxFrequencyHz = 30e6, sourceResistanceOhm = 50, loadResistanceOhm = 450, driveVoltageRms = 100 },
        });

        using var response = await Post(body);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var html = await response.Content.ReadAsStringAsync();
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<img", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<svg onload", html, StringComparison.OrdinalIgnoreCase);
        var document = Parse(html);
        Assert.Empty(document.QuerySelectorAll("script, img, iframe, object, embed"));
        Assert.DoesNotContain(document.All.SelectMany(e => e.Attributes), a => a.Name.StartsWith("on", StringComparison.OrdinalIgnoreCase));
        // The names arrive as text: the parsed document shows them character for character.
        Assert.Equal(planName, document.QuerySelector("[data-testid=sheet-title]")!.TextContent);
        Assert.Contains(planName, document.Title, StringComparison.Ordinal);
        Assert.Equal(firstName, Cell(document, "winding-1", "[data-cell=name]"));
        Assert.Equal(secondName, Cell(document, "winding-2", "[data-cell=name]"));
        Assert.Contains(document.QuerySelectorAll("[data-testid=sheet-steps] li"), li => li.TextContent.Contains(firstName, StringComparison.Ordinal));
        Assert.Contains(document.QuerySelectorAll("[data-testid=sheet-cautions] li"), li => li.TextContent.Contains(secondName, StringComparison.Ordinal));

        // The SVG: only the drawing's own elements, and each winding's name as the text of its title.
        var svg = document.QuerySelector("[data-testid=cross-section-svg]")!;
        var allowed = new HashSet<string>(StringComparer.OrdinalIgnoreCase) { "svg", "title", "rect", "circle", "path", "g", "line", "text" };
        Assert.All(svg.QuerySelectorAll("*"), e => Assert.Contains(e.LocalName, allowed));
        Assert.Equal(firstName, svg.QuerySelector("[data-winding='0'] > title")!.TextContent);
        Assert.Equal(secondName, svg.QuerySelector("[data-winding='1'] > title")!.TextContent);
    }

    [Fact]
    public async Task Sheet_PaperLetter_WritesTheLetterPageSize()
    {
        using var response = await Post(Demo("club-long-wire-receive"), "?format=html&paper=letter");

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("@page { size: letter portrait;", html, StringComparison.Ordinal);
        Assert.Equal("letter", Parse(html).QuerySelector("[data-testid=bench-sheet]")!.GetAttribute("data-paper"));
    }

    [Fact]
    public async Task Sheet_NoQuery_IsHtmlOnA4WithItsStylesInlined()
    {
        using var response = await Post(Demo("club-long-wire-receive"), string.Empty);

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.StartsWith("<!DOCTYPE html>", html, StringComparison.Ordinal);
        Assert.Contains("@page { size: A4 portrait;", html, StringComparison.Ordinal);
        var document = Parse(html);
        Assert.Contains(".bench-sheet", document.QuerySelector("head > style")!.TextContent, StringComparison.Ordinal);
        Assert.Empty(document.QuerySelectorAll("link, script"));
    }

    [Theory]
    [InlineData("?format=xml", "format")]
    [InlineData("?paper=a3", "paper")]
    public async Task Sheet_UnknownFormatOrPaper_Is400NamingTheField(string query, string field)
    {
        using var response = await Post(Demo("club-long-wire-receive"), query);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.True(json.RootElement.GetProperty("errors").TryGetProperty(field, out _));
    }

    [Fact]
    public async Task Sheet_InvalidPlan_Is400WithTheSameFieldErrorsAsEvaluate()
    {
        const string body = """{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": -4, "wire": { "conductorDiameterMm": 0.2 } } ] }""";

        using var response = await Post(body);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.True(json.RootElement.GetProperty("errors").TryGetProperty("windings[0].turns", out _));
    }

    [Fact]
    public async Task Sheet_PdfWithoutAPrinter_Is503WithAClearMessage()
    {
        using var factory = _factory.WithWebHostBuilder(b => b.ConfigureTestServices(s => s.RemoveAll<ISheetPdfPrinter>()));
        using var client = factory.CreateClient();
        using var content = new StringContent(Demo("club-long-wire-receive"), Encoding.UTF8, "application/json");

        using var response = await client.PostAsync(new Uri("/api/v1/sheet?format=pdf", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.ServiceUnavailable, response.StatusCode);
        Assert.Contains("no PDF printer", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Sheet_PdfWithChromiumMissing_Is503NamingThePathTried()
    {
        var missing = Path.Combine(Path.GetTempPath(), "winding-no-such-chromium", "chromium");
        using var factory = _factory.WithWebHostBuilder(b => b.UseSetting("Winding:ChromiumPath", missing));
        using var client = factory.CreateClient();
        using var content = new StringContent(Demo("club-long-wire-receive"), Encoding.UTF8, "application/json");

        using var response = await client.PostAsync(new Uri("/api/v1/sheet?format=pdf", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.ServiceUnavailable, response.StatusCode);
        Assert.Contains(missing, await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Sheet_PdfWithAPrinter_HandsItTheHtmlAndPaperAndReturnsItsBytes()
    {
        var printer = new RecordingPrinter();
        using var factory = _factory.WithWebHostBuilder(b => b.ConfigureTestServices(s => s.AddSingleton<ISheetPdfPrinter>(printer)));
        using var client = factory.CreateClient();
        using var content = new StringContent(Demo("club-gate-drive"), Encoding.UTF8, "application/json");

        using var response = await client.PostAsync(new Uri("/api/v1/sheet?format=pdf&paper=letter", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType!.MediaType);
        Assert.Equal(RecordingPrinter.Bytes, await response.Content.ReadAsByteArrayAsync());
        Assert.Equal(SheetPaper.Letter, printer.Paper);
        Assert.Contains("Club gate-drive transformer 1:1", printer.Html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Sheet_PrinterFails_Is503WithItsMessage()
    {
        using var factory = _factory.WithWebHostBuilder(b => b.ConfigureTestServices(s => s.AddSingleton<ISheetPdfPrinter>(new FailingPrinter())));
        using var client = factory.CreateClient();
        using var content = new StringContent(Demo("club-gate-drive"), Encoding.UTF8, "application/json");

        using var response = await client.PostAsync(new Uri("/api/v1/sheet?format=pdf", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.ServiceUnavailable, response.StatusCode);
        Assert.Contains("Chromium was not found", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task OpenApiDocument_DescribesTheSheetEndpoint()
    {
        using var client = _factory.CreateClient();

        var document = await client.GetFromJsonAsync<JsonElement>(new Uri("/openapi/v1.json", UriKind.Relative));

        Assert.True(document.GetProperty("paths").TryGetProperty("/api/v1/sheet", out var path));
        var post = path.GetProperty("post");
        Assert.Contains(post.GetProperty("parameters").EnumerateArray(), p => p.GetProperty("name").GetString() == "format");
        Assert.Contains(post.GetProperty("parameters").EnumerateArray(), p => p.GetProperty("name").GetString() == "paper");
        Assert.True(post.GetProperty("responses").GetProperty("200").GetProperty("content").TryGetProperty("text/html", out _));
    }

    private static string Demo(string id) => JsonSerializer.Serialize(DemoPlans.Find(id)!.Document, CatalogueJson.Options);

    private static IDocument Parse(string html) => new HtmlParser().ParseDocument(html);

    private static string Cell(IDocument document, string testId, string selector) =>
        document.QuerySelector($"[data-testid={testId}]")!.QuerySelector(selector)!.TextContent.Trim();

    private async Task<HttpResponseMessage> Post(string json, string query = "?format=html")
    {
        using var client = _factory.CreateClient();
        using var content = new StringContent(json, Encoding.UTF8, "application/json");
        return await client.PostAsync(new Uri("/api/v1/sheet" + query, UriKind.Relative), content);
    }

    /// <summary>A test double that records what the endpoint hands a printer.</summary>
    private sealed class RecordingPrinter : ISheetPdfPrinter
    {
        public static byte[] Bytes { get; } = Encoding.ASCII.GetBytes("%PDF-1.7 test double");

        public string Html { get; private set; } = string.Empty;

        public SheetPaper Paper { get; private set; }

        public Task<byte[]> PrintAsync(string html, SheetPaper paper, CancellationToken ct)
        {
            Html = html;
            Paper = paper;
            return Task.FromResult(Bytes);
        }
    }

    private sealed class FailingPrinter : ISheetPdfPrinter
    {
        public Task<byte[]> PrintAsync(string html, SheetPaper paper, CancellationToken ct) =>
            throw new SheetPrintException("Chromium was not found at /usr/bin/chromium.");
    }
}
