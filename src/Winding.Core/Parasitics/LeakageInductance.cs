namespace Winding.Core.Parasitics;

/// <summary>
/// Leakage inductance between two windings: the 1-D MMF formula for overlaid (concentric) layered windings, the
/// inductance of a two-wire line (bifilar and twisted pairs) and an estimate for sectored windings on a ring core.
/// μ0 is <see cref="PhysicalConstants.VacuumPermeabilityHPerM"/>. All lengths in m, inductances in H.
/// </summary>
public static class LeakageInductance
{
    /// <summary>
    /// Leakage inductance of overlaid layered windings by the 1-D MMF method:
    /// <code>
    /// L_lk = μ0·N²·MLT·(Σc + Σa/3) / (M²·b_w),   Σc = M·c,   Σa = a1 + a2
    /// </code>
    /// referred to the N-turn winding (multiply by (N2/N)² to refer it to a winding of N2 turns). Source: C. W. T.
    /// McLyman, <i>Transformer and Inductor Design Handbook</i>, 3rd ed. 2004, and E. C. Snelling, <i>Soft Ferrites</i>,
    /// 2nd ed. 1988, ch. 11 (both from memory); confirmed by integrating the piecewise-linear MMF profile,
    /// W = (μ0·MLT/(2·b_w))·∫F²dx (physics-sources.md §6.1).
    /// </summary>
    /// <remarks>
    /// With M = 1 this is the two-winding case P|S: L = μ0·N²·MLT·(c + (a1 + a2)/3)/b_w. With M &gt; 1 the windings are
    /// interleaved into M primary–secondary interfaces of equal share (e.g. P/2|S|P/2 gives M = 2): every section
    /// carries the same peak MMF N·I/M, <paramref name="firstBuildM"/> and <paramref name="secondBuildM"/> are the total
    /// builds of each winding summed over its sections, and each interface has the insulation gap
    /// <paramref name="gapM"/>. Validity: windings span the full breadth b_w; the leakage field is axial and uniform
    /// along b_w; MLT is the same for all layers. On a ring core with overlaid windings the formula is an estimate with
    /// b_w = the inner circumference available to the winding (physics-sources.md §6.2, common practice, no source).
    /// </remarks>
    /// <param name="turns">N, turns of the winding the result is referred to, at least 1.</param>
    /// <param name="meanTurnLengthM">MLT, mean length of turn in m, finite and positive.</param>
    /// <param name="breadthM">b_w, winding breadth along the core in m, finite and positive.</param>
    /// <param name="firstBuildM">a1, radial build of the first winding in m (summed over its sections), finite and
    /// positive.</param>
    /// <param name="secondBuildM">a2, radial build of the second winding in m (summed over its sections), finite and
    /// positive.</param>
    /// <param name="gapM">c, insulation gap at each interface in m, finite and at least 0.</param>
    /// <param name="interfaces">M, the number of primary–secondary interfaces, at least 1.</param>
    /// <returns>L_lk in H, finite and positive.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double OverlaidLayersH(int turns, double meanTurnLengthM, double breadthM,
        double firstBuildM, double secondBuildM, double gapM, int interfaces = 1)
    {
        RequireTurns(turns, nameof(turns));
        RequirePositive(meanTurnLengthM, nameof(meanTurnLengthM), "The mean turn length");
        RequirePositive(breadthM, nameof(breadthM), "The winding breadth");
        RequirePositive(firstBuildM, nameof(firstBuildM), "The build of the first winding");
        RequirePositive(secondBuildM, nameof(secondBuildM), "The build of the second winding");
        if (!double.IsFinite(gapM) || gapM < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(gapM), gapM, "The insulation gap must be a finite number of at least 0 m.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(interfaces, 1);

        double m = interfaces;
        var effectiveThicknessM = m * gapM + (firstBuildM + secondBuildM) / 3;
        return PhysicalConstants.VacuumPermeabilityHPerM * Squared(turns) * meanTurnLengthM * effectiveThicknessM / (m * m * breadthM);
    }

    /// <summary>
    /// External inductance per metre of a two-wire line (two parallel round conductors carrying opposite currents):
    /// <code>
    /// L′ = (μ0/π)·arcosh(D/d)
    /// </code>
    /// (S. Ramo, J. R. Whinnery, T. Van Duzer, <i>Fields and Waves in Communication Electronics</i>, from memory; any
    /// electromagnetics text). It is the leakage inductance per metre of a bifilar or twisted pair, referred to one
    /// conductor. Validity: straight parallel conductors, current on the surface (skin depth much smaller than d; the
    /// internal inductance μ0/(8π) per conductor at DC is not included), no magnetic material nearby. D = d (touching
    /// conductors) gives 0.
    /// </summary>
    /// <param name="centreSpacingM">D, centre-to-centre spacing in m, finite and at least <paramref name="conductorDiameterM"/>.</param>
    /// <param name="conductorDiameterM">d, conductor diameter in m, finite and positive.</param>
    /// <returns>L′ in H/m, finite and at least 0.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double TwoWireLinePerMetreHPerM(double centreSpacingM, double conductorDiameterM) =>
        PhysicalConstants.VacuumPermeabilityHPerM / Math.PI * TwoWireLine.ArcoshSpacingRatio(centreSpacingM, conductorDiameterM, allowTouching: true);

    /// <summary>
    /// An estimate of the leakage inductance of two sectored (side-by-side) windings on a ring core, referred to the
    /// first winding. No published closed form exists (physics-sources.md §6.2); this is our own derived estimate:
    /// each sector winding's flux that does not link the other is taken as that of an air-cored solenoid over its arc,
    /// <code>
    /// L_k = μ0·N_k²·A_k/ℓ_k,     L_lk = L_1 + (N1/N2)²·L_2 = μ0·N1²·(A_1/ℓ_1 + A_2/ℓ_2)
    /// </code>
    /// with A_k the area enclosed by the winding's mean turn (the core section grown by the winding build, supplied by the
    /// caller) and ℓ_k the arc length the winding covers at the ring's mean radius.
    /// </summary>
    /// <remarks>
    /// An estimate only: expect it within a factor of about 3 of a measurement. Real sectored leakage depends on the
    /// core's permeability and on the gap between the sectors and is often one to two orders of magnitude above the
    /// overlaid value (physics-sources.md §6.2, common practice, no source). Measure it (short-circuit test) when it
    /// matters.
    /// </remarks>
    /// <param name="firstTurns">N1, turns of the first winding (the result is referred to it), at least 1.</param>
    /// <param name="firstEnclosedAreaM2">A_1, area inside the first winding's mean turn in m², finite and positive.</param>
    /// <param name="firstArcLengthM">ℓ_1, arc length of the first winding at the mean radius in m, finite and positive.</param>
    /// <param name="secondTurns">N2, turns of the second winding, at least 1.</param>
    /// <param name="secondEnclosedAreaM2">A_2, area inside the second winding's mean turn in m², finite and positive.</param>
    /// <param name="secondArcLengthM">ℓ_2, arc length of the second winding at the mean radius in m, finite and positive.</param>
    /// <returns>L_lk in H referred to the first winding, finite and positive.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double SectoredEstimateH(int firstTurns, double firstEnclosedAreaM2, double firstArcLengthM,
        int secondTurns, double secondEnclosedAreaM2, double secondArcLengthM)
    {
        RequireTurns(firstTurns, nameof(firstTurns));
        RequirePositive(firstEnclosedAreaM2, nameof(firstEnclosedAreaM2), "The area enclosed by the first winding");
        RequirePositive(firstArcLengthM, nameof(firstArcLengthM), "The arc length of the first winding");
        RequireTurns(secondTurns, nameof(secondTurns));
        RequirePositive(secondEnclosedAreaM2, nameof(secondEnclosedAreaM2), "The area enclosed by the second winding");
        RequirePositive(secondArcLengthM, nameof(secondArcLengthM), "The arc length of the second winding");

        var firstH = PhysicalConstants.VacuumPermeabilityHPerM * Squared(firstTurns) * firstEnclosedAreaM2 / firstArcLengthM;
        var secondH = PhysicalConstants.VacuumPermeabilityHPerM * Squared(secondTurns) * secondEnclosedAreaM2 / secondArcLengthM;
        var ratio = (double)firstTurns / secondTurns;
        return firstH + ratio * ratio * secondH;
    }

    private static double Squared(int turns) => (double)turns * turns;

    private static void RequireTurns(int turns, string name)
    {
        if (turns < 1)
        {
            throw new ArgumentOutOfRangeException(name, turns, "The number of turns must be at least 1.");
        }
    }

    private static void RequirePositive(double value, string name, string what)
    {
        if (!double.IsFinite(value) || value <= 0)
        {
            throw new ArgumentOutOfRangeException(name, value, $"{what} must be a finite number above 0.");
        }
    }
}
