namespace Winding.Core.Windings;

/// <summary>
/// What is added to the wound length to get the length to cut: a lead at each end. The default of 50 mm per lead
/// (100 mm per winding) is common practice, no source: enough to reach a terminal strip and to be trimmed.
/// </summary>
/// <param name="LeadLengthPerEndM">Length of each of the two leads, m.</param>
public sealed record WireLengthAllowance(double LeadLengthPerEndM)
{
    /// <summary>The default: 50 mm per lead.</summary>
    public static WireLengthAllowance Default { get; } = new(0.050);

    /// <summary>Length to cut for a winding of <paramref name="turns"/> turns: N·MLT + 2·lead, in m.</summary>
    public double LengthToCutM(int turns, double meanTurnLengthM) => turns * meanTurnLengthM + 2 * LeadLengthPerEndM;
}
