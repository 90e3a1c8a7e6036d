using System.Net;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Winding.Web.Tests.Api;

/// <summary>Leakage, capacitances, the equivalent circuit, the sweep, band and tolerance, measured values and the netlist through the API.</summary>
public sealed class ResponseApiTests : IClassFixture<WebApplicationFactory<Program>>
{
    private const string Plan = """
        "core": { "catalogueId": "toroid-36x23x15-nizn-125" },
        "windings": [ { "name": "primary", "turns": 6, "wire": { "metricMm": 0.8 } }, { "name": "secondary", "turns": 18, "wire": { "metricMm": 0.5 } } ],
        "operating": { "minFrequencyHz": 1.8e6, "maxFrequencyHz": 3e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 450, "driveVoltageRms": 10 }
        """;

    private readonly WebApplicationFactory<Program> _factory;

    public ResponseApiTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Fact]
    public async Task Evaluate_GivesParasiticsCircuitSweepBandAndTolerance()
    {
        var root = await Evaluate("{" + Plan + "}");

        Assert.True(root.GetProperty("leakageInductanceH").GetDouble() > 0);
        Assert.True(root.GetProperty("interwindingCapacitanceF").GetDouble() > 0);
        foreach (var w in root.GetProperty("windings").EnumerateArray())
        {
            Assert.True(w.GetProperty("selfCapacitanceF").GetDouble() > 0);
            Assert.True(w.GetProperty("selfResonanceHz").GetDouble() > 0);
        }

        var circuit = root.GetProperty("equivalentCircuit");
        foreach (var name in new[] { "RS", "LM", "C1", "RSERIES", "LLK", "C2", "RL" })
        {
            Assert.True(circuit.TryGetProperty(name, out _), name);
        }

        // RL′ = RL·(N1/N2)² = 450/9 = 50 Ω (ideal-transformer relation).
        Assert.Equal(50, circuit.GetProperty("RL").GetDouble(), 9);
        var sweep = root.GetProperty("sweep");
        // Defaults: a decade beyond each band edge, 401 points.
        Assert.Equal(401, sweep.GetArrayLength());
        Assert.Equal(1.8e5, sweep[0].GetProperty("frequencyHz").GetDouble(), 1e-3);
        Assert.Equal(3e8, sweep[400].GetProperty("frequencyHz").GetDouble(), 1e-1);
        Assert.True(sweep[200].GetProperty("inputImpedanceOhm").TryGetProperty("re", out _));
        var band = root.GetProperty("band");
        Assert.True(band.GetProperty("minimumInsertionLossDb").GetDouble() >= 0);
        var lower = band.GetProperty("lowerCutoffHz").GetDouble();
        var tolerance = root.GetProperty("tolerance").GetProperty("lowerCutoffHz");
        Assert.InRange(lower, tolerance.GetProperty("min").GetDouble(), tolerance.GetProperty("max").GetDouble());
    }

    [Fact]
    public async Task Evaluate_SweepSettings_AreHonoured()
    {
        var root = await Evaluate("{" + Plan + """, "sweep": { "startHz": 1e4, "stopHz": 1e8, "points": 41 } }""");

        var sweep = root.GetProperty("sweep");
        Assert.Equal(41, sweep.GetArrayLength());
        Assert.Equal(1e4, sweep[0].GetProperty("frequencyHz").GetDouble(), 1e-6);
        Assert.Equal(1e5, sweep[10].GetProperty("frequencyHz").GetDouble(), 1e-3);
    }

    [Fact]
    public async Task Evaluate_MeasuredValues_ReplaceEstimatesAndAreNamed()
    {
        var root = await Evaluate("{" + Plan + """, "measured": { "alNh": 200, "leakageInductanceH": 2e-7, "interwindingCapacitanceF": 1.5e-11, "selfCapacitanceF": [null, 4e-12] } }""");

        Assert.Equal(200e-9, root.GetProperty("core").GetProperty("alH").GetDouble(), 1e-15);
        Assert.Equal(2e-7, root.GetProperty("leakageInductanceH").GetDouble());
        Assert.Equal(2e-7, root.GetProperty("equivalentCircuit").GetProperty("LLK").GetDouble());
        Assert.Equal(1.5e-11, root.GetProperty("interwindingCapacitanceF").GetDouble());
        Assert.Equal(4e-12, root.GetProperty("windings")[1].GetProperty("selfCapacitanceF").GetDouble());
        var measured = root.GetProperty("parasitics").GetProperty("measured").EnumerateArray().Select(e => e.GetString()).ToList();
        Assert.Equal(["al", "interwindingCapacitance", "leakageInductance", "selfCapacitance[1]"], measured.Order(StringComparer.Ordinal));
    }

    [Theory]
    [InlineData("""{ "sweep": { "points": 1 } }""", "sweep.points")]
    [InlineData("""{ "sweep": { "startHz": 1e6, "stopHz": 1e5 } }""", "sweep.stopHz")]
    [InlineData("""{ "measured": { "leakageInductanceH": -1 } }""", "measured.leakageInductanceH")]
    [InlineData("""{ "measured": { "selfCapacitanceF": [1e-12, 1e-12, 1e-12] } }""", "measured.selfCapacitanceF")]
    [InlineData("""{ "options": { "frequencyIndependentCore": "yes" } }""", "options.frequencyIndependentCore")]
    public async Task Evaluate_BadSweepOrMeasuredValues_NameTheField(string extra, string field)
    {
        var body = "{" + Plan + "," + extra.Trim()[1..^1] + "}";
        using var client = _factory.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), Json(body));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.True(json.RootElement.GetProperty("errors").TryGetProperty(field, out _), json.RootElement.GetProperty("errors").ToString());
    }

    [Fact]
    public async Task Netlist_HasTheContractNodesElementsAndAnalysis()
    {
        using var client = _factory.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/netlist", UriKind.Relative), Json("{" + Plan + """, "name": "club\n.end\nbad" }"""));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var lines = (await response.Content.ReadAsStringAsync()).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Contains("V1 src 0 AC 1", lines);
        Assert.Contains(lines, l => l.StartsWith("RS src in ", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("RL out 0 ", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith(".ac dec ", StringComparison.Ordinal));
        // Every card that is not a comment is an element or a dot card; a name cannot inject a card.
        Assert.Single(lines, l => l == ".end");
        Assert.All(lines.Where(l => !l.StartsWith('*')), l => Assert.Matches("^([A-Z][A-Z0-9]* |\\.)", l));
    }

    [Fact]
    public async Task Netlist_WithoutOperatingConditions_Is400()
    {
        using var client = _factory.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/netlist", UriKind.Relative), Json("""{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ { "turns": 3, "wire": { "metricMm": 0.5 } } ] }"""));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
    }

    private async Task<JsonElement> Evaluate(string body)
    {
        using var client = _factory.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), Json(body));
        var text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, text);
        return JsonDocument.Parse(text).RootElement.Clone();
    }

    private static StringContent Json(string body) => new(body, Encoding.UTF8, "application/json");
}
