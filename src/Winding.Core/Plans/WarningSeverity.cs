namespace Winding.Core.Plans;

/// <summary>How serious a plan warning is.</summary>
public enum WarningSeverity
{
    /// <summary>For information: an assumption the engine made.</summary>
    Info,

    /// <summary>The plan works but something deserves a second look.</summary>
    Caution,

    /// <summary>The plan cannot be built as it stands.</summary>
    Error,
}
