using Winding.Core.Windings;
using Winding.Core.Wire;

namespace Winding.Core.Sheets;

/// <summary>One winding as the sheet's windings table shows it.</summary>
/// <param name="Number">Position in winding order, 1 for the first (the primary).</param>
/// <param name="Name">The winding's name (user text: escape it wherever it is shown).</param>
/// <param name="Turns">Number of turns.</param>
/// <param name="WireDescription">The wire in plain words (size and insulation grade or build).</param>
/// <param name="WireKind">Solid, Litz or hook-up.</param>
/// <param name="ConductorDiameterM">Bare diameter of each conductor (strand), m.</param>
/// <param name="StrandsPerElement">Strands in one Litz bundle (1 for solid and hook-up wire).</param>
/// <param name="ElementsInHand">Wires wound side by side as one turn (1 for a single wire).</param>
/// <param name="MetalName">Conductor metal.</param>
/// <param name="LengthToCutM">Length to cut of each wire in hand, leads included, m (the engine's length to cut).</param>
/// <param name="LeadLengthPerEndM">Lead left at each end, m.</param>
/// <param name="Layers">Layers the winding takes.</param>
/// <param name="TurnsPerLayer">Turns in each layer, innermost first.</param>
/// <param name="Placement">Where the winding lies.</param>
/// <param name="PlacementText">The placement in plain words.</param>
/// <param name="DirectionText">The winding sense in plain words.</param>
/// <param name="StartMark">The letters written on the start lead (the phasing-dot end), e.g. "1S".</param>
/// <param name="FinishMark">The letters written on the finish lead, e.g. "1F".</param>
/// <param name="Taps">Taps with their marks.</param>
/// <param name="InsulationUnder">The wrap laid under this winding, if any.</param>
/// <param name="Fit">Whether the winding fits (from the engine's layer fit).</param>
public sealed record SheetWindingRow(
    int Number,
    string Name,
    int Turns,
    string WireDescription,
    WireKind WireKind,
    double ConductorDiameterM,
    int StrandsPerElement,
    int ElementsInHand,
    string MetalName,
    double LengthToCutM,
    double LeadLengthPerEndM,
    int Layers,
    IReadOnlyList<int> TurnsPerLayer,
    WindingPlacement Placement,
    string PlacementText,
    string DirectionText,
    string StartMark,
    string FinishMark,
    IReadOnlyList<SheetTap> Taps,
    InsulationWrap? InsulationUnder,
    FitOutcome Fit);
