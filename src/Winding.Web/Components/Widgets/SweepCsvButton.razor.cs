using Microsoft.AspNetCore.Components;
using Microsoft.JSInterop;
using Winding.Core.Plans;
using Winding.Web.Exports;

namespace Winding.Web.Components.Widgets;

/// <summary>
/// Downloads the response sweep as CSV. The text is written only on a click and handed to a small browser module
/// (<c>wwwroot/js/download.js</c>) that saves it, so editing the plan does not send the sweep to the browser each time.
/// </summary>
public sealed partial class SweepCsvButton : IAsyncDisposable
{
    /// <summary>The browser module that saves text as a file.</summary>
    public const string ModulePath = "./js/download.js";

    private IJSObjectReference? _module;

    [Inject]
    private IJSRuntime JS { get; set; } = default!;

    /// <summary>The plan's response; null when it has none (no band), which disables the button.</summary>
    [Parameter]
    public ResponseEvaluation? Response { get; set; }

    /// <summary>The plan's name, for the file name.</summary>
    [Parameter]
    public string? PlanName { get; set; }

    /// <summary>The file name the download gets.</summary>
    public string FileName => ExportFileName.For(PlanName, "csv");

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

    private async Task DownloadAsync()
    {
        if (Response is not { } response)
        {
            return;
        }

        _module ??= await JS.InvokeAsync<IJSObjectReference>("import", ModulePath);
        await _module.InvokeVoidAsync("saveText", FileName, "text/csv;charset=utf-8", SweepCsv.Write(response.Sweep));
    }
}
