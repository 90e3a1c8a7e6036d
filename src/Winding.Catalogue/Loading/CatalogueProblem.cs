namespace Winding.Catalogue.Loading;

/// <summary>A catalogue file that could not be loaded (or an entry in it that was refused), and why.</summary>
/// <param name="FileName">The file's path relative to the catalogue folder.</param>
/// <param name="JsonPath">Where in the file, as a JSON path (<c>$</c> for the whole file).</param>
/// <param name="Reason">Plain words.</param>
public sealed record CatalogueProblem(string FileName, string JsonPath, string Reason);
