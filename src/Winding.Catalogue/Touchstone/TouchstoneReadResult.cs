namespace Winding.Catalogue.Touchstone;

/// <summary>The outcome of <see cref="TouchstoneFile.Parse"/>: the file, or the first error found.</summary>
/// <param name="File">The parsed file, when it was valid.</param>
/// <param name="Error">The first error, when it was not.</param>
public sealed record TouchstoneReadResult(TouchstoneFile? File, TouchstoneError? Error)
{
    /// <summary>True when the file was read.</summary>
    public bool IsValid => File is not null && Error is null;
}
