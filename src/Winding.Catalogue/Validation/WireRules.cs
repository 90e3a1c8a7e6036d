using Winding.Catalogue.Plans;
using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Catalogue.Validation;

/// <summary>Checks a wire in a plan document and builds the engine's <see cref="WindingWire"/>.</summary>
public static class WireRules
{
    /// <summary>Thinnest accepted conductor or strand, mm.</summary>
    public const double MinimumWireMm = 0.01;

    /// <summary>Thickest accepted conductor, mm.</summary>
    public const double MaximumWireMm = 20;

    /// <summary>Most parallel wires in hand.</summary>
    public const int MaximumStrandsInHand = 20;

    /// <summary>Most strands in a Litz bundle.</summary>
    public const int MaximumLitzStrands = 10_000;

    /// <summary>Validates <paramref name="document"/> under <paramref name="prefix"/>; returns the wire or null.</summary>
    public static WindingWire? Read(FieldValidator v, string prefix, PlanWireDocument? document)
    {
        ArgumentNullException.ThrowIfNull(v);
        if (document is null)
        {
            v.Add(prefix, "Required: the wire — " + Forms + ".");
            return null;
        }

        var forms = (document.StandardId is not null ? 1 : 0)
            + (document.MetricMm is not null || document.Grade is not null ? 1 : 0)
            + (document.Awg is not null || document.Build is not null ? 1 : 0)
            + (document.ConductorDiameterMm is not null || document.OverallDiameterMm is not null ? 1 : 0)
            + (document.Litz is not null ? 1 : 0)
            + (document.HookUp is not null ? 1 : 0);
        if (forms != 1)
        {
            v.Add(prefix, forms == 0
                ? "Required: describe the wire — " + Forms + "."
                : "Give one form of wire only: " + Forms + ".");
            return null;
        }

        var metal = ReadMetal(v, $"{prefix}.metal", document.Metal);
        var inHand = document.StrandsInHand is null ? 1 : v.WholeRange($"{prefix}.strandsInHand", document.StrandsInHand, 1, MaximumStrandsInHand, "wires in hand");
        WindingWire? wire;
        if (document.StandardId is { } id)
        {
            wire = Standard(v, $"{prefix}.standardId", id, metal);
        }
        else if (document.MetricMm is not null || document.Grade is not null)
        {
            wire = Metric(v, prefix, document, metal);
        }
        else if (document.Awg is not null || document.Build is not null)
        {
            wire = Awg(v, prefix, document, metal);
        }
        else if (document.Litz is { } litz)
        {
            wire = Litz(v, $"{prefix}.litz", litz, metal);
        }
        else if (document.HookUp is { } hookUp)
        {
            wire = HookUp(v, $"{prefix}.hookUp", hookUp, metal);
        }
        else
        {
            wire = Custom(v, prefix, document, metal);
        }

        return wire is null || inHand is null || metal is null ? null : wire.InHand(inHand.Value);
    }

    private const string Forms = "standardId, metricMm (with grade), awg (with build), conductorDiameterMm (custom), litz or hookUp";

    private static ConductorMaterial? ReadMetal(FieldValidator v, string field, string? metal)
    {
        switch (metal)
        {
            case null:
            case "copper":
                return ConductorMaterial.Copper;
            case "aluminium":
                return ConductorMaterial.Aluminium;
            default:
                v.Add(field, $"Unknown metal '{metal}': use copper or aluminium.");
                return null;
        }
    }

    private static WindingWire? Standard(FieldValidator v, string field, string id, ConductorMaterial? metal)
    {
        if (!StandardWireTable.TryFind(id, out var standard) || standard is null)
        {
            v.Add(field, $"No standard wire with the id '{id}': see GET /api/v1/wires.");
            return null;
        }

        return metal is null ? null : WithMetal(standard.ToWindingWire(), metal);
    }

    private static WindingWire? Metric(FieldValidator v, string prefix, PlanWireDocument document, ConductorMaterial? metal)
    {
        var nominal = v.Range($"{prefix}.metricMm", document.MetricMm, MinimumWireMm, MaximumWireMm, "mm");
        var grade = document.Grade is null ? 1 : v.WholeRange($"{prefix}.grade", document.Grade, 1, 3, "grade");
        if (nominal is null || grade is null || metal is null)
        {
            return null;
        }

        if (!MetricEnamelledWireTable.TryFind(Length.FromMillimetres(nominal.Value), out var size) || size is null)
        {
            var near = MetricEnamelledWireTable.Sizes.OrderBy(s => Math.Abs(s.NominalDiameter.Millimetres - nominal.Value)).Take(2).Select(s => s.Label);
            v.Add($"{prefix}.metricMm", FormattableString.Invariant($"{nominal} mm is not a size of the IEC 60317 series; the nearest are {string.Join(" and ", near)}. For another size give conductorDiameterMm and overallDiameterMm."));
            return null;
        }

        var g = (MetricWireGrade)grade.Value;
        if (!size.HasGrade(g))
        {
            v.Add($"{prefix}.grade", $"Grade {grade} is not known for {size.Label}; use grade {string.Join(" or ", size.AvailableGrades.Select(a => (int)a))}.");
            return null;
        }

        return WithMetal(MetricEnamelledWireTable.Wire(size, g), metal);
    }

