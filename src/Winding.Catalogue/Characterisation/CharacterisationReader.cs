using System.Numerics;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Validation;
using Winding.Core.Characterisation;
using Winding.Core.Geometry;

namespace Winding.Catalogue.Characterisation;

/// <summary>
/// Validates a <see cref="CharacteriseDocument"/> and characterises the core: effective parameters from its dimensions
/// (IEC 60205), AL and μe from the test winding's inductance (AL = L/N², μe = AL·C1/μ0; IEC 62044-2), μ′ and μ″ from
/// measured impedances, a relaxation-model fit (Cole–Cole, MathNet Levenberg–Marquardt) when there are at least three
/// usable points, and the nearest generic material classes.
/// </summary>
public static class CharacterisationReader
{
    /// <summary>Most impedance points in one request.</summary>
    public const int MaximumPoints = 100_000;

    /// <summary>Characterises the measurement, or returns the field errors.</summary>
    public static (CharacterisationResult? Result, IReadOnlyList<FieldError> Errors) Read(CharacteriseDocument? document, CoreCatalogue catalogue)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        var v = new FieldValidator();
        if (document is null)
        {
            v.Add(string.Empty, "The request body must be a measurement: core, turns and an inductance or impedances.");
            return (null, v.Errors);
        }

        CoreShape? shape = null;
        if (document.Core is null)
        {
            v.Add("core", "Required: the core's shape and dimensions in mm, or a catalogueId.");
        }
        else if (!string.IsNullOrEmpty(document.Core.CatalogueId))
        {
            shape = catalogue.CoresById.TryGetValue(document.Core.CatalogueId, out var entry) ? entry.Shape : null;
            if (shape is null)
            {
                v.Add("core.catalogueId", $"No core with the id '{document.Core.CatalogueId}' is in the catalogue.");
            }
        }
        else
        {
            shape = CoreShapeRules.Validate(v, "core", document.Core.Shape, document.Core.Family, document.Core.DimensionsMm, document.Core.Effective, null);
        }

        var turns = v.WholeRange("turns", document.Turns, 1, 10_000, "turns");
        TestWindingMeasurement? measurement = null;
        var windingOhm = document.WindingResistanceOhm is null ? 0 : v.Range("windingResistanceOhm", document.WindingResistanceOhm, 0, 1e6, "Ω");
        if (document.InductanceH is not null || document.FrequencyHz is not null)
        {
            var f = v.Range("frequencyHz", document.FrequencyHz, 1e-3, 1e11, "Hz", minimumExclusive: true);
            var l = v.Range("inductanceH", document.InductanceH, 0, 1e4, "H", minimumExclusive: true);
            if (document.SeriesResistanceOhm is not null && document.QualityFactor is not null)
            {
                v.Add("qualityFactor", "Give either the series resistance or Q, not both.");
            }

            var r = document.SeriesResistanceOhm is null ? null : v.Range("seriesResistanceOhm", document.SeriesResistanceOhm, 0, 1e9, "Ω");
            var q = document.QualityFactor is null ? null : v.Range("qualityFactor", document.QualityFactor, 0, 1e9, string.Empty, minimumExclusive: true);
            if (v.IsValid && turns is not null && f is not null && l is not null && windingOhm is not null)
            {
                measurement = r is not null
                    ? TestWindingMeasurement.FromInductanceAndResistance(turns.Value, f.Value, l.Value, r.Value, windingOhm.Value)
                    : q is not null
                        ? TestWindingMeasurement.FromInductanceAndQuality(turns.Value, f.Value, l.Value, q.Value, windingOhm.Value)
                        : TestWindingMeasurement.FromInductance(turns.Value, f.Value, l.Value, windingOhm.Value);
            }
        }

        var points = new List<(double, Complex)>();
        var listed = document.Impedances ?? [];
        if (listed.Count > MaximumPoints)
        {
            v.Add("impedances", $"At most {MaximumPoints} points.");
        }
        else
        {
            for (var i = 0; i < listed.Count; i++)
            {
                var point = listed[i];
                var f = v.Range($"impedances[{i}].frequencyHz", point?.FrequencyHz, 1e-3, 1e11, "Hz", minimumExclusive: true);
                var re = v.Range($"impedances[{i}].re", point?.Re, -1e12, 1e12, "Ω");
                var im = v.Range($"impedances[{i}].im", point?.Im, -1e12, 1e12, "Ω");
                if (f is not null && re is not null && im is not null)
                {
                    points.Add((f.Value, new Complex(re.Value, im.Value)));
                }
            }
        }

        if (document.InductanceH is null && document.FrequencyHz is null && listed.Count == 0)
        {
            v.Add("inductanceH", "Required: the test winding's inductance (with frequencyHz), or impedances.");
        }

        if (!v.IsValid || shape is null || turns is null || windingOhm is null)
        {
            return (null, v.Errors);
        }

        return (Characterise(shape, turns.Value, measurement, points, windingOhm.Value, catalogue), v.Errors);
    }

    /// <summary>Characterises validated inputs.</summary>
    public static CharacterisationResult Characterise(CoreShape shape, int turns, TestWindingMeasurement? measurement, IReadOnlyList<(double FrequencyHz, Complex ImpedanceOhm)> impedances, double windingResistanceOhm, CoreCatalogue catalogue)
    {
        ArgumentNullException.ThrowIfNull(shape);
        ArgumentNullException.ThrowIfNull(impedances);
        ArgumentNullException.ThrowIfNull(catalogue);
        var effective = shape.EffectiveParameters();
        var fromInductance = measurement is null ? null : CoreCharacterisation.FromMeasurement(effective, measurement);
        var measured = CoreCharacterisation.FromImpedances(effective, turns, [.. impedances.OrderBy(p => p.FrequencyHz)], windingResistanceOhm);
        var usable = measured.Where(m => m.IsInductive && m.MuPrime > 0).ToList();
        PermeabilityRelaxationFit? fit = null;
        if (usable.Count >= 3)
        {
            fit = PermeabilityRelaxationFit.Fit(usable, PermeabilityRelaxationModel.ColeCole);
        }

        var mu = fromInductance?.EffectivePermeability ?? fit?.Parameters.InitialPermeability ?? usable.FirstOrDefault()?.MuPrime;
        var classes = mu is { } m && m > 0
            ? CoreCharacterisation.NearestMaterialClasses(m, catalogue.Materials.Select(c => (c.Id, c.Name, c.Material.InitialPermeability)), 3)
            : [];
        return new CharacterisationResult(shape, effective, fromInductance, measured, fit, classes);
    }
}
