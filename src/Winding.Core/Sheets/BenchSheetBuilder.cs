using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Windings;

namespace Winding.Core.Sheets;

/// <summary>
/// Builds the <see cref="BenchSheet"/> of a plan from the engine's evaluation of it: the core and windings exactly as
/// evaluated (turns, lengths to cut, layers), the build steps (<see cref="BuildSteps"/>), the bench checks with their
/// tolerances (<see cref="BenchChecks"/>) and the safety cautions (<see cref="SheetCautions"/>). Pure: the date is
/// passed in.
/// </summary>
public static class BenchSheetBuilder
{
    /// <summary>The AL tolerance used when AL was measured on this core: ±5 % (the repeatability of a wound test winding
    /// on an LCR meter; common practice, no source).</summary>
    public const double MeasuredAlTolerance = 0.05;

    /// <summary>Builds the sheet.</summary>
    /// <param name="plan">The plan.</param>
    /// <param name="evaluation">The engine's evaluation of <paramref name="plan"/>.</param>
    /// <param name="date">The sheet's date.</param>
    /// <param name="revision">The saved plan's version (1 and up), or 0 for a plan that is not saved.</param>
    /// <exception cref="ArgumentException">The evaluation does not have one result per winding.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A negative revision.</exception>
    public static BenchSheet Build(TransformerPlan plan, PlanEvaluation evaluation, DateOnly date, int revision)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        ArgumentOutOfRangeException.ThrowIfNegative(revision);
        if (plan.Windings.Count != evaluation.Windings.Count)
        {
            throw new ArgumentException("The evaluation must have one result per winding of the plan.", nameof(evaluation));
        }

