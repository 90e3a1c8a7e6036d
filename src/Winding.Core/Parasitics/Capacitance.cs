using MathNet.Numerics.LinearAlgebra;

namespace Winding.Core.Parasitics;

/// <summary>
/// Stray capacitances of windings: layered parallel plates, the self-capacitance of a multilayer winding, the
/// turn-to-turn capacitance of enamelled round wire with the single-layer winding built from it, and the two-wire line.
/// ε0 is <see cref="PhysicalConstants.VacuumPermittivityFPerM"/>. Lengths in m, areas in m², capacitances in F.
/// All assume a uniform voltage distribution (frequencies well below the winding's first self-resonance).
/// </summary>
public static class Capacitance
{
    /// <summary>
    /// Above this number of turns <see cref="SingleLayerSelfF"/> with a conductive core returns the infinite-ladder
    /// limit (1 + √3)/2·C_tt instead of solving the ladder. The exact value approaches the limit from above, the
    /// difference shrinking by about 2 − √3 ≈ 0.268 per turn: 1.2e-5·C_tt at N = 10, 2.4e-11·C_tt at N = 20 (below 1e-9
    /// relative from N = 18), below double rounding from N = 30.
    /// </summary>
    public const int SingleLayerExactMaxTurns = 40;

    /// <summary>(1 + √3)/2, the single-layer self-capacitance on a conductive core in units of C_tt for many turns.</summary>
    public static readonly double ConductiveCoreLimitFactor = (1 + Math.Sqrt(3)) / 2;

    /// <summary>Half-width of the Massarini–Kazimierczuk elementary cell, π/6 rad.</summary>
    private const double CellHalfAngleRad = Math.PI / 6;

    /// <summary>
    /// Capacitance of two parallel plates separated by series dielectric layers (electrostatics, series capacitors;
    /// physics-sources.md §7.1):
    /// <code>
    /// C = ε0·A / Σ(t_i/ε_ri)
    /// </code>
    /// For two windings facing each other use A = MLT × b_w. Validity: plate spacing small against the plate size
    /// (fringing neglected). Round wires are not flat plates; effective-distance corrections (Snelling 1988; Dalessandro
    /// et al. 2007, from memory) are not applied.
    /// </summary>
    /// <param name="areaM2">A, facing area in m², finite and positive.</param>
    /// <param name="layers">The dielectric layers between the plates: at least one, each with a finite thickness of
    /// at least 0 m and ε_r finite and at least 1, and a positive total thickness.</param>
    /// <returns>C in F, finite and positive.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="layers"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double LayeredPlateF(double areaM2, IReadOnlyList<DielectricLayer> layers)
    {
        RequirePositive(areaM2, nameof(areaM2), "The facing area");
        var (_, reducedThicknessM) = Thicknesses(layers);
        return PhysicalConstants.VacuumPermittivityFPerM * areaM2 / reducedThicknessM;
    }

    /// <summary>
    /// The effective relative permittivity of a layer stack, ε_eff = Σt_i / Σ(t_i/ε_ri): the permittivity of a uniform
    /// dielectric of the same total thickness and the same <see cref="LayeredPlateF"/> capacitance.
    /// </summary>
    /// <param name="layers">The layers, as for <see cref="LayeredPlateF"/>.</param>
    /// <returns>ε_eff, dimensionless, between the smallest and the largest ε_r of the layers.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="layers"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A layer is outside its range, or there is no positive thickness.</exception>
    public static double EffectivePermittivity(IReadOnlyList<DielectricLayer> layers)
    {
        var (totalThicknessM, reducedThicknessM) = Thicknesses(layers);
        return totalThicknessM / reducedThicknessM;
    }

    /// <summary>
    /// Self-capacitance of a multilayer winding from the static capacitance C_l between two adjacent layers, by the
    /// energy method with a uniform voltage distribution:
    /// <code>
    /// back-and-forth ("Z") winding:             C_s = (4/3)·C_l·(n − 1)/n²
    /// flyback ("C") winding, layers start at one end:   C_s = C_l·(n − 1)/n²
    /// </code>
    /// Sources: Snelling 1988; L. Dalessandro, F. da Silveira Cavalcante, J. W. Kolar, "Self-capacitance of
    /// high-voltage transformers", IEEE Trans. Power Electron. 22(5), 2007; the energy method after Duerdoth 1946 (all
    /// from memory); confirmed by integrating ½·C_l·∫ΔV² over the linear inter-layer voltage profiles
    /// (physics-sources.md §7.2). Validity: all layers alike (same C_l), uniform voltage per turn, turn-to-turn
    /// capacitance inside a layer and capacitance to the core neglected. One layer gives 0.
    /// </summary>
    /// <param name="layerToLayerF">C_l in F, finite and positive (e.g. <see cref="LayeredPlateF"/> with A = MLT × b_w).</param>
    /// <param name="layers">n, the number of layers, at least 1.</param>
    /// <param name="flyback">True for a flyback winding (every layer starts at the same end), false for the usual
    /// back-and-forth winding.</param>
    /// <returns>C_s in F between the winding's ends, finite and at least 0.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double MultilayerSelfF(double layerToLayerF, int layers, bool flyback = false)
    {
        RequirePositive(layerToLayerF, nameof(layerToLayerF), "The layer-to-layer capacitance");
        ArgumentOutOfRangeException.ThrowIfLessThan(layers, 1);
        double n = layers;
        var factor = flyback ? 1.0 : 4.0 / 3.0;
        return factor * layerToLayerF * (n - 1) / (n * n);
    }

