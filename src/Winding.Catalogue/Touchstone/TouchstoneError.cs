namespace Winding.Catalogue.Touchstone;

/// <summary>Why a Touchstone file could not be read.</summary>
/// <param name="LineNumber">The 1-based line at fault; null when the fault is the file as a whole (empty, too large).</param>
/// <param name="Reason">Plain words.</param>
public sealed record TouchstoneError(int? LineNumber, string Reason);
