namespace Winding.Core.Sheets;

/// <summary>A tap brought out of a winding.</summary>
/// <param name="Turn">The turn, counted from the start, where the tap comes out.</param>
/// <param name="Mark">The letters written on its lead, e.g. "1T1".</param>
public sealed record SheetTap(int Turn, string Mark);
