using Winding.Core.Conductors;

namespace Winding.Core.Plans;

/// <summary>A winding at the operating point.</summary>
/// <param name="AcResistanceOhm">Resistance of the length to cut at f_max and ambient temperature (Dowell, or per strand for Litz), Ω.</param>
/// <param name="AcFactor">The Rac/Rdc factor with its method, skin depth and d/δ.</param>
/// <param name="SkinDepthM">Skin depth in the conductor at f_max, m.</param>
/// <param name="RmsCurrentA">RMS current, A (stated or derived).</param>
/// <param name="CurrentStated">True when the current was stated in the plan, false when derived from drive and load.</param>
/// <param name="CurrentDensityAPerM2">RMS current over the copper cross-section, A/m².</param>
/// <param name="CopperLossW">I²·Rac, W.</param>
/// <param name="VoltageRms">RMS voltage across the winding (drive × turns ratio to the primary), V.</param>
public sealed record WindingElectrical(
    double AcResistanceOhm,
    AcResistanceFactor AcFactor,
    double SkinDepthM,
    double RmsCurrentA,
    bool CurrentStated,
    double CurrentDensityAPerM2,
    double CopperLossW,
    double VoltageRms);
