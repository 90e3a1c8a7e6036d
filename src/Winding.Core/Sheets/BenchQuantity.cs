namespace Winding.Core.Sheets;

/// <summary>What a bench check measures.</summary>
public enum BenchQuantity
{
    /// <summary>A winding's inductance, other windings open.</summary>
    Inductance,

    /// <summary>A winding's DC resistance.</summary>
    DcResistance,

    /// <summary>Leakage inductance: the primary with the last winding shorted.</summary>
    LeakageInductance,

    /// <summary>Turns ratio by the open-circuit voltage ratio.</summary>
    TurnsRatio,

    /// <summary>Self-resonant frequency seen from the primary, other windings open.</summary>
    SelfResonance,
}
