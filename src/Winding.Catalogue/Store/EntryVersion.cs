namespace Winding.Catalogue.Store;

/// <summary>One saved version of a user entry.</summary>
/// <param name="Version">Version number, 1 and up.</param>
/// <param name="SavedAt">When it was saved (from the store's clock), or null when the file does not say.</param>
/// <param name="Current">True for the current version; false for an earlier one kept in the history.</param>
public sealed record EntryVersion(int Version, DateTimeOffset? SavedAt, bool Current);
