namespace Winding.Catalogue.Store;

/// <summary>The saved versions of a user entry, newest first.</summary>
/// <param name="Outcome"><see cref="StoreOutcome.Ok"/>, or why there is no history.</param>
/// <param name="Message">One sentence for the user.</param>
/// <param name="Versions">The current version (if the entry was not deleted) and every earlier one kept, newest first.</param>
public sealed record HistoryResult(StoreOutcome Outcome, string Message, IReadOnlyList<EntryVersion> Versions);
