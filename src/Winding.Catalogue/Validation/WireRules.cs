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
            v.Add(prefix, "Required: the wire — conductorDiameterMm (custom), litz or hookUp.");
            return null;
        }

        var forms = (document.ConductorDiameterMm is not null || document.OverallDiameterMm is not null ? 1 : 0)
            + (document.Litz is not null ? 1 : 0)
            + (document.HookUp is not null ? 1 : 0);
        if (forms != 1)
        {
            v.Add(prefix, forms == 0
                ? "Required: describe the wire — conductorDiameterMm (custom), litz or hookUp."
                : "Give one form of wire only: conductorDiameterMm (custom), litz or hookUp.");
            return null;
        }

        var metal = ReadMetal(v, $"{prefix}.metal", document.Metal);
        var inHand = document.StrandsInHand is null ? 1 : v.WholeRange($"{prefix}.strandsInHand", document.StrandsInHand, 1, MaximumStrandsInHand, "wires in hand");
        WindingWire? wire;
        if (document.Litz is { } litz)
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

    private static ConductorMaterial? ReadMetal(FieldValidator v, string field, string? metal)
    {
        switch (metal)
        {
            case null:
            case "copper":
                return ConductorMaterial.Copper;
            default:
                v.Add(field, $"Unknown metal '{metal}': use copper.");
                return null;
        }
    }

    private static WindingWire? Custom(FieldValidator v, string prefix, PlanWireDocument document, ConductorMaterial? metal)
    {
        var conductor = v.Range($"{prefix}.conductorDiameterMm", document.ConductorDiameterMm, MinimumWireMm, MaximumWireMm, "mm");
        if (conductor is null || metal is null)
        {
            return null;
        }

        if (document.OverallDiameterMm is null)
        {
            return WindingWire.Enamelled(Length.FromMillimetres(conductor.Value));
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
