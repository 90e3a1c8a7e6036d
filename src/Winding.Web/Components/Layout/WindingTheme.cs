using MudBlazor;

namespace Winding.Web.Components.Layout;

/// <summary>Winding's own palette: copper and slate.</summary>
public static class WindingTheme
{
    /// <summary>The app theme.</summary>
    public static MudTheme Theme { get; } = new()
    {
        PaletteLight = new PaletteLight
        {
            Primary = "#9a4f1e",
            Secondary = "#3d5a6c",
            AppbarBackground = "#3d5a6c",
        },
        PaletteDark = new PaletteDark
        {
            Primary = "#e0955f",
            Secondary = "#8fb3c7",
            AppbarBackground = "#22313b",
        },
    };
}