    /// <summary>
    /// θ*, the angle up to which the field between two touching enamelled turns is coating-dominated (A. Massarini,
    /// M. K. Kazimierczuk, "Self-capacitance of inductors", IEEE Trans. Power Electron. 12(4):671–676, 1997, from memory;
    /// physics-sources.md §7.3):
    /// <code>
    /// θ* = arccos(1 − ln(r_o/r_c)/ε_r)
    /// </code>
    /// computed as 2·arcsin(√(ln(r_o/r_c)/(2·ε_r))), the same value without the cancellation near θ* = 0.
    /// </summary>
    /// <param name="conductorRadiusM">r_c, bare conductor radius in m, finite and positive.</param>
    /// <param name="outerRadiusM">r_o, radius over the coating in m, finite and greater than r_c.</param>
    /// <param name="coatingPermittivity">ε_r of the coating, finite and at least 1.</param>
    /// <returns>θ* in rad, above 0 and at most π.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range, or ln(r_o/r_c) &gt; 2·ε_r (arccos
    /// undefined).</exception>
    public static double CoatingAngleRad(double conductorRadiusM, double outerRadiusM, double coatingPermittivity) =>
        CoatingAngle(conductorRadiusM, outerRadiusM, coatingPermittivity).ThetaRad;

    /// <summary>
    /// Capacitance between two adjacent touching turns of enamelled round wire (Massarini &amp; Kazimierczuk 1997, from
    /// memory; physics-sources.md §7.3):
    /// <code>
    /// θ*   = arccos(1 − ln(r_o/r_c)/ε_r)
    /// C_tt = ε0·l_t·[ε_r·θ*/ln(r_o/r_c) + cot(θ*/2) − cot(π/12)]
    /// </code>
    /// The closed form integrates the elementary cell −π/6 … π/6 piecewise: through the coating for θ &lt; θ*, through
    /// the air gap for θ &gt; θ*.
    /// </summary>
    /// <remarks>
    /// Validity: touching turns of equal round wire, coating thin against the radius, a ±30 % quantity (integrating the
    /// same cell without the piecewise simplification gives about 25 % less; physics-sources.md §7.3).
    /// Thick coatings (our extension, not from the paper): when θ* exceeds the cell half-angle π/6 (ln(r_o/r_c) &gt;
    /// ε_r·(1 − cos π/6), e.g. r_o/r_c &gt; 1.60 for ε_r = 3.5, as with hook-up wire) the whole cell is
    /// coating-dominated and C_tt = ε0·l_t·ε_r·(π/6)/ln(r_o/r_c) is returned: the closed form's value at θ* = π/6,
    /// continuous there. Taken beyond π/6 the closed form would subtract the air term and turn negative for
    /// r_o/r_c ≳ 5.6 (ε_r = 3.5).
    /// </remarks>
    /// <param name="conductorRadiusM">r_c, bare conductor radius in m, finite and positive.</param>
    /// <param name="outerRadiusM">r_o, radius over the coating in m, finite and greater than r_c.</param>
    /// <param name="coatingPermittivity">ε_r of the coating, finite and at least 1 (enamel ≈ 3.5).</param>
    /// <param name="turnLengthM">l_t, mean turn length in m, finite and positive.</param>
    /// <returns>C_tt in F, finite and positive.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range, or ln(r_o/r_c) &gt; 2·ε_r (θ*
    /// undefined).</exception>
    public static double TurnToTurnF(double conductorRadiusM, double outerRadiusM, double coatingPermittivity, double turnLengthM)
    {
        var (thetaRad, lnRatio) = CoatingAngle(conductorRadiusM, outerRadiusM, coatingPermittivity);
        RequirePositive(turnLengthM, nameof(turnLengthM), "The turn length");

        var bracket = thetaRad >= CellHalfAngleRad
            ? coatingPermittivity * CellHalfAngleRad / lnRatio
            : coatingPermittivity * thetaRad / lnRatio + 1 / Math.Tan(thetaRad / 2) - 1 / Math.Tan(Math.PI / 12);
        return PhysicalConstants.VacuumPermittivityFPerM * turnLengthM * bracket;
    }

