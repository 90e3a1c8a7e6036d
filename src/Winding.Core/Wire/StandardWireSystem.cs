namespace Winding.Core.Wire;

/// <summary>The sizing system of a standard wire.</summary>
public enum StandardWireSystem
{
    /// <summary>Metric nominal diameters of IEC 60317-0-1 (ids start with "metric-").</summary>
    Metric,

    /// <summary>American Wire Gauge per ASTM B258 (ids start with "awg-").</summary>
    Awg,
}
