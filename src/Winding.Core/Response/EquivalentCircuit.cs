using System.Numerics;

namespace Winding.Core.Response;

/// <summary>
/// The transformer's equivalent circuit referred to the primary, with an ideal 1:1 transformer removed (classic
/// broadband-transformer circuit; McLyman 2004, Snelling 1988, from memory; physics-sources §9):
/// <code>
/// src ─RS─ in ─┬─ R_series(f) ─ L_lk ─ out ─┬─ RL′
///              ├ C_in                       ├ C_out
///              └ Z_m(f)                     ┘
/// </code>
/// Z_m is the magnetising branch (jωL_m with core loss), R_series the sum of the primary's and the referred secondary's
/// AC resistances, C_in the primary's self-capacitance, C_out the secondary's self-capacitance and the interwinding
/// capacitance referred to the primary, RL′ the load referred to the primary. The source is 1 V.
/// </summary>
/// <param name="SourceResistanceOhm">RS, Ω (≥ 0).</param>
/// <param name="LoadResistanceOhm">RL′, the load referred to the primary, Ω (&gt; 0).</param>
/// <param name="InputCapacitanceF">C_in, F.</param>
/// <param name="OutputCapacitanceF">C_out, F.</param>
/// <param name="LeakageInductanceH">L_lk referred to the primary, H.</param>
/// <param name="MagnetizingImpedanceOhm">Z_m(f), Ω, at a frequency in Hz.</param>
/// <param name="SeriesResistanceOhm">R_series(f), Ω, at a frequency in Hz.</param>
public sealed record EquivalentCircuit(
    double SourceResistanceOhm,
    double LoadResistanceOhm,
    double InputCapacitanceF,
    double OutputCapacitanceF,
    double LeakageInductanceH,
    Func<double, Complex> MagnetizingImpedanceOhm,
    Func<double, double> SeriesResistanceOhm)
{
    /// <summary>
    /// The circuit at one frequency, by nodal analysis of the two nodes (exact for this linear circuit):
    /// Y_in = jωC_in + 1/Z_m, Z_s = R_series + jωL_lk, Y_out = jωC_out + 1/RL′;
    /// Z_in = 1/(Y_in + 1/(Z_s + 1/Y_out)); V_in = Z_in/(RS + Z_in); V_out = V_in/(1 + Z_s·Y_out).
    /// Insertion loss is taken against an ideal lossless transformer of the same ratio between the same source and
    /// load, V_ideal = RL′/(RS + RL′): IL = 20·log10(|V_ideal|/|V_out|) (0 dB for a perfect transformer, whatever the
    /// mismatch). Return loss at the primary: −20·log10|Γ|, Γ = (Z_in − Z_ref)/(Z_in + Z_ref) with Z_ref = RS (RL′ when
    /// RS = 0).
    /// </summary>
    /// <param name="frequencyHz">Frequency, Hz, positive.</param>
    public CircuitPoint At(double frequencyHz)
    {
        var omega = 2 * Math.PI * frequencyHz;
        var zm = MagnetizingImpedanceOhm(frequencyHz);
        var yin = new Complex(0, omega * InputCapacitanceF) + (zm == Complex.Zero ? new Complex(1e300, 0) : Complex.Reciprocal(zm));
        var zs = new Complex(SeriesResistanceOhm(frequencyHz), omega * LeakageInductanceH);
        var yout = new Complex(1 / LoadResistanceOhm, omega * OutputCapacitanceF);
        var zin = Complex.Reciprocal(yin + Complex.Reciprocal(zs + Complex.Reciprocal(yout)));
        var vin = SourceResistanceOhm > 0 ? zin / (SourceResistanceOhm + zin) : Complex.One;
        var vout = vin / (Complex.One + zs * yout);
        var ideal = LoadResistanceOhm / (SourceResistanceOhm + LoadResistanceOhm);
        var insertionLossDb = 20 * Math.Log10(ideal / Math.Max(vout.Magnitude, 1e-300));
        var reference = SourceResistanceOhm > 0 ? SourceResistanceOhm : LoadResistanceOhm;
        var gamma = (zin - reference) / (zin + reference);
        var returnLossDb = -20 * Math.Log10(Math.Max(gamma.Magnitude, 1e-15));
        return new CircuitPoint(frequencyHz, insertionLossDb, returnLossDb, zin, vout);
    }

    /// <summary>This circuit with the magnetising branch scaled by <paramref name="alFactor"/> (AL tolerance) and both
    /// capacitances by <paramref name="capacitanceFactor"/>.</summary>
    public EquivalentCircuit Scaled(double alFactor, double capacitanceFactor)
    {
        var zm = MagnetizingImpedanceOhm;
        return this with
        {
            MagnetizingImpedanceOhm = f => zm(f) * alFactor,
            InputCapacitanceF = InputCapacitanceF * capacitanceFactor,
            OutputCapacitanceF = OutputCapacitanceF * capacitanceFactor,
        };
    }
}
