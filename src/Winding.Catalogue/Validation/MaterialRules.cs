using System.Globalization;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Core.Materials;

namespace Winding.Catalogue.Validation;

/// <summary>
/// Checks a material entry's fields — family, μi, the μs′/μs″ table, saturation flux density, Steinmetz parameters,
/// resistivity, Curie temperature, AL tolerance and source — and builds the engine's <see cref="MagneticMaterial"/>.
/// Every refusal names the field's JSON path and says what is allowed; a value the engine's factories would refuse is
/// always caught here first.
/// </summary>
public static class MaterialRules
{
    /// <summary>Lowest accepted table or fit frequency, Hz.</summary>
    public const double MinimumFrequencyHz = 1;

    /// <summary>Highest accepted table or fit frequency, Hz (100 GHz).</summary>
    public const double MaximumFrequencyHz = 1e11;

    /// <summary>Highest accepted saturation or fit flux density, T (the engine's limit).</summary>
    public const double MaximumFluxDensityT = 3;

    /// <summary>Highest accepted Steinmetz coefficient k, W·m⁻³·Hz^−α·T^−β.</summary>
    public const double MaximumSteinmetzK = 1e12;

    /// <summary>Accepted resistivity range, Ω·m: above 0 up to 10¹² (insulating ferrites lie near 10⁵…10⁷).</summary>
    public const double MaximumResistivityOhmM = 1e12;

    /// <summary>Highest accepted Curie temperature, °C (iron itself: about 770 °C).</summary>
    public const double MaximumCurieTemperatureC = 1000;

    /// <summary>AL tolerance assumed when none is given, ± percent (common practice; physics-sources.md §2.3).</summary>
    public const double DefaultAlTolerancePercent = 25;

    /// <summary>Largest accepted AL tolerance, ± percent.</summary>
    public const double MaximumAlTolerancePercent = 90;

    /// <summary>Longest accepted source text, characters.</summary>
    public const int MaximumSourceLength = 1000;

    /// <summary>
    /// The table's first μs′ must lie within this factor of μi: a table starts where the material is used at low
    /// frequency, where μs′ ≈ μi (a plausibility rule that catches a wrong row or unit; common practice, no source).
    /// </summary>
    public const double LowFrequencyAgreementFactor = 2;

    /// <summary>Validates <paramref name="document"/> (field paths from the top of the file); returns the material or null.</summary>
    public static MagneticMaterial? Validate(FieldValidator validator, MaterialEntryDocument document)
    {
        ArgumentNullException.ThrowIfNull(validator);
        ArgumentNullException.ThrowIfNull(document);
        var before = validator.Errors.Count;

        if (document.Family is null)
        {
            validator.Add("family", "Required: the material family, one of " + Families() + ".");
        }
        else if (!MaterialFamilies.All.Contains(document.Family))
        {
            validator.Add("family", $"Unknown family '{document.Family}': use one of " + Families() + ".");
        }

        if (string.IsNullOrWhiteSpace(document.Source) || document.Source.Length > MaximumSourceLength)
        {
            validator.Add("source", Text($"Required: say where the values come from (handbook typical values, from memory, measured…), 1 to {MaximumSourceLength} characters."));
        }

        var mu = validator.Range("initialPermeability", document.InitialPermeability, 1, CatalogueLoader.MaximumPermeability, string.Empty);
        var curve = document.Permeability is null ? null : Table(validator, document.Permeability, mu);
        var saturation = document.SaturationFluxDensityT is null ? null : Saturation(validator, document.SaturationFluxDensityT);
        var steinmetz = document.Steinmetz is null ? null : Steinmetz(validator, document.Steinmetz, saturation);
        var resistivity = document.ResistivityOhmM is null
            ? null
            : validator.Range("resistivityOhmM", document.ResistivityOhmM, 0, MaximumResistivityOhmM, "Ω·m", minimumExclusive: true);
        var curie = document.CurieTemperatureC is null
            ? null
            : validator.Range("curieTemperatureC", document.CurieTemperatureC, 0, MaximumCurieTemperatureC, "°C", minimumExclusive: true);
        if (curie is not null && saturation is not null && curie <= SaturationFluxDensity.UpperTemperatureC)
        {
            validator.Add("curieTemperatureC", Text($"A Curie temperature of {curie} °C leaves no magnetisation at 100 °C, yet saturationFluxDensityT.at100C is given."));
        }

        var tolerance = document.AlTolerancePercent is null
            ? DefaultAlTolerancePercent
            : validator.Range("alTolerancePercent", document.AlTolerancePercent, 0, MaximumAlTolerancePercent, "%");

        if (validator.Errors.Count != before || mu is null || tolerance is null
            || (document.Permeability is not null && curve is null)
            || (document.SaturationFluxDensityT is not null && saturation is null)
            || (document.Steinmetz is not null && steinmetz is null))
        {
            return null;
        }

        return MagneticMaterial.Create(document.Name ?? string.Empty, mu.Value, curve, saturation, steinmetz, resistivity, curie, tolerance.Value / 100);
    }

