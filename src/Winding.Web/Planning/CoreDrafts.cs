using Winding.Catalogue.Entries;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Validation;
using Winding.Core.Characterisation;

namespace Winding.Web.Planning;

/// <summary>
/// Moves a typed core between its draft (<see cref="CoreDraft"/>) and the plan document's inline core
/// (<see cref="PlanCoreDocument"/> without a catalogue id). Shapes and dimensions are checked by the same
/// <see cref="CoreShapeRules"/> the API uses; a measured AL alone becomes μi = μe = AL·C1/μ0 through
/// <see cref="CoreCharacterisation.FromInductance"/> (IEC 62044-2 relations), never a formula of its own.
/// </summary>
internal static class CoreDrafts
{
    /// <summary>The field labels used in parse errors.</summary>
    public static IReadOnlyDictionary<string, string> Labels { get; } = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["outerDiameter"] = "Outer diameter",
        ["innerDiameter"] = "Inner diameter",
        ["height"] = "Height",
        ["coatingThickness"] = "Coating",
        ["length"] = "Length",
        ["residualGap"] = "Residual gap",
        ["holeDiameter"] = "Hole diameter",
        ["holeSpacing"] = "Hole spacing",
        ["width"] = "Width",
        ["windowBreadth"] = "Window breadth",
        ["windowHeight"] = "Window height",
        ["legDiameter"] = "Leg diameter",
        ["legWidth"] = "Leg width",
        ["legDepth"] = "Leg depth",
        ["bobbinWall"] = "Bobbin wall",
    };

    /// <summary>A draft of the inline core <paramref name="core"/> with the plan's measured AL <paramref name="measuredAlNh"/>.</summary>
    public static CoreDraft Load(PlanCoreDocument core, double? measuredAlNh)
    {
        var draft = new CoreDraft
        {
            Shape = core.Shape ?? string.Empty,
            Family = core.Family ?? string.Empty,
            EffectiveArea = DraftReading.Show(core.Effective?.AreaMm2),
            EffectiveLength = Winding.Web.Display.LengthText.ForDraft(core.Effective?.LengthMm),
            DatasheetAl = DraftReading.Show(core.AlNh),
            MaterialId = core.MaterialId,
            Permeability = DraftReading.Show(core.InitialPermeability),
            MeasuredAl = DraftReading.Show(measuredAlNh),
        };
        if (core.DimensionsMm is { } d)
        {
            foreach (var field in Labels.Keys)
            {
                if (Get(d, field) is { } mm)
                {
                    draft.Dimensions[field] = Winding.Web.Display.LengthText.ForDraft(mm);
                }
            }
        }

        draft.MaterialBasis = core.MaterialId is not null ? CoreMaterialBasis.MaterialClass
            : core.InitialPermeability is { } mu && measuredAlNh is { } al && IsDerived(core, mu, al) ? CoreMaterialBasis.MeasuredAl
            : core.InitialPermeability is null && measuredAlNh is not null ? CoreMaterialBasis.MeasuredAl
            : CoreMaterialBasis.Permeability;
        return draft;
    }

    /// <summary>
    /// The inline core document of <paramref name="draft"/> and the measured AL to put in the plan (nH, or null). Texts that
    /// are not numbers become errors at their document paths (<c>core.dimensionsMm.height</c>, <c>measured.alNh</c> …).
    /// </summary>
    public static (PlanCoreDocument Core, double? MeasuredAlNh) Build(CoreDraft draft, int? stack, Dictionary<string, string> errors)
    {
        var dimensions = new DimensionsMmDocument();
        var fields = draft.ShownDimensions.Count > 0 ? draft.ShownDimensions : Labels.Keys.ToList();
        foreach (var field in fields)
        {
            Set(dimensions, field, DraftReading.Length(errors, $"core.dimensionsMm.{field}", draft.Dimension(field), Labels[field], required: false));
        }

        EffectiveParametersDocument? effective = null;
        if (draft.Shape == CoreShapes.Bobbin || (draft.TakesEffective && (!string.IsNullOrWhiteSpace(draft.EffectiveArea) || !string.IsNullOrWhiteSpace(draft.EffectiveLength))))
        {
            effective = new EffectiveParametersDocument
            {
                AreaMm2 = DraftReading.Number(errors, "core.effective.areaMm2", draft.EffectiveArea, "Effective area", string.Empty, required: false),
                LengthMm = DraftReading.Length(errors, "core.effective.lengthMm", draft.EffectiveLength, "Effective length", required: false),
            };
        }

        var core = new PlanCoreDocument
        {
            Shape = DraftReading.Word(draft.Shape),
            Family = draft.Shape == CoreShapes.Bobbin ? DraftReading.Word(draft.Family) : null,
            DimensionsMm = dimensions,
            Effective = effective,
            AlNh = draft.Shape == CoreShapes.Bobbin ? DraftReading.Number(errors, "core.alNh", draft.DatasheetAl, "AL", string.Empty, required: false) : null,
            Stack = stack,
        };
        var measured = DraftReading.Nanohenries(errors, "measured.alNh", draft.MeasuredAl, "Measured AL", required: draft.MaterialBasis == CoreMaterialBasis.MeasuredAl);
        switch (draft.MaterialBasis)
        {
            case CoreMaterialBasis.MaterialClass:
                core.MaterialId = draft.MaterialId;
                if (draft.MaterialId is null)
                {
                    errors["core.materialId"] = "Pick a material class.";
                }

                break;
            case CoreMaterialBasis.Permeability:
                core.InitialPermeability = DraftReading.Number(errors, "core.initialPermeability", draft.Permeability, "μi", string.Empty, required: true);
                break;
            default:
                core.InitialPermeability = measured is { } al ? Derived(core, al) : null;
                if (core.InitialPermeability < 1)
                {
                    errors["measured.alNh"] = FormattableString.Invariant($"Measured AL: {measured} nH is less than this core would have if it were air (μe {core.InitialPermeability:0.###} < 1); check the value and that it is in nH.");
                }

                break;
        }

        return (core, measured);
    }

    /// <summary>
    /// μe = AL·C1/μ0 of the (stacked) core for a measured AL in nH, or null when the shape is not valid yet (its own
    /// errors then come from the reader) or the AL is not positive.
    /// </summary>
    public static double? Derived(PlanCoreDocument core, double alNh)
    {
        var validator = new FieldValidator();
        var shape = CoreShapeRules.Validate(validator, "core", core.Shape, core.Family, core.DimensionsMm, core.Effective, core.AlNh);
        var stack = core.Stack ?? 1;
        if (shape is null || !(alNh > 0) || !double.IsFinite(alNh) || stack < 1 || stack > PlanReader.MaximumStack || (stack > 1 && !shape.CanStack))
        {
            return null;
        }

        return CoreCharacterisation.FromInductance(shape.Stacked(stack).EffectiveParameters(), 1, alNh * 1e-9).EffectivePermeability;
    }

    private static bool IsDerived(PlanCoreDocument core, double mu, double alNh) =>
        Derived(core, alNh) is { } derived && Math.Abs(derived - mu) <= 1e-9 * Math.Abs(mu);

    private static double? Get(DimensionsMmDocument d, string field) => field switch
    {
        "outerDiameter" => d.OuterDiameter,
        "innerDiameter" => d.InnerDiameter,
        "height" => d.Height,
        "coatingThickness" => d.CoatingThickness,
        "length" => d.Length,
        "residualGap" => d.ResidualGap,
        "holeDiameter" => d.HoleDiameter,
        "holeSpacing" => d.HoleSpacing,
        "width" => d.Width,
        "windowBreadth" => d.WindowBreadth,
        "windowHeight" => d.WindowHeight,
        "legDiameter" => d.LegDiameter,
        "legWidth" => d.LegWidth,
        "legDepth" => d.LegDepth,
        "bobbinWall" => d.BobbinWall,
        _ => null,
    };

    private static void Set(DimensionsMmDocument d, string field, double? value)
    {
        switch (field)
        {
            case "outerDiameter":
                d.OuterDiameter = value;
                break;
            case "innerDiameter":
                d.InnerDiameter = value;
                break;
            case "height":
                d.Height = value;
                break;
            case "coatingThickness":
                d.CoatingThickness = value;
                break;
            case "length":
                d.Length = value;
                break;
            case "residualGap":
                d.ResidualGap = value;
                break;
            case "holeDiameter":
                d.HoleDiameter = value;
                break;
            case "holeSpacing":
                d.HoleSpacing = value;
                break;
            case "width":
                d.Width = value;
                break;
            case "windowBreadth":
                d.WindowBreadth = value;
                break;
            case "windowHeight":
                d.WindowHeight = value;
                break;
            case "legDiameter":
                d.LegDiameter = value;
                break;
            case "legWidth":
                d.LegWidth = value;
                break;
            case "legDepth":
                d.LegDepth = value;
                break;
            case "bobbinWall":
                d.BobbinWall = value;
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(field), field, "Not a dimension field.");
        }
    }
}
