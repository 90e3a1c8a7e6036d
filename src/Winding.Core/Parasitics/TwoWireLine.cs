namespace Winding.Core.Parasitics;

/// <summary>The geometry factor arcosh(D/d) shared by the two-wire line's inductance and capacitance per metre.</summary>
internal static class TwoWireLine
{
    /// <summary>
    /// arcosh(D/d) of two parallel round conductors of diameter d at centre spacing D, with the arguments checked: d
    /// finite and positive; D finite and at least d, or above d when <paramref name="allowTouching"/> is false.
    /// </summary>
    internal static double ArcoshSpacingRatio(double centreSpacingM, double conductorDiameterM, bool allowTouching)
    {
        if (!double.IsFinite(conductorDiameterM) || conductorDiameterM <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(conductorDiameterM), conductorDiameterM, "The conductor diameter must be a finite number above 0 m.");
        }

        var tooClose = allowTouching ? centreSpacingM < conductorDiameterM : centreSpacingM <= conductorDiameterM;
        if (!double.IsFinite(centreSpacingM) || tooClose)
        {
            var range = allowTouching ? "at least" : "greater than";
            throw new ArgumentOutOfRangeException(nameof(centreSpacingM), centreSpacingM,
                $"The centre spacing must be finite and {range} the conductor diameter ({conductorDiameterM} m).");
        }

        return Math.Acosh(centreSpacingM / conductorDiameterM);
    }
}