    private static WindingWire? Awg(FieldValidator v, string prefix, PlanWireDocument document, ConductorMaterial? metal)
    {
        var gauge = v.WholeRange($"{prefix}.awg", document.Awg, AwgWireTable.FirstGauge, AwgWireTable.LastGauge, "AWG");
        AwgBuild? build = document.Build switch
        {
            null or "single" => AwgBuild.Single,
            "heavy" => AwgBuild.Heavy,
            _ => null,
        };
        if (build is null)
        {
            v.Add($"{prefix}.build", $"Unknown build '{document.Build}': use single or heavy.");
        }

        return gauge is null || build is null || metal is null ? null : WithMetal(AwgWireTable.Wire(gauge.Value, build.Value), metal);
    }

    private static WindingWire WithMetal(WindingWire wire, ConductorMaterial metal) =>
        metal == ConductorMaterial.Copper
            ? wire
            : WindingWire.Solid(wire.StrandDiameter, wire.ElementOverallDiameter, metal, wire.Description + ", " + metal.Name);

    private static WindingWire? Custom(FieldValidator v, string prefix, PlanWireDocument document, ConductorMaterial? metal)
    {
        var conductor = v.Range($"{prefix}.conductorDiameterMm", document.ConductorDiameterMm, MinimumWireMm, MaximumWireMm, "mm");
        if (conductor is null || metal is null)
        {
            return null;
        }

        if (document.OverallDiameterMm is null)
        {
            var enamelled = WindingWire.Enamelled(Length.FromMillimetres(conductor.Value));
            return metal == ConductorMaterial.Copper
                ? enamelled
                : WindingWire.Solid(enamelled.StrandDiameter, enamelled.ElementOverallDiameter, metal, enamelled.Description + ", " + metal.Name, overallDiameterAssumed: true);
        }

        var overall = v.Range($"{prefix}.overallDiameterMm", document.OverallDiameterMm, MinimumWireMm, MaximumWireMm * 1.5, "mm");
        if (overall is null)
        {
            return null;
        }

        if (overall < conductor)
        {
            v.Add($"{prefix}.overallDiameterMm", FormattableString.Invariant($"The overall diameter ({overall} mm) cannot be smaller than the conductor diameter ({conductor} mm)."));
            return null;
        }

        return WindingWire.Solid(Length.FromMillimetres(conductor.Value), Length.FromMillimetres(overall.Value), metal);
    }

    private static WindingWire? Litz(FieldValidator v, string prefix, PlanLitzDocument litz, ConductorMaterial? metal)
    {
        var strands = v.WholeRange($"{prefix}.strands", litz.Strands, 2, MaximumLitzStrands, "strands");
        var strand = v.Range($"{prefix}.strandDiameterMm", litz.StrandDiameterMm, MinimumWireMm, 1, "mm");
        var overall = v.Range($"{prefix}.overallDiameterMm", litz.OverallDiameterMm, MinimumWireMm, MaximumWireMm * 1.5, "mm");
        if (strands is null || strand is null || overall is null || metal is null)
        {
            return null;
        }

        if (overall.Value * overall.Value < strands.Value * strand.Value * strand.Value)
        {
            v.Add($"{prefix}.overallDiameterMm", FormattableString.Invariant($"{overall} mm is too small to hold {strands} strands of {strand} mm (at least {Math.Sqrt(strands.Value) * strand.Value:0.###} mm)."));
            return null;
        }

        return WindingWire.Litz(strands.Value, Length.FromMillimetres(strand.Value), Length.FromMillimetres(overall.Value), metal);
    }

    private static WindingWire? HookUp(FieldValidator v, string prefix, PlanHookUpDocument hookUp, ConductorMaterial? metal)
    {
        var conductor = v.Range($"{prefix}.conductorDiameterMm", hookUp.ConductorDiameterMm, MinimumWireMm, MaximumWireMm, "mm");
        var insulation = v.Range($"{prefix}.insulationThicknessMm", hookUp.InsulationThicknessMm, 0, 10, "mm");
        return conductor is null || insulation is null || metal is null
            ? null
            : WindingWire.HookUp(Length.FromMillimetres(conductor.Value), Length.FromMillimetres(insulation.Value), metal);
    }
}
