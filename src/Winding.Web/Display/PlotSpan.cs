namespace Winding.Web.Display;

/// <summary>A shaded frequency range across the whole plot height.</summary>
/// <param name="FromHz">Lower end, Hz.</param>
/// <param name="ToHz">Upper end, Hz.</param>
/// <param name="Fill">CSS fill colour (translucent).</param>
/// <param name="Name">What it marks, e.g. "requested band".</param>
public sealed record PlotSpan(double FromHz, double ToHz, string Fill, string Name);
