namespace Winding.Core.Plans;

/// <summary>The stable codes of plan warnings. Clients may rely on these strings.</summary>
public static class WarningCodes
{
    /// <summary>Not every turn of a winding finds room on the core.</summary>
    public const string WireDoesNotFit = "wire-does-not-fit";

    /// <summary>The wire's overall diameter was not given; the standard enamel build was assumed.</summary>
    public const string OverallDiameterAssumed = "overall-diameter-assumed";
}
