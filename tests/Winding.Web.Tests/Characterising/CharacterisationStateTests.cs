using Microsoft.Extensions.Logging.Abstractions;
using Winding.Web.Characterising;
using Winding.Web.Hosting;

namespace Winding.Web.Tests.Characterising;

/// <summary>The measuring page's view model: caliper reading, test winding, Touchstone sweep, saving with provenance.</summary>
public sealed class CharacterisationStateTests : IDisposable
{
    private readonly string _data = Path.Combine(Path.GetTempPath(), "winding-measure-" + Guid.NewGuid().ToString("N"));
    private readonly CatalogueProvider _provider;
    private readonly CharacterisationState _state;

    public CharacterisationStateTests()
    {
        _provider = new CatalogueProvider(new WindingPaths(Path.Combine(AppContext.BaseDirectory, "cores"), _data), TimeProvider.System, NullLogger<CatalogueProvider>.Instance);
        _state = new CharacterisationState(_provider, TimeProvider.System)
        {
            Shape = "toroid",
            OuterDiameter = "10",
            InnerDiameter = "5",
            Length = "4",
            Turns = "10",
        };
    }

    public void Dispose()
    {
        if (Directory.Exists(_data))
        {
            Directory.Delete(_data, recursive: true);
        }
    }

    [Fact]
    public void Inductance_GivesAlAndMuE_AndSavesCoreAndMaterialWithProvenance()
    {
        // physics-sources.md §12: ring 10/5/4 mm, N = 10, 6.93 µH → AL 69.3 nH, μe 124.973 (IEC 62044-2 relations).
        _state.Frequency = "10 kHz";
        _state.Inductance = "6.93u";

        _state.Characterise();
        _state.SaveName = "Toroid 10 × 5 × 4 mm (bench)";
        _state.Save();

        Assert.Equal(124.973, _state.Result!.FromInductance!.EffectivePermeability, 124.973 * 2e-5);
        var core = _provider.Catalogue.CoresById[_state.SavedCoreId!];
        Assert.False(core.BuiltIn);
        Assert.Contains("6.93u at 10 kHz", core.Material.Source, StringComparison.Ordinal);
        Assert.Equal(124.973, core.Material.Material.InitialPermeability, 124.973 * 2e-5);
    }

    [Fact]
    public void TouchstoneSweep_IsFitted_AndSavedAsAPermeabilityTable()
    {
        // The three impedances of physics-sources.md §12 (N = 10 on ring 10/5/4 mm) as a Touchstone file in ohms.
        _state.LoadTouchstone("winding.s1p", "# MHz Z RI R 1\n1 0.75 43.55\n10 139.4 348.4\n100 2090 697\n");
        _state.Characterise();
        _state.SaveName = "Toroid 10 × 5 × 4 mm (swept)";
        _state.Save();

        Assert.Equal(3, _state.Impedances.Count);
        Assert.NotNull(_state.Result!.Fit);
        var material = _provider.Catalogue.CoresById[_state.SavedCoreId!].Material;
        Assert.True(material.PermeabilityPoints.Count >= 8);
        Assert.Contains("Cole–Cole", material.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void TypedImpedances_AreReadWithSiPrefixes()
    {
        // physics-sources.md §12 impedances typed in: 10 MHz 139.4 + j348.4 Ω → μs′ 99.996 (N = 10, ring 10/5/4 mm).
        _state.LoadTypedImpedances("! f R X\n1M 0.75 43.55\n10M 139.4 348.4\n100M 2090 697\n");
        _state.Characterise();

        Assert.Equal(3, _state.Impedances.Count);
        Assert.Equal(99.996, _state.Result!.MeasuredPermeability[1].MuPrime, 99.996 * 1e-4);

        _state.LoadTypedImpedances("1M 0.75\n");
        Assert.Contains("Line 1", _state.FileMessage, StringComparison.Ordinal);
    }

    [Fact]
    public void MalformedTouchstone_IsRefusedWithItsLineNumber()
    {
        _state.LoadTouchstone("bad.s1p", "# MHz Z RI R 1\n1 0.75 43.55\n2 x 5\n");

        Assert.Empty(_state.Impedances);
        Assert.Contains("line 3", _state.FileMessage, StringComparison.Ordinal);
    }

    [Fact]
    public void MissingTurns_IsAFieldError()
    {
        _state.Turns = string.Empty;
        _state.Inductance = "10u";

        _state.Characterise();

        Assert.Null(_state.Result);
        Assert.NotNull(_state.ErrorFor("turns"));
    }

    [Fact]
    public void CaliperInInches_GivesTheSameResultAsMillimetres()
    {
        // 0.5 in = 12.7 mm, 0.25 in = 6.35 mm, 0.125 in = 3.175 mm exactly (1 in = 25.4 mm): the same ring either way.
        _state.Frequency = "10 kHz";
        _state.Inductance = "6.93u";
        (_state.OuterDiameter, _state.InnerDiameter, _state.Length) = ("12.7", "6.35", "3.175");
        _state.Characterise();
        var inMillimetres = _state.Result!.FromInductance!.EffectivePermeability;

        (_state.OuterDiameter, _state.InnerDiameter, _state.Length) = ("0.5 in", "0.25\"", "125 mil");
        _state.Characterise();

        Assert.Equal(inMillimetres, _state.Result!.FromInductance!.EffectivePermeability);
    }

    [Fact]
    public void CaliperWithMAlone_IsAnErrorAtThatField()
    {
        _state.OuterDiameter = "10m";
        _state.Frequency = "10 kHz";
        _state.Inductance = "6.93u";

        _state.Characterise();

        Assert.Contains("ambiguous", _state.ErrorFor("core.dimensionsMm.outerDiameter"), StringComparison.Ordinal);
        Assert.Null(_state.Result);
    }
}
