using System.Text.RegularExpressions;

namespace Winding.Web.Planning;

/// <summary>
/// Where on the plan page a warning's field is: the element ids to focus for a warning's field path (the engine's and
/// the API's paths, e.g. <c>windings[1].turns</c>, <c>operating.driveVoltageRms</c>, <c>core</c>), in order of
/// preference; the page focuses the first one that is on screen (a wire's fields depend on its kind).
/// </summary>
public static partial class WarningTarget
{
    private static readonly Dictionary<string, string[]> Operating = new(StringComparer.Ordinal)
    {
        ["operating"] = ["min-frequency"],
        ["operating.minFrequencyHz"] = ["min-frequency"],
        ["operating.maxFrequencyHz"] = ["max-frequency"],
        ["operating.sourceResistanceOhm"] = ["source-resistance"],
        ["operating.loadResistanceOhm"] = ["load-resistance"],
        ["operating.driveVoltageRms"] = ["drive-voltage"],
        ["operating.ambientTemperatureC"] = ["ambient"],
        ["operating.dutyCycle"] = ["duty-cycle"],
    };

    private static readonly string[] WireFields = ["conductor", "metric-size", "awg", "litz-strand", "hookup-conductor", "standard-search"];

    /// <summary>The element ids for <paramref name="field"/>, most specific first; empty when the page has no such field.</summary>
    public static IReadOnlyList<string> Candidates(string? field)
    {
        if (string.IsNullOrEmpty(field))
        {
            return [];
        }

        if (Operating.TryGetValue(field, out var ids))
        {
            return ids;
        }

        if (field == "core" || field.StartsWith("core.", StringComparison.Ordinal))
        {
            return ["core-measured-al", "core-mu", "core-search"];
        }

        var winding = WindingField().Match(field);
        if (!winding.Success)
        {
            return [];
        }

        var prefix = "windings-" + winding.Groups["index"].Value + "-";
        return winding.Groups["rest"].Value switch
        {
            "turns" or "taps" => [prefix + "turns"],
            "wire" => [.. WireFields.Select(f => prefix + f), prefix + "turns"],
            "rmsCurrentA" => [prefix + "current"],
            _ => [prefix + "turns", prefix + "name"],
        };
    }

    /// <summary><c>windings[i]</c> with an optional first property after it.</summary>
    [GeneratedRegex(@"^windings\[(?<index>\d+)\](?:\.(?<rest>[A-Za-z]+))?", RegexOptions.CultureInvariant)]
    private static partial Regex WindingField();
}
