namespace Winding.Web.Drawing;

/// <summary>The eight winding colours of the drawings (chosen for this app), repeated after the eighth winding.</summary>
public static class WindingPalette
{
    /// <summary>The colours as hex values, first winding first.</summary>
    public static IReadOnlyList<string> Colours { get; } =
    [
        "#2f6db3", // blue
        "#c8453a", // brick red
        "#3a9a5b", // green
        "#d99a1e", // amber
        "#7e4fa8", // violet
        "#2aa3a8", // teal
        "#8c5a3c", // brown
        "#d2528f", // rose
    ];

    /// <summary>The colour of winding <paramref name="index"/> (≥ 0).</summary>
    public static string Of(int index)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        return Colours[index % Colours.Count];
    }
}