        var core = Core(plan, evaluation);
        var rows = new List<SheetWindingRow>(plan.Windings.Count);
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            rows.Add(Row(plan, evaluation, i));
        }

        var title = string.IsNullOrWhiteSpace(plan.Name) ? "Untitled plan" : plan.Name.Trim();
        return new BenchSheet(
            title,
            date,
            revision,
            core,
            rows,
            BuildSteps.For(plan, evaluation, rows),
            BenchChecks.For(plan, evaluation, core.AlTolerance),
            SheetCautions.For(plan, evaluation));
    }

    /// <summary>The AL tolerance the sheet uses: <see cref="MeasuredAlTolerance"/> for a measured AL, else the material's.</summary>
    public static double AlTolerance(PlanCore core)
    {
        ArgumentNullException.ThrowIfNull(core);
        return core.MeasuredAl is not null ? MeasuredAlTolerance : core.Material.AlTolerance;
    }

    private static SheetCoreSummary Core(TransformerPlan plan, PlanEvaluation evaluation)
    {
        var core = plan.Core;
        var tolerance = AlTolerance(core);
        string basis;
        if (core.MeasuredAl is not null)
        {
            basis = "measured on this core (the plan's measured AL), taken as ±5 % (common practice, no source)";
        }
        else if (core.WoundGeometry is BobbinCore { EnteredAl: not null })
        {
            basis = SheetText.Text($"entered from the core's data, with the material's AL tolerance ±{tolerance * 100:0} %");
        }
        else
        {
            basis = SheetText.Text($"AL = μ0·μe/C1 from the effective parameters (IEC 60205), with the material's AL tolerance ±{tolerance * 100:0} %");
        }

        return new SheetCoreSummary(
            core.Shape.ShapeName,
            ShapeText(core.Shape),
            Dimensions(core.Shape),
            core.StackCount,
            core.Material.Name,
            core.Material.InitialPermeability,
            evaluation.Core.EffectivePermeability,
            evaluation.Core.InductanceFactor.HenriesPerTurnSquared,
            tolerance,
            basis,
            evaluation.Core.Effective.EffectiveLengthM,
            evaluation.Core.Effective.EffectiveAreaM2);
    }

    private static string ShapeText(CoreShape shape) => shape switch
    {
        ToroidCore { CoatingThickness.Metres: > 0 } => "ring core (toroid), coated",
        ToroidCore => "ring core (toroid)",
        SleeveCore { IsSplit: true } => "split sleeve (clamp-on)",
        SleeveCore => "sleeve",
        TwoHoleCore => "two-hole core",
        BobbinCore bobbin => bobbin.Family switch
        {
            "other" => "bobbin core",
            var family => family + "-family bobbin core",
        },
        _ => shape.ShapeName,
    };

    private static List<SheetDimension> Dimensions(CoreShape shape)
    {
        var list = new List<SheetDimension>();
        switch (shape)
        {
            case ToroidCore t:
                list.Add(new("outer diameter", t.OuterDiameter.Metres));
                list.Add(new("inner diameter", t.InnerDiameter.Metres));
                list.Add(new("height", t.Height.Metres));
                if (t.CoatingThickness.Metres > 0)
                {
                    list.Add(new("coating", t.CoatingThickness.Metres));
                }

                break;
            case SleeveCore s:
                list.Add(new("outer diameter", s.OuterDiameter.Metres));
                list.Add(new("bore", s.BoreDiameter.Metres));
                list.Add(new("length", s.Length.Metres));
                if (s.IsSplit)
                {
                    list.Add(new("gap between the halves", s.ResidualGap.Metres));
                }

                break;
            case TwoHoleCore h:
                list.Add(new("length", h.Length.Metres));
                list.Add(new("hole diameter", h.HoleDiameter.Metres));
                list.Add(new("hole spacing", h.HoleSpacing.Metres));
                list.Add(new("width", h.Width.Metres));
                list.Add(new("height", h.Height.Metres));
                break;
            case BobbinCore b:
                list.Add(new("window breadth", b.WindowBreadth.Metres));
                list.Add(new("window height", b.WindowHeight.Metres));
                if (b.Leg.IsRound)
                {
                    list.Add(new("centre leg diameter", b.Leg.Width.Metres));
                }
                else
                {
                    list.Add(new("centre leg width", b.Leg.Width.Metres));
                    list.Add(new("centre leg depth", b.Leg.Depth.Metres));
                }

                list.Add(new("bobbin wall", b.BobbinWall.Metres));
                break;
            default:
                break;
        }

        return list;
    }

    private static SheetWindingRow Row(TransformerPlan plan, PlanEvaluation evaluation, int i)
    {
        var spec = plan.Windings[i];
        var result = evaluation.Windings[i];
        var number = i + 1;
        var taps = spec.Taps.Select((turn, k) => new SheetTap(turn, SheetText.Text($"{number}T{k + 1}"))).ToList();
        return new SheetWindingRow(
            number,
            spec.Name,
            spec.Turns,
            spec.Wire.Description,
            spec.Wire.Kind,
            spec.Wire.StrandDiameter.Metres,
            spec.Wire.StrandsPerElement,
            spec.Wire.ElementsInHand,
            spec.Wire.Metal.Name,
            result.WireLengthM,
            plan.Allowance.LeadLengthPerEndM,
            result.Fit.Layers,
            result.Fit.TurnsPerLayer,
            spec.Placement,
            PlacementText(plan, i),
            DirectionText(spec.Placement, i),
            StartMark(number),
            FinishMark(number),
            taps,
            spec.Wrap,
            result.Fit.Outcome);
    }

    /// <summary>The mark written on a winding's start lead, its phasing-dot end.</summary>
    public static string StartMark(int number) => SheetText.Text($"{number}S");

    /// <summary>The mark written on a winding's finish lead.</summary>
    public static string FinishMark(int number) => SheetText.Text($"{number}F");

    /// <summary>Where winding <paramref name="index"/> lies, in plain words.</summary>
    internal static string PlacementText(TransformerPlan plan, int index)
    {
        var placement = plan.Windings[index].Placement;
        var shape = plan.Core.Shape;
        return placement.Kind switch
        {
            PlacementKind.Sector => SheetText.Text($"on the arc from {placement.StartDegrees:0.#}° to {placement.EndDegrees:0.#}°"),
            PlacementKind.Over => SheetText.Text($"over winding {placement.OtherWinding + 1}"),
            PlacementKind.Bifilar => SheetText.Text($"together with winding {placement.OtherWinding + 1} (bifilar)"),
            _ => shape switch
            {
                TwoHoleCore => "through both holes",
                BobbinCore => "across the whole bobbin",
                _ => "spread round the whole ring",
            },
        };
    }

    private static string DirectionText(WindingPlacement placement, int index) => index == 0
        ? "reference"
        : placement.Kind == PlacementKind.Bifilar
            ? SheetText.Text($"with {placement.OtherWinding + 1}")
            : "same as 1";
}
