using System.Globalization;
using System.Text;
using Winding.Core.Plans;
using Winding.Core.Response;

namespace Winding.Web.Exports;

/// <summary>
/// Writes the plan's linear equivalent circuit (frequency-independent core) as an ngspice netlist, runnable as is with
/// <c>ngspice -b</c>: a 1 V AC source at node <c>src</c>, <c>RS</c> from <c>src</c> to the primary terminal <c>in</c>, the
/// magnetising inductance, core-loss resistance and primary capacitance across <c>in</c>, the series resistance and
/// leakage inductance to <c>out</c>, the output capacitance and the referred load <c>RL</c> from <c>out</c> to ground, and
/// an <c>.ac dec</c> analysis over the sweep. Comment lines give each element's origin. Elements of zero value are left
/// out (a zero resistor or inductor becomes a plain connection).
/// </summary>
public static class SpiceNetlist
{
    /// <summary>Points per decade of the <c>.ac dec</c> analysis for a sweep of <paramref name="points"/> from start to stop.</summary>
    public static int PointsPerDecade(double startHz, double stopHz, int points) =>
        Math.Max(1, (int)Math.Round((points - 1) / Math.Log10(stopHz / startHz)));

    /// <summary>The netlist of <paramref name="evaluation"/>, which must have been made with a frequency-independent core.</summary>
    public static string Write(TransformerPlan plan, PlanEvaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        var response = evaluation.Response ?? throw new ArgumentException("The evaluation has no response (no operating conditions).", nameof(evaluation));
        var circuit = response.Circuit;
        var e = response.Elements;
        var startHz = response.Sweep[0].FrequencyHz;
        var stopHz = response.Sweep[^1].FrequencyHz;
        var first = plan.Windings[0];
        var last = plan.Windings[^1];
        var text = new StringBuilder();
        Line(text, $"* Winding: equivalent circuit referred to the primary, frequency-independent core");
        Line(text, $"* Plan: {Clean(plan.Name ?? "unnamed")}; {first.Turns} turns : {last.Turns} turns on a {evaluation.Core.ShapeName} core");
        Line(text, $"* Frequency-dependent values taken at {response.ElementsFrequencyHz:G6} Hz (geometric centre of the band)");
        Line(text, $"V1 src 0 AC 1");
        Line(text, $"* RS: source resistance");
        Line(text, $"RS src in {Value(Math.Max(circuit.SourceResistanceOhm, 1e-9))}");
        if (circuit.InputCapacitanceF > 0)
        {
            Line(text, $"* C1: self-capacitance of winding '{Clean(first.Name)}' ({Clean(evaluation.Parasitics.SelfCapacitanceMethods[0])})");
            Line(text, $"C1 in 0 {Value(circuit.InputCapacitanceF)}");
        }

        Line(text, $"* LM: magnetising inductance AL·N1² = {evaluation.Core.InductanceFactor.NanohenriesPerTurnSquared:G6} nH × {first.Turns}²");
        Line(text, $"LM in 0 {Value(e["LM"])}");
        if (e.TryGetValue("RCORE", out var coreOhm))
        {
            Line(text, $"* RCORE: core loss as a parallel resistance, from μ″ of the material at the band centre");
            Line(text, $"RCORE in 0 {Value(coreOhm)}");
        }

        var node = "in";
        if (e["RSERIES"] > 0)
        {
            Line(text, $"* RSERIES: AC resistance of '{Clean(first.Name)}' plus that of '{Clean(last.Name)}' referred by (N1/N2)², at the band centre");
            Line(text, $"RSERIES in mid {Value(e["RSERIES"])}");
            node = "mid";
        }

        if (circuit.LeakageInductanceH > 0)
        {
            Line(text, $"* LLK: leakage inductance referred to the primary ({Clean(evaluation.Parasitics.LeakageMethod)})");
            Line(text, $"LLK {node} out {Value(circuit.LeakageInductanceH)}");
        }
        else
        {
            Line(text, $"* no leakage inductance: a 0 V source joins {node} and out");
            Line(text, $"VLLK {node} out 0");
        }

        if (circuit.OutputCapacitanceF > 0)
        {
            Line(text, $"* C2: self-capacitance of '{Clean(last.Name)}' × (N2/N1)² plus interwinding capacitance × (1 − N2/N1)²");
            Line(text, $"C2 out 0 {Value(circuit.OutputCapacitanceF)}");
        }

        Line(text, $"* RL: load resistance referred to the primary, RL·(N1/N2)²");
        Line(text, $"RL out 0 {Value(circuit.LoadResistanceOhm)}");
        Line(text, $".ac dec {PointsPerDecade(startHz, stopHz, response.Sweep.Count)} {Value(startHz)} {Value(stopHz)}");
        Line(text, $".print ac vm(out) vp(out)");
        Line(text, $".end");
        return text.ToString();
    }

    private static void Line(StringBuilder text, FormattableString line) => text.Append(line.ToString(CultureInfo.InvariantCulture)).Append('\n');

    private static string Value(double value) => value.ToString("G12", CultureInfo.InvariantCulture);

    /// <summary>Names go into comment lines only: strip line breaks and control characters so they cannot start a new card.</summary>
    private static string Clean(string text) => new([.. text.Select(c => char.IsControl(c) ? ' ' : c)]);
}
