namespace Winding.Core.Plans;

/// <summary>
/// Values measured on a built transformer that replace the engine's estimates. Null means "not measured".
/// </summary>
/// <param name="Al">Measured AL of the (stacked) core, H per turn².</param>
/// <param name="LeakageInductanceH">Measured leakage inductance referred to the primary (primary measured with the last
/// winding shorted), H.</param>
/// <param name="InterwindingCapacitanceF">Measured capacitance between the first and the last winding, F.</param>
/// <param name="SelfCapacitancesF">Measured self-capacitance per winding (null entries: not measured), F.</param>
public sealed record MeasuredValues(
    double? Al,
    double? LeakageInductanceH,
    double? InterwindingCapacitanceF,
    IReadOnlyList<double?> SelfCapacitancesF)
{
    /// <summary>Nothing measured.</summary>
    public static MeasuredValues None { get; } = new(null, null, null, []);

    /// <summary>The measured self-capacitance of winding <paramref name="index"/>, if any.</summary>
    public double? SelfCapacitanceF(int index) => index < SelfCapacitancesF.Count ? SelfCapacitancesF[index] : null;
}
