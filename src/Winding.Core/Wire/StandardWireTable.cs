using System.Collections.Frozen;
using System.Diagnostics.CodeAnalysis;

namespace Winding.Core.Wire;

/// <summary>
/// Every standard wire the engine knows, for listing and picking by id: the metric enamelled sizes of
/// <see cref="MetricEnamelledWireTable"/> in each grade they list, then AWG 10 to 44 of <see cref="AwgWireTable"/> in
/// single and heavy build.
/// </summary>
public static class StandardWireTable
{
    /// <summary>All standard wires: metric by size then grade, then AWG thickest first, single before heavy.</summary>
    public static IReadOnlyList<StandardWire> All { get; } = Array.AsReadOnly([.. Metric(), .. Awg()]);

    private static readonly FrozenDictionary<string, StandardWire> ById = All.ToFrozenDictionary(w => w.Id, StringComparer.Ordinal);

    /// <summary>The standard wire with the id <paramref name="id"/> (ordinal, case-sensitive match).</summary>
    /// <exception cref="ArgumentNullException"><paramref name="id"/> is null.</exception>
    public static bool TryFind(string id, [NotNullWhen(true)] out StandardWire? wire)
    {
        ArgumentNullException.ThrowIfNull(id);
        return ById.TryGetValue(id, out wire);
    }

    private static IEnumerable<StandardWire> Metric() =>
        from size in MetricEnamelledWireTable.Sizes
        from grade in size.AvailableGrades
        select new StandardWire(
            FormattableString.Invariant($"metric-{size.NominalDiameter.Millimetres:0.000}-g{(int)grade}").Replace('.', '-'),
            StandardWireSystem.Metric,
            size.Label,
            MetricEnamelledWireTable.GradeLabel(grade),
            MetricEnamelledWireTable.Wire(size, grade),
            size.Provenance);

    private static IEnumerable<StandardWire> Awg() =>
        from size in AwgWireTable.Sizes
        from build in new[] { AwgBuild.Single, AwgBuild.Heavy }
        select new StandardWire(
            FormattableString.Invariant($"awg-{size.Gauge}-{(build == AwgBuild.Single ? "single" : "heavy")}"),
            StandardWireSystem.Awg,
            size.Label,
            AwgWireTable.BuildLabel(build),
            AwgWireTable.Wire(size.Gauge, build),
            AwgMagnetWireSize.OverallDiameterProvenance);
}
