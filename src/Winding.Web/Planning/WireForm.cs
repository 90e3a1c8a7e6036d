namespace Winding.Web.Planning;

/// <summary>
/// How a winding's wire is given on the plan page; each form is one form of the plan document's <c>wire</c> object
/// (<see cref="Winding.Catalogue.Plans.PlanWireDocument"/>).
/// </summary>
public enum WireForm
{
    /// <summary>A standard wire from the built-in table (<c>standardId</c>).</summary>
    Table,

    /// <summary>Metric enamelled wire by nominal size and grade (<c>metricMm</c>, <c>grade</c>).</summary>
    Metric,

    /// <summary>AWG magnet wire by gauge and film build (<c>awg</c>, <c>build</c>).</summary>
    Awg,

    /// <summary>A Litz bundle (<c>litz</c>).</summary>
    Litz,

    /// <summary>Hook-up wire with a thick insulation (<c>hookUp</c>).</summary>
    HookUp,

    /// <summary>Diameters measured or read off a spool (<c>conductorDiameterMm</c>, <c>overallDiameterMm</c>).</summary>
    Custom,
}

/// <summary>The plan page's words for each <see cref="WireForm"/>.</summary>
public static class WireForms
{
    /// <summary>Every form, in the order the page lists them.</summary>
    public static IReadOnlyList<WireForm> All { get; } = [WireForm.Table, WireForm.Metric, WireForm.Awg, WireForm.Litz, WireForm.HookUp, WireForm.Custom];

    /// <summary>The label of a form in the wire kind select.</summary>
    public static string Label(WireForm form) => form switch
    {
        WireForm.Table => "From the table",
        WireForm.Metric => "Metric enamelled",
        WireForm.Awg => "AWG enamelled",
        WireForm.Litz => "Litz",
        WireForm.HookUp => "Hook-up (insulated)",
        _ => "Measured / custom",
    };
}
