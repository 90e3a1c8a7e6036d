namespace Winding.Core.Sheets;

/// <summary>One dimension of a core, as it is measured with callipers.</summary>
/// <param name="Name">Plain name, e.g. "outer diameter".</param>
/// <param name="Metres">The value, m.</param>
public sealed record SheetDimension(string Name, double Metres);
