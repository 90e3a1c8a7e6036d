using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Core.Geometry;

namespace Winding.Catalogue.Tests.Loading;

/// <summary>
/// The shipped catalogue (top-level <c>cores/</c>): it loads cleanly, covers the shapes and material classes the app
/// promises, and is self-consistent. Its values are generic class values from memory (see each file's source), so these
/// tests check structure, physical bounds and naming, never the numbers themselves.
/// </summary>
public sealed partial class BuiltInCatalogueTests
{
    private static readonly CoreCatalogue BuiltIn = CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores"));

    /// <summary>μ0 = 4π×10⁻⁷ H/m (SI before 2019; the 2019 value differs by 5.5×10⁻¹⁰ relative, physics-sources.md constants).</summary>
    private const double Mu0HPerM = 4e-7 * Math.PI;

    /// <summary>
    /// SHA-256 of lower-case maker names of ferrite and powder cores (from memory). Kept hashed so that no brand name is
    /// written anywhere in the repository, while a name that slips into an entry is still caught.
    /// </summary>
    private static readonly HashSet<string> BrandWordHashes =
    [
        "2f77309c2f30d028132a8616e9455d24cc9a2c3ece4b72387462dc03e0a75022", "1d4c753e58ed35629afb2c82c54ccee31ac0264dcad9ecf6a40a51e86ab2df44",
        "daf79813ecfbe95e289ecd0934b952d535625a480764e5616a6636817789aea8", "539e438c4879b06809e18e15265510188508f73e417e169f9e042385b590d42b",
        "2e4cb2b12b31d70bf20dbea7f5e409207a5fc3387814f2208cbb17813a9c0484", "3a33e32390ad0af77ae285e9a9e3e4afb13cd4a0f148fbe32702f015323923a3",
        "5186015e19b55660e14ca606cc333cd3b54f5d448dff0d6e88e6c3bb18ddbb40", "a66e7109d7cf60d8dbaa05b13727583314276edc48193ec76f820450acf2723e",
        "a7ba8282602892b786a511c0462852022b5b806695e34eea5088a3efa601f00d", "08a22a9da607ecf3531fa3a87b197d705a28f7e303a250db99c7f026189de26b",
        "76faa0295e4f0a68c6ab2dac601d308a7170260be3f245eb3b63a784e4a03824", "74bbf83ae135bb7d7329ada56a1fb32b83ad1602c47573740c81b2befa433c10",
        "956a017fee5fe3c1174a46702dd5335383587c2063516f11fe1e693b7f8eedde", "822b33ad87c148a0a20a5ba7cd5ebcaa68d36a18e7aad165554903f52ca82757",
        "98f4270f09c07130b91985c80ab067e3f09d61f24636eb30784634aea6958a69", "ca6e0dc328e4570d5a249d57980b2a03b24da6877b698b953201d6eb906fe09d",
        "b347159650d886f1bb0b4b2486b293fb5a14e137e0b69ccba8f8411a2a84ade9", "dd4cb9cf52f0a9f1529c3b994274c8ab304b6b9f21ac69403a46f639fd026b1a",
        "30e363d3e8c59f2c1319f8d73d48e3ad26db5e087951a4d7ab809c6f5401aea8", "541af776155855194e527a9ada9d80bd73fc16ba47744fc570a6caadd9cd0959",
        "1e84855630913c012d541a4720d243e6d07e8131ae47ebc69c5b0e11c36e6eee", "995917920bef81f503f6e44bc62e89ed0ab3719da67e9173a0e261018b9ac9a0",
        "55a4c86b3b73bc5013198eadf522b01bf6a7a4195cd0d589721d2ca5645117cf", "34aed63e78906dd2de00a092c9555e105ae3df49e54ece5d11dadb3d89401f01",
        "ac1324e68ea94ce3098234355c6e7966d9443917cff90312bba571c0d295b01f", "f6f3437f1cb934bf88c7d86ce50ab266d84a202bc5c763e8fe7a535ce402844f",
        "6483d4f5b8fc2c93d592c0a99fb91459acb2bc69205f91a353d7d2d74bc0b18d", "9dc0da260b2a5c28007b5c81ef538ffebfb3dcc5542de16ce1819d889edb60ec",
        "17422a689aaafeb559e287deba27082846ab0d6bc53a96ac192b1872e3efff91", "d27259ee86ca15dcb8be1f2fb49cc9cd072081a2507b2d7330640c2609a6241b",
        "8e2158e6597c3d2aedde2ea71724c2397bbbe46dd0cee0f00ca2ff4a3edd2150", "69d659d572131d94afdddac81e49cf147a8d2702d6ab2c5cabbcb71fd3223c8a",
        "93378447ced05b50c2f8b9e95da0927efffc292ff0fca18ace6019f66a91343b", "3c64fe4c5a038d3fce3d845ffcf8c6c46f6d4dd2b7725d13ae1d43918b1f4d9b",
        "fd226f257ce036ed5c9329a8f00ee8369f5a757ad769abdf5b45706d8ac1b8ce", "4bb9d37aff53efd6307c8a465662e1d5c498dd2c3cabafddb15610bbb9633a90",
    ];

