using Microsoft.Extensions.Logging.Abstractions;
using Winding.Catalogue.Store;
using Winding.Web.Cataloguing;
using Winding.Web.Hosting;

namespace Winding.Web.Tests.Cataloguing;

/// <summary>Editing catalogue entries: two open forms on one entry (two browser tabs) never lose an edit.</summary>
public sealed class EntryEditorTests : IDisposable
{
    private readonly string _data = Path.Combine(Path.GetTempPath(), "winding-editor-" + Guid.NewGuid().ToString("N"));
    private readonly CatalogueProvider _provider;

    public EntryEditorTests()
    {
        _provider = new CatalogueProvider(new WindingPaths(Path.Combine(AppContext.BaseDirectory, "cores"), _data), TimeProvider.System, NullLogger<CatalogueProvider>.Instance);
    }

    public void Dispose()
    {
        if (Directory.Exists(_data))
        {
            Directory.Delete(_data, recursive: true);
        }
    }

    [Fact]
    public void BuiltIn_IsReadOnly_AndClonesIntoTheUserCatalogue()
    {
        var editor = new EntryEditor(_provider, CatalogueEntryKind.Core, "toroid-36x23x15-nizn-125");

        var id = editor.Clone(editor.SuggestCloneId(), "My toroid");

        Assert.True(editor.BuiltIn);
        Assert.Equal("toroid-36x23x15-nizn-125-copy", id);
        Assert.False(_provider.Catalogue.CoresById[id!].BuiltIn);
        Assert.Equal("My toroid", _provider.Catalogue.CoresById[id!].Name);
    }

    [Fact]
    public void TwoForms_SecondSaveIsAConflict_AndTheFirstEditStays()
    {
        var id = new EntryEditor(_provider, CatalogueEntryKind.Core, "toroid-36x23x15-nizn-125").Clone("bench-core", "Bench core");
        var tabA = new EntryEditor(_provider, CatalogueEntryKind.Core, id!);
        var tabB = new EntryEditor(_provider, CatalogueEntryKind.Core, id!);

        tabA.Name = "Bench core, re-measured";
        tabA.Save();
        tabB.Name = "Bench core, other idea";
        tabB.Save();

        Assert.True(tabA.Succeeded);
        Assert.False(tabB.Succeeded);
        Assert.True(tabB.Conflict);
        Assert.Equal("Bench core, re-measured", _provider.Catalogue.CoresById[id!].Name);
    }

    [Fact]
    public void EditedDimensions_AreValidated_AndHistoryRestores()
    {
        var id = new EntryEditor(_provider, CatalogueEntryKind.Core, "toroid-36x23x15-nizn-125").Clone("bench-ring", "Bench ring");
        var editor = new EntryEditor(_provider, CatalogueEntryKind.Core, id!);

        editor.SetDimension("innerDiameter", "40");
        editor.Save();
        Assert.False(editor.Succeeded);
        Assert.NotNull(editor.ErrorFor("dimensionsMm.innerDiameter"));

        editor.SetDimension("innerDiameter", "24");
        editor.Save();
        Assert.True(editor.Succeeded);
        Assert.Equal(2, editor.Version);

        editor.Restore(1);
        Assert.True(editor.Succeeded);
        Assert.Equal("23", editor.Dimensions["innerDiameter"]);
        Assert.Equal(3, editor.Version);
    }

    [Fact]
    public void MaterialForm_SaturationRisingWithTemperature_IsRefusedAtItsField()
    {
        // B_sat falls as the temperature rises (Snelling 1988, from memory): 100 °C above 25 °C is refused.
        var id = new EntryEditor(_provider, CatalogueEntryKind.Material, "nizn-125").Clone("bench-ferrite", "NiZn, μi 125 (bench)");
        var editor = new EntryEditor(_provider, CatalogueEntryKind.Material, id!);

        editor.SaturationAt25C = "0.30";
        editor.SaturationAt100C = "0.35";
        editor.Save();

        Assert.False(editor.Succeeded);
        Assert.NotNull(editor.ErrorFor("saturationFluxDensityT.at100C"));

        editor.SaturationAt100C = "0.25";
        editor.CurieTemperature = "300";
        editor.Save();
        Assert.True(editor.Succeeded, editor.Message);
        Assert.Equal(0.25, _provider.Catalogue.MaterialsById[id!].Material.Saturation!.At100CT, 1e-12);
    }

    [Fact]
    public void Delete_RemovesTheEntry()
    {
        var id = new EntryEditor(_provider, CatalogueEntryKind.Material, "nizn-125").Clone("bench-mix", "NiZn, μi 125 (bench)");
        var editor = new EntryEditor(_provider, CatalogueEntryKind.Material, id!);

        Assert.True(editor.Delete());

        Assert.False(_provider.Catalogue.MaterialsById.ContainsKey(id!));
    }

    [Fact]
    public void DimensionTypedInInches_IsSavedInMillimetres_AndShownWithAllItsDigits()
    {
        var id = new EntryEditor(_provider, CatalogueEntryKind.Core, "toroid-36x23x15-nizn-125").Clone("inch-core", "Inch core");
        var editor = new EntryEditor(_provider, CatalogueEntryKind.Core, id!);

        // 1.5 in = 38.1 mm exactly (1 in = 25.4 mm).
        editor.SetDimension("outerDiameter", "1.5 in");
        editor.Save();

        Assert.True(editor.Succeeded, editor.Message);
        Assert.Equal("38.1", new EntryEditor(_provider, CatalogueEntryKind.Core, id!).Dimensions["outerDiameter"]);
    }
}
