namespace Winding.Web.Sheets;

/// <summary>What writing a measured AL into the catalogue did.</summary>
/// <param name="Succeeded">True when the entry was saved.</param>
/// <param name="Message">One sentence for the user.</param>
/// <param name="CoreId">The core saved: the new user copy of a built-in core, or the user core itself; null on failure.</param>
/// <param name="Copied">True when a user copy of a built-in core was made.</param>
public sealed record CoreAlWriteResult(bool Succeeded, string Message, string? CoreId, bool Copied);
