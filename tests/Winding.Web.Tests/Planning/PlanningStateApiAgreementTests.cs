using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Loading;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>
/// The plan page and <c>POST /api/v1/evaluate</c> agree: the page's document, posted as it is exported, gives the same
/// figures as the page shows, for every wire form and for a typed core (consistency, not physics).
/// </summary>
public sealed class PlanningStateApiAgreementTests : WindingComponentTestBase, IClassFixture<WebApplicationFactory<Program>>
{
    private readonly WebApplicationFactory<Program> _factory;

    public PlanningStateApiAgreementTests(WebApplicationFactory<Program> factory) => _factory = factory;

    private PlanningState State => Services.GetRequiredService<PlanningState>();

    public static TheoryData<string> Edits => new()
    {
        "metric", "awg", "litz", "hook-up", "custom-aluminium", "table", "typed-ring-measured-al", "typed-sleeve-material-class",
    };

    [Theory]
    [MemberData(nameof(Edits))]
    public async Task PageFigures_EqualTheApiFiguresForTheExportedPlan(string edit)
    {
        Apply(edit);
        Assert.Empty(State.Errors);
        var result = State.Result!;

        using var client = _factory.CreateClient();
        using var content = new StringContent(JsonSerializer.Serialize(State.ToDocument(), CatalogueJson.Options), Encoding.UTF8, "application/json");
        using var response = await client.PostAsync(new Uri("/api/v1/evaluate", UriKind.Relative), content);
        response.EnsureSuccessStatusCode();
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());

        var root = json.RootElement;
        AssertSame(result.Core.InductanceFactor.HenriesPerTurnSquared, root.GetProperty("core").GetProperty("alH").GetDouble());
        for (var i = 0; i < result.Windings.Count; i++)
        {
            var winding = root.GetProperty("windings")[i];
            AssertSame(result.Windings[i].InductanceH, winding.GetProperty("inductanceH").GetDouble());
            AssertSame(result.Windings[i].DcResistanceOhm, winding.GetProperty("dcResistanceOhm").GetDouble());
            AssertSame(result.Windings[i].Electrical!.AcResistanceOhm, winding.GetProperty("acResistanceOhm").GetDouble());
            Assert.Equal(result.Windings[i].Fit.Layers, winding.GetProperty("layers").GetInt32());
        }

        AssertSame(result.Parasitics.LeakageInductanceH, root.GetProperty("leakageInductanceH").GetDouble());
    }

    private void Apply(string edit)
    {
        switch (edit)
        {
            case "metric":
                State.EditWinding(0, w => { w.WireForm = WireForm.Metric; w.MetricSize = "0.5"; w.MetricGrade = "2"; });
                break;
            case "awg":
                State.EditWinding(0, w => { w.WireForm = WireForm.Awg; w.AwgGauge = "24"; w.AwgBuild = "heavy"; w.StrandsInHand = "2"; });
                break;
            case "litz":
                State.EditWinding(1, w => { w.WireForm = WireForm.Litz; w.LitzStrands = "20"; w.LitzStrandDiameter = "0.1"; w.LitzOverallDiameter = "0.6"; });
                break;
            case "hook-up":
                State.EditWinding(0, w => { w.WireForm = WireForm.HookUp; w.HookUpConductor = "0.6"; w.HookUpInsulation = "0.3"; });
                break;
            case "custom-aluminium":
                State.EditWinding(0, w => { w.ConductorDiameter = "0.02 in"; w.Metal = "aluminium"; });
                break;
            case "table":
                State.EditWinding(0, w => { w.WireForm = WireForm.Table; w.StandardId = "awg-24-heavy"; });
                break;
            case "typed-ring-measured-al":
                State.EditTypedCore(c => { c.Shape = "toroid"; c.Dimensions["outerDiameter"] = "23"; c.Dimensions["innerDiameter"] = "14"; c.Dimensions["height"] = "7"; c.MeasuredAl = "120"; });
                State.EditWinding(1, w => { w.WireForm = WireForm.Litz; w.LitzStrands = "20"; w.LitzStrandDiameter = "0.1"; w.LitzOverallDiameter = "0.6"; });
                break;
            default:
                State.EditTypedCore(c =>
                {
                    c.Shape = "sleeve";
                    c.Dimensions["outerDiameter"] = "25";
                    c.Dimensions["innerDiameter"] = "13";
                    c.Dimensions["length"] = "35";
                    c.Dimensions["residualGap"] = "0.02";
                    c.MaterialBasis = CoreMaterialBasis.MaterialClass;
                    c.MaterialId = "nizn-1500";
                });
                break;
        }
    }

    private static void AssertSame(double expected, double actual) =>
        Assert.True(Math.Abs(expected - actual) <= 1e-12 * Math.Abs(expected), $"page {expected}, API {actual}");
}
