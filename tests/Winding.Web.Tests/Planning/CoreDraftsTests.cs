using Microsoft.Extensions.DependencyInjection;
using Winding.Web.Planning;

namespace Winding.Web.Tests.Planning;

/// <summary>
/// A core typed on the plan page (a salvaged ring or sleeve measured with a caliper): read by the same reader as the
/// API, errors at the field, kept in saved and exported plans, and left for a catalogue core and back.
/// </summary>
public sealed class CoreDraftsTests : WindingComponentTestBase
{
    private PlanningState State => Services.GetRequiredService<PlanningState>();

    private void TypeRing(string od, string id, string height) => State.EditTypedCore(c =>
    {
        c.Shape = "toroid";
        c.Dimensions["outerDiameter"] = od;
        c.Dimensions["innerDiameter"] = id;
        c.Dimensions["height"] = height;
    });

    [Fact]
    public void MeasuredAlAlone_GivesL_EqualAlTimesNSquared()
    {
        TypeRing("23", "14", "7");
        State.EditTypedCore(c => { c.MaterialBasis = CoreMaterialBasis.MeasuredAl; c.MeasuredAl = "120"; });
        State.EditWinding(0, w => w.Turns = "6");

        Assert.Empty(State.Errors);
        // L = AL·N² (definition of AL, IEC 60050-221): 120 nH × 36 = 4.32 µH.
        Assert.Equal(4.32e-6, State.Result!.Windings[0].InductanceH, 1e-15);
        Assert.Equal(120e-9, State.Result.Core.InductanceFactor.HenriesPerTurnSquared, 1e-18);
        var document = State.ToDocument();
        Assert.Null(document.Core!.CatalogueId);
        Assert.Equal(120, document.Measured!.AlNh);
        Assert.NotNull(document.Core.InitialPermeability);
    }

    [Theory]
    [InlineData("120 nH")]
    [InlineData("0.12 µH")]
    [InlineData("0,12 µH")]
    public void MeasuredAl_WithAUnit_IsReadInNanohenries(string text)
    {
        TypeRing("23", "14", "7");
        State.EditTypedCore(c => c.MeasuredAl = text);

        Assert.Equal(120, State.ToDocument().Measured!.AlNh!.Value, 9);
    }

    [Fact]
    public void TypedPermeability_GivesTheIec60205Al()
    {
        TypeRing("10", "5", "4");
        State.EditTypedCore(c => { c.MaterialBasis = CoreMaterialBasis.Permeability; c.Permeability = "125"; });

        // Ring 10 × 5 × 4 mm, μi 125: AL = 69.3147 nH (IEC 60205 ring formulas; physics-sources.md §2.2).
        Assert.Equal(69.3147e-9, State.Result!.Core.InductanceFactor.HenriesPerTurnSquared, 1e-13);
    }

    [Fact]
    public void MaterialClass_GivesTheSameAlAsTheCatalogueCoreOfThoseDimensions()
    {
        TypeRing("10", "5", "4");
        State.EditTypedCore(c => { c.MaterialBasis = CoreMaterialBasis.MaterialClass; c.MaterialId = "nizn-850"; });

        // AL of a 10 × 5 × 4 mm ring at μi 850 is 471.34 nH (IEC 60205; physics-sources.md §2.2).
        Assert.Equal(471.34e-9, State.Result!.Core.InductanceFactor.HenriesPerTurnSquared, 0.01e-9);
        Assert.Equal(State.Materials.Single(m => m.Id == "nizn-850").Name, State.CoreMaterialName);
    }

    [Fact]
    public void Stack_OfTwoTypedRings_DoublesTheAl()
    {
        TypeRing("10", "5", "4");
        State.EditTypedCore(c => { c.MaterialBasis = CoreMaterialBasis.Permeability; c.Permeability = "125"; });
        var single = State.Result!.Core.InductanceFactor.HenriesPerTurnSquared;

        State.EditStack("2");

        // Two identical rings side by side: twice Ae over the same le (IEC 60205 summation), so twice the AL.
        Assert.Equal(2 * single, State.Result!.Core.InductanceFactor.HenriesPerTurnSquared, 1e-15);
    }

    [Theory]
    [InlineData("14", "23", "7", "core.dimensionsMm.innerDiameter", "must be smaller")]
    [InlineData("23", "14", "", "core.dimensionsMm.height", "Required")]
    [InlineData("23", "14", "seven", "core.dimensionsMm.height", "'seven'")]
    [InlineData("23", "14", "2000", "core.dimensionsMm.height", "out of range")]
    public void BadDimension_IsAnErrorAtThatDimension(string od, string id, string height, string field, string words)
    {
        TypeRing(od, id, height);
        State.EditTypedCore(c => c.MeasuredAl = "120");

        Assert.Contains(words, State.ErrorFor(field), StringComparison.Ordinal);
        Assert.Null(State.Result);
    }

    [Fact]
    public void MeasuredAlMissing_IsAnErrorAtTheAl_AndNotAboutAMaterial()
    {
        TypeRing("23", "14", "7");

        Assert.Contains("required", State.ErrorFor("measured.alNh"), StringComparison.Ordinal);
        Assert.Null(State.ErrorFor("core.materialId"));
        Assert.Null(State.ErrorFor("core"));
    }

    [Fact]
    public void MeasuredAlBelowAnAirCore_IsAnErrorAtTheAl()
    {
        TypeRing("23", "14", "7");
        State.EditTypedCore(c => c.MeasuredAl = "0.001");

        Assert.Contains("air", State.ErrorFor("measured.alNh"), StringComparison.Ordinal);
    }

