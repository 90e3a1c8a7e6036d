using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Store;

/// <summary>One entry of an imported bundle and what happens to it.</summary>
/// <param name="Kind">Material or core (the bundle list it came from).</param>
/// <param name="Id">Its id as written (may be empty or invalid when refused).</param>
/// <param name="Action">Added, changed, unchanged or refused.</param>
/// <param name="OldVersion">The current user version it replaces (changes and unchanged entries), or null.</param>
/// <param name="NewVersion">The version it is (or would be) saved as, or null.</param>
/// <param name="Errors">Why it is refused (field paths within the entry); empty otherwise.</param>
public sealed record ImportItem(CatalogueEntryKind Kind, string Id, ImportAction Action, int? OldVersion, int? NewVersion, IReadOnlyList<FieldError> Errors);
