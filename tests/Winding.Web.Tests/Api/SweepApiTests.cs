using System.Globalization;
using System.Net;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;
using Winding.Web.Exports;
using Winding.Web.Tests.Exports;

namespace Winding.Web.Tests.Api;

/// <summary><c>POST /api/v1/sweep?format=csv</c>: the same sweep as <c>/evaluate</c>, as a CSV download; the same field errors.</summary>
public sealed class SweepApiTests : IClassFixture<WebApplicationFactory<Program>>
{
    private const string Plan = """
        "name": "club 1:9 \"unun\" / 80 m",
        "core": { "catalogueId": "toroid-36x23x15-nizn-125" },
        "windings": [ { "name": "primary", "turns": 4, "wire": { "metricMm": 0.8 } }, { "name": "secondary", "turns": 12, "wire": { "metricMm": 0.5 } } ],
        "operating": { "minFrequencyHz": 1.8e6, "maxFrequencyHz": 3e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 450, "driveVoltageRms": 10 },
        "sweep": { "startHz": 1e5, "stopHz": 1e9, "points": 33 }
        """;

    private readonly WebApplicationFactory<Program> _factory;

    public SweepApiTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Fact]
    public async Task Sweep_Csv_IsTheEvaluatedSweepAsAFileNamedAfterThePlan()
    {
        using var client = _factory.CreateClient();
        using var evaluated = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), Json("{" + Plan + "}"));
        using var expected = JsonDocument.Parse(await evaluated.Content.ReadAsStringAsync());

        using var response = await client.PostAsync(new Uri("/api/v1/sweep?format=csv", UriKind.Relative), Json("{" + Plan + "}"));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        Assert.Equal("utf-8", response.Content.Headers.ContentType?.CharSet);
        Assert.Contains(response.Content.Headers.ContentType!.Parameters, p => p.Name == "header" && p.Value == "present");
        Assert.Equal("attachment", response.Content.Headers.ContentDisposition?.DispositionType);
        Assert.Equal("club-19-unun-80-m.csv", response.Content.Headers.ContentDisposition?.FileNameStar);
        var rows = SweepCsvTests.Read(await response.Content.ReadAsStringAsync());
        Assert.Equal(SweepCsv.Columns, rows[0]);
        var sweep = expected.RootElement.GetProperty("sweep");
        Assert.Equal(33, sweep.GetArrayLength());
        Assert.Equal(sweep.GetArrayLength(), rows.Count - 1);
        for (var i = 0; i < sweep.GetArrayLength(); i++)
        {
            var point = sweep[i];
            Assert.Equal(point.GetProperty("frequencyHz").GetDouble(), Parse(rows[i + 1][0]));
            Assert.Equal(point.GetProperty("insertionLossDb").GetDouble(), Parse(rows[i + 1][1]));
            Assert.Equal(point.GetProperty("returnLossDb").GetDouble(), Parse(rows[i + 1][2]));
            Assert.Equal(point.GetProperty("inputImpedanceOhm").GetProperty("re").GetDouble(), Parse(rows[i + 1][5]));
            Assert.Equal(point.GetProperty("inputImpedanceOhm").GetProperty("im").GetDouble(), Parse(rows[i + 1][6]));
        }
    }

    [Fact]
    public async Task Sweep_WithoutFormat_IsCsv()
    {
        using var client = _factory.CreateClient();

        using var response = await client.PostAsync(new Uri("/api/v1/sweep", UriKind.Relative), Json("{" + Plan + "}"));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
    }

    [Theory]
    [InlineData("/api/v1/sweep?format=xlsx", "{" + Plan + "}", "format")]
    [InlineData("/api/v1/sweep", """{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ { "turns": 3, "wire": { "metricMm": 0.5 } } ] }""", "operating")]
    [InlineData("/api/v1/sweep", """{ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ { "turns": 0, "wire": { "metricMm": 0.5 } } ] }""", "windings[0].turns")]
    [InlineData("/api/v1/sweep", """{ "core": { "catalogueId": "no-such-core" }, "windings": [ { "turns": 3, "wire": { "metricMm": 0.5 } } ] }""", "core.catalogueId")]
    [InlineData("/api/v1/sweep", """{ "core": """, "core")] // truncated JSON: named where it broke off
    public async Task Sweep_BadRequest_Answers400ProblemJsonNamingTheField(string address, string body, string field)
    {
        using var client = _factory.CreateClient();

        using var response = await client.PostAsync(new Uri(address, UriKind.Relative), Json(body));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var errors = json.RootElement.GetProperty("errors");
        Assert.True(errors.TryGetProperty(field, out var messages), $"no error for '{field}' in {errors}");
        Assert.False(string.IsNullOrWhiteSpace(messages[0].GetString()));
    }

    [Fact]
    public async Task Sweep_NotJson_Answers400()
    {
        using var client = _factory.CreateClient();
        using var content = new StringContent("turns=4", Encoding.UTF8, "application/x-www-form-urlencoded");

        using var response = await client.PostAsync(new Uri("/api/v1/sweep", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
    }

    private static double Parse(string field) => double.Parse(field, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static StringContent Json(string body) => new(body, Encoding.UTF8, "application/json");
}
