using System.Diagnostics.CodeAnalysis;
using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// Enamelled round copper wire of metric nominal diameter per IEC 60317-0-1:2013, Table 1: the R20 series of nominal
/// conductor diameters from 0.020 mm to 2.000 mm, each with the maximum overall diameter of grades 1, 2 and 3 (mm).
/// A wire is specified as "IEC 60317-xx – nominal diameter – grade"; for a fit check the maximum overall diameter is
/// the one to use (physics-sources.md §3.3).
/// </summary>
/// <remarks>
/// <para>Provenance of the rows (each row's <see cref="MetricEnamelledWireSize.Provenance"/> says the same):</para>
/// <list type="bullet">
/// <item>0.100, 0.112 and 0.125 mm: read in a public reproduction of IS 13730-0-1, the Indian adoption of
/// IEC 60317-0-1 (<see cref="ValueProvenance.Read"/>).</item>
/// <item>0.200, 0.224, 0.250, 0.280, 0.315, 0.450, 0.500, 0.560, 1.000 and 1.120 mm: from memory, confirmed indirectly
/// because the SWG rows of IS 13730-0-1 equal the SWG diameter plus these rows' increments for all three grades
/// (physics-sources.md §3.3, script t03_wire.py; <see cref="ValueProvenance.FromMemoryCrossChecked"/>).</item>
/// <item>Every other row: from memory, not cross-checked (<see cref="ValueProvenance.FromMemory"/>). The rows below
/// 0.100 mm are the least certain.</item>
/// <item>Grade 3 below 0.100 mm: not known here, so those rows list grades 1 and 2 only rather than a guessed value.</item>
/// <item>The R40 intermediate sizes (0.106, 0.118, 0.132, 0.150, …, 0.300 mm, …) are not listed: their values are not
/// known here (physics-sources.md §3.3 marks 0.300 mm as unverified). Use <see cref="EnamelBuild"/> for them.</item>
/// </list>
/// </remarks>
public static class MetricEnamelledWireTable
{
    private const ValueProvenance Read = ValueProvenance.Read;
    private const ValueProvenance Checked = ValueProvenance.FromMemoryCrossChecked;
    private const ValueProvenance Memory = ValueProvenance.FromMemory;

    /// <summary>How far a requested nominal diameter may lie from a row and still match it: ±0.0005 mm.</summary>
    public static Length LookupTolerance { get; } = Length.FromMillimetres(0.0005);

    /// <summary>All rows in increasing nominal diameter.</summary>
    public static IReadOnlyList<MetricEnamelledWireSize> Sizes { get; } = Array.AsReadOnly<MetricEnamelledWireSize>(
    [
        // nominal, grade 1 / grade 2 / grade 3 maximum overall diameter (mm)
        new(0.020, 0.024, 0.027, null, Memory),
        new(0.022, 0.027, 0.030, null, Memory),
        new(0.025, 0.031, 0.034, null, Memory),
        new(0.028, 0.034, 0.038, null, Memory),
        new(0.032, 0.039, 0.043, null, Memory),
        new(0.036, 0.044, 0.049, null, Memory),
        new(0.040, 0.049, 0.054, null, Memory),
        new(0.045, 0.055, 0.061, null, Memory),
        new(0.050, 0.060, 0.066, null, Memory),
        new(0.056, 0.067, 0.074, null, Memory),
        new(0.063, 0.076, 0.083, null, Memory),
        new(0.071, 0.084, 0.091, null, Memory),
        new(0.080, 0.094, 0.101, null, Memory),
        new(0.090, 0.105, 0.113, null, Memory),
        new(0.100, 0.117, 0.125, 0.132, Read),
        new(0.112, 0.130, 0.139, 0.147, Read),
        new(0.125, 0.144, 0.154, 0.163, Read),
        new(0.140, 0.160, 0.171, 0.181, Memory),
        new(0.160, 0.182, 0.194, 0.205, Memory),
        new(0.180, 0.204, 0.217, 0.229, Memory),
        new(0.200, 0.226, 0.239, 0.252, Checked),
        new(0.224, 0.252, 0.266, 0.280, Checked),
        new(0.250, 0.281, 0.297, 0.312, Checked),
        new(0.280, 0.312, 0.329, 0.345, Checked),
        new(0.315, 0.349, 0.367, 0.384, Checked),
        new(0.355, 0.392, 0.411, 0.428, Memory),
        new(0.400, 0.439, 0.459, 0.478, Memory),
        new(0.450, 0.491, 0.513, 0.533, Checked),
        new(0.500, 0.544, 0.566, 0.587, Checked),
        new(0.560, 0.606, 0.630, 0.653, Checked),
        new(0.630, 0.679, 0.704, 0.728, Memory),
        new(0.710, 0.762, 0.789, 0.814, Memory),
        new(0.800, 0.855, 0.884, 0.911, Memory),
        new(0.900, 0.959, 0.989, 1.018, Memory),
        new(1.000, 1.062, 1.094, 1.124, Checked),
        new(1.120, 1.184, 1.217, 1.248, Checked),
        new(1.250, 1.316, 1.349, 1.381, Memory),
        new(1.400, 1.468, 1.502, 1.535, Memory),
        new(1.600, 1.670, 1.706, 1.740, Memory),
        new(1.800, 1.872, 1.909, 1.944, Memory),
        new(2.000, 2.074, 2.112, 2.148, Memory),
    ]);

    /// <summary>
    /// The row whose nominal diameter equals <paramref name="nominalDiameter"/> within <see cref="LookupTolerance"/>
    /// (the sizes are at least 0.002 mm apart, so at most one row matches). No interpolation.
    /// </summary>
    public static bool TryFind(Length nominalDiameter, [NotNullWhen(true)] out MetricEnamelledWireSize? size)
    {
        foreach (var row in Sizes)
        {
            if (Math.Abs(row.NominalDiameter.Metres - nominalDiameter.Metres) <= LookupTolerance.Metres)
            {
                size = row;
                return true;
            }
        }

        size = null;
        return false;
    }

    /// <summary>
    /// Enamelled copper wire of a listed nominal diameter and grade, with the grade's maximum overall diameter; its
    /// description reads like "0.500 mm, grade 2".
    /// </summary>
    /// <param name="nominalDiameter">A nominal diameter of the table (within <see cref="LookupTolerance"/>).</param>
    /// <param name="grade">An insulation grade the row lists.</param>
    /// <exception cref="ArgumentOutOfRangeException">The diameter is not in the table, or the row does not list the grade.</exception>
    public static WindingWire Wire(Length nominalDiameter, MetricWireGrade grade)
    {
        if (!TryFind(nominalDiameter, out var size))
        {
            throw new ArgumentOutOfRangeException(nameof(nominalDiameter), nominalDiameter, "Not a nominal diameter of the IEC 60317-0-1 R20 table (0.020 mm to 2.000 mm).");
        }

        return Wire(size, grade);
    }

    /// <summary>Enamelled copper wire of a table row and one of its grades (see <see cref="Wire(Length, MetricWireGrade)"/>).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The row does not list the grade.</exception>
    public static WindingWire Wire(MetricEnamelledWireSize size, MetricWireGrade grade)
    {
        ArgumentNullException.ThrowIfNull(size);
        var overall = size.MaximumOverallDiameter(grade);
        return WindingWire.Solid(size.NominalDiameter, overall, ConductorMaterial.Copper, $"{size.Label}, {GradeLabel(grade)}");
    }

    /// <summary>The grade as it is written: "grade 1".</summary>
    internal static string GradeLabel(MetricWireGrade grade) =>
        FormattableString.Invariant($"grade {(int)grade}");
}
