namespace Winding.Core.Sheets;

/// <summary>A value the bench measurements suggest putting into the plan (or the catalogue) in place of an estimate.</summary>
/// <param name="Target">What it changes.</param>
/// <param name="WindingIndex">The winding concerned (self-capacitance), or null.</param>
/// <param name="Value">The value in SI (H/turn² for AL, H, F), or null when the measurement cannot give one (the reason
/// says why).</param>
/// <param name="Reason">How it was derived and when it is valid, in plain words.</param>
public sealed record SuggestedUpdate(UpdateTarget Target, int? WindingIndex, double? Value, string Reason);