    /// <summary>
    /// Self-capacitance between the ends of a single-layer winding of N turns from the turn-to-turn capacitance C_tt.
    /// </summary>
    /// <remarks>
    /// <para>
    /// With a conductive core (MnZn ferrite, resistivity about 0.1…10 Ω·m; physics-sources.md §7.3, common practice,
    /// from memory): the exact equivalent capacitance between the winding ends of the ladder with C_tt between
    /// neighbouring turns and C_tc = 2·C_tt from every turn to the floating core (Massarini &amp; Kazimierczuk 1997, from
    /// memory). It is solved on the nodal capacitance matrix with MathNet linear algebra: the floating core node is
    /// eliminated (Kron reduction), the last turn is taken as reference and a unit charge is injected at the first.
    /// N = 2 gives 2·C_tt, N = 3 gives 1.5·C_tt, N = 5 gives 1.375·C_tt, and C_s tends to (1 + √3)/2·C_tt ≈ 1.366·C_tt,
    /// the infinite-ladder limit (x² − 2x − 2 = 0, x = 1 + √3; physics-sources.md §7.3). Above
    /// <see cref="SingleLayerExactMaxTurns"/> turns the limit is returned (equal to the exact value to rounding).
    /// </para>
    /// <para>
    /// Without a conductive core (NiZn ferrite, powder or air): the nearest-neighbour chain C_s = C_tt/(N − 1), our own
    /// model (physics-sources.md §7.3). It neglects the capacitances between non-adjacent turns and to the surroundings
    /// and so underestimates real coils, whose self-capacitance tends to a constant for many turns (Grandi et al., IEEE
    /// Trans. Ind. Appl. 35(5), 1999, and a published measurement study of toroidal inductors; titles and abstracts).
    /// </para>
    /// <para>One turn has no turn-to-turn capacitance: N = 1 gives 0.</para>
    /// </remarks>
    /// <param name="turnToTurnF">C_tt in F, finite and positive (e.g. <see cref="TurnToTurnF"/>).</param>
    /// <param name="turns">N, at least 1.</param>
    /// <param name="conductiveCore">True when the winding lies on a conductive core (C_tc = 2·C_tt per turn).</param>
    /// <returns>C_s in F, finite and at least 0.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double SingleLayerSelfF(double turnToTurnF, int turns, bool conductiveCore)
    {
        RequirePositive(turnToTurnF, nameof(turnToTurnF), "The turn-to-turn capacitance");
        ArgumentOutOfRangeException.ThrowIfLessThan(turns, 1);
        if (turns == 1)
        {
            return 0;
        }

        if (!conductiveCore)
        {
            return turnToTurnF / (turns - 1);
        }

        return turns > SingleLayerExactMaxTurns
            ? ConductiveCoreLimitFactor * turnToTurnF
            : ConductiveCoreLadderFactor(turns) * turnToTurnF;
    }

    /// <summary>
    /// Capacitance per metre of a two-wire line (S. Ramo, J. R. Whinnery, T. Van Duzer, <i>Fields and Waves in
    /// Communication Electronics</i>, from memory; any electromagnetics text):
    /// <code>
    /// C′ = π·ε0·ε_eff / arcosh(D/d)
    /// </code>
    /// With <see cref="LeakageInductance.TwoWireLinePerMetreHPerM"/> it satisfies L′·C′ = μ0·ε0·ε_eff (a TEM line).
    /// Validity: straight parallel conductors in a uniform dielectric of ε_eff (for enamelled or insulated pairs an
    /// effective value between 1 and the insulation's ε_r), no other conductors nearby.
    /// </summary>
    /// <param name="centreSpacingM">D, centre-to-centre spacing in m, finite and greater than <paramref name="conductorDiameterM"/>.</param>
    /// <param name="conductorDiameterM">d, conductor diameter in m, finite and positive.</param>
    /// <param name="effectivePermittivity">ε_eff, dimensionless, finite and at least 1.</param>
    /// <returns>C′ in F/m, finite and positive.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double TwoWireLinePerMetreFPerM(double centreSpacingM, double conductorDiameterM, double effectivePermittivity)
    {
        var arcosh = TwoWireLine.ArcoshSpacingRatio(centreSpacingM, conductorDiameterM, allowTouching: false);
        RequirePermittivity(effectivePermittivity, nameof(effectivePermittivity));
        var result = Math.PI * PhysicalConstants.VacuumPermittivityFPerM * effectivePermittivity / arcosh;
        if (!double.IsFinite(result))
        {
            throw new ArgumentOutOfRangeException(nameof(centreSpacingM), centreSpacingM, "The centre spacing is too close to the conductor diameter to give a finite capacitance.");
        }

        return result;
    }

