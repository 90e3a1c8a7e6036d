using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Winding.Web.Tests.Api;

/// <summary>Characterising a salvaged core through the API, against the worked values of physics-sources.md §12.</summary>
public sealed class CharacteriseApiTests : IClassFixture<WebApplicationFactory<Program>>
{
    private const string Ring = """ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 } } """;

    private readonly WebApplicationFactory<Program> _factory;

    public CharacteriseApiTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Fact]
    public async Task Characterise_Inductance_GivesAlAndMuE()
    {
        // physics-sources.md §12 (IEC 62044-2 relations; ring 10/5/4 mm, C1 = 2.26618 mm⁻¹): N = 10, 6.93 µH →
        // AL = 69.3 nH, μe = 124.973.
        var root = await Post("{" + Ring + """, "turns": 10, "frequencyHz": 1e4, "inductanceH": 6.93e-6 }""");

        Assert.Equal(69.3e-9, root.GetProperty("alH").GetDouble(), 1e-15);
        Assert.Equal(124.973, root.GetProperty("effectivePermeability").GetDouble(), 124.973 * 2e-5);
        Assert.Equal(21.7759e-3, root.GetProperty("effectiveLengthM").GetDouble(), 21.7759e-3 * 1e-5);
        Assert.Equal("nizn-125", root.GetProperty("nearestMaterials")[0].GetProperty("id").GetString());
    }

    [Fact]
    public async Task Characterise_Impedances_GiveComplexPermeability()
    {
        // physics-sources.md §12: N = 10, R_w = 0.05 Ω: 1 MHz 0.75 + j43.55 Ω → μs′ 124.995, μs″ 2.00911;
        // 10 MHz 139.4 + j348.4 → 99.996, 39.9955; 100 MHz 2090 + j697 → 20.0049, 59.9847.
        var root = await Post("{" + Ring + """, "turns": 10, "windingResistanceOhm": 0.05, "impedances": [ { "frequencyHz": 1e6, "re": 0.75, "im": 43.55 }, { "frequencyHz": 1e7, "re": 139.4, "im": 348.4 }, { "frequencyHz": 1e8, "re": 2090, "im": 697 } ] }""");

        var points = root.GetProperty("permeability");
        Assert.Equal(124.995, points[0].GetProperty("real").GetDouble(), 124.995 * 1e-5);
        Assert.Equal(2.00911, points[0].GetProperty("imaginary").GetDouble(), 2.00911 * 1e-5);
        Assert.Equal(39.9955, points[1].GetProperty("imaginary").GetDouble(), 39.9955 * 1e-5);
        Assert.Equal(20.0049, points[2].GetProperty("real").GetDouble(), 20.0049 * 1e-5);
        Assert.True(root.GetProperty("fit").GetProperty("permeability").GetArrayLength() >= 8);
    }

    [Fact]
    public async Task CharacteriseTouchstone_ReadsTheFileAndCharacterises()
    {
        // Touchstone 1: "# MHz Z RI R 1" holds impedances in ohms (normalised to 1 Ω); the same §12 points as above.
        const string File = "! test winding, 10 turns\n# MHz Z RI R 1\n1 0.75 43.55\n10 139.4 348.4\n100 2090 697\n";
        using var form = Form(File, Ring.Trim().Split(':', 2)[1], "10", "0.05");
        using var client = _factory.CreateClient();

        using var response = await client.PostAsync(new Uri("/api/v1/characterise/touchstone", UriKind.Relative), form);

        var text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, text);
        using var json = JsonDocument.Parse(text);
        Assert.Equal(99.996, json.RootElement.GetProperty("permeability")[1].GetProperty("real").GetDouble(), 99.996 * 1e-5);
    }

    [Fact]
    public async Task CharacteriseTouchstone_MalformedFile_IsRefusedWithItsLineNumber()
    {
        using var form = Form("# MHz Z RI R 1\n1 0.75 43.55\n10 oops 348.4\n", Ring.Trim().Split(':', 2)[1], "10", "0");
        using var client = _factory.CreateClient();

        using var response = await client.PostAsync(new Uri("/api/v1/characterise/touchstone", UriKind.Relative), form);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("Line 3", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("""{ "turns": 10, "inductanceH": 1e-6, "frequencyHz": 1e4 }""", "core")]
    [InlineData("""{ "core": { "shape": "toroid", "dimensionsMm": { "outerDiameter": 5, "innerDiameter": 10, "height": 4 } }, "turns": 10, "inductanceH": 1e-6, "frequencyHz": 1e4 }""", "core.dimensionsMm.innerDiameter")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "turns": 0, "inductanceH": 1e-6, "frequencyHz": 1e4 }""", "turns")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "turns": 10, "inductanceH": -1, "frequencyHz": 1e4 }""", "inductanceH")]
    [InlineData("""{ "core": { "catalogueId": "toroid-10x5x4-nizn-850" }, "turns": 10 }""", "inductanceH")]
    public async Task Characterise_BadInput_NamesTheField(string body, string field)
    {
        using var client = _factory.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/characterise", UriKind.Relative), new StringContent(body, Encoding.UTF8, "application/json"));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.True(json.RootElement.GetProperty("errors").TryGetProperty(field, out _), json.RootElement.GetProperty("errors").ToString());
    }

    private async Task<JsonElement> Post(string body)
    {
        using var client = _factory.CreateClient();
        using var response = await client.PostAsync(new Uri("/api/v1/characterise", UriKind.Relative), new StringContent(body, Encoding.UTF8, "application/json"));
        var text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, text);
        return JsonDocument.Parse(text).RootElement.Clone();
    }

    private static MultipartFormDataContent Form(string file, string core, string turns, string windingOhm)
    {
        var form = new MultipartFormDataContent();
        var fileContent = new ByteArrayContent(Encoding.UTF8.GetBytes(file));
        fileContent.Headers.ContentType = new MediaTypeHeaderValue("text/plain");
        form.Add(fileContent, "file", "winding.s1p");
        form.Add(new StringContent(core), "core");
        form.Add(new StringContent(turns), "turns");
        form.Add(new StringContent(windingOhm), "windingResistanceOhm");
        return form;
    }
}
