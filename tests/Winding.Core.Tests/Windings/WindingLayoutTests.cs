using Winding.Core.Geometry;
using Winding.Core.Plans;
using Winding.Core.Quantities;
using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Tests.Windings;

/// <summary>
/// Placement of several windings on every shape. The layer convention and the limits are common practice, no source;
/// the expected counts are the convention's arithmetic worked by hand (or physics-sources.md §11 where noted).
/// </summary>
public sealed class WindingLayoutTests
{
    private static readonly WindingWire Wire0226 = WindingWire.Solid(Mm(0.2), Mm(0.226));

    [Fact]
    public void Spread_FirstWindingOnRing_MatchesTheSkeletonConvention()
    {
        // physics-sources.md §11: ID 5 mm, d 0.226 mm → 66, 60, 53, 47 turns per layer.
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(226, Wire0226)]);

        Assert.Equal([66, 60, 53, 47], fits[0].TurnsPerLayer);
    }

    [Fact]
    public void Sector_HalfTheCircumference_HoldsHalfThePlaces()
    {
        // ⌊π·(5 − 0.226)·0.5/0.226⌋ = ⌊33.18⌋ = 33 places in the first layer of a 180° sector.
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(33, Wire0226, WindingPlacement.Sector(0, 180))]);

        Assert.Equal([33], fits[0].TurnsPerLayer);
        Assert.Equal(Math.PI * 5e-3 / 2, fits[0].BreadthM, 12);
    }

    [Fact]
    public void Sectors_SideBySide_BothSitOnTheBareCore()
    {
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(30, Wire0226, WindingPlacement.Sector(0, 180)), Spec(30, Wire0226, WindingPlacement.Sector(180, 360))]);

        Assert.Equal(0, fits[1].BuildBelowM);
        Assert.Equal(fits[0].MeanTurnLengthM, fits[1].MeanTurnLengthM, 12);
    }

    [Fact]
    public void Spread_SecondWinding_GoesOverTheFirst()
    {
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(10, Wire0226), Spec(10, Wire0226)]);

        Assert.Equal(0.226e-3, fits[1].BuildBelowM, 12);
        Assert.True(fits[1].MeanTurnLengthM > fits[0].MeanTurnLengthM);
    }

    [Fact]
    public void Bifilar_PairTakesTwoPlacesPerTurn()
    {
        // 66 places in the first layer (§11) hold 33 bifilar turns; both windings share the fit.
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(33, Wire0226), Spec(33, Wire0226, WindingPlacement.Bifilar(0))]);

        Assert.Equal([33], fits[0].TurnsPerLayer);
        Assert.Same(fits[0], fits[1]);
    }

    [Fact]
    public void StrandsInHand_TakePlacesLikeBifilar()
    {
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(33, Wire0226.InHand(2))]);

        Assert.Equal([33], fits[0].TurnsPerLayer);
    }

    [Fact]
    public void Coating_AndWrap_AddToTheBuild()
    {
        // A 0.1 mm coating and a 0.05 mm wrap: the first layer's centres lie on 5 − 2·0.15 − 0.226 = 4.474 mm,
        // ⌊π·4.474/0.226⌋ = ⌊62.19⌋ = 62 places.
        var core = ToroidCore.Create(Mm(10), Mm(5), Mm(4)).WithCoating(Mm(0.1));
        var wrap = InsulationWrap.Create("polyester", Mm(0.05), 3.2);

        var fits = WindingLayout.Place(core, [WindingSpec.Create("a", 62, Wire0226, wrap: wrap)]);

        Assert.Equal([62], fits[0].TurnsPerLayer);
        Assert.Equal(0.15e-3, fits[0].BuildBelowM, 12);
    }

    [Fact]
    public void Ring_SmallHoleLeft_IsTight()
    {
        // ID 5 mm with 0.566 mm wire holds 24 + 18 + 12 + 5 = 59 turns (§11) and leaves 5 − 8·0.566 = 0.472 mm,
        // under three wire diameters: tight.
        var fits = WindingLayout.Place(Ring(10, 5, 4), [Spec(59, WindingWire.Solid(Mm(0.5), Mm(0.566)))]);

        Assert.Equal(FitOutcome.Tight, fits[0].Outcome);
    }

    [Fact]
    public void TwoHole_BundleAreaAgainstPackedHoleArea()
    {
        // Hole 3 mm: area 7.0686 mm², 0.6 of it = 4.2412 mm². A 0.544 mm wire takes 0.23243 mm² per pass:
        // ⌊4.2412/0.23243⌋ = 18 turns fit, the 19th does not.
        var core = TwoHoleCore.Create(Mm(10), Mm(3), Mm(6), Mm(9.5), Mm(5));
        var wire = WindingWire.Solid(Mm(0.5), Mm(0.544));

        var eighteen = WindingLayout.Place(core, [Spec(18, wire)]);
        var nineteen = WindingLayout.Place(core, [Spec(19, wire)]);

        Assert.True(eighteen[0].Fits);
        Assert.False(nineteen[0].Fits);
        Assert.Equal(1, nineteen[0].UnplacedTurns);
        // Mean turn length: twice the hole length plus twice the spacing, grown by half a wire: 2·(10 + 6) + π·0.544 mm.
        Assert.Equal(32e-3 + Math.PI * 0.544e-3, eighteen[0].MeanTurnLengthM, 9);
    }

    [Fact]
    public void Bobbin_LayersAcrossTheBreadth()
    {
        // Breadth 10 mm / 0.5 mm wire = 20 turns per layer; 50 turns → 20 + 20 + 10, build 1.5 mm of 4 mm.
        // MLT of layer 1 over a 7 × 7 mm leg with a 0.5 mm wall: 28 + 2π·(0.5 + 0.25) mm.
        var bobbin = BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(4), CentreLeg.Rectangular(Mm(7), Mm(7)), Mm(0.5));

        var fits = WindingLayout.Place(bobbin, [Spec(50, WindingWire.Solid(Mm(0.45), Mm(0.5)))]);

        Assert.Equal([20, 20, 10], fits[0].TurnsPerLayer);
        Assert.Equal(2.5e-3, fits[0].RemainingWindowHeightM!.Value, 12);
        Assert.Equal(28e-3 + 2 * Math.PI * 0.75e-3, fits[0].LayerMeanTurnLengthsM[0], 12);
    }

    [Fact]
    public void Bobbin_TooManyLayers_DoesNotFit()
    {
        // 4 mm height / 0.5 mm = 8 layers of 20 = 160 turns at most.
        var bobbin = BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(4), CentreLeg.Rectangular(Mm(7), Mm(7)), Length.Zero);

        var fits = WindingLayout.Place(bobbin, [Spec(161, WindingWire.Solid(Mm(0.45), Mm(0.5)))]);

        Assert.Equal(FitOutcome.DoesNotFit, fits[0].Outcome);
        Assert.Equal(1, fits[0].UnplacedTurns);
    }

    [Fact]
    public void HighCopperFill_IsTight()
    {
        // Copper above 0.4 of the window (McLyman K_u, common practice): 150 turns of 0.45 mm in a 10 × 4 mm window
        // is 150·0.15904 mm² = 23.86 mm² of 40 mm² = 0.60.
        var bobbin = BobbinCore.Create("E", 52e-6, 57e-3, null, Mm(10), Mm(4), CentreLeg.Rectangular(Mm(7), Mm(7)), Length.Zero);

        var fits = WindingLayout.Place(bobbin, [Spec(150, WindingWire.Solid(Mm(0.45), Mm(0.5)))]);

        Assert.Equal(FitOutcome.Tight, fits[0].Outcome);
    }

    private static WindingSpec Spec(int turns, WindingWire wire, WindingPlacement? placement = null) =>
        WindingSpec.Create("w", turns, wire, placement);

    private static ToroidCore Ring(double od, double id, double h) => ToroidCore.Create(Mm(od), Mm(id), Mm(h));

    private static Length Mm(double value) => Length.FromMillimetres(value);
}
