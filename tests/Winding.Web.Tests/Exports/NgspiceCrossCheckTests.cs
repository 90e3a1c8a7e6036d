using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;
using Winding.EndToEnd;

namespace Winding.Web.Tests.Exports;

/// <summary>
/// The engine's own sweep (frequency-independent core) against ngspice — the reference circuit simulator — running the
/// netlist that <c>POST /api/v1/netlist</c> exports, for plans that differ in core shape, ratio and band: at every point
/// the insertion losses agree within 0.01 dB. With <c>WINDING_REQUIRE_TOOLS=1</c> a missing ngspice fails the test.
/// </summary>
public sealed class NgspiceCrossCheckTests : IClassFixture<WebApplicationFactory<Program>>
{
    private readonly WebApplicationFactory<Program> _factory;

    public NgspiceCrossCheckTests(WebApplicationFactory<Program> factory) => _factory = factory;

    public static TheoryData<string, string> Plans() => new()
    {
        { "toroid 1:9, HF", """ "core": { "catalogueId": "toroid-36x23x15-nizn-125" }, "windings": [ { "name": "primary", "turns": 4, "wire": { "metricMm": 0.8 } }, { "name": "secondary", "turns": 12, "wire": { "metricMm": 0.5 } } ], "operating": { "minFrequencyHz": 1.8e6, "maxFrequencyHz": 3e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 450, "driveVoltageRms": 10 }, "sweep": { "startHz": 1e5, "stopHz": 1e9, "points": 161 } """ },
        { "split sleeve bifilar 1:1", """ "core": { "catalogueId": "sleeve-split-17x7x28-nizn-250" }, "windings": [ { "name": "a", "turns": 3, "wire": { "metricMm": 0.5 } }, { "name": "b", "turns": 3, "wire": { "metricMm": 0.5 }, "placement": { "kind": "bifilar", "winding": 0 } } ], "operating": { "minFrequencyHz": 5e5, "maxFrequencyHz": 3e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 50, "driveVoltageRms": 1 }, "sweep": { "startHz": 1e4, "stopHz": 1e9, "points": 201 } """ },
        { "two-hole 1:4", """ "core": { "catalogueId": "two-hole-14x8x14-nizn-850" }, "windings": [ { "name": "primary", "turns": 2, "wire": { "metricMm": 0.4 } }, { "name": "secondary", "turns": 4, "wire": { "metricMm": 0.315 } } ], "operating": { "minFrequencyHz": 1e5, "maxFrequencyHz": 1e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 200, "driveVoltageRms": 1 }, "sweep": { "startHz": 1e3, "stopHz": 1e9, "points": 241 } """ },
        { "bobbin audio 1:1", """ "core": { "catalogueId": "bobbin-rm-ae-37-mnzn-2000" }, "windings": [ { "name": "line in", "turns": 60, "wire": { "metricMm": 0.2 } }, { "name": "line out", "turns": 60, "wire": { "metricMm": 0.2 } } ], "operating": { "minFrequencyHz": 300, "maxFrequencyHz": 1e5, "sourceResistanceOhm": 600, "loadResistanceOhm": 600, "driveVoltageRms": 1 }, "sweep": { "startHz": 10, "stopHz": 1e8, "points": 281 } """ },
        { "sectored toroid 1:3", """ "core": { "catalogueId": "toroid-23x14x7-nizn-850" }, "windings": [ { "name": "primary", "turns": 5, "wire": { "metricMm": 0.5 }, "placement": { "kind": "sector", "startDegrees": 0, "endDegrees": 150 } }, { "name": "secondary", "turns": 15, "wire": { "metricMm": 0.315 }, "placement": { "kind": "sector", "startDegrees": 180, "endDegrees": 330 } } ], "operating": { "minFrequencyHz": 1e6, "maxFrequencyHz": 3e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 450, "driveVoltageRms": 1 }, "sweep": { "startHz": 1e4, "stopHz": 1e9, "points": 201 } """ },
        { "toroid multilayer with wrap 1:4", """ "core": { "catalogueId": "toroid-61x36x13-nizn-125" }, "windings": [ { "name": "primary", "turns": 10, "wire": { "metricMm": 1.0 } }, { "name": "secondary", "turns": 40, "wire": { "metricMm": 0.8 }, "insulation": { "material": "polyester", "thicknessMm": 0.1 } } ], "operating": { "minFrequencyHz": 1e6, "maxFrequencyHz": 1e7, "sourceResistanceOhm": 50, "loadResistanceOhm": 800, "driveVoltageRms": 1 }, "sweep": { "startHz": 1e4, "stopHz": 1e9, "points": 201 } """ },
    };

    public static TheoryData<string> DemoPlanIds()
    {
        var data = new TheoryData<string>();
        foreach (var demo in Winding.Web.Planning.DemoPlans.All)
        {
            data.Add(demo.Id);
        }

        return data;
    }

    [SkippableTheory]
    [MemberData(nameof(Plans))]
    public Task ExportedNetlist_RunInNgspice_MatchesTheEngineWithin0p01Db(string label, string plan) =>
        CrossCheck(label, "{ " + plan + ", \"options\": { \"frequencyIndependentCore\": true } }");

