namespace Winding.Catalogue.Store;

/// <summary>How a store operation ended. Everything but <see cref="Ok"/> leaves the files as they were.</summary>
public enum StoreOutcome
{
    /// <summary>Done (saved, deleted, restored or read).</summary>
    Ok,

    /// <summary>The content or an argument was refused; see the field errors.</summary>
    Invalid,

    /// <summary>No such entry (or version).</summary>
    NotFound,

    /// <summary>The entry changed since the caller read it: the expected version is not the current one.</summary>
    Conflict,

    /// <summary>The entry is built in, and built-in entries cannot be changed.</summary>
    ReadOnly,

    /// <summary>The id is already taken by a built-in or user entry.</summary>
    AlreadyExists,

    /// <summary>The material is used by user cores and cannot be deleted.</summary>
    InUse,

    /// <summary>The file system refused the read or write (disk full, permissions); the message says what happened.</summary>
    StorageFailed,
}