    /// <summary>Colour words, as used for colour-coded powder cores.</summary>
    private static readonly HashSet<string> ColourWords =
        ["red", "yellow", "black", "white", "grey", "gray", "green", "blue", "brown", "orange", "violet", "purple", "pink", "tan"];

    [Fact]
    public void BuiltIn_LoadsEveryFileWithoutProblems()
    {
        Assert.True(BuiltIn.Problems.Count == 0, string.Join(Environment.NewLine, BuiltIn.Problems.Select(p => $"{p.FileName} {p.JsonPath}: {p.Reason}")));
    }

    [Fact]
    public void BuiltIn_HasAtLeastFortyCoresCoveringEveryShape()
    {
        Assert.True(BuiltIn.Cores.Count >= 40, $"{BuiltIn.Cores.Count} cores");
        Assert.All(CoreShapes.All, shape => Assert.Contains(BuiltIn.Cores, c => c.Shape.ShapeName == shape));
        var sleeves = BuiltIn.Cores.Select(c => c.Shape).OfType<SleeveCore>().ToList();
        Assert.Contains(sleeves, s => !s.IsSplit);
        var bobbins = BuiltIn.Cores.Select(c => c.Shape).OfType<BobbinCore>().ToList();
        Assert.All(new[] { "E", "pot", "RM" }, family => Assert.Contains(bobbins, b => b.Family == family));
        Assert.Contains(bobbins, b => b.EnteredAl is not null);
        var toroids = BuiltIn.Cores.Where(c => c.Shape is ToroidCore).ToList();
        Assert.InRange(toroids.Min(t => ((ToroidCore)t.Shape).OuterDiameter.Millimetres), 5, 7);
        Assert.InRange(toroids.Max(t => ((ToroidCore)t.Shape).OuterDiameter.Millimetres), 55, 65);
        Assert.True(toroids.Select(t => t.Material.Id).Distinct().Count() >= 5, "toroids in at least five materials");
    }

    [Theory]
    [InlineData(5)]
    [InlineData(7)]
    [InlineData(10)]
    [InlineData(13)]
    public void BuiltIn_HasASplitSleeveForEachCommonCableSize_WithAResidualGapOfHundredthsOfAMillimetre(double cableMm)
    {
        var fitting = BuiltIn.Cores.Select(c => c.Shape).OfType<SleeveCore>()
            .Where(s => s.IsSplit && Math.Abs(s.BoreDiameter.Millimetres - cableMm) <= 1)
            .ToList();

        Assert.NotEmpty(fitting);
        Assert.All(fitting, s => Assert.InRange(s.ResidualGap.Millimetres, 0.01, 0.1));
    }

