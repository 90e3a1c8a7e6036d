namespace Winding.Web.Drawing;

/// <summary>
/// A round part of the core drawn face on: an annulus between two circles, or a filled disc when the inner diameter is
/// zero. Used for a ring core's body and coating and for the holes of a two-hole core.
/// </summary>
/// <param name="CentreXMm">Centre, x, mm.</param>
/// <param name="CentreYMm">Centre, y, mm (downwards).</param>
/// <param name="OuterDiameterMm">Outer diameter, mm.</param>
/// <param name="InnerDiameterMm">Inner diameter, mm (0 for a disc).</param>
/// <param name="Role">What it shows: <c>core</c>, <c>coating</c> or <c>hole</c>.</param>
/// <param name="Fill">Fill colour as a hex value.</param>
public sealed record DrawnRing(double CentreXMm, double CentreYMm, double OuterDiameterMm, double InnerDiameterMm, string Role, string Fill)
{
    /// <summary>True when there is no inner circle.</summary>
    public bool IsDisc => InnerDiameterMm <= 0;
}
