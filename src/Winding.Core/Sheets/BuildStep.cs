namespace Winding.Core.Sheets;

/// <summary>One numbered step of the build instructions.</summary>
/// <param name="Number">1 for the first step, counting up without gaps.</param>
/// <param name="Kind">What the step is about.</param>
/// <param name="WindingIndex">The winding concerned (0-based), or null for a step about the whole part.</param>
/// <param name="Text">The instruction in plain words (may contain the plan's winding names: escape on display).</param>
public sealed record BuildStep(int Number, BuildStepKind Kind, int? WindingIndex, string Text);
