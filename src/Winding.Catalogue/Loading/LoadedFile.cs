namespace Winding.Catalogue.Loading;

/// <summary>One parsed entry file, before validation.</summary>
/// <param name="Name">File name for problems: relative to its folder, user files prefixed <c>user/</c>.</param>
/// <param name="User">True for a file of the user catalogue.</param>
/// <param name="Entry">The parsed document.</param>
internal sealed record LoadedFile(string Name, bool User, EntryParseResult Entry);
