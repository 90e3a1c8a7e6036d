using System.Net;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Winding.Web.Tests.Api;

public sealed class EvaluateApiTests : IClassFixture<WebApplicationFactory<Program>>
{
    private readonly WebApplicationFactory<Program> _factory;

    public EvaluateApiTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Fact]
    public async Task Evaluate_InlineRing_ReturnsIec60205ParametersAndInductance()
    {
        // Ring 10 × 5 × 4 mm, μi 125: le = 21.7759 mm, Ae = 9.60906 mm², Ve = 209.246 mm³ (IEC 60205 ring formulas),
        // AL = 69.3147 nH and L(10 turns) = 6.93147 µH (physics-sources.md §1.2, §2.2).
        using var response = await Post("""
            {
              "name": "bench test",
              "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "initialPermeability": 125 },
              "windings": [
                { "name": "primary", "turns": 10, "wire": { "conductorDiameterMm": 0.2, "overallDiameterMm": 0.226 } },
                { "name": "secondary", "turns": 30, "wire": { "conductorDiameterMm": 0.2 } }
              ],
              "operating": { "minFrequencyHz": 1.8e6, "maxFrequencyHz": 3.0e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 450, "driveVoltageRms": 10 }
            }
            """);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var root = json.RootElement;
        var core = root.GetProperty("core");
        AssertRelative(21.7759e-3, core.GetProperty("effectiveLengthM").GetDouble());
        AssertRelative(9.60906e-6, core.GetProperty("effectiveAreaM2").GetDouble());
        AssertRelative(209.246e-9, core.GetProperty("effectiveVolumeM3").GetDouble());
        AssertRelative(Math.PI * 25e-6 / 4, core.GetProperty("windowAreaM2").GetDouble());
        AssertRelative(69.3147e-9, core.GetProperty("alH").GetDouble());
        var primary = root.GetProperty("windings")[0];
        AssertRelative(6.93147e-6, primary.GetProperty("inductanceH").GetDouble());
        Assert.True(primary.GetProperty("fits").GetBoolean());
        Assert.Equal(1, primary.GetProperty("layers").GetInt32());
        Assert.Equal(10, primary.GetProperty("turnsPerLayer")[0].GetInt32());
        // MLT of the first layer = (OD − ID) + 2H + π·d_o = 13.71 mm (physics-sources.md §11).
        Assert.Equal(13.71e-3, primary.GetProperty("meanTurnLengthM").GetDouble(), 5);
        Assert.Equal(3.0, root.GetProperty("turnsRatio").GetDouble());
        Assert.Equal(9.0, root.GetProperty("impedanceRatio").GetDouble());
        var warning = Assert.Single(root.GetProperty("warnings").EnumerateArray(), w => w.GetProperty("code").GetString() == "overall-diameter-assumed");
        Assert.Equal("overall-diameter-assumed", warning.GetProperty("code").GetString());
        Assert.Equal("info", warning.GetProperty("severity").GetString());
        Assert.Equal("windings[1].wire.overallDiameterMm", warning.GetProperty("field").GetString());
        foreach (var name in new[] { "remainingHoleDiameterM", "fillFactor", "wireLengthM", "dcResistanceOhm" })
        {
            Assert.True(primary.GetProperty(name).GetDouble() > 0, name);
        }
    }

    [Fact]
    public async Task Evaluate_CatalogueCoreTooManyTurns_WarnsWireDoesNotFit()
    {
        using var response = await Post("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "name": "primary", "turns": 500, "wire": { "conductorDiameterMm": 1.0 } } ] }""");

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.False(json.RootElement.GetProperty("windings")[0].GetProperty("fits").GetBoolean());
        Assert.Contains(json.RootElement.GetProperty("warnings").EnumerateArray(), w =>
            w.GetProperty("code").GetString() == "wire-does-not-fit" && w.GetProperty("severity").GetString() == "error" && w.GetProperty("field").GetString() == "windings[0].turns");
    }

    [Theory]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 5, "innerDiameter": 10, "height": 4 }, "initialPermeability": 125 }, "windings": [ { "turns": 1, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "core.dimensionsMm.innerDiameter")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": -4, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "windings[0].turns")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": "many", "wire": { "conductorDiameterMm": 0.2 } } ] }""", "windings[0].turns")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 4, "wire": { "conductorDiameterMm": NaN } } ] }""", "windings[0].wire.conductorDiameterMm")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 4, "wire": { "conductorDiameterMm": 1e400 } } ] }""", "windings[0].wire.conductorDiameterMm")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 4, "wire": { "conductorDiameterMm": 0.2, "colour": "red" } } ] }""", "windings[0].wire.colour")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 99999999999, "wire": { "conductorDiameterMm": 0.2 } } ] }""", "windings[0].turns")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }""", "")] // truncated JSON: the whole document
    [InlineData("""[]""", "")]
    [InlineData("""null""", "")]
    [InlineData("""{}""", "core")]
    public async Task Evaluate_InvalidPlan_Answers400ProblemJsonNamingTheField(string body, string field)
    {
        using var response = await Post(body);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var errors = json.RootElement.GetProperty("errors");
        Assert.True(errors.TryGetProperty(field, out var messages), $"no error for '{field}' in {errors}");
        Assert.False(string.IsNullOrWhiteSpace(messages[0].GetString()));
    }

    [Fact]
    public async Task Evaluate_NotJson_Answers400()
    {
        using var client = _factory.CreateClient();
        using var content = new StringContent("turns=4", Encoding.UTF8, "application/x-www-form-urlencoded");

        using var response = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
    }

    [Fact]
    public async Task OpenApiDocument_DescribesTheEvaluateEndpoint()
    {
        using var client = _factory.CreateClient();

        var document = await client.GetFromJsonAsync<JsonElement>(new Uri("/openapi/v1.json", UriKind.Relative));

        Assert.True(document.GetProperty("paths").TryGetProperty("/api/v1/evaluate", out var path));
        Assert.True(path.TryGetProperty("post", out _));
    }

    private async Task<HttpResponseMessage> Post(string json)
    {
        using var client = _factory.CreateClient();
        using var content = new StringContent(json, Encoding.UTF8, "application/json");
        return await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), content);
    }

    private static void AssertRelative(double expected, double actual) =>
        Assert.True(Math.Abs(actual - expected) <= 1e-5 * Math.Abs(expected), $"expected {expected}, got {actual}");
}
