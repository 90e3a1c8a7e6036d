using Microsoft.AspNetCore.Components;
using Winding.Web.Display;

namespace Winding.Web.Components.Widgets;

/// <summary>
/// A <see cref="NumberField"/> for a length (core dimension, wire diameter, wrap thickness). It binds to a draft text
/// in which a plain number means millimetres (the stored unit) and a number with a unit means that unit
/// (<see cref="LengthText"/>); it shows that length in the unit of the cascading <see cref="UnitSystem"/> and writes back
/// what was typed (a plain number typed in inches as "… in"). Switching units only changes what is shown, never the
/// bound text, so no stored digit is lost; what the user typed stays on screen until the units or the bound length
/// change.
/// </summary>
/// <example>
/// <code>
/// &lt;LengthField Label="Conductor" Id="@Id("conductor")" Value="@Draft.ConductorDiameter"
///              ValueChanged="@(v =&gt; State.EditWinding(Index, w =&gt; w.ConductorDiameter = v))" Error="…" /&gt;
/// </code>
/// The view model then reads the text with <see cref="LengthText.Read"/> (plain unit: millimetres).
/// </example>
public sealed partial class LengthField
{
    private string _shown = string.Empty;
    private string? _emitted;
    private UnitSystem? _shownIn;

    /// <summary>The quantity, without a unit: "(mm)" or "(in)" is added.</summary>
    [Parameter, EditorRequired]
    public string Label { get; set; } = string.Empty;

    /// <summary>Element id, also the test id and the key of its tooltip in <see cref="InputHelp"/>.</summary>
    [Parameter, EditorRequired]
    public string Id { get; set; } = string.Empty;

    /// <summary>The draft text: a plain number in millimetres, or a number with its unit ("0.02 in").</summary>
    [Parameter]
    public string? Value { get; set; }

    /// <summary>Raised with the new draft text.</summary>
    [Parameter]
    public EventCallback<string> ValueChanged { get; set; }

    /// <summary>The error at this field, if any.</summary>
    [Parameter]
    public string? Error { get; set; }

    /// <summary>Helper text under the field.</summary>
    [Parameter]
    public string? Help { get; set; }

    /// <summary>A tooltip (default: <see cref="InputHelp.For"/> of the id).</summary>
    [Parameter]
    public string? Tooltip { get; set; }

    /// <summary>True (default) to update while typing; false to update when the field loses focus.</summary>
    [Parameter]
    public bool Immediate { get; set; } = true;

    /// <summary>CSS classes.</summary>
    [Parameter]
    public string? Class { get; set; }

    /// <summary>The unit system, cascaded from <see cref="DisplayUnits"/> (metric when there is none).</summary>
    [CascadingParameter]
    public UnitSystem Units { get; set; }

    /// <inheritdoc />
    protected override void OnParametersSet()
    {
        if (_shownIn == Units && _emitted is not null && SameLength(Value, _emitted))
        {
            return;
        }

        _shown = LengthText.Show(Value, Units);
        _shownIn = Units;
        _emitted = null;
    }

    private async Task OnTypedAsync(string text)
    {
        _shown = text ?? string.Empty;
        _shownIn = Units;
        _emitted = LengthText.ForDraft(text, Units);
        await ValueChanged.InvokeAsync(_emitted);
    }

    /// <summary>True when both texts are the same text, or the same length.</summary>
    private static bool SameLength(string? bound, string emitted) =>
        string.Equals(bound, emitted, StringComparison.Ordinal)
        || (LengthText.Read(bound, LengthUnit.Millimetre).Millimetres is { } a && LengthText.Read(emitted, LengthUnit.Millimetre).Millimetres is { } b && a.Equals(b));
}
