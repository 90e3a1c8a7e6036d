namespace Winding.Catalogue.Store;

/// <summary>The JSON text of one entry (built-in, user, or an earlier version).</summary>
/// <param name="Outcome"><see cref="StoreOutcome.Ok"/>, or why nothing was read.</param>
/// <param name="Message">One sentence for the user.</param>
/// <param name="Json">The entry's JSON as saved, or null.</param>
/// <param name="Version">Its version (0 for a built-in entry), or null.</param>
/// <param name="BuiltIn">True for a built-in entry.</param>
public sealed record EntryReadResult(StoreOutcome Outcome, string Message, string? Json, int? Version, bool BuiltIn);
