namespace Winding.Core.Wire;

/// <summary>How far a tabulated standard value can be trusted (the labels of physics-sources.md).</summary>
public enum ValueProvenance
{
    /// <summary>Read in the named source (or a faithful reproduction of it).</summary>
    Read,

    /// <summary>Recalled from memory and confirmed indirectly by an independent cross-check.</summary>
    FromMemoryCrossChecked,

    /// <summary>Recalled from memory, not re-read and not cross-checked: treat as unverified.</summary>
    FromMemory,
}
