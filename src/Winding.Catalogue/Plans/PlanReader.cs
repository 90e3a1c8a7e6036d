using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Validation;
using Winding.Core.Geometry;
using Winding.Core.Magnetics;
using Winding.Core.Materials;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;


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

    /// <summary>Most measured values in a plan's bench record.</summary>
    public const int MaximumBenchValues = 100;

    /// <summary>Most identical cores in a stack.</summary>
    public const int MaximumStack = 100;

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
        var windings = ReadWindings(v, document.Windings, core?.Shape);
        var operating = ReadOperating(v, document.Operating);
        var allowance = ReadAllowance(v, document.Allowance);
        ReadBench(v, document.Bench);
        if (!v.IsValid || core is null || windings is null || allowance is null)
        {
            return new PlanReadResult(null, v.Errors);
        }

        var sweep = ReadSweep(v, document.Sweep);
        var measured = ReadMeasured(v, document.Measured, windings.Count);
        if (!v.IsValid || sweep is null || measured is null)
        {
            return new PlanReadResult(null, v.Errors);
        }

        var measuredCore = measured.Al is { } al ? core with { MeasuredAl = InductanceFactor.FromHenriesPerTurnSquared(al) } : core;
        return new PlanReadResult(
            new TransformerPlan(document.Name, measuredCore, windings, operating, allowance)
            {
                Sweep = sweep,
                FrequencyIndependentCore = document.Options?.FrequencyIndependentCore ?? false,
                Measured = measured,
            },
            v.Errors);
    }

    private static PlanCore? ReadCore(FieldValidator v, PlanCoreDocument? document, CoreCatalogue catalogue)
    {
        if (document is null)
        {
            v.Add("core", "Required: give a catalogueId, or shape, dimensionsMm and a material.");
            return null;
        }

        CoreShape? shape = null;
        MagneticMaterial? material = null;
        InductanceFactor? catalogueAl = null;
        if (!string.IsNullOrEmpty(document.CatalogueId))
        {
            if (document.DimensionsMm is not null || document.Shape is not null || document.Effective is not null || document.AlNh is not null || document.Family is not null)
            {
                v.Add("core.catalogueId", "Give either a catalogueId or an inline core (shape, dimensionsMm …), not both.");
            }
            else if (!catalogue.CoresById.TryGetValue(document.CatalogueId, out var entry))
            {
                v.Add("core.catalogueId", $"No core with the id '{document.CatalogueId}' is in the catalogue.");
            }
            else
            {
                shape = entry.Shape;
                material = entry.Material.Material;
                catalogueAl = entry.MeasuredAl;
            }
        }
        else
        {
            shape = CoreShapeRules.Validate(v, "core", document.Shape, document.Family, document.DimensionsMm, document.Effective, document.AlNh);
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

        int? stack = 1;
        if (document.Stack is not null)
        {
            stack = v.WholeRange("core.stack", document.Stack, 1, MaximumStack, "cores");
            if (stack > 1 && shape is { CanStack: false })
            {
                v.Add("core.stack", $"A {shape.ShapeName} core is not stacked here: use 1.");
                stack = null;
            }
        }

        // A catalogue core's measured AL is for one core; identical cores side by side add their AL (their Ae adds,
        // le is the same: AL = μ0·μe·Ae/le, IEC 60205). A different material id makes it not apply.
        var measuredAl = catalogueAl is { } one && document.MaterialId is null && document.InitialPermeability is null && stack is not null
            ? InductanceFactor.FromHenriesPerTurnSquared(one.HenriesPerTurnSquared * stack.Value)
            : (InductanceFactor?)null;
        return shape is null || material is null || stack is null ? null : new PlanCore(shape, stack.Value, material) { MeasuredAl = measuredAl };
    }

    private static List<WindingSpec>? ReadWindings(FieldValidator v, List<PlanWindingDocument?>? documents, CoreShape? shape)
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

            var before = v.Errors.Count;
            var name = string.IsNullOrWhiteSpace(document.Name) ? $"winding {i + 1}" : document.Name.Trim();
            if (name.Length > 60)
            {
                v.Add($"{prefix}.name", "The name may have at most 60 characters.");
            }

            var turns = v.WholeRange($"{prefix}.turns", document.Turns, 1, MaximumTurns, "turns");
            var wire = WireRules.Read(v, $"{prefix}.wire", document.Wire);
            var placement = ReadPlacement(v, $"{prefix}.placement", document.Placement, i, documents, shape);
            var wrap = ReadInsulation(v, $"{prefix}.insulation", document.Insulation);
            var taps = document.Taps ?? [];
            if (turns is not null)
            {
                for (var t = 0; t < taps.Count; t++)
                {
                    if (taps[t] < 1 || taps[t] >= turns)
                    {
                        v.Add($"{prefix}.taps[{t}]", string.Create(CultureInfo.InvariantCulture, $"A tap must be at a turn from 1 to {turns - 1} (the winding has {turns} turns)."));
                    }
                }

                if (taps.Distinct().Count() != taps.Count)
                {
                    v.Add($"{prefix}.taps", "Each tap may be listed once.");
                }
            }

            if (document.RmsCurrentA is not null)
            {
                v.Range($"{prefix}.rmsCurrentA", document.RmsCurrentA, 0, 1000, "A");
            }

            if (document.TargetInductanceH is not null)
            {
                v.Range($"{prefix}.targetInductanceH", document.TargetInductanceH, 1e-12, 1e3, "H", minimumExclusive: true);
            }

            if (v.Errors.Count == before && turns is not null && wire is not null && placement is not null)
            {
                windings.Add(WindingSpec.Create(name, turns.Value, wire, placement, wrap, taps, document.RmsCurrentA, document.TargetInductanceH));
            }
        }

        return windings.Count == documents.Count ? windings : null;
    }

    private static WindingPlacement? ReadPlacement(FieldValidator v, string prefix, PlanPlacementDocument? document, int index, List<PlanWindingDocument?> all, CoreShape? shape)
    {
        if (document is null || document.Kind == "spread")
        {
            if (document is not null && (document.StartDegrees is not null || document.EndDegrees is not null || document.Winding is not null))
            {
                v.Add(prefix, "A spread winding takes no angles or winding index.");
                return null;
            }

            return WindingPlacement.Spread;
        }

        switch (document.Kind)
        {
            case "sector":
                if (shape is not null and not ToroidCore and not SleeveCore)
                {
                    v.Add($"{prefix}.kind", $"Sectors apply to toroids and sleeves, not to a {shape.ShapeName} core.");
                    return null;
                }

                var start = v.Range($"{prefix}.startDegrees", document.StartDegrees, 0, 360, "degrees");
                var end = v.Range($"{prefix}.endDegrees", document.EndDegrees, 0, 360, "degrees");
                if (start is null || end is null)
                {
                    return null;
                }

                if (end <= start)
                {
                    v.Add($"{prefix}.endDegrees", "The sector must end after it starts (0 ≤ start < end ≤ 360).");
                    return null;
                }

                return WindingPlacement.Sector(start.Value, end.Value);
            case "over":
            case "bifilar":
                if (index == 0)
                {
                    v.Add($"{prefix}.kind", "The first winding cannot lie over or pair with another winding.");
                    return null;
                }

                var other = v.WholeRange($"{prefix}.winding", document.Winding, 0, index - 1, "an earlier winding's index");
                if (other is null)
                {
                    return null;
                }

                if (document.Kind == "over")
                {
                    return WindingPlacement.Over(other.Value);
                }

                var partner = all[other.Value];
                if (partner?.Turns is { } partnerTurns && all[index]?.Turns is { } turns && partnerTurns != turns)
                {
                    v.Add($"{prefix}.winding", string.Create(CultureInfo.InvariantCulture, $"A bifilar pair is wound together, so both need the same turns ({partnerTurns} and {turns})."));
                    return null;
                }

                if (partner?.Placement?.Kind == "bifilar")
                {
                    v.Add($"{prefix}.winding", "Pair with the first winding of the bifilar group.");
                    return null;
                }

                return WindingPlacement.Bifilar(other.Value);
            default:
                v.Add($"{prefix}.kind", $"Unknown placement '{document.Kind}': use spread, sector, over or bifilar.");
                return null;
        }
    }

    private static InsulationWrap? ReadInsulation(FieldValidator v, string prefix, PlanInsulationDocument? document)
    {
        if (document is null)
        {
            return null;
        }

        var thickness = v.Range($"{prefix}.thicknessMm", document.ThicknessMm, 0, 10, "mm");
        double? permittivity;
        if (document.Material is { } material && InsulationWrap.TypicalPermittivity.TryGetValue(material, out var typical))
        {
            permittivity = document.RelativePermittivity is null ? typical : v.Range($"{prefix}.relativePermittivity", document.RelativePermittivity, 1, 20, string.Empty);
        }
        else if (document.Material is "other")
        {
            permittivity = v.Range($"{prefix}.relativePermittivity", document.RelativePermittivity, 1, 20, string.Empty);
        }
        else
        {
            v.Add($"{prefix}.material", "Required: paper, polyester, ptfe, polyimide or other.");
            return null;
        }

        return thickness is null || permittivity is null ? null : InsulationWrap.Create(document.Material, Length.FromMillimetres(thickness.Value), permittivity.Value);
    }

    private static SweepSettings? ReadSweep(FieldValidator v, PlanSweepDocument? document)
    {
        if (document is null)
        {
            return SweepSettings.Default;
        }

        var start = document.StartHz is null ? null : v.Range("sweep.startHz", document.StartHz, 1e-3, 1e12, "Hz");
        var stop = document.StopHz is null ? null : v.Range("sweep.stopHz", document.StopHz, 1e-3, 1e12, "Hz");
        var points = document.Points is null ? SweepSettings.DefaultPoints : v.WholeRange("sweep.points", document.Points, 3, Core.Response.FrequencySweep.MaximumPoints, "points");
        if ((document.StartHz is not null && start is null) || (document.StopHz is not null && stop is null) || points is null)
        {
            return null;
        }

        if (start is not null && stop is not null && stop <= start)
        {
            v.Add("sweep.stopHz", "The sweep must stop above where it starts.");
            return null;
        }

        return new SweepSettings(start, stop, points.Value);
    }

    private static MeasuredValues? ReadMeasured(FieldValidator v, PlanMeasuredDocument? document, int windingCount)
    {
        if (document is null)
        {
            return MeasuredValues.None;
        }

        var before = v.Errors.Count;
        var al = document.AlNh is null ? null : v.Range("measured.alNh", document.AlNh, 0.01, 1e7, "nH", minimumExclusive: true);
        var leakage = document.LeakageInductanceH is null ? null : v.Range("measured.leakageInductanceH", document.LeakageInductanceH, 0, 10, "H");
        var interwinding = document.InterwindingCapacitanceF is null ? null : v.Range("measured.interwindingCapacitanceF", document.InterwindingCapacitanceF, 0, 1e-6, "F");
        var selfCapacitances = new List<double?>();
        var listed = document.SelfCapacitanceF ?? [];
        if (listed.Count > windingCount)
        {
            v.Add("measured.selfCapacitanceF", $"One value per winding at most ({windingCount}).");
        }

        for (var i = 0; i < Math.Min(listed.Count, windingCount); i++)
        {
            selfCapacitances.Add(listed[i] is null ? null : v.Range($"measured.selfCapacitanceF[{i}]", listed[i], 0, 1e-6, "F"));
        }

        return v.Errors.Count != before ? null : new MeasuredValues(al * 1e-9, leakage, interwinding, selfCapacitances);
    }

    /// <summary>Checks the bench record: known-looking check ids, finite positive values, a real date, a version.</summary>
    private static void ReadBench(FieldValidator v, PlanBenchDocument? document)
    {
        if (document is null)
        {
            return;
        }

        if (document.MeasuredOn is not null
            && !DateOnly.TryParseExact(document.MeasuredOn, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _))
        {
            v.Add("bench.measuredOn", $"'{document.MeasuredOn}' is not a date: write it as yyyy-mm-dd.");
        }

        if (document.PlanVersion is not null)
        {
            v.WholeRange("bench.planVersion", document.PlanVersion, 1, int.MaxValue, "versions");
        }

        var values = document.Values ?? [];
        if (values.Count > MaximumBenchValues)
        {
            v.Add("bench.values", $"At most {MaximumBenchValues} measured values.");
            return;
        }

        foreach (var (id, value) in values)
        {
            if (!EntryId.IsValid(id) || id.Length > 40)
            {
                v.Add("bench.values", $"'{id}' is not a check id: lower-case letters, digits and single hyphens, at most 40 characters (e.g. w0-inductance).");
            }
            else if (value is null)
            {
                v.Add($"bench.values.{id}", "Required: the measured value in SI, or leave the check out.");
            }
            else
            {
                v.Range($"bench.values.{id}", value.Value, 0, 1e15, string.Empty, minimumExclusive: true);
            }
        }
    }

    private static WireLengthAllowance? ReadAllowance(FieldValidator v, PlanAllowanceDocument? document)
    {
        if (document is null)
        {
            return WireLengthAllowance.Default;
        }

        var lead = document.LeadLengthMm is null ? WireLengthAllowance.Default.LeadLengthPerEndM * 1e3 : v.Range("allowance.leadLengthMm", document.LeadLengthMm, 0, 5000, "mm");
        var margin = document.MarginPercent is null ? WireLengthAllowance.Default.MarginFraction * 100 : v.Range("allowance.marginPercent", document.MarginPercent, 0, 100, "%");
        return lead is null || margin is null ? null : new WireLengthAllowance(lead.Value * 1e-3, margin.Value / 100);
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
        var ambient = document.AmbientTemperatureC is null ? 25 : v.Range("operating.ambientTemperatureC", document.AmbientTemperatureC, -55, 150, "°C");
        var k = document.ReactanceFactor is null ? OperatingConditions.DefaultReactanceFactor : v.Range("operating.reactanceFactor", document.ReactanceFactor, 0.1, 100, string.Empty);
        VoltageWaveform? waveform = null;
        switch (document.Waveform)
        {
            case null or "sine":
                waveform = VoltageWaveform.Sine;
                break;
            case "square":
                waveform = VoltageWaveform.Square;
                break;
            case "pulse":
                var duty = v.Range("operating.dutyCycle", document.DutyCycle, VoltageWaveform.MinPulseDutyCycle, VoltageWaveform.MaxPulseDutyCycle, string.Empty);
                waveform = duty is null ? null : VoltageWaveform.Pulse(duty.Value);
                break;
            default:
                v.Add("operating.waveform", $"Unknown waveform '{document.Waveform}': use sine, square or pulse.");
                break;
        }

        if (document.DutyCycle is not null && document.Waveform != "pulse")
        {
            v.Add("operating.dutyCycle", "A duty cycle applies to the pulse waveform only.");
        }

        if (fMin is not null && fMax is not null && fMax <= fMin)
        {
            v.Add("operating.maxFrequencyHz", "The highest frequency must be above the lowest frequency.");
            return null;
        }

        return fMin is null || fMax is null || rs is null || rl is null || drive is null || ambient is null || k is null || waveform is null
            ? null
            : new OperatingConditions(fMin.Value, fMax.Value, rs.Value, rl.Value, drive.Value)
            {
                Waveform = waveform,
                AmbientTemperatureC = ambient.Value,
                ReactanceFactor = k.Value,
            };
    }
}
