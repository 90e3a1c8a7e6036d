using Microsoft.AspNetCore.Components;
using Microsoft.JSInterop;
using Winding.Catalogue.Plans;
using Winding.Web.Sheets;

namespace Winding.Web.Components.Widgets;

/// <summary>
/// The sheet page's exports row. Each file is made only when its button is clicked and handed to
/// <c>wwwroot/js/download.js</c>: text with <c>saveText</c>, the PDF (the sheet's standalone HTML printed by the registered
/// <see cref="ISheetPdfPrinter"/>) as a stream with <c>saveBytes</c>. Without a printer, or when printing fails, it says so.
/// </summary>
public sealed partial class SheetExports : IAsyncDisposable
{
    private IJSObjectReference? _module;
    private string? _problem;
    private bool _printing;

    [Inject]
    private IJSRuntime JS { get; set; } = default!;

    [Inject]
    private IServiceProvider Services { get; set; } = default!;

    /// <summary>The sheet.</summary>
    [Parameter, EditorRequired]
    public SheetView View { get; set; } = default!;

    /// <summary>The plan document the sheet was made from (null: no plan JSON).</summary>
    [Parameter]
    public PlanDocument? Document { get; set; }

    /// <summary>The paper the PDF is printed on.</summary>
    [Parameter]
    public SheetPaper Paper { get; set; } = SheetPaper.A4;

    private string? NetlistProblem => SheetDownloads.NetlistUnavailable(View);

    /// <inheritdoc />
    public async ValueTask DisposeAsync()
    {
        if (_module is not null)
        {
            try
            {
                await _module.DisposeAsync();
            }
            catch (JSDisconnectedException)
            {
                // The browser has gone: nothing is left to release.
            }
        }
    }

    private async Task PdfAsync()
    {
        _problem = null;
        if (Services.GetService(typeof(ISheetPdfPrinter)) is not ISheetPdfPrinter printer || Services.GetService(typeof(SheetHtmlRenderer)) is not SheetHtmlRenderer renderer)
        {
            _problem = "This server cannot make PDFs (no printer is set up): use Print and choose to save as PDF in the browser's print dialogue.";
            return;
        }

        _printing = true;
        try
        {
            var html = await renderer.RenderAsync(View, Paper);
            var pdf = await printer.PrintAsync(html, Paper, CancellationToken.None);
            using var stream = new MemoryStream(pdf);
            using var reference = new DotNetStreamReference(stream);
            await SaveAsync("saveBytes", SheetDownloads.PdfFileName(View), "application/pdf", reference);
        }
        catch (SheetPrintException e)
        {
            _problem = "The PDF could not be made: " + e.Message + " Use Print and choose to save as PDF in the browser's print dialogue.";
        }
        finally
        {
            _printing = false;
        }
    }

    private async Task NetlistAsync()
    {
        if (SheetDownloads.Netlist(View) is { } file)
        {
            await SaveAsync("saveText", file.FileName, file.ContentType, file.Text);
        }
    }

    private async Task PlanJsonAsync()
    {
        if (Document is { } document)
        {
            var file = SheetDownloads.PlanJson(View, document);
            await SaveAsync("saveText", file.FileName, file.ContentType, file.Text);
        }
    }

    private async Task SaveAsync(string function, string fileName, string contentType, object content)
    {
        _module ??= await JS.InvokeAsync<IJSObjectReference>("import", SweepCsvButton.ModulePath);
        await _module.InvokeVoidAsync(function, fileName, contentType, content);
    }
}
