namespace Winding.Core.Plans;

/// <summary>The stable codes of plan warnings. Clients may rely on these strings.</summary>
public static class WarningCodes
{
    /// <summary>Not every turn of a winding finds room on the core.</summary>
    public const string WireDoesNotFit = "wire-does-not-fit";

    /// <summary>Every turn finds room but hand winding will be hard.</summary>
    public const string FitsButTight = "fits-but-tight";

    /// <summary>The wire's overall diameter was not given; the standard enamel build was assumed.</summary>
    public const string OverallDiameterAssumed = "overall-diameter-assumed";
}
