using CsCheck;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;

namespace Winding.Catalogue.Tests.Plans;

/// <summary>Random documents, most of them nonsense: the reader answers with field errors or a plan, never an exception.</summary>
public sealed class PlanReaderPropertyTests
{
    private static readonly CoreCatalogue BuiltIn = CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores"));

    private static readonly Gen<double?> Number = Gen.OneOf(
        Gen.OneOf(new double?[] { null }),
        Gen.Double.Select(d => (double?)d),
        Gen.Double[-10, 100].Select(d => (double?)d),
        Gen.OneOf<double?>(double.NaN, double.PositiveInfinity, double.NegativeInfinity, 0, -0.0, 1e308, 5e-324));

    private static readonly Gen<int?> Whole = Gen.OneOf(Gen.OneOf(new int?[] { null }), Gen.Int.Select(i => (int?)i), Gen.Int[-3, 200].Select(i => (int?)i));

    private static readonly Gen<string?> Word = Gen.OneOf<string?>(null, "", "toroid", "sleeve", "two-hole", "bobbin", "pot", "spread", "sector", "over", "bifilar", "sine", "pulse", "square", "paper", "other", "copper", "aluminium", "heavy", "single", "E", "toroid-36x23x15-nizn-125", "nizn-125", "metric-0-500-g1", "x");

    private static readonly Gen<PlanWindingDocument?> Winding =
        Gen.Select(Whole, Number, Number, Word, Whole, Number, Number, Word).Select((turns, conductor, overall, kind, other, start, end, metal) => (PlanWindingDocument?)new PlanWindingDocument
        {
            Turns = turns,
            Wire = new PlanWireDocument { ConductorDiameterMm = conductor, OverallDiameterMm = overall, Metal = metal },
            Placement = kind is null ? null : new PlanPlacementDocument { Kind = kind, Winding = other, StartDegrees = start, EndDegrees = end },
            Insulation = metal == "x" ? new PlanInsulationDocument { Material = kind, ThicknessMm = start } : null,
            Taps = other is { } t ? [t] : null,
            RmsCurrentA = end,
        });

    private static readonly Gen<PlanDocument> Documents =
        Gen.Select(Word, Number, Number, Number, Number, Whole, Winding.List[0, 4], Gen.Select(Number, Number, Number, Number, Number, Word))
            .Select((shape, a, b, c, mu, stack, windings, op) => new PlanDocument
            {
                Core = new PlanCoreDocument
                {
                    Shape = shape,
                    CatalogueId = shape == "toroid-36x23x15-nizn-125" ? shape : null,
                    DimensionsMm = new DimensionsMmDocument { OuterDiameter = a, InnerDiameter = b, Height = c, Length = c, HoleDiameter = b, HoleSpacing = a, Width = a, WindowBreadth = a, WindowHeight = b, LegDiameter = c },
                    Effective = shape == "bobbin" ? new EffectiveParametersDocument { AreaMm2 = a, LengthMm = c } : null,
                    InitialPermeability = mu,
                    Stack = stack,
                },
                Windings = windings,
                Operating = new PlanOperatingDocument { MinFrequencyHz = op.Item1, MaxFrequencyHz = op.Item2, SourceResistanceOhm = op.Item3, LoadResistanceOhm = op.Item4, DriveVoltageRms = op.Item5, Waveform = op.Item6 },
            });

    [Fact]
    public void Read_AnyDocument_GivesErrorsOrAPlan_NeverAnException_AndValidPlansEvaluate()
    {
        Documents.Sample(document =>
        {
            var result = PlanReader.Read(document, BuiltIn);
            if (result.IsValid)
            {
                var evaluation = PlanEvaluator.Evaluate(result.Plan!);
                Assert.All(evaluation.Windings, w => Assert.True(double.IsFinite(w.InductanceH) && double.IsFinite(w.WireLengthM)));
            }
            else
            {
                Assert.NotEmpty(result.Errors);
                Assert.All(result.Errors, e => Assert.False(string.IsNullOrWhiteSpace(e.Message)));
            }
        }, iter: 2000);
    }
}
