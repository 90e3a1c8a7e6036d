using BenchmarkDotNet.Attributes;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Benchmarks;

/// <summary>How long one plan takes: the engine without operating conditions, the full evaluation with 401- and 10,001-point sweeps, the wire picker for one winding, and validation of the request document plus the engine.</summary>
[MemoryDiagnoser]
public class EvaluateBenchmarks
{
    private TransformerPlan _plan = default!;
    private TransformerPlan _operatingPlan = default!;
    private TransformerPlan _wideSweepPlan = default!;
    private PlanDocument _document = default!;

    [GlobalSetup]
    public void Setup()
    {
        var core = ToroidCore.Create(Length.FromMillimetres(36), Length.FromMillimetres(23), Length.FromMillimetres(15));
        _plan = new TransformerPlan(
            "benchmark",
            new PlanCore(core, 1, MagneticMaterial.Create("NiZn, μi 125", 125)),
            [
                WindingSpec.Create("primary", 4, WindingWire.Solid(Length.FromMillimetres(0.8), Length.FromMillimetres(0.86))),
                WindingSpec.Create("secondary", 100, WindingWire.Enamelled(Length.FromMillimetres(0.25))),
            ],
            new OperatingConditions(1.8e6, 30e6, 50, 450, 10),
            WireLengthAllowance.Default);
        var catalogue = CatalogueLoader.Load(Path.Combine(AppContext.BaseDirectory, "cores"));
        _operatingPlan = PlanReader.Read(
            new PlanDocument
            {
                Core = new PlanCoreDocument { CatalogueId = "toroid-36x23x15-nizn-125" },
                Windings =
                [
                    new PlanWindingDocument { Name = "primary", Turns = 4, Wire = new PlanWireDocument { MetricMm = 0.8 } },
                    new PlanWindingDocument { Name = "secondary", Turns = 12, Wire = new PlanWireDocument { MetricMm = 0.5 } },
                ],
                Operating = new PlanOperatingDocument { MinFrequencyHz = 1.8e6, MaxFrequencyHz = 30e6, SourceResistanceOhm = 50, LoadResistanceOhm = 450, DriveVoltageRms = 70 },
            },
            catalogue).Plan ?? throw new InvalidOperationException("The benchmark plan is invalid.");
        _wideSweepPlan = _operatingPlan with { Sweep = new SweepSettings(null, null, 10_001) };
        _document = new PlanDocument
        {
            Core = new PlanCoreDocument { Shape = "toroid", DimensionsMm = new() { OuterDiameter = 36, InnerDiameter = 23, Height = 15 }, InitialPermeability = 125 },
            Windings =
            [
                new PlanWindingDocument { Name = "primary", Turns = 4, Wire = new PlanWireDocument { ConductorDiameterMm = 0.8, OverallDiameterMm = 0.86 } },
                new PlanWindingDocument { Name = "secondary", Turns = 100, Wire = new PlanWireDocument { ConductorDiameterMm = 0.25 } },
            ],
        };
    }

    [Benchmark]
    public PlanEvaluation EvaluatePlan() => PlanEvaluator.Evaluate(_plan);

    /// <summary>The full evaluation: operating point, parasitics, equivalent circuit, a 401-point sweep, band edges and the tolerance band.</summary>
    [Benchmark]
    public PlanEvaluation EvaluateWithSweep401() => PlanEvaluator.Evaluate(_operatingPlan);

    /// <summary>The same with a 10,001-point sweep.</summary>
    [Benchmark]
    public PlanEvaluation EvaluateWithSweep10001() => PlanEvaluator.Evaluate(_wideSweepPlan);

    [Benchmark]
    public WireChoiceReport WireChoicesForPrimary() => WireGaugePicker.ChooseWithReport(_operatingPlan, 0, 1.4, 30e6);

    [Benchmark]
    public PlanEvaluation ValidateAndEvaluate() => PlanEvaluator.Evaluate(PlanReader.Read(_document, CoreCatalogue.Empty).Plan!);
}
