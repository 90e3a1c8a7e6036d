namespace Winding.Web.Display;

/// <summary>The value axis a plotted series is read against.</summary>
public enum PlotAxis
{
    /// <summary>The left axis (insertion loss).</summary>
    Left,

    /// <summary>The right axis (return loss).</summary>
    Right,
}
