using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;

namespace Winding.Web.Tests.Api;

/// <summary>The catalogue API: lists, ETags, create, change with If-Match, conflicts, built-ins, hostile ids, import.</summary>
public sealed class CatalogueApiTests : IClassFixture<TempDataFactory>
{
    private readonly TempDataFactory _factory;

    public CatalogueApiTests(TempDataFactory factory) => _factory = factory;

    [Fact]
    public async Task Lists_CarryTheContractFields()
    {
        using var client = _factory.CreateClient();

        var cores = await client.GetFromJsonAsync<JsonElement>(new Uri("/api/v1/cores", UriKind.Relative));
        var materials = await client.GetFromJsonAsync<JsonElement>(new Uri("/api/v1/materials", UriKind.Relative));

        var core = cores.EnumerateArray().Single(c => c.GetProperty("id").GetString() == "toroid-10x5x4-nizn-850");
        foreach (var name in new[] { "id", "name", "shape", "dimensionsMm", "materialId", "alH", "builtIn", "version" })
        {
            Assert.True(core.TryGetProperty(name, out _), name);
        }

        // AL = μ0·μi·Ae/le for the 10 × 5 × 4 mm ring at μi 850: 471.340 nH (physics-sources.md §2.2).
        Assert.Equal(471.340e-9, core.GetProperty("alH").GetDouble(), 471.340e-9 * 1e-5);
        Assert.True(core.GetProperty("builtIn").GetBoolean());
        var material = materials.EnumerateArray().Single(m => m.GetProperty("id").GetString() == "nizn-125");
        foreach (var name in new[] { "id", "name", "initialPermeability", "permeability", "builtIn", "version" })
        {
            Assert.True(material.TryGetProperty(name, out _), name);
        }

        Assert.True(material.GetProperty("permeability")[0].TryGetProperty("imaginary", out _));
    }

    [Fact]
    public async Task CreateChangeAndDelete_WithIfMatch_AndStaleSavesRefused()
    {
        using var client = _factory.CreateClient();
        const string Core = """{ "kind": "core", "id": "bench-toroid-a", "name": "Toroid 20 × 10 × 7 mm", "shape": "toroid", "dimensionsMm": { "outerDiameter": 20, "innerDiameter": 10, "height": 7 }, "materialId": "nizn-125", "source": "caliper" }""";

        using var created = await client.PostAsync(new Uri("/api/v1/cores", UriKind.Relative), Json(Core));
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        using var get = await client.GetAsync(new Uri("/api/v1/cores/bench-toroid-a", UriKind.Relative));
        Assert.Equal("\"1\"", get.Headers.ETag?.Tag);

        using var changed = await Send(client, HttpMethod.Put, "/api/v1/cores/bench-toroid-a", Core.Replace("caliper", "caliper, again", StringComparison.Ordinal), "\"1\"");
        Assert.Equal(HttpStatusCode.OK, changed.StatusCode);
        using var stale = await Send(client, HttpMethod.Put, "/api/v1/cores/bench-toroid-a", Core, "\"1\"");
        Assert.Equal(HttpStatusCode.PreconditionFailed, stale.StatusCode);
        using var withoutIfMatch = await Send(client, HttpMethod.Put, "/api/v1/cores/bench-toroid-a", Core, null);
        Assert.Equal(HttpStatusCode.PreconditionRequired, withoutIfMatch.StatusCode);
        var after = await client.GetFromJsonAsync<JsonElement>(new Uri("/api/v1/cores/bench-toroid-a", UriKind.Relative));
        Assert.Equal("caliper, again", after.GetProperty("source").GetString());

        using var deleted = await Send(client, HttpMethod.Delete, "/api/v1/cores/bench-toroid-a", null, "\"2\"");
        Assert.Equal(HttpStatusCode.NoContent, deleted.StatusCode);
        using var gone = await client.GetAsync(new Uri("/api/v1/cores/bench-toroid-a", UriKind.Relative));
        Assert.Equal(HttpStatusCode.NotFound, gone.StatusCode);
    }

    [Fact]
    public async Task BuiltIn_CannotBeChanged_AnswerIs409WithCloneAdvice()
    {
        using var client = _factory.CreateClient();

        using var response = await Send(client, HttpMethod.Put, "/api/v1/materials/nizn-125", """{ "kind": "material", "id": "nizn-125", "name": "x", "family": "NiZn", "initialPermeability": 1, "source": "x" }""", "\"0\"");

        Assert.Equal(HttpStatusCode.Conflict, response.StatusCode);
        Assert.Contains("clone", await response.Content.ReadAsStringAsync(), StringComparison.OrdinalIgnoreCase);
    }

    [Theory]
    [InlineData("..%2Fx")]
    [InlineData("a%2Fb")]
    [InlineData("Upper")]
    [InlineData("con")]
    public async Task HostileIds_AreRefused(string id)
    {
        using var client = _factory.CreateClient();
        var body = $$"""{ "kind": "core", "id": "{{Uri.UnescapeDataString(id)}}", "name": "T", "shape": "toroid", "dimensionsMm": { "outerDiameter": 20, "innerDiameter": 10, "height": 7 }, "materialId": "nizn-125", "source": "x" }""";

        using var created = await client.PostAsync(new Uri("/api/v1/cores", UriKind.Relative), Json(body));
        using var put = await Send(client, HttpMethod.Put, "/api/v1/cores/" + id, body, "\"1\"");

        Assert.Equal(HttpStatusCode.BadRequest, created.StatusCode);
        Assert.NotEqual(HttpStatusCode.OK, put.StatusCode);
        Assert.False(File.Exists(Path.Combine(Path.GetTempPath(), "x.json")));
        if (Directory.Exists(_factory.DataDirectory))
        {
            Assert.DoesNotContain(Directory.EnumerateFiles(_factory.DataDirectory, "*.json", SearchOption.AllDirectories), f => f.Contains("Upper", StringComparison.Ordinal) || f.EndsWith("con.json", StringComparison.Ordinal));
        }
    }

    [Fact]
    public async Task Import_DryRun_ReportsWithoutWriting()
    {
        using var client = _factory.CreateClient();
        const string Bundle = """{ "format": "winding-catalogue-bundle", "formatVersion": 1, "materials": [ { "kind": "material", "id": "bench-mix", "name": "NiZn, μi 300 (bench)", "family": "NiZn", "initialPermeability": 300, "source": "measured" } ], "cores": [] }""";

        using var dry = await client.PostAsync(new Uri("/api/v1/catalogue/import?dryRun=true", UriKind.Relative), Json(Bundle));
        var report = await dry.Content.ReadAsStringAsync();
        using var missing = await client.GetAsync(new Uri("/api/v1/materials/bench-mix", UriKind.Relative));

        Assert.Equal(HttpStatusCode.OK, dry.StatusCode);
        Assert.Contains("bench-mix", report, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.NotFound, missing.StatusCode);
    }

    private static async Task<HttpResponseMessage> Send(HttpClient client, HttpMethod method, string path, string? body, string? ifMatch)
    {
        using var request = new HttpRequestMessage(method, new Uri(path, UriKind.Relative));
        if (body is not null)
        {
            request.Content = Json(body);
        }

        if (ifMatch is not null)
        {
            request.Headers.IfMatch.Add(new EntityTagHeaderValue(ifMatch));
        }

        return await client.SendAsync(request);
    }

    private static StringContent Json(string body) => new(body, Encoding.UTF8, "application/json");
}
