using System.Globalization;
using Winding.Core.Wire;

namespace Winding.Web.Display;

/// <summary>
/// Which AWG size a diameter is, if any: the gauge whose ASTM B258 nominal diameter (<see cref="AwgWireTable.ConductorDiameter"/>,
/// d = 0.005 in · 92^((36 − n)/39)) lies within 0.05 mil of it, half the 0.1 mil step to which the standard's table
/// rounds the formula. So 0.0201 in (0.51054 mm) is AWG 24 and 0.5 mm is no AWG size.
/// </summary>
public static class AwgSize
{
    /// <summary>How far a diameter may lie from a gauge's nominal diameter and still be that gauge: 0.05 mil.</summary>
    public const double ToleranceMillimetres = 0.05 * 0.0254;

    private const int Thickest = -3;
    private const int Thinnest = 56;

    /// <summary>The gauge (−3 for 0000 … 56) of <paramref name="diameterMillimetres"/>, or null when it is no AWG size.</summary>
    public static int? Match(double diameterMillimetres)
    {
        if (!double.IsFinite(diameterMillimetres) || diameterMillimetres <= 0)
        {
            return null;
        }

        // d = 0.127 mm · 92^((36 − n)/39) solved for n, then the nearest whole gauge checked against the tolerance.
        var estimate = 36 - (39 * Math.Log(diameterMillimetres / 0.127) / Math.Log(92));
        var gauge = (int)Math.Round(estimate);
        if (gauge is < Thickest or > Thinnest)
        {
            return null;
        }

        var nominal = AwgWireTable.ConductorDiameter(gauge).Millimetres;
        return Math.Abs(nominal - diameterMillimetres) <= ToleranceMillimetres ? gauge : null;
    }

    /// <summary>The gauge as written: "AWG 24", and "AWG 1/0" … "AWG 4/0" for 0 … −3.</summary>
    public static string Label(int gauge) =>
        gauge > 0 ? "AWG " + gauge.ToString(CultureInfo.InvariantCulture) : "AWG " + (1 - gauge).ToString(CultureInfo.InvariantCulture) + "/0";
}