    /// <summary>C_s/C_tt of the ladder on a floating conductive core, solved exactly for N ≥ 2 turns.</summary>
    private static double ConductiveCoreLadderFactor(int turns)
    {
        // Nodal capacitance matrix in units of C_tt: nodes 0 … N−1 are the turns, node N is the core.
        var size = turns + 1;
        var core = turns;
        var y = Matrix<double>.Build.Dense(size, size);
        for (var i = 0; i < turns - 1; i++)
        {
            Connect(y, i, i + 1, 1);
        }

        for (var i = 0; i < turns; i++)
        {
            Connect(y, i, core, 2);
        }

        // Kron reduction: eliminate the floating core node (no charge is injected there).
        var turnsBlock = y.SubMatrix(0, turns, 0, turns);
        var toCore = y.Column(core, 0, turns);
        var reduced = turnsBlock - toCore.OuterProduct(toCore) / y[core, core];

        // Reference the last turn, inject a unit charge at the first: C = 1/V_first.
        var grounded = reduced.SubMatrix(0, turns - 1, 0, turns - 1);
        var charge = Vector<double>.Build.Dense(turns - 1);
        charge[0] = 1;
        var voltages = grounded.Solve(charge);
        return 1 / voltages[0];
    }

    private static void Connect(Matrix<double> y, int a, int b, double value)
    {
        y[a, a] += value;
        y[b, b] += value;
        y[a, b] -= value;
        y[b, a] -= value;
    }

    private static (double ThetaRad, double LnRatio) CoatingAngle(double conductorRadiusM, double outerRadiusM, double coatingPermittivity)
    {
        RequirePositive(conductorRadiusM, nameof(conductorRadiusM), "The conductor radius");
        if (!double.IsFinite(outerRadiusM) || outerRadiusM <= conductorRadiusM)
        {
            throw new ArgumentOutOfRangeException(nameof(outerRadiusM), outerRadiusM,
                $"The outer radius must be finite and greater than the conductor radius ({conductorRadiusM} m).");
        }

        RequirePermittivity(coatingPermittivity, nameof(coatingPermittivity));
        var lnRatio = Math.Log(outerRadiusM / conductorRadiusM);
        if (!(lnRatio > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(outerRadiusM), outerRadiusM, "The coating is too thin to resolve: r_o/r_c rounds to 1.");
        }

        if (lnRatio > 2 * coatingPermittivity)
        {
            throw new ArgumentOutOfRangeException(nameof(outerRadiusM), outerRadiusM,
                $"The Massarini–Kazimierczuk angle θ* = arccos(1 − ln(r_o/r_c)/ε_r) is undefined: ln(r_o/r_c) = {lnRatio} exceeds 2·ε_r = {2 * coatingPermittivity}.");
        }

        var thetaRad = 2 * Math.Asin(Math.Sqrt(lnRatio / (2 * coatingPermittivity)));
        return (thetaRad, lnRatio);
    }

    private static (double TotalM, double ReducedM) Thicknesses(IReadOnlyList<DielectricLayer> layers)
    {
        ArgumentNullException.ThrowIfNull(layers);
        if (layers.Count == 0)
        {
            throw new ArgumentOutOfRangeException(nameof(layers), layers.Count, "At least one dielectric layer is needed.");
        }

        double totalM = 0;
        double reducedM = 0;
        for (var i = 0; i < layers.Count; i++)
        {
            var layer = layers[i];
            if (!double.IsFinite(layer.ThicknessM) || layer.ThicknessM < 0)
            {
                throw new ArgumentOutOfRangeException(nameof(layers), layer, $"Layer {i}: the thickness must be a finite number of at least 0 m.");
            }

            if (!double.IsFinite(layer.RelativePermittivity) || layer.RelativePermittivity < 1)
            {
                throw new ArgumentOutOfRangeException(nameof(layers), layer, $"Layer {i}: ε_r must be a finite number of at least 1.");
            }

            totalM += layer.ThicknessM;
            reducedM += layer.ThicknessM / layer.RelativePermittivity;
        }

        if (!(reducedM > 0) || !double.IsFinite(totalM))
        {
            throw new ArgumentOutOfRangeException(nameof(layers), totalM, "The layers must have a finite total thickness above 0 m.");
        }

        return (totalM, reducedM);
    }

    private static void RequirePermittivity(double value, string name)
    {
        if (!double.IsFinite(value) || value < 1)
        {
            throw new ArgumentOutOfRangeException(name, value, "ε_r must be a finite number of at least 1.");
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
