namespace Winding.Web.Display;

/// <summary>
/// One line of a chart: its values at the chart's frequencies (null where the value is not finite or, when
/// <paramref name="SpansGaps"/>, where the series has no point at that frequency), how it is drawn and read out.
/// </summary>
/// <param name="Name">Legend name.</param>
/// <param name="Colour">CSS colour of the line.</param>
/// <param name="Width">Line width, CSS pixels.</param>
/// <param name="Dash">Line style.</param>
/// <param name="Axis">The axis it is read against.</param>
/// <param name="Unit">Unit shown after a read-out value, e.g. "dB".</param>
/// <param name="Decimals">Decimals of a read-out value.</param>
/// <param name="SpansGaps">True when the line is drawn across missing values (the series was evaluated at fewer
/// frequencies than the chart has); false when a missing value breaks the line.</param>
/// <param name="Values">One value (or null) per chart frequency.</param>
public sealed record PlotSeries(
    string Name,
    string Colour,
    double Width,
    LineDash Dash,
    PlotAxis Axis,
    string Unit,
    int Decimals,
    bool SpansGaps,
    IReadOnlyList<double?> Values);
