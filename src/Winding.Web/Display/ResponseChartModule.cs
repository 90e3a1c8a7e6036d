using Microsoft.AspNetCore.Components;
using Microsoft.JSInterop;

namespace Winding.Web.Display;

/// <summary>
/// Draws a <see cref="ResponsePlot"/> into an element through the module <c>wwwroot/js/response-chart.js</c> (uPlot),
/// one per chart component. Calls that cannot reach the browser do nothing (see <see cref="BrowserModule"/>).
/// </summary>
public sealed class ResponseChartModule : IAsyncDisposable
{
    /// <summary>The module path, relative to the app's base address.</summary>
    public const string ModulePath = "./js/response-chart.js";

    private readonly BrowserModule _module;

    /// <summary>Creates the module for one chart.</summary>
    public ResponseChartModule(IJSRuntime js) => _module = new BrowserModule(js, ModulePath);

    /// <summary>Draws <paramref name="plotJson"/> (<see cref="ResponsePlot.ToJson"/>) into <paramref name="element"/>: a new
    /// chart the first time, the same chart updated in place afterwards.</summary>
    public Task DrawAsync(ElementReference element, string plotJson) => _module.InvokeVoidAsync("update", element, plotJson);

    /// <summary>Removes the chart from <paramref name="element"/>.</summary>
    public Task RemoveAsync(ElementReference element) => _module.InvokeVoidAsync("dispose", element);

    /// <inheritdoc />
    public ValueTask DisposeAsync() => _module.DisposeAsync();
}
