using Microsoft.AspNetCore.Components;
using Winding.Web.Planning;

namespace Winding.Web.Components.Pages;

/// <summary>The planning page: binds inputs to <see cref="PlanningState"/> and shows its results.</summary>
public sealed partial class PlanPage
{
    [Inject]
    private PlanningState State { get; set; } = default!;

    private string? _shown;
    private Winding.Core.Plans.ResponseEvaluation? _chartFor;
    private object? _comparedFor;
    private IReadOnlyList<(string Name, Winding.Core.Plans.ResponseEvaluation Response)> _chart = [];

    /// <summary>The unit system the results show lengths in (a change re-renders the page).</summary>
    [CascadingParameter]
    public Winding.Web.Display.UnitSystem Units { get; set; }

    /// <summary>A saved plan's id (<c>/plan/{id}</c>).</summary>
    [Parameter]
    public string? PlanId { get; set; }

    /// <summary>A core to start with, e.g. one just saved on the measuring page (<c>/plan?core=id</c>).</summary>
    [SupplyParameterFromQuery(Name = "core")]
    public string? CoreQuery { get; set; }

    /// <summary>A demo plan to open (<c>/plan?demo=id</c>).</summary>
    [SupplyParameterFromQuery(Name = "demo")]
    public string? DemoQuery { get; set; }

    private string ExportFileName => Winding.Web.Exports.ExportFileName.For(State.PlanName, "json");

    private string ExportHref => "data:application/json;charset=utf-8," + Uri.EscapeDataString(System.Text.Json.JsonSerializer.Serialize(State.ToDocument(), Winding.Catalogue.Loading.CatalogueJson.Options));

    /// <inheritdoc />
    protected override void OnInitialized() => State.Changed += OnStateChanged;

    /// <summary>The chart's list, rebuilt only when the response changed (so the chart redraws only then).</summary>
    private IReadOnlyList<(string Name, Winding.Core.Plans.ResponseEvaluation Response)> ChartResponses(Winding.Core.Plans.ResponseEvaluation response)
    {
        var compared = State.Comparisons;
        if (!ReferenceEquals(response, _chartFor) || !ReferenceEquals(compared, _comparedFor))
        {
            _chartFor = response;
            _comparedFor = compared;
            _chart = [(string.IsNullOrWhiteSpace(State.PlanName) ? "this plan" : State.PlanName, response), .. compared.Where(c => c.Evaluation.Response is not null).Select(c => (c.Name, c.Evaluation.Response!))];
        }

        return _chart;
    }

    /// <inheritdoc />
    protected override void OnParametersSet()
    {
        var key = $"{PlanId}|{DemoQuery}|{CoreQuery}";
        if (key == _shown)
        {
            return;
        }

        _shown = key;
        if (!string.IsNullOrEmpty(PlanId))
        {
            State.LoadSaved(PlanId);
        }
        else if (DemoPlans.Find(DemoQuery) is { } demo)
        {
            State.Load(demo.Document);
        }
        else if (!string.IsNullOrEmpty(CoreQuery) && CoreQuery != State.CoreId)
        {
            State.SelectCore(CoreQuery);
        }
    }

    /// <inheritdoc />
    public void Dispose() => State.Changed -= OnStateChanged;

    private void OnStateChanged() => _ = InvokeAsync(StateHasChanged);
}
