namespace Winding.Web.Display;

/// <summary>A vertical line at one frequency with a short label at its top.</summary>
/// <param name="FrequencyHz">Where, Hz.</param>
/// <param name="Dash">Line style.</param>
/// <param name="Label">Short label, e.g. "3 dB".</param>
/// <param name="Colour">CSS colour of line and label.</param>
public sealed record PlotEdge(double FrequencyHz, LineDash Dash, string Label, string Colour);
