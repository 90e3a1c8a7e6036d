namespace Winding.Core.Windings;

/// <summary>Whether a winding fits.</summary>
public enum FitOutcome
{
    /// <summary>Every turn finds room with margin.</summary>
    Fits,

    /// <summary>Every turn finds room, but hand winding will be hard (the reason says why).</summary>
    Tight,

    /// <summary>Not every turn finds room.</summary>
    DoesNotFit,
}
