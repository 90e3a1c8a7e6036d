using Microsoft.AspNetCore.Components;
using Winding.Catalogue.Entries;
using Winding.Web.Planning;

namespace Winding.Web.Components.Pages;

/// <summary>The planning page: binds inputs to <see cref="PlanningState"/> and shows its results.</summary>
public sealed partial class PlanPage
{
    [Inject]
    private PlanningState State { get; set; } = default!;

    /// <summary>A core to start with, e.g. one just saved on the measuring page (<c>/plan?core=id</c>).</summary>
    [SupplyParameterFromQuery(Name = "core")]
    public string? CoreQuery { get; set; }

    /// <inheritdoc />
    protected override void OnInitialized()
    {
        State.Changed += OnStateChanged;
        if (!string.IsNullOrEmpty(CoreQuery) && CoreQuery != State.CoreId)
        {
            State.SelectCore(CoreQuery);
        }
    }

    /// <inheritdoc />
    public void Dispose() => State.Changed -= OnStateChanged;

    private void OnStateChanged() => _ = InvokeAsync(StateHasChanged);

    private static string CoreLabel(CatalogueCore core) => $"{core.Name} · {core.Material.Name}";
}