    private static ComplexPermeabilityCurve? Table(FieldValidator v, List<PermeabilityPointDocument?> rows, double? mu)
    {
        if (rows.Count < 2)
        {
            v.Add("permeability", "A permeability table needs at least 2 points ({ frequencyHz, real, imaginary }); leave it out when only μi is known.");
            return null;
        }

        var before = v.Errors.Count;
        var points = new List<ComplexPermeabilityPoint>(rows.Count);
        double? previousHz = null;
        for (var i = 0; i < rows.Count; i++)
        {
            var at = Text($"permeability[{i}]");
            if (rows[i] is not { } row)
            {
                v.Add(at, "Required: a point { frequencyHz, real, imaginary }.");
                continue;
            }

            var f = v.Range(at + ".frequencyHz", row.FrequencyHz, MinimumFrequencyHz, MaximumFrequencyHz, "Hz");
            var real = v.Range(at + ".real", row.Real, 0, CatalogueLoader.MaximumPermeability, "(μ′)", minimumExclusive: true);
            var imaginary = v.Range(at + ".imaginary", row.Imaginary, 0, CatalogueLoader.MaximumPermeability, "(μ″, the loss part, never negative)");
            if (f is not null && previousHz is not null && f <= previousHz)
            {
                v.Add(at + ".frequencyHz", Text($"Frequencies must increase: {f} Hz does not lie above the previous point's {previousHz} Hz."));
            }

            previousHz = f ?? previousHz;
            if (f is not null && real is not null && imaginary is not null)
            {
                points.Add(new ComplexPermeabilityPoint(f.Value, real.Value, imaginary.Value));
            }
        }

        if (v.Errors.Count != before)
        {
            return null;
        }

        if (mu is not null && (points[0].MuPrime > mu * LowFrequencyAgreementFactor || points[0].MuPrime < mu / LowFrequencyAgreementFactor))
        {
            v.Add("permeability[0].real", Text($"The first point's μ′ ({points[0].MuPrime}) is far from μi ({mu}): start the table at a frequency where μ′ is still close to μi (within a factor of {LowFrequencyAgreementFactor})."));
            return null;
        }

        return ComplexPermeabilityCurve.Create(points);
    }

    private static SaturationFluxDensity? Saturation(FieldValidator v, SaturationFluxDensityDocument d)
    {
        var at25 = v.Range("saturationFluxDensityT.at25C", d.At25C, 0, MaximumFluxDensityT, "T", minimumExclusive: true);
        var at100 = v.Range("saturationFluxDensityT.at100C", d.At100C, 0, MaximumFluxDensityT, "T", minimumExclusive: true);
        if (at25 is null || at100 is null)
        {
            return null;
        }

        if (at100 > at25)
        {
            // Saturation magnetisation falls monotonically from 0 K to the Curie point (Snelling, Soft Ferrites, 2nd ed.
            // 1988, ch. 2, from memory; physics-sources.md §8.2).
            v.Add("saturationFluxDensityT.at100C", Text($"B_sat at 100 °C ({at100} T) cannot exceed B_sat at 25 °C ({at25} T): saturation falls as the temperature rises."));
            return null;
        }

        return SaturationFluxDensity.Create(at25.Value, at100.Value);
    }

    private static SteinmetzParameters? Steinmetz(FieldValidator v, SteinmetzDocument d, SaturationFluxDensity? saturation)
    {
        const string at = "steinmetz.";
        var k = v.Range(at + "k", d.K, 0, MaximumSteinmetzK, "W·m⁻³·Hz^−α·T^−β", minimumExclusive: true);
        var alpha = v.Range(at + "alpha", d.Alpha, 0, 4, string.Empty, minimumExclusive: true);
        var beta = v.Range(at + "beta", d.Beta, 0, 5, string.Empty, minimumExclusive: true);
        var minHz = v.Range(at + "minFrequencyHz", d.MinFrequencyHz, MinimumFrequencyHz, MaximumFrequencyHz, "Hz");
        var maxHz = v.Range(at + "maxFrequencyHz", d.MaxFrequencyHz, MinimumFrequencyHz, MaximumFrequencyHz, "Hz");
        var minT = v.Range(at + "minFluxDensityT", d.MinFluxDensityT, 0, MaximumFluxDensityT, "T");
        var maxT = v.Range(at + "maxFluxDensityT", d.MaxFluxDensityT, 0, MaximumFluxDensityT, "T", minimumExclusive: true);
        var ok = k is not null && alpha is not null && beta is not null && minHz is not null && maxHz is not null && minT is not null && maxT is not null;
        if (minHz is not null && maxHz is not null && maxHz <= minHz)
        {
            v.Add(at + "maxFrequencyHz", Text($"The highest frequency of the fit ({maxHz} Hz) must lie above the lowest ({minHz} Hz)."));
            ok = false;
        }

        if (minT is not null && maxT is not null && maxT <= minT)
        {
            v.Add(at + "maxFluxDensityT", Text($"The highest flux density of the fit ({maxT} T) must lie above the lowest ({minT} T)."));
            ok = false;
        }

        if (maxT is not null && saturation is not null && maxT > saturation.At25CT)
        {
            v.Add(at + "maxFluxDensityT", Text($"The fit cannot reach {maxT} T: the material saturates at {saturation.At25CT} T (25 °C)."));
            ok = false;
        }

        return ok ? SteinmetzParameters.Create(k!.Value, alpha!.Value, beta!.Value, minHz!.Value, maxHz!.Value, minT!.Value, maxT!.Value) : null;
    }

    private static string Families() => string.Join(", ", MaterialFamilies.All.Select(f => "\"" + f + "\""));

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
