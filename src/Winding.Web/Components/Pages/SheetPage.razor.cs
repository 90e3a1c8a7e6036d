using Microsoft.AspNetCore.Components;
using Microsoft.JSInterop;
using Winding.Catalogue.Plans;
using Winding.Web.Hosting;
using Winding.Web.Sheets;

namespace Winding.Web.Components.Pages;

/// <summary>
/// The bench sheet page: <c>/plan/{id}/sheet</c> for a saved plan, <c>/sheet?demo=id</c> for a demo plan, and
/// <c>/sheet</c> for the plan now on the plan page. <c>?paper=a4|letter</c> picks the paper. The sheet comes from
/// <see cref="SheetLoader"/>; the page only lays it out and prints.
/// </summary>
public sealed partial class SheetPage
{
    private SheetLoadResult _result = new(null, "No plan.", "plan");
    private SheetPaper _paper = SheetPaper.A4;
    private string? _shown;
    private BenchResultsState? _bench;
    private string? _message;
    private bool _messageSucceeded;

    [Inject]
    private SheetLoader Loader { get; set; } = default!;

    [Inject]
    private IJSRuntime Js { get; set; } = default!;

    [Inject]
    private CatalogueProvider Catalogue { get; set; } = default!;

    [Inject]
    private PlanStore Plans { get; set; } = default!;

    [Inject]
    private TimeProvider Time { get; set; } = default!;

    /// <summary>A saved plan's id (<c>/plan/{id}/sheet</c>).</summary>
    [Parameter]
    public string? PlanId { get; set; }

    /// <summary>A demo plan (<c>/sheet?demo=id</c>).</summary>
    [SupplyParameterFromQuery(Name = "demo")]
    public string? DemoQuery { get; set; }

    /// <summary>The paper, <c>a4</c> (default) or <c>letter</c>.</summary>
    [SupplyParameterFromQuery(Name = "paper")]
    public string? PaperQuery { get; set; }

    private string PageTitleText => _result.View is { } view ? $"Bench sheet · {view.Title} · Winding" : "Bench sheet · Winding";

    /// <inheritdoc />
    protected override void OnParametersSet()
    {
        var key = $"{PlanId}|{DemoQuery}|{PaperQuery}";
        if (key == _shown)
        {
            return;
        }

        _shown = key;
        _paper = SheetPapers.TryParse(PaperQuery, out var paper) ? paper : SheetPaper.A4;
        _message = null;
        Load(texts: null);
    }

    private void Load(IReadOnlyDictionary<string, string>? texts)
    {
        _result = !string.IsNullOrEmpty(PlanId)
            ? Loader.Saved(PlanId)
            : !string.IsNullOrEmpty(DemoQuery)
                ? Loader.Demo(DemoQuery)
                : Loader.Current();
        _bench = _result.View is null ? null : new BenchResultsState(Catalogue, Plans, Time, _result, texts);
    }

    /// <summary>Shows what a bench-results button did; builds the sheet again when the plan or its core changed.</summary>
    private void Acted(BenchActionResult result)
    {
        _message = result.Message;
        _messageSucceeded = result.Succeeded;
        if (result.Reload)
        {
            if (_result.SavedId is { } id)
            {
                Loader.PlanSaved(id);
            }

            Load(_bench?.Texts.ToDictionary(StringComparer.Ordinal));
        }
    }

    private async Task PrintAsync() => await Js.InvokeVoidAsync("print");
}
