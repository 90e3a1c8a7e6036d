namespace Winding.Web.Planning;

/// <summary>The input fields of the planning page, so that an error can be shown at its field.</summary>
public enum PlanField
{
    /// <summary>The core picker.</summary>
    Core,

    /// <summary>Number of turns.</summary>
    Turns,

    /// <summary>Conductor diameter.</summary>
    ConductorDiameter,

    /// <summary>Overall diameter.</summary>
    OverallDiameter,
}
