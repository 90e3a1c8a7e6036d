using System.Text.Json;
using Microsoft.Extensions.DependencyInjection;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Wire;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>
/// Every wire form of the plan document edited on the plan page: the draft reaches the engine through the same reader
/// as the API, errors land at the field of the form, and a loaded plan of any form is written back unchanged.
/// </summary>
public sealed class WireDraftsTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    /// <summary>A complete plan with <paramref name="wire"/> on the primary (explicit members only, so it can be compared).</summary>
    internal static string PlanWith(string wire, string core = """{ "catalogueId": "toroid-36x23x15-nizn-125" }""", string measured = "") => $$"""
        {
          "name": "round trip",
          "core": {{core}},
          "windings": [
            { "name": "primary", "turns": 6, "wire": {{wire}} },
            { "name": "secondary", "turns": 12, "wire": { "conductorDiameterMm": 0.4 } }
          ],
          "operating": { "minFrequencyHz": 1800000, "maxFrequencyHz": 30000000, "sourceResistanceOhm": 50, "loadResistanceOhm": 200, "driveVoltageRms": 5, "waveform": "sine" }{{(measured.Length > 0 ? ", \"measured\": " + measured : string.Empty)}}
        }
        """;

    internal static string Canonical(PlanDocument document) => JsonSerializer.Serialize(document, CatalogueJson.Options);

    internal static PlanDocument Parse(string json) => JsonSerializer.Deserialize<PlanDocument>(json, CatalogueJson.Options)!;

    [Theory]
    [InlineData("""{ "standardId": "metric-0-500-g1" }""", WireForm.Table)]
    [InlineData("""{ "metricMm": 0.5, "grade": 2 }""", WireForm.Metric)]
    [InlineData("""{ "metricMm": 0.5 }""", WireForm.Metric)]
    [InlineData("""{ "awg": 24, "build": "heavy" }""", WireForm.Awg)]
    [InlineData("""{ "awg": 24 }""", WireForm.Awg)]
    [InlineData("""{ "conductorDiameterMm": 0.45, "overallDiameterMm": 0.5 }""", WireForm.Custom)]
    [InlineData("""{ "litz": { "strands": 20, "strandDiameterMm": 0.1, "overallDiameterMm": 0.6 } }""", WireForm.Litz)]
    [InlineData("""{ "hookUp": { "conductorDiameterMm": 0.6, "insulationThicknessMm": 0.3 } }""", WireForm.HookUp)]
    [InlineData("""{ "awg": 22, "strandsInHand": 2, "metal": "aluminium" }""", WireForm.Awg)]
    [InlineData("""{ "conductorDiameterMm": 0.123456789, "metal": "copper" }""", WireForm.Custom)]
    public void Load_AnyWireForm_IsEditedInItsFormAndExportsUnchanged(string wire, WireForm form)
    {
        var document = Parse(PlanWith(wire));

        State.Load(document);

        Assert.Equal(form, State.Windings[0].WireForm);
        Assert.Empty(State.Errors);
        Assert.NotNull(State.Result);
        Assert.Equal(Canonical(document), Canonical(State.ToDocument()));
    }

    [Fact]
    public void Metric_SizeAndGrade_ReachTheEngine()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Metric; w.MetricSize = "0.5"; w.MetricGrade = "2"; });

        var wire = State.Plan!.Windings[0].Wire;
        Assert.Equal(0.5, wire.StrandDiameter.Millimetres, 12);
        // The grade 2 film is thicker than grade 1 (IEC 60317-0-1): the page passes the grade through.
        var grade1 = MetricEnamelledWireTable.Wire(Core.Quantities.Length.FromMillimetres(0.5), MetricWireGrade.Grade1).ElementOverallDiameter.Millimetres;
        Assert.True(wire.ElementOverallDiameter.Millimetres > grade1, $"{wire.ElementOverallDiameter.Millimetres} mm");
        Assert.Equal(2, State.ToDocument().Windings![0]!.Wire!.Grade);
    }

    [Fact]
    public void Metric_SizeOutsideTheSeries_IsAnErrorAtTheSize()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Metric; w.MetricSize = "0.51"; });

        Assert.Contains("IEC 60317", State.ErrorFor("windings[0].wire.metricMm"), StringComparison.Ordinal);
        Assert.Null(State.Result);
    }

    [Fact]
    public void Awg_GaugeAndBuild_ReachTheEngine()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Awg; w.AwgGauge = "24"; w.AwgBuild = "heavy"; });

        // AWG 24 = 0.0201 in = 0.51054 mm bare (ASTM B258, rounded to the table's 4 digits in inches).
        Assert.Equal(0.51054, State.Plan!.Windings[0].Wire.StrandDiameter.Millimetres, 3);
        Assert.Contains("heavy", State.Plan.Windings[0].Wire.Description, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("60", "out of range")]
    [InlineData("x", "is not a number")]
    [InlineData("24.5", "is not a whole number")]
    [InlineData("", "required")]
    public void Awg_BadGauge_IsAnErrorAtTheGauge(string gauge, string words)
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Awg; w.AwgGauge = gauge; });

        Assert.Contains(words, State.ErrorFor("windings[0].wire.awg"), StringComparison.Ordinal);
    }

    [Fact]
    public void Litz_Bundle_ReachesTheEngine()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Litz; w.LitzStrands = "20"; w.LitzStrandDiameter = "0.1"; w.LitzOverallDiameter = "0.6"; });

        var wire = State.Plan!.Windings[0].Wire;
        Assert.Equal(WireKind.Litz, wire.Kind);
        Assert.Equal(20, wire.StrandsPerElement);
        Assert.Equal(0.6, wire.ElementOverallDiameter.Millimetres, 12);
    }

    [Fact]
    public void Litz_BundleTooSmallForItsStrands_IsAnErrorAtTheBundle()
    {
        // 100 strands of 0.1 mm need at least √100 × 0.1 = 1 mm (their areas alone).
        State.EditWinding(0, w => { w.WireForm = WireForm.Litz; w.LitzStrands = "100"; w.LitzStrandDiameter = "0.1"; w.LitzOverallDiameter = "0.5"; });

        Assert.Contains("too small", State.ErrorFor("windings[0].wire.litz.overallDiameterMm"), StringComparison.Ordinal);
    }

    [Fact]
    public void Litz_MissingStrands_IsAnErrorAtTheStrands()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Litz; w.LitzStrandDiameter = "0.1"; w.LitzOverallDiameter = "0.6"; });

        Assert.StartsWith("Required", State.ErrorFor("windings[0].wire.litz.strands"), StringComparison.Ordinal);
    }

    [Fact]
    public void HookUp_OverallIsConductorPlusTwiceTheInsulation()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.HookUp; w.HookUpConductor = "0.6"; w.HookUpInsulation = "0.3"; });

        // Geometry: 0.6 + 2 × 0.3 = 1.2 mm.
        Assert.Equal(1.2, State.Plan!.Windings[0].Wire.ElementOverallDiameter.Millimetres, 12);
        Assert.Equal(WireKind.HookUp, State.Plan.Windings[0].Wire.Kind);
    }

    [Fact]
    public void HookUp_NegativeInsulation_IsAnErrorAtTheInsulation()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.HookUp; w.HookUpConductor = "0.6"; w.HookUpInsulation = "-0.1"; });

        Assert.Contains("out of range", State.ErrorFor("windings[0].wire.hookUp.insulationThicknessMm"), StringComparison.Ordinal);
    }

    [Fact]
    public void Table_NothingPicked_IsAnErrorAtTheSearch()
    {
        State.EditWinding(0, w => w.WireForm = WireForm.Table);

        Assert.NotNull(State.ErrorFor("windings[0].wire.standardId"));
        Assert.Null(State.Result);
    }

    [Fact]
    public void SwitchingKinds_KeepsWhatWasTypedInEach()
    {
        State.EditWinding(0, w => { w.WireForm = WireForm.Litz; w.LitzStrands = "20"; w.LitzStrandDiameter = "0.1"; w.LitzOverallDiameter = "0.6"; });
        State.EditWinding(0, w => w.WireForm = WireForm.Custom);
        Assert.Equal(WireKind.Solid, State.Plan!.Windings[0].Wire.Kind);

        State.EditWinding(0, w => w.WireForm = WireForm.Litz);

        Assert.Equal(20, State.Plan!.Windings[0].Wire.StrandsPerElement);
        Assert.Null(State.ToDocument().Windings![0]!.Wire!.ConductorDiameterMm);
    }

    [Fact]
    public void Metal_Aluminium_ReachesTheEngine_EvenWithTheAssumedEnamel()
    {
        State.EditWinding(0, w => { w.ConductorDiameter = "0.5"; w.OverallDiameter = string.Empty; w.Metal = "aluminium"; });

        var wire = State.Plan!.Windings[0].Wire;
        Assert.Same(ConductorMaterial.Aluminium, wire.Metal);
        Assert.True(wire.OverallDiameterAssumed);
    }

    [Fact]
    public void Metal_Unknown_FromALoadedPlan_IsAnErrorAtTheMetal()
    {
        State.Load(Parse(PlanWith("""{ "awg": 24, "metal": "silver" }""")));

        Assert.Contains("silver", State.ErrorFor("windings[0].wire.metal"), StringComparison.Ordinal);
    }

    [Fact]
    public void UseSuggestion_SwitchesToTheTable()
    {
        State.EditWinding(0, w => w.WireForm = WireForm.Litz);
        State.SuggestWires(0);
        Assert.Null(State.SuggestionsFor(0));
        State.EditWinding(0, w => w.WireForm = WireForm.Custom);
        State.SuggestWires(0);
        var choice = State.SuggestionsFor(0)!.Choices[0];

        State.UseSuggestion(0, choice);

        Assert.Equal(WireForm.Table, State.Windings[0].WireForm);
        Assert.Equal(choice.StandardId, State.ToDocument().Windings![0]!.Wire!.StandardId);
    }
}
