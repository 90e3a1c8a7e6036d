using Microsoft.AspNetCore.Components;
using Winding.Catalogue.Entries;
using Winding.Web.Planning;

namespace Winding.Web.Components.Pages;

/// <summary>The planning page: binds inputs to <see cref="PlanningState"/> and shows its results.</summary>
public sealed partial class PlanPage
{
    [Inject]
    private PlanningState State { get; set; } = default!;

    /// <inheritdoc />
    protected override void OnInitialized() => State.Changed += OnStateChanged;

    /// <inheritdoc />
    public void Dispose() => State.Changed -= OnStateChanged;

    private void OnStateChanged() => _ = InvokeAsync(StateHasChanged);

    private static string CoreLabel(CatalogueCore core) => $"{core.Name} · {core.Material.Name}";
}
