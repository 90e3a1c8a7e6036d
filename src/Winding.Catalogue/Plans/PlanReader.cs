using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Validation;
using Winding.Core.Geometry;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Catalogue.Plans;

/// <summary>
/// Validates a <see cref="PlanDocument"/> against the catalogue and builds the engine's <see cref="TransformerPlan"/>.
/// Every problem is reported as a field error; nothing here throws on user input.
/// </summary>
public static class PlanReader
{
    /// <summary>Most windings on one core.</summary>
    public const int MaximumWindings = 16;

    /// <summary>Most turns in one winding.</summary>
    public const int MaximumTurns = 100_000;

    /// <summary>Most identical cores in a stack.</summary>
    public const int MaximumStack = 100;

    /// <summary>Thinnest accepted conductor, mm.</summary>
    public const double MinimumWireMm = 0.01;

    /// <summary>Thickest accepted conductor, mm.</summary>
    public const double MaximumWireMm = 20;

    /// <summary>Reads <paramref name="document"/>, resolving catalogue ids in <paramref name="catalogue"/>.</summary>
    public static PlanReadResult Read(PlanDocument? document, CoreCatalogue catalogue)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        var v = new FieldValidator();
        if (document is null)
        {
            v.Add(string.Empty, "The request body must be a plan: a JSON object with core and windings.");
            return new PlanReadResult(null, v.Errors);
        }

        if (document.Name is { Length: > 200 })
        {
            v.Add("name", "The name may have at most 200 characters.");
        }

        var core = ReadCore(v, document.Core, catalogue);
        var windings = ReadWindings(v, document.Windings);
        var operating = ReadOperating(v, document.Operating);
        if (!v.IsValid || core is null || windings is null)
        {
            return new PlanReadResult(null, v.Errors);
        }

