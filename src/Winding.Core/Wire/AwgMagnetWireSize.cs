using Winding.Core.Quantities;

namespace Winding.Core.Wire;

/// <summary>
/// One AWG size of film-insulated round copper magnet wire: the nominal conductor diameter (ASTM B258 formula) and the
/// maximum overall diameters of single and heavy build (see <see cref="AwgWireTable"/> for the sources).
/// </summary>
public sealed record AwgMagnetWireSize
{
    internal AwgMagnetWireSize(int gauge, Length conductorDiameter, double singleBuildMaximumInch, double heavyBuildMaximumInch)
    {
        var single = Length.FromMillimetres(singleBuildMaximumInch * AwgWireTable.MillimetresPerInch);
        var heavy = Length.FromMillimetres(heavyBuildMaximumInch * AwgWireTable.MillimetresPerInch);
        if (!(single > conductorDiameter && heavy > single))
        {
            throw new ArgumentOutOfRangeException(nameof(gauge), gauge, "A row needs conductor < single build < heavy build diameters.");
        }

        Gauge = gauge;
        ConductorDiameter = conductorDiameter;
        SingleBuildMaximumOverallDiameter = single;
        HeavyBuildMaximumOverallDiameter = heavy;
    }

    /// <summary>The gauge number n (a larger number is a thinner wire).</summary>
    public int Gauge { get; }

    /// <summary>Nominal bare conductor diameter by the ASTM B258 formula.</summary>
    public Length ConductorDiameter { get; }

    /// <summary>Maximum overall diameter of single-build film insulation.</summary>
    public Length SingleBuildMaximumOverallDiameter { get; }

    /// <summary>Maximum overall diameter of heavy-build film insulation.</summary>
    public Length HeavyBuildMaximumOverallDiameter { get; }

    /// <summary>Where the overall diameters come from: recalled from memory (<see cref="ValueProvenance.FromMemory"/>).</summary>
    public static ValueProvenance OverallDiameterProvenance => ValueProvenance.FromMemory;

    /// <summary>The size as it is written: "AWG 24".</summary>
    public string Label => FormattableString.Invariant($"AWG {Gauge}");

    /// <summary>The maximum overall diameter of a build.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="build"/> is not a defined build.</exception>
    public Length MaximumOverallDiameter(AwgBuild build) => build switch
    {
        AwgBuild.Single => SingleBuildMaximumOverallDiameter,
        AwgBuild.Heavy => HeavyBuildMaximumOverallDiameter,
        _ => throw new ArgumentOutOfRangeException(nameof(build), build, "The build must be Single or Heavy."),
    };
}
