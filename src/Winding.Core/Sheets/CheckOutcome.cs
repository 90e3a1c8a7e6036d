namespace Winding.Core.Sheets;

/// <summary>One check compared with its measured value.</summary>
/// <param name="Check">The check.</param>
/// <param name="Measured">The measured value in SI, or null when not measured.</param>
/// <param name="Deviation">(measured − expected)/expected, or null when not measured.</param>
/// <param name="Verdict">Within, below or above the limits, or not measured.</param>
/// <param name="Advice">What an out-of-tolerance reading usually means, in plain words; null when within or not measured.</param>
public sealed record CheckOutcome(BenchCheck Check, double? Measured, double? Deviation, CheckVerdict Verdict, string? Advice)
{
    /// <summary>True when a value was measured and lies outside the limits.</summary>
    public bool IsOutside => Verdict is CheckVerdict.Below or CheckVerdict.Above;
}
