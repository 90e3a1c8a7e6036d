using System.Diagnostics.CodeAnalysis;

namespace Winding.Core.Wire;

/// <summary>Film insulation build of AWG magnet wire (NEMA MW 1000 style).</summary>
public enum AwgBuild
{
    /// <summary>Single build, the thinner film.</summary>
    [SuppressMessage("Naming", "CA1720:Identifier contains type name", Justification = "\"Single build\" is the trade name of the insulation build, not the floating-point type.")]
    Single,

    /// <summary>Heavy build, about twice the film of single build.</summary>
    Heavy,
}
