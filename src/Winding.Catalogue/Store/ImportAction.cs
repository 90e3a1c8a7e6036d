namespace Winding.Catalogue.Store;

/// <summary>What an import does (or would do) with one entry of a bundle.</summary>
public enum ImportAction
{
    /// <summary>A new user entry, version 1 (or the next after a deleted entry's history).</summary>
    Add,

    /// <summary>A new version of an existing user entry.</summary>
    Change,

    /// <summary>The same content as the current user entry: nothing to do.</summary>
    Unchanged,

    /// <summary>Refused; see the errors.</summary>
    Refuse,
}
