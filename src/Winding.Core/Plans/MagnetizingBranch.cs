namespace Winding.Core.Plans;

/// <summary>The primary's magnetising inductance at the bottom of the band and the reactance rule.</summary>
/// <param name="FrequencyHz">f_min, Hz.</param>
/// <param name="InductanceH">Series magnetising inductance of the primary at f_min, from μ′(f_min), H.</param>
/// <param name="ReactanceOhm">2π·f_min·L, Ω.</param>
/// <param name="SeriesLossResistanceOhm">Core-loss resistance in series with L at f_min, ω·L0·μ″, Ω (IEC 60401-3 notation).</param>
/// <param name="ParallelLossResistanceOhm">The same loss as a resistance across the winding, R_p, Ω (null without μ″).</param>
/// <param name="ImpedanceSeenOhm">The impedance the magnetising inductance works against: twice the parallel
/// resistance of the source and the load referred to the primary, 2·(RS ∥ RL′) — equal to R in a matched design, the
/// form the rule X ≥ k·R is usually stated in (common practice; the corner f_L = R_par/(2π·L_m), physics-sources §9.1);
/// with an ideal voltage source (RS = 0) the referred load, Ω.</param>
/// <param name="ReactanceFactor">k of the rule X ≥ k·Z.</param>
/// <param name="PrimaryTurnsNeeded">Primary turns that meet X ≥ k·Z even at the low end of the AL tolerance.</param>
/// <param name="PermeabilityExtrapolated">True when f_min lies outside the material's permeability table.</param>
public sealed record MagnetizingBranch(
    double FrequencyHz,
    double InductanceH,
    double ReactanceOhm,
    double SeriesLossResistanceOhm,
    double? ParallelLossResistanceOhm,
    double ImpedanceSeenOhm,
    double ReactanceFactor,
    int PrimaryTurnsNeeded,
    bool PermeabilityExtrapolated);
