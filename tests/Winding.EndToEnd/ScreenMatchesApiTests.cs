using System.Globalization;
using System.Text;
using System.Text.Json;
using Microsoft.Playwright;
using Winding.Catalogue.Loading;
using Winding.Web.Display;
using Winding.Web.Planning;

namespace Winding.EndToEnd;

/// <summary>
/// Every figure the plan page shows for a plan is the figure the HTTP API answers for the same plan: each demo plan is
/// opened in the browser, its document is sent to <c>POST /api/v1/evaluate</c>, and each result cell on screen is
/// compared with the API's number written the way the page writes it (metric).
/// </summary>
public sealed class ScreenMatchesApiTests : IClassFixture<ServerFixture>
{
    private readonly ServerFixture _server;

    public ScreenMatchesApiTests(ServerFixture server) => _server = server;

    [SkippableFact]
    public async Task EveryDemoPlan_EveryResultOnScreen_EqualsTheApisFigure()
    {
        await using var session = await BrowserSession.StartAsync();
        var compared = 0;
        foreach (var demo in DemoPlans.All)
        {
            var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan?demo=" + demo.Id));
            await Assertions.Expect(page.Locator("[data-testid=value-w0-inductance]")).ToBeVisibleAsync();

            compared += await CompareWithTheApi(page, demo.Id, JsonSerializer.Serialize(demo.Document, CatalogueJson.Options));
            await page.CloseAsync();
        }

        // Five demo plans, each with a core, two or more windings and a band: well over a hundred figures.
        Assert.True(compared > 100, $"only {compared} figures were compared");
    }

