namespace Winding.Core.Sheets;

/// <summary>A safety caution on the sheet.</summary>
/// <param name="Code">The engine's warning code it repeats (<c>above-extra-low-voltage</c>, <c>high-power</c>,
/// <c>hot</c>), or <c>local-codes</c> and <c>no-operating-conditions</c> for the sheet's own words.</param>
/// <param name="Text">The caution in plain words.</param>
public sealed record SheetCaution(string Code, string Text);
