using System.Globalization;
using System.Text.Json;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;
using Winding.Web.Hosting;

namespace Winding.Web.Sheets;

/// <summary>
/// Writes an AL measured on the bench into the user's catalogue as the core's <c>measuredAlNh</c>, with the measurement
/// appended to its <c>source</c> as provenance. A built-in core is read-only, so a user copy is saved under a new id
/// (<c>{id}-measured</c>, numbered when taken); a user core gets the AL as its next version (refused, with nothing written,
/// when someone saved it in between).
/// </summary>
public sealed class CoreAlWriter
{
    private readonly CatalogueProvider _catalogue;

    /// <summary>Creates the writer.</summary>
    public CoreAlWriter(CatalogueProvider catalogue)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        _catalogue = catalogue;
    }

    /// <summary>Saves <paramref name="alPerCoreH"/> (H/turn², one core) as the measured AL of the core <paramref name="coreId"/>.</summary>
    /// <param name="coreId">The catalogue core the plan uses.</param>
    /// <param name="alPerCoreH">The measured AL of one core, H/turn² (finite, positive).</param>
    /// <param name="provenance">How it was measured, one or two sentences.</param>
    public CoreAlWriteResult Write(string coreId, double alPerCoreH, string provenance)
    {
        ArgumentNullException.ThrowIfNull(coreId);
        ArgumentNullException.ThrowIfNull(provenance);
        if (!_catalogue.Catalogue.CoresById.TryGetValue(coreId, out var entry))
        {
            return new CoreAlWriteResult(false, $"There is no core '{coreId}' in the catalogue any more.", null, false);
        }

        var read = _catalogue.Store.Read(CatalogueEntryKind.Core, coreId);
        if (read.Json is null)
        {
            return new CoreAlWriteResult(false, read.Message, null, false);
        }

        var document = JsonSerializer.Deserialize<CoreEntryDocument>(read.Json, CatalogueJson.Options)!;
        var alNh = double.Parse((alPerCoreH * 1e9).ToString("G6", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        document.MeasuredAlNh = alNh;
        document.Source = string.IsNullOrWhiteSpace(document.Source) ? provenance : document.Source.TrimEnd() + " " + provenance;
        document.Version = null;
        document.SavedAt = null;
        StoreResult result;
        if (entry.BuiltIn)
        {
            document.Id = FreeId(coreId + "-measured");
            document.Name = entry.Name + " (measured AL)";
            document.Schema = null;
            result = _catalogue.Store.Create(CatalogueEntryKind.Core, JsonSerializer.Serialize(document, CatalogueJson.Options));
        }
        else
        {
            result = _catalogue.Store.Update(CatalogueEntryKind.Core, coreId, JsonSerializer.Serialize(document, CatalogueJson.Options), entry.Version);
        }

        _catalogue.Reload();
        if (!result.Succeeded)
        {
            var errors = string.Join(" ", result.Errors.Select(e => e.Field + ": " + e.Message));
            return new CoreAlWriteResult(false, (result.Message + " " + errors).Trim(), null, false);
        }

        var al = alNh.ToString("0.###", CultureInfo.InvariantCulture);
        return entry.BuiltIn
            ? new CoreAlWriteResult(true, $"Saved '{document.Name}' in your catalogue with AL {al} nH/turn² per core; the built-in core stays as it was.", document.Id, true)
            : new CoreAlWriteResult(true, $"Saved AL {al} nH/turn² per core as version {result.Version} of your core '{entry.Name}'.", coreId, false);
    }

    private string FreeId(string wanted)
    {
        var stem = wanted.Length > EntryId.MaximumLength - 4 ? wanted[..(EntryId.MaximumLength - 4)].TrimEnd('-') : wanted;
        var cores = _catalogue.Catalogue.CoresById;
        if (!cores.ContainsKey(stem) && _catalogue.Store.History(CatalogueEntryKind.Core, stem).Versions.Count == 0)
        {
            return stem;
        }

        for (var n = 2; ; n++)
        {
            var id = string.Create(CultureInfo.InvariantCulture, $"{stem}-{n}");
            if (!cores.ContainsKey(id) && _catalogue.Store.History(CatalogueEntryKind.Core, id).Versions.Count == 0)
            {
                return id;
            }
        }
    }
}
