using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Web;
using Winding.Web.Components.Sheets;

namespace Winding.Web.Sheets;

/// <summary>
/// Renders a bench sheet to one complete, standalone HTML document: the same <c>BenchSheetView</c> component as the page,
/// inside <c>SheetDocument</c> with the sheet's CSS inlined and the chosen @page size, and no scripts or external
/// resources (ASP.NET Core's <see cref="HtmlRenderer"/>). Every name is escaped by the renderer. This is the HTML the API
/// returns and the HTML a PDF printer (<see cref="ISheetPdfPrinter"/>) is given.
/// </summary>
public sealed class SheetHtmlRenderer
{
    private readonly IServiceScopeFactory _scopes;
    private readonly ILoggerFactory _loggers;

    /// <summary>Creates the renderer.</summary>
    public SheetHtmlRenderer(IServiceScopeFactory scopes, ILoggerFactory loggers)
    {
        ArgumentNullException.ThrowIfNull(scopes);
        ArgumentNullException.ThrowIfNull(loggers);
        _scopes = scopes;
        _loggers = loggers;
    }

    /// <summary>The whole HTML document of <paramref name="view"/> on <paramref name="paper"/>.</summary>
    public async Task<string> RenderAsync(SheetView view, SheetPaper paper)
    {
        ArgumentNullException.ThrowIfNull(view);
        await using var scope = _scopes.CreateAsyncScope();
        await using var renderer = new HtmlRenderer(scope.ServiceProvider, _loggers);
        var body = await renderer.Dispatcher.InvokeAsync(async () =>
        {
            var parameters = ParameterView.FromDictionary(new Dictionary<string, object?>
            {
                [nameof(SheetDocument.View)] = view,
                [nameof(SheetDocument.Paper)] = paper,
            });
            var output = await renderer.RenderComponentAsync<SheetDocument>(parameters);
            return output.ToHtmlString();
        });
        return "<!DOCTYPE html>\n" + body;
    }
}
