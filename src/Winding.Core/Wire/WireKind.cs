namespace Winding.Core.Wire;

/// <summary>How a winding wire is built.</summary>
public enum WireKind
{
    /// <summary>A solid round conductor with a thin film insulation (enamelled magnet wire), or bare.</summary>
    Solid,

    /// <summary>Litz: many insulated strands twisted into one bundle.</summary>
    Litz,

    /// <summary>Hook-up wire: a conductor with a thick extruded insulation (PVC, PTFE, silicone).</summary>
    HookUp,
}
