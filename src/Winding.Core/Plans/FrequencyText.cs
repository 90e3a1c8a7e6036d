using System.Globalization;

namespace Winding.Core.Plans;

/// <summary>Frequencies and numbers in warning texts (invariant culture).</summary>
internal static class FrequencyText
{
    /// <summary>A frequency with a Hz, kHz or MHz unit.</summary>
    public static string Hz(double frequencyHz) => frequencyHz switch
    {
        >= 1e6 => Text($"{frequencyHz / 1e6:0.###} MHz"),
        >= 1e3 => Text($"{frequencyHz / 1e3:0.###} kHz"),
        _ => Text($"{frequencyHz:0.###} Hz"),
    };

    /// <summary>An interpolated text in the invariant culture.</summary>
    public static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
