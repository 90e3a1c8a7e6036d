namespace Winding.Web.Api;

/// <summary>One standard wire of <c>GET /api/v1/wires</c>.</summary>
/// <param name="Id">Stable id, usable as <c>wire.standardId</c> in a plan.</param>
/// <param name="System"><c>metric</c> (IEC 60317-0-1) or <c>awg</c> (ASTM B258 with film builds).</param>
/// <param name="Size">Size label, e.g. "0.500 mm" or "AWG 24".</param>
/// <param name="Insulation">Grade or build, e.g. "grade 1" or "heavy build".</param>
/// <param name="Description">Plain description.</param>
/// <param name="ConductorDiameterM">Bare conductor diameter, m.</param>
/// <param name="OverallDiameterM">Maximum overall diameter, m.</param>
/// <param name="ConductorAreaM2">Conductor cross-section, m².</param>
/// <param name="ResistancePerMetre20COhmPerM">Copper resistance per metre at 20 °C (IEC 60028), Ω/m.</param>
/// <param name="OverallDiameterProvenance"><c>read</c>, <c>from-memory-cross-checked</c> or <c>from-memory</c>: how sure the overall diameter is.</param>
public sealed record WireListResponse(
    string Id,
    string System,
    string Size,
    string Insulation,
    string Description,
    double ConductorDiameterM,
    double OverallDiameterM,
    double ConductorAreaM2,
    double ResistancePerMetre20COhmPerM,
    string OverallDiameterProvenance);
