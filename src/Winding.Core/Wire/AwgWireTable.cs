using System.Diagnostics.CodeAnalysis;
using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// American Wire Gauge round copper magnet wire, AWG 10 to 44: the conductor diameter by the ASTM B258 formula and the
/// maximum overall diameters of single- and heavy-build film insulation.
/// </summary>
/// <remarks>
/// <para>Conductor: d_n = 0.005 in · 92^((36 − n)/39) = 0.127 mm · 92^((36 − n)/39) (ASTM B258, the definition of the
/// gauge: AWG 36 is 0.005 in, AWG 0000 is 0.46 in, 39 steps between; physics-sources.md §3.1). The formula is exact
/// by definition; the standard's own table rounds it (to 0.1 mil), and the formula is used here.</para>
/// <para>Overall diameters: maximum overall diameters of single- and heavy-build film-insulated round magnet wire as
/// tabulated in NEMA MW 1000 (inch values to 0.1 mil), recalled from memory: neither the edition nor the table was
/// re-read, so treat them as unverified (<see cref="ValueProvenance.FromMemory"/>). They are consistent with a build
/// (maximum overall minus nominal conductor) rising smoothly from about 0.2 mil (single) and 0.4 mil (heavy) at
/// AWG 44 to 2.7 mil and 3.6 mil at AWG 10.</para>
/// </remarks>
public static class AwgWireTable
{
    /// <summary>Millimetres per inch (the international inch, exactly 25.4 mm).</summary>
    public const double MillimetresPerInch = 25.4;

    /// <summary>The thickest gauge of the table (AWG 10).</summary>
    public const int FirstGauge = 10;

    /// <summary>The thinnest gauge of the table (AWG 44).</summary>
    public const int LastGauge = 44;

    private const int FormulaFirstGauge = -3;
    private const int FormulaLastGauge = 56;

    // Maximum overall diameter in inches, single build then heavy build, for AWG 10, 11, …, 44 (NEMA MW 1000, from memory).
    private static readonly (double Single, double Heavy)[] BuildMaximumInch =
    [
        (0.1046, 0.1055), (0.0934, 0.0942), (0.0834, 0.0842), (0.0744, 0.0753), (0.0664, 0.0673), // 10–14
        (0.0593, 0.0602), (0.0529, 0.0538), (0.0473, 0.0482), (0.0423, 0.0431), (0.0379, 0.0386), // 15–19
        (0.0340, 0.0346), (0.0303, 0.0310), (0.0271, 0.0277), (0.0243, 0.0249), (0.0217, 0.0223), // 20–24
        (0.0194, 0.0199), (0.0173, 0.0178), (0.0156, 0.0161), (0.0140, 0.0144), (0.0125, 0.0130), // 25–29
        (0.0112, 0.0116), (0.0101, 0.0105), (0.0091, 0.0095), (0.0081, 0.0085), (0.0072, 0.0075), // 30–34
        (0.0064, 0.0067), (0.0058, 0.0060), (0.0052, 0.0055), (0.0047, 0.0049), (0.0041, 0.0043), // 35–39
        (0.0036, 0.0038), (0.0032, 0.0034), (0.0028, 0.0030), (0.0025, 0.0027), (0.0022, 0.0024), // 40–44
    ];

    /// <summary>All sizes from AWG 10 to AWG 44, thickest first.</summary>
    public static IReadOnlyList<AwgMagnetWireSize> Sizes { get; } = Array.AsReadOnly(
        [.. BuildMaximumInch.Select((b, i) => new AwgMagnetWireSize(FirstGauge + i, ConductorDiameter(FirstGauge + i), b.Single, b.Heavy))]);

    /// <summary>
    /// Nominal conductor diameter of AWG n, d_n = 0.127 mm · 92^((36 − n)/39) (ASTM B258; physics-sources.md §3.1).
    /// Valid for n from −3 (AWG 0000; −2, −1 and 0 are 000, 00 and 0) to 56, the range ASTM B258 tabulates (range from
    /// memory).
    /// </summary>
    /// <param name="gauge">The gauge number n, −3 to 56.</param>
    /// <exception cref="ArgumentOutOfRangeException">The gauge is outside −3 to 56.</exception>
    public static Length ConductorDiameter(int gauge)
    {
        if (gauge is < FormulaFirstGauge or > FormulaLastGauge)
        {
            throw new ArgumentOutOfRangeException(nameof(gauge), gauge, "The gauge must be between -3 (AWG 0000) and 56.");
        }

        return Length.FromMillimetres(0.127 * Math.Pow(92, (36 - gauge) / 39.0));
    }

    /// <summary>The table row of a gauge, if it lies between AWG 10 and AWG 44.</summary>
    public static bool TryFind(int gauge, [NotNullWhen(true)] out AwgMagnetWireSize? size)
    {
        if (gauge is < FirstGauge or > LastGauge)
        {
            size = null;
            return false;
        }

        size = Sizes[gauge - FirstGauge];
        return true;
    }

    /// <summary>
    /// Copper magnet wire of a gauge and build, with the build's maximum overall diameter; its description reads like
    /// "AWG 24, heavy build".
    /// </summary>
    /// <param name="gauge">AWG 10 to 44.</param>
    /// <param name="build">Single or heavy build.</param>
    /// <exception cref="ArgumentOutOfRangeException">The gauge is outside 10 to 44, or the build is not defined.</exception>
    public static WindingWire Wire(int gauge, AwgBuild build)
    {
        if (!TryFind(gauge, out var size))
        {
            throw new ArgumentOutOfRangeException(nameof(gauge), gauge, "The gauge must be between 10 and 44.");
        }

        var overall = size.MaximumOverallDiameter(build);
        return WindingWire.Solid(size.ConductorDiameter, overall, ConductorMaterial.Copper, $"{size.Label}, {BuildLabel(build)}");
    }

    /// <summary>The build as it is written: "single build" or "heavy build".</summary>
    internal static string BuildLabel(AwgBuild build) => build switch
    {
        AwgBuild.Single => "single build",
        AwgBuild.Heavy => "heavy build",
        _ => throw new ArgumentOutOfRangeException(nameof(build), build, "The build must be Single or Heavy."),
    };
}