    [SkippableFact]
    public async Task EditedPlan_ResultsAndTheRedrawnChart_EqualTheApisAnswerForTheEditedPlan()
    {
        await using var session = await BrowserSession.StartAsync();
        var page = await session.OpenInteractiveAsync(new Uri(_server.BaseAddress, "/plan?demo=club-end-fed-unun"));
        await Assertions.Expect(page.Locator("[data-testid=value-w0-inductance]")).ToBeVisibleAsync();
        var chart = page.Locator("[data-testid=response-chart]");
        await Assertions.Expect(chart.Locator("canvas")).ToBeVisibleAsync();
        await page.WaitForFunctionAsync("() => document.querySelector('[data-testid=response-chart]').windingChart !== undefined");
        var before = await chart.EvaluateAsync<double>("el => el.windingChart.series[0].values[0]");

        // Same 1:9 ratio, more turns: the chart's low end must move (more magnetising reactance).
        await page.Locator("#windings-0-turns").FillAsync("6");
        await Assertions.Expect(page.Locator("[data-testid=value-w0-turns-per-layer]")).ToHaveTextAsync("6");
        await page.Locator("#windings-1-turns").FillAsync("18");
        await page.Locator("#windings-1-turns").BlurAsync();
        await Assertions.Expect(page.Locator("[data-testid=value-w1-turns-per-layer]")).ToHaveTextAsync("18");
        await page.WaitForFunctionAsync("before => document.querySelector('[data-testid=response-chart]').windingChart.series[0].values[0] !== before", before);

        var demo = DemoPlans.Find("club-end-fed-unun")!;
        var edited = JsonSerializer.SerializeToNode(demo.Document, CatalogueJson.Options)!;
        edited["windings"]![0]!["turns"] = 6;
        edited["windings"]![1]!["turns"] = 18;
        var compared = await CompareWithTheApi(page, "edited end-fed demo", edited.ToJsonString());
        Assert.True(compared > 30, $"only {compared} figures were compared");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ServerFixture.ArtefactDirectory, "plan-edited-matches-api.png"), FullPage = true });
    }

    /// <summary>
    /// Sends <paramref name="planJson"/> to the API and compares every result cell and both traces of the plan's
    /// response chart with its answer. Returns how many figures were compared.
    /// </summary>
    private async Task<int> CompareWithTheApi(IPage page, string what, string planJson)
    {
        using var client = _server.CreateClient();
        using var content = new StringContent(planJson, Encoding.UTF8, "application/json");
        using var response = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), content);
        response.EnsureSuccessStatusCode();
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());

        var onScreen = await page.Locator("[data-testid^=value-]").EvaluateAllAsync<Dictionary<string, string>>(
            "cells => Object.fromEntries(cells.map(c => [c.dataset.testid.substring(6), c.textContent.trim()]))");
        var compared = 0;
        foreach (var (key, expected, whole) in Expected(json.RootElement))
        {
            Assert.True(onScreen.TryGetValue(key, out var shown), $"{what}: the page shows no '{key}' although the API answers {expected}");
            if (whole)
            {
                Assert.True(expected == shown, $"{what}, {key}: page '{shown}', API '{expected}'");
            }
            else
            {
                Assert.True(shown!.StartsWith(expected, StringComparison.Ordinal), $"{what}, {key}: page '{shown}' does not start with the API's '{expected}'");
            }

            compared++;
        }

        if (json.RootElement.TryGetProperty("sweep", out var sweep) && sweep.ValueKind == JsonValueKind.Array)
        {
            // The plan's own series are the chart's first two: insertion loss and return loss at the sweep's frequencies
            // (as plotted: the values the chart module handed to uPlot).
            var chart = page.Locator("[data-testid=response-chart]");
            await page.WaitForFunctionAsync("() => document.querySelector('[data-testid=response-chart]').windingChart !== undefined");
            var traces = await chart.EvaluateAsync<double[][]>(
                "el => [el.windingChart.x, el.windingChart.series[0].values, el.windingChart.series[1].values].map(a => Array.from(a, Number))");
            var points = sweep.EnumerateArray().ToArray();
            Assert.Equal(points.Length, traces[0].Length);
            for (var i = 0; i < points.Length; i++)
            {
                Assert.Equal(points[i].GetProperty("frequencyHz").GetDouble(), traces[0][i], 9);
                Assert.Equal(points[i].GetProperty("insertionLossDb").GetDouble(), traces[1][i], 9);
                Assert.Equal(points[i].GetProperty("returnLossDb").GetDouble(), traces[2][i], 9);
            }

            compared += 3 * points.Length;
        }

        return compared;
    }

    /// <summary>The cells the page must show for the API's answer: (cell key, text, whole cell or its beginning).</summary>
    private static IEnumerable<(string Key, string Text, bool Whole)> Expected(JsonElement api)
    {
        const UnitSystem metric = UnitSystem.Metric;
        var core = api.GetProperty("core");
        yield return ("al", EngineeringFormat.Format(core.GetProperty("alH").GetDouble(), "H") + "/turn² ± ", false);
        yield return ("mue", Fixed(core.GetProperty("effectivePermeability").GetDouble(), 1), true);
        yield return ("le", LengthFormat.Dimension(core.GetProperty("effectiveLengthM").GetDouble() * 1e3, metric, 2), true);
        yield return ("ae", LengthFormat.Area(core.GetProperty("effectiveAreaM2").GetDouble() * 1e6, metric, 2), true);
        yield return ("ve", LengthFormat.Volume(core.GetProperty("effectiveVolumeM3").GetDouble() * 1e9, metric, 0), true);
        yield return ("window", LengthFormat.Area(core.GetProperty("windowAreaM2").GetDouble() * 1e6, metric, 2), true);

        var windings = api.GetProperty("windings");
        for (var i = 0; i < windings.GetArrayLength(); i++)
        {
            var w = windings[i];
            var k = $"w{i}-";
            yield return (k + "inductance", EngineeringFormat.Format(w.GetProperty("inductanceH").GetDouble(), "H"), true);
            yield return (k + "layers", w.GetProperty("layers").GetInt32().ToString(CultureInfo.InvariantCulture), true);
            yield return (k + "turns-per-layer", string.Join(" + ", w.GetProperty("turnsPerLayer").EnumerateArray().Select(t => t.GetInt32().ToString(CultureInfo.InvariantCulture))), true);
            yield return (k + "fits", w.GetProperty("fitOutcome").GetString() switch { "fits" => "fits", "tight" => "tight", _ => "does not fit" } + " — " + w.GetProperty("fitReason").GetString(), true);
            yield return (k + "fill", Fixed(w.GetProperty("fillFactor").GetDouble() * 100, 1) + " %", true);
            yield return (k + "mlt", LengthFormat.Dimension(w.GetProperty("meanTurnLengthM").GetDouble() * 1e3, metric, 1), true);
            yield return (k + "wire-length", LengthFormat.CutLength(w.GetProperty("wireLengthM").GetDouble() * 1e3, metric), true);
            yield return (k + "rdc", EngineeringFormat.Format(w.GetProperty("dcResistanceOhm").GetDouble(), "Ω"), true);
            if (Number(w, "remainingHoleDiameterM") is { } hole)
            {
                yield return (k + "hole-left", LengthFormat.Dimension(hole * 1e3, metric, 2), true);
            }

            if (Number(w, "acResistanceOhm") is { } rac)
            {
                yield return (k + "rac", EngineeringFormat.Format(rac, "Ω") + " (×", false);
                yield return (k + "current", EngineeringFormat.Format(w.GetProperty("rmsCurrentA").GetDouble(), "A"), false);
                yield return (k + "copper-loss", EngineeringFormat.Format(w.GetProperty("copperLossW").GetDouble(), "W"), true);
            }

            var self = EngineeringFormat.Format(w.GetProperty("selfCapacitanceF").GetDouble(), "F");
            yield return (k + "self-capacitance", Number(w, "selfResonanceHz") is { } srf ? self + " · resonates at " + EngineeringFormat.Format(srf, "Hz") : self, true);
        }

        if (Number(api, "turnsRatio") is { } ratio)
        {
            yield return ("turns-ratio", "1 : " + ratio.ToString("G4", CultureInfo.InvariantCulture), true);
            yield return ("impedance-ratio", "1 : " + api.GetProperty("impedanceRatio").GetDouble().ToString("G4", CultureInfo.InvariantCulture), true);
        }

        if (windings.GetArrayLength() > 1)
        {
            yield return ("leakage", EngineeringFormat.Format(api.GetProperty("leakageInductanceH").GetDouble(), "H"), true);
            yield return ("interwinding", EngineeringFormat.Format(api.GetProperty("interwindingCapacitanceF").GetDouble(), "F"), true);
        }

        if (api.TryGetProperty("parasitics", out var parasitics) && Number(parasitics, "transformerSelfResonanceHz") is { } transformer)
        {
            yield return ("transformer-srf", EngineeringFormat.Format(transformer, "Hz"), true);
        }

        if (api.TryGetProperty("magnetizing", out var m) && m.ValueKind == JsonValueKind.Object)
        {
            yield return ("magnetizing", EngineeringFormat.Format(api.GetProperty("magnetizingInductanceH").GetDouble(), "H"), true);
            yield return ("reactance", Fixed(m.GetProperty("reactanceOhm").GetDouble(), 1) + " Ω against " + Fixed(m.GetProperty("reactanceFactor").GetDouble() * m.GetProperty("impedanceSeenOhm").GetDouble(), 1) + " Ω wanted", true);
            yield return ("turns-needed", m.GetProperty("primaryTurnsNeeded").GetInt32().ToString(CultureInfo.InvariantCulture), true);
        }

        if (api.TryGetProperty("band", out var band) && band.ValueKind == JsonValueKind.Object)
        {
            yield return ("min-loss", Fixed(band.GetProperty("minimumInsertionLossDb").GetDouble(), 2) + " dB at ", false);
            yield return ("band-3db", Edge(band, "lowerCutoffHz") + " – " + Edge(band, "upperCutoffHz"), true);
            yield return ("band-1db", Edge(band, "lower1DbHz") + " – " + Edge(band, "upper1DbHz"), true);
            var tolerance = api.GetProperty("tolerance");
            var lower = tolerance.GetProperty("lowerCutoffHz");
            var upper = tolerance.GetProperty("upperCutoffHz");
            yield return ("band-spread", Edge(lower, "min") + "…" + Edge(lower, "max") + " / " + Edge(upper, "min") + "…" + Edge(upper, "max"), true);
        }

        if (api.TryGetProperty("operatingPoint", out var point) && point.ValueKind == JsonValueKind.Object)
        {
            yield return ("flux", Fixed(point.GetProperty("peakFluxDensityT").GetDouble() * 1e3, 2) + " mT", true);
            if (Number(point, "coreLossW") is { } coreLoss)
            {
                yield return ("core-loss", EngineeringFormat.Format(coreLoss, "W") + " (" + point.GetProperty("coreLossMethod").GetString() + ")", true);
            }

            yield return ("copper-loss", EngineeringFormat.Format(point.GetProperty("copperLossW").GetDouble(), "W") + " (DC: " + EngineeringFormat.Format(point.GetProperty("copperLossDcW").GetDouble(), "W") + ")", true);
            yield return ("temperature", Fixed(point.GetProperty("temperatureRiseK").GetDouble(), 1) + " K → " + Fixed(point.GetProperty("hotTemperatureC").GetDouble(), 0) + " °C", true);
        }
    }

    private static double? Number(JsonElement element, string name) =>
        element.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.Number ? value.GetDouble() : null;

    private static string Edge(JsonElement element, string name) =>
        Number(element, name) is { } hz ? EngineeringFormat.Format(hz, "Hz") : "beyond the sweep";

    private static string Fixed(double value, int decimals) =>
        value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}