        return new PlanReadResult(new TransformerPlan(document.Name, core, windings, operating, WireLengthAllowance.Default), v.Errors);
    }

    private static PlanCore? ReadCore(FieldValidator v, PlanCoreDocument? document, CoreCatalogue catalogue)
    {
        if (document is null)
        {
            v.Add("core", "Required: give a catalogueId, or shape, dimensionsMm and a material.");
            return null;
        }

        var stack = document.Stack is null ? 1 : v.WholeRange("core.stack", document.Stack, 1, MaximumStack, "cores");
        ToroidCore? toroid = null;
        MagneticMaterial? material = null;
        if (!string.IsNullOrEmpty(document.CatalogueId))
        {
            if (document.DimensionsMm is not null || document.Shape is not null)
            {
                v.Add("core.catalogueId", "Give either a catalogueId or an inline core (shape and dimensionsMm), not both.");
            }
            else if (!catalogue.CoresById.TryGetValue(document.CatalogueId, out var entry))
            {
                v.Add("core.catalogueId", $"No core with the id '{document.CatalogueId}' is in the catalogue.");
            }
            else
            {
                toroid = entry.Toroid;
                material = entry.Material.Material;
            }
        }
        else
        {
            if (document.Shape != CoreShapes.Toroid)
            {
                v.Add("core.shape", document.Shape is null
                    ? $"Required: the core shape (\"{CoreShapes.Toroid}\"), or a catalogueId instead."
                    : $"Unknown shape '{document.Shape}': this version knows \"{CoreShapes.Toroid}\".");
            }

            toroid = ToroidDimensionsRules.Validate(v, "core.dimensionsMm", document.DimensionsMm);
            if (document.MaterialId is null && document.InitialPermeability is null)
            {
                v.Add("core.materialId", "Required: a materialId from the catalogue, or an initialPermeability.");
            }
        }

        if (document.MaterialId is not null && document.InitialPermeability is not null)
        {
            v.Add("core.materialId", "Give either a materialId or an initialPermeability, not both.");
        }
        else if (document.MaterialId is not null)
        {
            material = catalogue.MaterialsById.TryGetValue(document.MaterialId, out var m) ? m.Material : null;
            if (material is null)
            {
                v.Add("core.materialId", $"No material with the id '{document.MaterialId}' is in the catalogue.");
            }
        }
        else if (document.InitialPermeability is not null)
        {
            var mu = v.Range("core.initialPermeability", document.InitialPermeability, 1, CatalogueLoader.MaximumPermeability, string.Empty);
            material = mu is null ? null : MagneticMaterial.Create(string.Create(CultureInfo.InvariantCulture, $"μi {mu.Value:G4}"), mu.Value);
        }

        return toroid is null || material is null || stack is null ? null : new PlanCore(toroid, stack.Value, material);
    }

    private static List<WindingSpec>? ReadWindings(FieldValidator v, List<PlanWindingDocument?>? documents)
    {
        if (documents is null || documents.Count == 0)
        {
            v.Add("windings", "Required: at least one winding (the first is the primary).");
            return null;
        }

        if (documents.Count > MaximumWindings)
        {
            v.Add("windings", $"At most {MaximumWindings} windings per plan.");
            return null;
        }

        var windings = new List<WindingSpec>(documents.Count);
        for (var i = 0; i < documents.Count; i++)
        {
            var prefix = $"windings[{i}]";
            var document = documents[i];
            if (document is null)
            {
                v.Add(prefix, "Required: a winding with turns and wire.");
                continue;
            }

            var name = string.IsNullOrWhiteSpace(document.Name) ? $"winding {i + 1}" : document.Name.Trim();
            if (name.Length > 60)
            {
                v.Add($"{prefix}.name", "The name may have at most 60 characters.");
            }

            var turns = v.WholeRange($"{prefix}.turns", document.Turns, 1, MaximumTurns, "turns");
            var wire = ReadWire(v, $"{prefix}.wire", document.Wire);
            if (turns is not null && wire is not null && name.Length <= 60)
            {
                windings.Add(WindingSpec.Create(name, turns.Value, wire));
            }
        }

        return windings.Count == documents.Count ? windings : null;
    }

    private static WindingWire? ReadWire(FieldValidator v, string prefix, PlanWireDocument? document)
    {
        if (document is null)
        {
            v.Add(prefix, "Required: the wire, with conductorDiameterMm (and overallDiameterMm if known).");
            return null;
        }

        var conductor = v.Range($"{prefix}.conductorDiameterMm", document.ConductorDiameterMm, MinimumWireMm, MaximumWireMm, "mm");
        if (conductor is null)
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
            v.Add($"{prefix}.overallDiameterMm", string.Create(CultureInfo.InvariantCulture, $"The overall diameter ({overall} mm) cannot be smaller than the conductor diameter ({conductor} mm)."));
            return null;
        }

        return WindingWire.Solid(Length.FromMillimetres(conductor.Value), Length.FromMillimetres(overall.Value));
    }

    private static OperatingConditions? ReadOperating(FieldValidator v, PlanOperatingDocument? document)
    {
        if (document is null)
        {
            return null;
        }

        var fMin = v.Range("operating.minFrequencyHz", document.MinFrequencyHz, 1, 1e10, "Hz");
        var fMax = v.Range("operating.maxFrequencyHz", document.MaxFrequencyHz, 1, 1e10, "Hz");
        var rs = v.Range("operating.sourceResistanceOhm", document.SourceResistanceOhm, 0, 1e7, "Ω");
        var rl = v.Range("operating.loadResistanceOhm", document.LoadResistanceOhm, 0, 1e7, "Ω", minimumExclusive: true);
        var drive = v.Range("operating.driveVoltageRms", document.DriveVoltageRms, 0, 1e5, "V");
        if (fMin is not null && fMax is not null && fMax <= fMin)
        {
            v.Add("operating.maxFrequencyHz", "The highest frequency must be above the lowest frequency.");
            return null;
        }

        return fMin is null || fMax is null || rs is null || rl is null || drive is null
            ? null
            : new OperatingConditions(fMin.Value, fMax.Value, rs.Value, rl.Value, drive.Value);
    }
}