    [SkippableTheory]
    [MemberData(nameof(DemoPlanIds))]
    public Task EveryDemoPlan_ExportedNetlist_MatchesTheEngineWithin0p01Db(string id)
    {
        // The demo's own plan, swept over whole decades (a decade and more beyond its band) so that the engine's grid and
        // ngspice's ".ac dec" grid coincide point for point.
        var options = Winding.Catalogue.Loading.CatalogueJson.Options;
        var demo = System.Text.Json.JsonSerializer.Deserialize<Winding.Catalogue.Plans.PlanDocument>(System.Text.Json.JsonSerializer.Serialize(Winding.Web.Planning.DemoPlans.Find(id)!.Document, options), options)!;
        var op = demo.Operating!;
        var start = Math.Pow(10, Math.Floor(Math.Log10(op.MinFrequencyHz!.Value / 10)));
        var stop = Math.Pow(10, Math.Ceiling(Math.Log10(op.MaxFrequencyHz!.Value * 10)));
        var decades = (int)Math.Round(Math.Log10(stop / start));
        demo.Sweep = new Winding.Catalogue.Plans.PlanSweepDocument { StartHz = start, StopHz = stop, Points = decades * 40 + 1 };
        demo.Options = new Winding.Catalogue.Plans.PlanOptionsDocument { FrequencyIndependentCore = true };
        return CrossCheck(id, System.Text.Json.JsonSerializer.Serialize(demo, Winding.Catalogue.Loading.CatalogueJson.Options));
    }

    private async Task CrossCheck(string label, string body)
    {
        var ngspice = RequiredTools.Ngspice();
        using var client = _factory.CreateClient();
        using var evaluateResponse = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), Json(body));
        var evaluateText = await evaluateResponse.Content.ReadAsStringAsync();
        Assert.True(evaluateResponse.StatusCode == HttpStatusCode.OK, evaluateText);
        using var evaluation = JsonDocument.Parse(evaluateText);
        using var netlistResponse = await client.PostAsync(new Uri("/api/v1/netlist", UriKind.Relative), Json(body));
        var netlist = await netlistResponse.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, netlistResponse.StatusCode);
        Assert.StartsWith("text/plain", netlistResponse.Content.Headers.ContentType?.MediaType, StringComparison.Ordinal);

        var simulated = RunNgspice(ngspice, netlist);

        var elements = evaluation.RootElement.GetProperty("equivalentCircuit");
        var ideal = elements.GetProperty("RL").GetDouble() / (elements.GetProperty("RS").GetDouble() + elements.GetProperty("RL").GetDouble());
        var sweep = evaluation.RootElement.GetProperty("sweep").EnumerateArray().ToList();
        Assert.Equal(sweep.Count, simulated.Count);
        for (var i = 0; i < sweep.Count; i++)
        {
            var frequency = sweep[i].GetProperty("frequencyHz").GetDouble();
            Assert.Equal(frequency, simulated[i].FrequencyHz, frequency * 1e-6);
            var ngspiceLossDb = 20 * Math.Log10(ideal / simulated[i].Magnitude);
            var engineLossDb = sweep[i].GetProperty("insertionLossDb").GetDouble();
            Assert.True(Math.Abs(ngspiceLossDb - engineLossDb) <= 0.01, $"{label}: {frequency:G6} Hz engine {engineLossDb:F5} dB, ngspice {ngspiceLossDb:F5} dB");
        }
    }

    private static List<(double FrequencyHz, double Magnitude)> RunNgspice(string ngspice, string netlist)
    {
        var directory = Directory.CreateTempSubdirectory("winding-ngspice-");
        try
        {
            var output = Path.Combine(directory.FullName, "out.txt");
            var control = $".control\nset wr_singlescale\nset filetype=ascii\nrun\nwrdata {output} vm(out)\n.endc\n";
            var deck = netlist.Replace(".end\n", control + ".end\n", StringComparison.Ordinal);
            var deckPath = Path.Combine(directory.FullName, "plan.cir");
            File.WriteAllText(deckPath, deck);
            using var process = Process.Start(new ProcessStartInfo(ngspice, ["-b", deckPath])
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                WorkingDirectory = directory.FullName,
            })!;
            var stdout = process.StandardOutput.ReadToEndAsync();
            var stderr = process.StandardError.ReadToEndAsync();
            Assert.True(process.WaitForExit(60_000), "ngspice did not finish within 60 s");
            Assert.True(File.Exists(output), "ngspice wrote no data: " + stdout.Result + stderr.Result);
            return [.. File.ReadAllLines(output)
                .Select(line => line.Split(' ', StringSplitOptions.RemoveEmptyEntries))
                .Where(parts => parts.Length >= 2)
                .Select(parts => (double.Parse(parts[0], CultureInfo.InvariantCulture), double.Parse(parts[1], CultureInfo.InvariantCulture)))];
        }
        finally
        {
            directory.Delete(recursive: true);
        }
    }

    private static StringContent Json(string body) => new(body, Encoding.UTF8, "application/json");
}
