using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// One row of IEC 60317-0-1 Table 1 (enamelled round copper wire): a nominal conductor diameter and the maximum overall
/// diameter of each insulation grade. Grade 3 is missing where its value is not known (see
/// <see cref="MetricEnamelledWireTable"/> for the provenance of every row).
/// </summary>
public sealed record MetricEnamelledWireSize
{
    internal MetricEnamelledWireSize(double nominalMm, double grade1Mm, double grade2Mm, double? grade3Mm, ValueProvenance provenance)
    {
        if (!(nominalMm > 0 && grade1Mm > nominalMm && grade2Mm > grade1Mm && (grade3Mm is null || grade3Mm > grade2Mm)))
        {
            throw new ArgumentOutOfRangeException(nameof(nominalMm), nominalMm, "A row needs 0 < nominal < grade 1 < grade 2 < grade 3 diameters.");
        }

        NominalDiameter = Length.FromMillimetres(nominalMm);
        Grade1MaximumOverallDiameter = Length.FromMillimetres(grade1Mm);
        Grade2MaximumOverallDiameter = Length.FromMillimetres(grade2Mm);
        Grade3MaximumOverallDiameter = grade3Mm is { } g3 ? Length.FromMillimetres(g3) : null;
        Provenance = provenance;
    }

    /// <summary>Nominal diameter of the bare conductor.</summary>
    public Length NominalDiameter { get; }

    /// <summary>Maximum overall diameter of grade 1 (thinnest enamel).</summary>
    public Length Grade1MaximumOverallDiameter { get; }

    /// <summary>Maximum overall diameter of grade 2.</summary>
    public Length Grade2MaximumOverallDiameter { get; }

    /// <summary>Maximum overall diameter of grade 3, or null where this table does not know it.</summary>
    public Length? Grade3MaximumOverallDiameter { get; }

    /// <summary>Where the row's values come from.</summary>
    public ValueProvenance Provenance { get; }

    /// <summary>The size as it is written, in millimetres with three decimals and the invariant culture: "0.500 mm".</summary>
    public string Label => FormattableString.Invariant($"{NominalDiameter.Millimetres:0.000} mm");

    /// <summary>The grades this row lists: 1 and 2 always, 3 where its value is known.</summary>
    public IReadOnlyList<MetricWireGrade> AvailableGrades =>
        Grade3MaximumOverallDiameter is null
            ? [MetricWireGrade.Grade1, MetricWireGrade.Grade2]
            : [MetricWireGrade.Grade1, MetricWireGrade.Grade2, MetricWireGrade.Grade3];

    /// <summary>True when the row lists a maximum overall diameter for <paramref name="grade"/>.</summary>
    public bool HasGrade(MetricWireGrade grade) => TryGetMaximumOverallDiameter(grade, out _);

    /// <summary>The maximum overall diameter of <paramref name="grade"/>, if the row lists it.</summary>
    /// <param name="grade">The insulation grade.</param>
    /// <param name="overallDiameter">The maximum overall diameter, or <see cref="Length.Zero"/> when unavailable.</param>
    public bool TryGetMaximumOverallDiameter(MetricWireGrade grade, out Length overallDiameter)
    {
        Length? value = grade switch
        {
            MetricWireGrade.Grade1 => Grade1MaximumOverallDiameter,
            MetricWireGrade.Grade2 => Grade2MaximumOverallDiameter,
            MetricWireGrade.Grade3 => Grade3MaximumOverallDiameter,
            _ => null,
        };
        overallDiameter = value ?? Length.Zero;
        return value is not null;
    }

    /// <summary>The maximum overall diameter of <paramref name="grade"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The row does not list <paramref name="grade"/> (or it is not a grade).</exception>
    public Length MaximumOverallDiameter(MetricWireGrade grade)
    {
        if (!TryGetMaximumOverallDiameter(grade, out var overall))
        {
            throw new ArgumentOutOfRangeException(nameof(grade), grade, FormattableString.Invariant($"The {Label} row lists grades 1 and 2{(HasGrade(MetricWireGrade.Grade3) ? " and 3" : "; its grade 3 value is not known")}."));
        }

        return overall;
    }
}