    [Fact]
    public void PermeabilityOutOfRange_IsAnErrorAtTheμi()
    {
        TypeRing("23", "14", "7");
        State.EditTypedCore(c => { c.MaterialBasis = CoreMaterialBasis.Permeability; c.Permeability = "0.5"; });

        Assert.Contains("out of range", State.ErrorFor("core.initialPermeability"), StringComparison.Ordinal);
    }

    [Fact]
    public void Stack_Zero_IsAnErrorAtTheStack()
    {
        State.EditStack("0");

        Assert.Contains("out of range", State.ErrorFor("core.stack"), StringComparison.Ordinal);
    }

    [Fact]
    public void SwitchBackToTheCatalogue_UsesTheCatalogueCore_AndKeepsTheTypedOne()
    {
        var catalogueAl = State.Result!.Core.InductanceFactor.HenriesPerTurnSquared;
        TypeRing("23", "14", "7");
        State.EditTypedCore(c => c.MeasuredAl = "120");

        State.UseCoreSource(CoreSource.Catalogue);

        Assert.Equal(catalogueAl, State.Result!.Core.InductanceFactor.HenriesPerTurnSquared);
        Assert.Equal(PlanningState.DefaultCoreId, State.ToDocument().Core!.CatalogueId);
        Assert.Null(State.ToDocument().Measured);
        State.UseCoreSource(CoreSource.Typed);
        Assert.Equal(120e-9, State.Result!.Core.InductanceFactor.HenriesPerTurnSquared, 1e-18);
    }

    [Fact]
    public void SavedPlan_KeepsTheTypedCore()
    {
        TypeRing("23", "14", "7");
        State.EditTypedCore(c => c.MeasuredAl = "120");
        State.EditStack("2");
        var before = WireDraftsTests.Canonical(State.ToDocument());
        State.PlanName = "Salvaged ring";
        State.Save();
        var id = State.SavedId!;
        State.UseCoreSource(CoreSource.Catalogue);

        Assert.True(State.LoadSaved(id));

        Assert.Equal(CoreSource.Typed, State.CoreSource);
        Assert.Equal(CoreMaterialBasis.MeasuredAl, State.TypedCore.MaterialBasis);
        Assert.Equal("120", State.TypedCore.MeasuredAl);
        Assert.Equal("23", State.TypedCore.Dimension("outerDiameter"));
        Assert.Equal("2", State.Stack);
        var after = State.ToDocument();
        after.Name = null;
        Assert.Equal(before, WireDraftsTests.Canonical(after));
    }

    [Theory]
    [InlineData("""{ "shape": "toroid", "dimensionsMm": { "outerDiameter": 23, "innerDiameter": 14, "height": 7, "coatingThickness": 0.1 }, "initialPermeability": 125 }""", "")]
    [InlineData("""{ "shape": "toroid", "dimensionsMm": { "outerDiameter": 23, "innerDiameter": 14, "height": 7 }, "initialPermeability": 250 }""", """{ "alNh": 120 }""")]
    [InlineData("""{ "shape": "toroid", "dimensionsMm": { "outerDiameter": 10, "innerDiameter": 5, "height": 4 }, "materialId": "nizn-850", "stack": 2 }""", "")]
    [InlineData("""{ "shape": "sleeve", "dimensionsMm": { "outerDiameter": 25, "innerDiameter": 13, "length": 35, "residualGap": 0.02 }, "initialPermeability": 1500 }""", """{ "alNh": 800, "leakageInductanceH": 1e-7 }""")]
    [InlineData("""{ "shape": "two-hole", "dimensionsMm": { "length": 10, "holeDiameter": 3, "holeSpacing": 5, "width": 12, "height": 7 }, "materialId": "nizn-850" }""", "")]
    [InlineData("""{ "shape": "bobbin", "family": "E", "dimensionsMm": { "windowBreadth": 10, "windowHeight": 5, "legWidth": 5, "legDepth": 5 }, "effective": { "areaMm2": 25, "lengthMm": 40 }, "alNh": 1000, "materialId": "mnzn-2000" }""", "")]
    public void Load_TypedCoreOfAnyShape_ExportsUnchanged(string core, string measured)
    {
        var document = WireDraftsTests.Parse(WireDraftsTests.PlanWith("""{ "conductorDiameterMm": 0.3 }""", core, measured));

        State.Load(document);

        Assert.Equal(CoreSource.Typed, State.CoreSource);
        Assert.Empty(State.Errors);
        Assert.NotNull(State.Result);
        Assert.Equal(WireDraftsTests.Canonical(document), WireDraftsTests.Canonical(State.ToDocument()));
    }

    [Fact]
    public void Load_TypedCoreWithAnAlAndAnotherμi_KeepsTheTypedμi()
    {
        var document = WireDraftsTests.Parse(WireDraftsTests.PlanWith("""{ "conductorDiameterMm": 0.3 }""", """{ "shape": "toroid", "dimensionsMm": { "outerDiameter": 23, "innerDiameter": 14, "height": 7 }, "initialPermeability": 250 }""", """{ "alNh": 120 }"""));

        State.Load(document);

        Assert.Equal(CoreMaterialBasis.Permeability, State.TypedCore.MaterialBasis);
        Assert.Equal("250", State.TypedCore.Permeability);
        Assert.Equal("120", State.TypedCore.MeasuredAl);
    }
}
