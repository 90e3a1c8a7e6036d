namespace Winding.Core.Sheets;

/// <summary>What a build step is about.</summary>
public enum BuildStepKind
{
    /// <summary>Check and prepare the core (stack, bobbin).</summary>
    PrepareCore,

    /// <summary>Insulate the bare core before the first winding.</summary>
    InsulateCore,

    /// <summary>Cut the wire of one winding.</summary>
    CutWire,

    /// <summary>Wind one winding.</summary>
    Wind,

    /// <summary>Insulate between windings.</summary>
    Insulate,

    /// <summary>Measure, trim and strip the leads.</summary>
    Terminate,

    /// <summary>Mark the leads and the part.</summary>
    Mark,

    /// <summary>Make the bench checks.</summary>
    Check,
}
