namespace Winding.Core.Conductors;

/// <summary>The method <see cref="WindingAcResistance"/> used, for display beside the result.</summary>
public enum AcResistanceMethod
{
    /// <summary>
    /// Dowell's 1-D layer method with the round-wire porosity conversion (solid and hook-up wire; see
    /// <see cref="DowellFactor"/>).
    /// </summary>
    DowellRoundWire,

    /// <summary>
    /// Litz: the exact isolated-wire skin effect of each strand plus the low-frequency proximity loss of the strands in
    /// the winding's 1-D field (see <see cref="WindingAcResistance"/>).
    /// </summary>
    LitzStrandSkinAndWindingProximity,
}