    [Fact]
    public void BuiltIn_HasTenMaterialsCoveringTheListedClasses()
    {
        var materials = BuiltIn.Materials;
        Assert.True(materials.Count >= 10, $"{materials.Count} materials");

        bool Has(string family, double minMu, double maxMu) =>
            materials.Any(m => m.Family == family && m.Material.InitialPermeability >= minMu && m.Material.InitialPermeability <= maxMu);

        Assert.True(Has(MaterialFamilies.NickelZinc, 30, 50), "NiZn about 40");
        Assert.True(Has(MaterialFamilies.NickelZinc, 100, 150), "NiZn about 125");
        Assert.True(Has(MaterialFamilies.NickelZinc, 200, 300), "NiZn about 250");
        Assert.True(Has(MaterialFamilies.NickelZinc, 700, 1000), "NiZn about 850");
        Assert.True(Has(MaterialFamilies.NickelZinc, 1200, 2000), "NiZn about 1500");
        Assert.True(Has(MaterialFamilies.ManganeseZinc, 1500, 3000), "MnZn power about 2000");
        Assert.True(Has(MaterialFamilies.ManganeseZinc, 4000, 6000), "MnZn about 5000");
        Assert.True(Has(MaterialFamilies.ManganeseZinc, 8000, 15000), "MnZn about 10000");
        Assert.True(Has(MaterialFamilies.IronPowder, 5, 15), "iron powder about 10");
        Assert.True(Has(MaterialFamilies.IronPowder, 25, 50), "iron powder about 35");
    }

    [Theory]
    [InlineData("nizn-125")]
    [InlineData("nizn-850")]
    [InlineData("mnzn-5000")]
    [InlineData("toroid-10x5x4-nizn-850")]
    [InlineData("toroid-23x14x7-nizn-125")]
    [InlineData("toroid-25x15x10-mnzn-5000")]
    [InlineData("toroid-36x23x15-nizn-125")]
    [InlineData("toroid-61x36x13-nizn-125")]
    public void BuiltIn_KeepsTheIdsOtherTestsUse(string id)
    {
        Assert.True(BuiltIn.MaterialsById.ContainsKey(id) || BuiltIn.CoresById.ContainsKey(id), id);
    }

    [Fact]
    public void BuiltIn_EveryCoresMaterialIsInTheCatalogue_AndItsIdEndsWithTheMaterial()
    {
        Assert.All(BuiltIn.Cores, c =>
        {
            Assert.Same(BuiltIn.MaterialsById[c.Material.Id], c.Material);
            Assert.EndsWith("-" + c.Material.Id, c.Id, StringComparison.Ordinal);
        });
    }

    [Fact]
    public void BuiltIn_EveryMaterialIsFullyDescribed_WithATableOfAtLeastEightIncreasingPoints()
    {
        Assert.All(BuiltIn.Materials, m =>
        {
            var points = m.PermeabilityPoints;
            Assert.True(points.Count >= 8, $"{m.Id}: {points.Count} points");
            Assert.All(points.Zip(points.Skip(1)), pair => Assert.True(pair.Second.FrequencyHz > pair.First.FrequencyHz, m.Id));
            Assert.All(points, p => Assert.True(p.MuPrime > 0 && p.MuDoublePrime >= 0, m.Id));
            Assert.NotNull(m.Material.Saturation);
            Assert.NotNull(m.Material.Steinmetz);
            Assert.NotNull(m.Material.ResistivityOhmM);
            Assert.NotNull(m.Material.CurieTemperatureC);
            Assert.Contains("from memory", m.Source, StringComparison.Ordinal);
        });
    }

    [Fact]
    public void BuiltIn_EnteredBobbinAl_NeverExceedsTheUngappedBound()
    {
        // AL = μ0·μr·Ae/le (IEC 60050-221 / IEC 60205 definitions; physics-sources.md §2.1). A gap lowers μe below μi
        // (Snelling 1988, from memory: μe ≈ μi/(1 + μi·g/le)), so an entered AL can never exceed μ0·μi·Ae/le.
        var gapped = BuiltIn.Cores.Where(c => c.Shape is BobbinCore { EnteredAl: not null }).ToList();
        Assert.NotEmpty(gapped);
        Assert.All(gapped, c =>
        {
            var bobbin = (BobbinCore)c.Shape;
            var boundH = Mu0HPerM * c.Material.Material.InitialPermeability * bobbin.EffectiveAreaM2 / bobbin.EffectiveLengthM;
            Assert.True(bobbin.EnteredAl!.Value.HenriesPerTurnSquared <= boundH, $"{c.Id}: AL {bobbin.EnteredAl.Value.NanohenriesPerTurnSquared} nH > {boundH * 1e9} nH");
        });
    }

