namespace Winding.Core.Plans;

/// <summary>The frequency sweep of the response: log-spaced from start to stop. Defaults: one decade beyond each band
/// edge, 401 points.</summary>
/// <param name="StartHz">First frequency, Hz (null: f_min/10).</param>
/// <param name="StopHz">Last frequency, Hz (null: f_max·10).</param>
/// <param name="Points">Number of points (default 401).</param>
public sealed record SweepSettings(double? StartHz, double? StopHz, int Points)
{
    /// <summary>Points when none are stated.</summary>
    public const int DefaultPoints = 401;

    /// <summary>The default sweep.</summary>
    public static SweepSettings Default { get; } = new(null, null, DefaultPoints);
}
