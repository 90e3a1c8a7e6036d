using Winding.Catalogue.Validation;

namespace Winding.Catalogue.Store;

/// <summary>What an import did, or would do on a dry run.</summary>
/// <param name="DryRun">True when nothing was written.</param>
/// <param name="Outcome"><see cref="StoreOutcome.Ok"/> when the bundle could be read (single entries may still be refused).</param>
/// <param name="Errors">Problems with the bundle as a whole (field paths from its top); empty when it was read.</param>
/// <param name="Items">Every entry of the bundle, materials first, in bundle order.</param>
public sealed record ImportReport(bool DryRun, StoreOutcome Outcome, IReadOnlyList<FieldError> Errors, IReadOnlyList<ImportItem> Items)
{
    /// <summary>Entries added.</summary>
    public IReadOnlyList<ImportItem> Added => [.. Items.Where(i => i.Action == ImportAction.Add)];

    /// <summary>Entries changed, with their old and new versions.</summary>
    public IReadOnlyList<ImportItem> Changed => [.. Items.Where(i => i.Action == ImportAction.Change)];

    /// <summary>Entries already as in the bundle.</summary>
    public IReadOnlyList<ImportItem> Unchanged => [.. Items.Where(i => i.Action == ImportAction.Unchanged)];

    /// <summary>Entries refused, with reasons.</summary>
    public IReadOnlyList<ImportItem> Refused => [.. Items.Where(i => i.Action == ImportAction.Refuse)];
}
