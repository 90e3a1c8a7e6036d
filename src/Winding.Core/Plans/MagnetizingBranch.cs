namespace Winding.Core.Plans;

/// <summary>The primary's magnetising inductance at the bottom of the band and the reactance rule.</summary>
/// <param name="FrequencyHz">f_min, Hz.</param>
/// <param name="InductanceH">Series magnetising inductance of the primary at f_min, from μ′(f_min), H.</param>
/// <param name="ReactanceOhm">2π·f_min·L, Ω.</param>
/// <param name="SeriesLossResistanceOhm">Core-loss resistance in series with L at f_min, ω·L0·μ″, Ω (IEC 60401-3 notation).</param>
/// <param name="ParallelLossResistanceOhm">The same loss as a resistance across the winding, R_p, Ω (null without μ″).</param>
/// <param name="ImpedanceSeenOhm">The impedance the primary works at: the larger of the source resistance and the
/// load reflected to the primary (common practice, no source), Ω.</param>
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
