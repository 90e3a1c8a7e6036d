namespace Winding.Core.Sheets;

/// <summary>How a measured value compares with a check's limits.</summary>
public enum CheckVerdict
{
    /// <summary>No value was entered.</summary>
    NotMeasured,

    /// <summary>Between the lower and the upper limit (limits included).</summary>
    Within,

    /// <summary>Under the lower limit.</summary>
    Below,

    /// <summary>Over the upper limit.</summary>
    Above,
}
