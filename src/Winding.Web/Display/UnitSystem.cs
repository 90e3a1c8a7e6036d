namespace Winding.Web.Display;

/// <summary>
/// How lengths, areas and wire sizes are shown and typed: metric (millimetres) or imperial (inches). Only the display
/// and input edge changes; plans, the catalogue and the API stay in millimetres, and electrical quantities (H, Ω, F, Hz,
/// W, T, °C) are SI in both.
/// </summary>
public enum UnitSystem
{
    /// <summary>Millimetres, mm², metric wire grades (the default and the stored form).</summary>
    Metric,

    /// <summary>Inches, in², AWG where a diameter is an AWG size.</summary>
    Imperial,
}
