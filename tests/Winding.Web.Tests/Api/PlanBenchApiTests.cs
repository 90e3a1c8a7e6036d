using System.Net;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Winding.Web.Tests.Api;

/// <summary>A plan's bench record through the API: accepted as part of a plan, checked field by field.</summary>
public sealed class PlanBenchApiTests : IClassFixture<WebApplicationFactory<Program>>
{
    private const string Plan = """
        { "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "windings": [ { "turns": 8, "wire": { "conductorDiameterMm": 0.3 } } ], "bench": BENCH }
        """;

    private readonly WebApplicationFactory<Program> _factory;

    public PlanBenchApiTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Fact]
    public async Task Evaluate_PlanWithABenchRecord_IsAcceptedAndUnchangedByIt()
    {
        using var with = await Post("/api/v1/evaluate", Plan.Replace("BENCH", """{ "measuredOn": "2026-12-03", "planVersion": 1, "values": { "w0-inductance": 2e-6 } }""", StringComparison.Ordinal));
        using var without = await Post("/api/v1/evaluate", Plan.Replace("BENCH", "null", StringComparison.Ordinal));

        Assert.Equal(HttpStatusCode.OK, with.StatusCode);
        Assert.Equal(await without.Content.ReadAsStringAsync(), await with.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task Sheet_BadBenchValue_Is400NamingTheField()
    {
        using var response = await Post("/api/v1/sheet", Plan.Replace("BENCH", """{ "values": { "w0-inductance": -2e-6 } }""", StringComparison.Ordinal));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.True(json.RootElement.GetProperty("errors").TryGetProperty("bench.values.w0-inductance", out _));
    }

    private async Task<HttpResponseMessage> Post(string path, string json)
    {
        using var client = _factory.CreateClient();
        using var content = new StringContent(json, Encoding.UTF8, "application/json");
        return await client.PostAsync(new Uri(path, UriKind.Relative), content);
    }
}
