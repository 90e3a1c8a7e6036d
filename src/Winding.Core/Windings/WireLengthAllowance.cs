namespace Winding.Core.Windings;

/// <summary>
/// What is added to the wound length to get the length to cut: a margin on the wound length (slack, crossovers, a
/// mistake) and a lead at each end. Defaults (common practice, no source): 5 % margin and 50 mm per lead — enough to
/// reach a terminal strip and to be trimmed.
/// </summary>
/// <param name="LeadLengthPerEndM">Length of each of the two leads, m (≥ 0).</param>
/// <param name="MarginFraction">Margin on the wound length as a fraction (0.05 = 5 %).</param>
public sealed record WireLengthAllowance(double LeadLengthPerEndM, double MarginFraction)
{
    /// <summary>The default: 50 mm per lead, 5 % margin.</summary>
    public static WireLengthAllowance Default { get; } = new(0.050, 0.05);

    /// <summary>Wound length N·MLT, m.</summary>
    public static double WoundLengthM(int turns, double meanTurnLengthM) => turns * meanTurnLengthM;

    /// <summary>Length to cut for a winding of <paramref name="turns"/> turns: N·MLT·(1 + margin) + 2·lead, in m.</summary>
    public double LengthToCutM(int turns, double meanTurnLengthM) =>
        WoundLengthM(turns, meanTurnLengthM) * (1 + MarginFraction) + 2 * LeadLengthPerEndM;
}
