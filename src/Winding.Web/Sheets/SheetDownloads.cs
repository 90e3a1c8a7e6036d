using System.Text.Json;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Core.Plans;
using Winding.Web.Exports;

namespace Winding.Web.Sheets;

/// <summary>
/// The text files of the sheet page's exports row, made only when a button is clicked: the SPICE netlist (as
/// <c>POST /api/v1/netlist</c> writes it), the plan as JSON (as the plan page exports it) and their file names. The sweep
/// CSV is the plan page's own button (<c>SweepCsvButton</c>), the PDF the sheet's HTML printed by <see cref="ISheetPdfPrinter"/>.
/// </summary>
public static class SheetDownloads
{
    /// <summary>Why there is no netlist for a plan without a band, or null when there is one.</summary>
    public static string? NetlistUnavailable(SheetView view)
    {
        ArgumentNullException.ThrowIfNull(view);
        return view.Plan.Operating is null ? "A netlist needs the plan's band, source and load: give operating conditions on the plan page." : null;
    }

    /// <summary>
    /// The SPICE netlist of the sheet's plan, frequency-independent form (the circuit the API's netlist writes), or null
    /// without operating conditions.
    /// </summary>
    public static SheetDownload? Netlist(SheetView view)
    {
        ArgumentNullException.ThrowIfNull(view);
        if (view.Plan.Operating is null)
        {
            return null;
        }

        var plan = view.Plan with { FrequencyIndependentCore = true };
        return new SheetDownload(ExportFileName.For(view.Title, "cir"), "text/plain;charset=utf-8", SpiceNetlist.Write(plan, PlanEvaluator.Evaluate(plan)));
    }

    /// <summary>The plan document as JSON, named after the sheet's title (the plan page's export; the start page imports it).</summary>
    public static SheetDownload PlanJson(SheetView view, PlanDocument document)
    {
        ArgumentNullException.ThrowIfNull(view);
        ArgumentNullException.ThrowIfNull(document);
        return new SheetDownload(ExportFileName.For(view.Title, "json"), "application/json;charset=utf-8", JsonSerializer.Serialize(document, CatalogueJson.Options));
    }

    /// <summary>The PDF file name for the sheet.</summary>
    public static string PdfFileName(SheetView view)
    {
        ArgumentNullException.ThrowIfNull(view);
        return ExportFileName.For(view.Title + " bench sheet", "pdf");
    }
}
