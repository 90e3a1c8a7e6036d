using Winding.Core.Plans;

namespace Winding.Core.Sheets;

/// <summary>
/// Test frequencies for the bench checks, chosen from the frequencies bench LCR meters commonly offer (100 Hz, 1 kHz,
/// 10 kHz, 100 kHz, 1 MHz; common practice, no source).
/// <list type="bullet">
/// <item>Inductance: the highest of 100 kHz, 10 kHz, 1 kHz and 100 Hz at which μ′ of the wound core is within
/// <see cref="RollOffShare"/> of the value AL stands for (below the μ′ roll-off) and which is at most a tenth of the
/// winding's self-resonance, so that the capacitance adds under about 1 % (L_apparent = L/(1 − (f/f0)²)).</item>
/// <item>Leakage: the lowest of 1 kHz … 10 MHz (above 1 MHz an RF impedance meter) at which the leakage reactance is at least <see cref="LeakageMinimumQ"/>
/// times the windings' resistance, at most a tenth of the resonance of the leakage with the first winding's
/// self-capacitance.</item>
/// </list>
/// </summary>
public static class TestFrequency
{
    /// <summary>How far μ′ may be from its low-frequency value at an inductance test frequency (3 %; our choice, well
    /// inside every AL tolerance the catalogue holds but a tight gapped one).</summary>
    public const double RollOffShare = 0.03;

    /// <summary>Smallest ratio of a test frequency's distance to a resonance (10: the capacitance then adds about 1 %).</summary>
    public const double ResonanceMargin = 10;

    /// <summary>Smallest leakage reactance over the shorted windings' resistance for a clear reading (3; common practice, no source).</summary>
    public const double LeakageMinimumQ = 3;

    private static readonly double[] InductanceCandidatesHz = [100e3, 10e3, 1e3, 100];
    private static readonly double[] LeakageCandidatesHz = [1e3, 10e3, 100e3, 1e6, 10e6];

    /// <summary>
    /// μ′ of the wound core at <paramref name="frequencyHz"/> over the μ that AL stands for: the series inductance of a
    /// winding there over AL·N², (μ0·μ′(f)/C1)/AL.
    /// </summary>
    public static double PermeabilityShare(PlanCore core, double frequencyHz)
    {
        ArgumentNullException.ThrowIfNull(core);
        var c1 = core.WoundGeometry.EffectiveParameters().CoreFactorC1PerM;
        var muPrime = core.PermeabilityAt(frequencyHz).MuPrime;
        return PhysicalConstants.VacuumPermeabilityHPerM * muPrime / c1 / core.InductanceFactor.HenriesPerTurnSquared;
    }

    /// <summary>The inductance test frequency for a winding whose lowest resonance is <paramref name="resonanceHz"/>.</summary>
    /// <returns>The frequency, μ′ there over its low-frequency value, and whether both conditions hold (when none of the
    /// candidates meets them, the candidate nearest to meeting them is returned with false).</returns>
    public static (double FrequencyHz, double PermeabilityShare, bool Clean) ForInductance(PlanCore core, double? resonanceHz)
    {
        ArgumentNullException.ThrowIfNull(core);
        var limitHz = resonanceHz is { } f0 ? f0 / ResonanceMargin : double.PositiveInfinity;
        foreach (var f in InductanceCandidatesHz)
        {
            var share = PermeabilityShare(core, f);
            if (f <= limitHz && Math.Abs(share - 1) <= RollOffShare)
            {
                return (f, share, true);
            }
        }

        var underResonance = InductanceCandidatesHz.Where(f => f <= limitHz).ToArray();
        var pick = underResonance.Length > 0
            ? underResonance.MinBy(f => Math.Abs(PermeabilityShare(core, f) - 1))
            : InductanceCandidatesHz[^1];
        return (pick, PermeabilityShare(core, pick), false);
    }

    /// <summary>The leakage test frequency.</summary>
    /// <param name="leakageH">The leakage inductance, H.</param>
    /// <param name="shortedResistanceOhm">The first winding's resistance plus the shorted winding's referred to it, Ω.</param>
    /// <param name="inputCapacitanceF">The first winding's self-capacitance, F (0 when unknown).</param>
    /// <returns>The frequency and whether both conditions hold.</returns>
    public static (double FrequencyHz, bool Clean) ForLeakage(double leakageH, double shortedResistanceOhm, double inputCapacitanceF)
    {
        var limitHz = leakageH > 0 && inputCapacitanceF > 0
            ? 1 / (2 * Math.PI * Math.Sqrt(leakageH * inputCapacitanceF)) / ResonanceMargin
            : double.PositiveInfinity;
        foreach (var f in LeakageCandidatesHz)
        {
            if (f <= limitHz && 2 * Math.PI * f * leakageH >= LeakageMinimumQ * shortedResistanceOhm)
            {
                return (f, true);
            }
        }

        var underResonance = LeakageCandidatesHz.Where(f => f <= limitHz).ToArray();
        return (underResonance.Length > 0 ? underResonance[^1] : LeakageCandidatesHz[0], false);
    }
}