    [Fact]
    public void BuiltIn_NamesDescribeShapeAndSizeOnly()
    {
        string[] corePrefixes = ["Toroid ", "Sleeve ", "Split sleeve ", "Two-hole ", "E-type bobbin core, ", "Pot-type bobbin core, ", "RM-type bobbin core, "];
        string[] materialPrefixes = ["NiZn", "MnZn", "Iron powder"];

        Assert.All(BuiltIn.Cores, c => Assert.Contains(corePrefixes, p => c.Name.StartsWith(p, StringComparison.Ordinal)));
        Assert.All(BuiltIn.Materials, m => Assert.Contains(materialPrefixes, p => m.Name.StartsWith(p, StringComparison.Ordinal)));
        Assert.Equal(BuiltIn.Cores.Count, BuiltIn.Cores.Select(c => c.Name + " · " + c.Material.Name).Distinct().Count());
    }

    [Fact]
    public void BuiltIn_HasNoPartNumbersBrandsOrColourCodes()
    {
        var names = BuiltIn.Cores.Select(c => c.Name).Concat(BuiltIn.Materials.Select(m => m.Name)).ToList();
        var texts = BuiltIn.Cores.SelectMany(c => new[] { c.Id, c.Name, c.Source })
            .Concat(BuiltIn.Materials.SelectMany(m => new[] { m.Id, m.Name, m.Source, m.Family }))
            .ToList();

        Assert.All(names, name => Assert.False(LooksLikePartNumber(name), name));
        Assert.All(texts, text => Assert.False(HasBrandWord(text, BrandWordHashes), text));
        Assert.All(texts, text => Assert.DoesNotContain(Words(text), ColourWords.Contains));
    }

    [Theory]
    [InlineData("Toroid FT37 mm")]
    [InlineData("E25/13/7")]
    [InlineData("Material 3C90")]
    [InlineData("Toroid T-50")]
    [InlineData("Mix #2")]
    [InlineData("Sleeve® 5 mm")]
    public void LooksLikePartNumber_CatchesTypicalPatterns(string name)
    {
        Assert.True(LooksLikePartNumber(name));
    }

    [Fact]
    public void HasBrandWord_CatchesAHashedWordAloneOrWrittenAsTwo()
    {
        // Self-check of the comparison with a made-up word whose hash is computed here (not a brand).
        HashSet<string> hashes = [Sha256("zzqxwv")];

        Assert.True(HasBrandWord("A core by ZZQXWV, made in 1990", hashes));
        Assert.True(HasBrandWord("A core by zzqx-wv", hashes));
        Assert.False(HasBrandWord("Toroid 36 × 23 × 15 mm", hashes));
    }

    private static bool LooksLikePartNumber(string name) => PartNumberPattern().IsMatch(name);

    private static bool HasBrandWord(string text, HashSet<string> hashes)
    {
        var words = Words(text);
        var pairs = words.Zip(words.Skip(1), (a, b) => a + b);
        return words.Concat(pairs).Any(w => hashes.Contains(Sha256(w)));
    }

    private static List<string> Words(string text) =>
        [.. WordSeparator().Split(text.ToLowerInvariant()).Where(w => w.Length > 0)];

    private static string Sha256(string word) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(word)));

    // A letter touching a digit (FT37, 3C90), letter-hyphen-digit (T-50), digit/digit (25/13), #digit, or a trademark sign.
    [GeneratedRegex(@"\p{L}\d|\d\p{L}|\p{L}-\d|\d/\d|#\s*\d|[®™©]", RegexOptions.CultureInvariant)]
    private static partial Regex PartNumberPattern();

    [GeneratedRegex(@"[^\p{L}\p{N}]+", RegexOptions.CultureInvariant)]
    private static partial Regex WordSeparator();
}
