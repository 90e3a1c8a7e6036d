namespace Winding.Web.Display;

/// <summary>How a plotted line is drawn.</summary>
public enum LineDash
{
    /// <summary>A continuous line.</summary>
    Solid,

    /// <summary>Long dashes.</summary>
    Dash,

    /// <summary>Dots.</summary>
    Dot,
}
