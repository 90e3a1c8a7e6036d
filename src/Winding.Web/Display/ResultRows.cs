using System.Globalization;
using Winding.Core.Plans;
using Winding.Core.Windings;

namespace Winding.Web.Display;

/// <summary>Turns an evaluation into the titled, formatted sections the results panel shows.</summary>
public static class ResultRows
{
    /// <summary>
    /// Sections for the core, each winding, the band and the operating point; lengths, areas and wires in
    /// <paramref name="units"/> (electrical figures are SI in both systems).
    /// </summary>
    public static IReadOnlyList<ResultSection> For(PlanEvaluation evaluation, string materialName, double alTolerance, UnitSystem units = UnitSystem.Metric)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        var sections = new List<ResultSection> { Core(evaluation.Core, materialName, alTolerance, units) };
        for (var i = 0; i < evaluation.Windings.Count; i++)
        {
            sections.Add(Winding(evaluation.Windings[i], i, units));
        }

        if (evaluation.TurnsRatio is not null || evaluation.Magnetizing is not null)
        {
            sections.Add(Band(evaluation));
        }

        sections.Add(Parasitics(evaluation));
        if (evaluation.Response is { } response)
        {
            sections.Add(Response(response));
        }

        if (evaluation.Operating is { } point)
        {
            sections.Add(Operating(point));
        }

        return sections;
    }

    private static ResultSection Core(CoreEvaluation core, string materialName, double alTolerance, UnitSystem units) => new("core", "Core", [
        new("shape", "Shape", core.ShapeName + " · " + materialName, "The core's shape and material class."),
        new("al", "AL", EngineeringFormat.Format(core.InductanceFactor.HenriesPerTurnSquared, "H") + "/turn² ± " + Fixed(alTolerance * 100, 0) + " %", "Inductance per turn squared, AL = μ0·μe·Ae/le (IEC 60205), with the material's AL tolerance."),
        new("mue", "Effective permeability μe", Fixed(core.EffectivePermeability, 1), "μi, reduced by an air gap as μi/(1 + μi·g/le) (Snelling 1988)."),
        new("le", "Effective length le", LengthFormat.Dimension(core.Effective.EffectiveLengthM * 1e3, units, 2), "Effective magnetic path length (IEC 60205)."),
        new("ae", "Effective area Ae", LengthFormat.Area(core.Effective.EffectiveAreaM2 * 1e6, units, 2), "Effective cross-section (IEC 60205)."),
        new("ve", "Effective volume Ve", LengthFormat.Volume(core.Effective.EffectiveVolumeM3 * 1e9, units, 0), "Effective volume le·Ae (IEC 60205)."),
        new("window", "Window area", LengthFormat.Area(core.WindowAreaM2 * 1e6, units, 2), "Area the windings pass through."),
    ]);

    private static ResultSection Winding(WindingEvaluation w, int index, UnitSystem units)
    {
        var key = $"w{index}-";
        var rows = new List<ResultRow>
        {
            new(key + "inductance", "Inductance L", EngineeringFormat.Format(w.InductanceH, "H"), "L = AL·N² at low excitation and low frequency."),
            new(key + "fits", "Fit", OutcomeText(w.Fit.Outcome) + " — " + LengthFormat.Prose(w.Fit.Reason, units), "Whether every turn finds room, and how comfortably: " + w.Fit.Method + "."),
            new(key + "turns-per-layer", "Turns per layer", w.Fit.TurnsPerLayer.Count == 0 ? "—" : string.Join(" + ", w.Fit.TurnsPerLayer.Select(t => t.ToString(CultureInfo.InvariantCulture))), "Turns in each layer, innermost first (common practice convention)."),
            new(key + "layers", "Layers", w.Fit.Layers.ToString(CultureInfo.InvariantCulture), "Layers used."),
        };
        if (w.Fit.RemainingHoleDiameter is { } hole)
        {
            rows.Add(new(key + "hole-left", "Hole left", LengthFormat.Dimension(hole.Millimetres, units, 2), "Diameter of the hole left after this winding."));
        }

        if (w.Fit.RemainingWindowHeightM is { } height)
        {
            rows.Add(new(key + "height-left", "Window height left", LengthFormat.Dimension(height * 1e3, units, 2), "Bobbin window height left after this winding."));
        }

        rows.Add(new(key + "wire", "Wire", WireText.Describe(w.Wire, units) + (w.Wire.ElementsInHand > 1 ? $", {w.Wire.ElementsInHand} in hand" : string.Empty), "The wire as the engine understood it."));
        rows.Add(new(key + "fill", "Copper fill", Fixed(w.FillFactor * 100, 1) + " %", "Copper cross-section of this winding over the window area."));
        rows.Add(new(key + "mlt", "Mean turn length", LengthFormat.Dimension(w.Fit.MeanTurnLengthM * 1e3, units, 1), "Perimeter of the core section grown by the build under the turn."));
        rows.Add(new(key + "wire-length", "Wire to cut", LengthFormat.CutLength(w.WireLengthM * 1e3, units), "N·MLT plus the margin, plus two leads."));
        rows.Add(new(key + "rdc", "DC resistance (20 °C)", EngineeringFormat.Format(w.DcResistanceOhm, "Ω"), "ρ·ℓ/A of the length to cut (IEC 60028 copper)."));
        if (w.Electrical is { } e)
        {
            rows.Add(new(key + "rac", "AC resistance (f max)", EngineeringFormat.Format(e.AcResistanceOhm, "Ω") + " (×" + Fixed(e.AcFactor.RacPerRdc, 2) + ")", "Skin and proximity effect at the top of the band: Dowell 1966 with the round-wire porosity, or per strand for Litz."));
            rows.Add(new(key + "skin", "Skin depth (f max)", LengthFormat.SkinDepth(e.SkinDepthM, units) + " · d/δ = " + Fixed(e.AcFactor.SkinDepthRatio, 1), "δ = √(ρ/(π·f·μ0)); conductors much thicker than 2δ waste copper."));
            rows.Add(new(key + "current", "RMS current", EngineeringFormat.Format(e.RmsCurrentA, "A") + (e.CurrentStated ? " (stated)" : " (from drive and load)"), "Stated, or derived from the drive and load through an ideal transformer."));
            rows.Add(new(key + "density", "Current density", LengthFormat.CurrentDensity(e.CurrentDensityAPerM2, units), "RMS current over the copper cross-section; about 4 A/mm² (some 500 circular mils per ampere) is a common limit for small windings (common practice, no source)."));
            rows.Add(new(key + "copper-loss", "Copper loss", EngineeringFormat.Format(e.CopperLossW, "W"), "I²·Rac."));
        }

        return new ResultSection($"winding-{index}", "Winding: " + w.Name, rows);
    }

    private static ResultSection Band(PlanEvaluation evaluation)
    {
        var rows = new List<ResultRow>();
        if (evaluation.TurnsRatio is { } ratio)
        {
            rows.Add(new("turns-ratio", "Turns ratio", "1 : " + ratio.ToString("G4", CultureInfo.InvariantCulture), "Last winding's turns over the first's."));
            rows.Add(new("impedance-ratio", "Impedance ratio", "1 : " + evaluation.ImpedanceRatio!.Value.ToString("G4", CultureInfo.InvariantCulture), "The square of the turns ratio."));
        }

        if (evaluation.Magnetizing is { } m)
        {
            rows.Add(new("magnetizing", "Magnetising inductance (f min)", EngineeringFormat.Format(m.InductanceH, "H"), "The primary's series inductance at the bottom of the band, from μ′(f)."));
            rows.Add(new("reactance", "Reactance (f min)", Fixed(m.ReactanceOhm, 1) + " Ω against " + Fixed(m.ReactanceFactor * m.ImpedanceSeenOhm, 1) + " Ω wanted", $"X = 2π·f·L; the rule X ≥ {m.ReactanceFactor:0.##}·Z with Z = 2·(RS ∥ RL′), which is R when matched (common practice)."));
            rows.Add(new("core-loss-resistance", "Core-loss resistance (f min)", EngineeringFormat.Format(m.SeriesLossResistanceOhm, "Ω") + " in series" + (m.ParallelLossResistanceOhm is { } rp ? " · " + EngineeringFormat.Format(rp, "Ω") + " across" : string.Empty), "ω·L0·μ″: the core's loss as a resistance in series with L, and as a resistance across the winding (IEC 60401-3 notation)."));
            rows.Add(new("turns-needed", "Primary turns for the band", m.PrimaryTurnsNeeded.ToString(CultureInfo.InvariantCulture), "Turns meeting X ≥ k·Z even at the low end of the AL tolerance."));
        }

        return new ResultSection("band", "Band and ratio", rows);
    }

    private static ResultSection Parasitics(PlanEvaluation evaluation)
    {
        var p = evaluation.Parasitics;
        var measured = p.Measured.Count > 0 ? " (measured: " + string.Join(", ", p.Measured) + ")" : string.Empty;
        var rows = new List<ResultRow>();
        if (evaluation.Windings.Count > 1)
        {
            rows.Add(new("leakage", "Leakage inductance", EngineeringFormat.Format(p.LeakageInductanceH, "H"), "Referred to the primary: " + p.LeakageMethod + "."));
            rows.Add(new("interwinding", "Interwinding capacitance", EngineeringFormat.Format(p.InterwindingCapacitanceF, "F"), "Between the first and the last winding: " + p.InterwindingMethod + "."));
        }

        for (var i = 0; i < evaluation.Windings.Count; i++)
        {
            var srf = p.SelfResonancesHz[i] is { } f ? " · resonates at " + EngineeringFormat.Format(f, "Hz") : string.Empty;
            rows.Add(new($"w{i}-self-capacitance", evaluation.Windings[i].Name + ": self-capacitance", EngineeringFormat.Format(p.SelfCapacitancesF[i], "F") + srf, p.SelfCapacitanceMethods[i] + "; self-resonance 1/(2π·√(L·C))."));
        }

        if (p.TransformerSelfResonanceHz is { } transformer)
        {
            rows.Add(new("transformer-srf", "Resonance seen from the primary", EngineeringFormat.Format(transformer, "Hz"), "Magnetising inductance with all shunt capacitance referred to the primary."));
        }

        return new ResultSection("parasitics", "Leakage and capacitance" + measured, rows);
    }

    private static ResultSection Response(ResponseEvaluation r)
    {
        var b = r.Band;
        var t = r.Tolerance;
        return new ResultSection("response", "Frequency response", [
            new("min-loss", "Lowest insertion loss", Fixed(b.MinimumInsertionLossDb, 2) + " dB at " + EngineeringFormat.Format(b.MinimumFrequencyHz, "Hz"), "Against an ideal lossless transformer of the same ratio between the same source and load."),
            new("band-3db", "3 dB band", Edge(b.LowerCutoffHz) + " – " + Edge(b.UpperCutoffHz), "Where the loss is 3 dB worse than its minimum (MathNet Brent root finding on the circuit)."),
            new("band-1db", "1 dB band", Edge(b.Lower1DbHz) + " – " + Edge(b.Upper1DbHz), "Where the loss is 1 dB worse than its minimum."),
            new("band-spread", "3 dB edges with tolerance", Edge(t.LowerCutoffMinHz) + "…" + Edge(t.LowerCutoffMaxHz) + " / " + Edge(t.UpperCutoffMinHz) + "…" + Edge(t.UpperCutoffMaxHz), "The lower and upper 3 dB edges over AL ± its tolerance and capacitances ± 30 %."),
            new("circuit", "Equivalent circuit", string.Join(" · ", r.Elements.Select(e => e.Key + " " + ElementValue(e.Key, e.Value))), "Referred to the primary; frequency-dependent values at " + EngineeringFormat.Format(r.ElementsFrequencyHz, "Hz") + "."),
        ]);
    }

    private static string Edge(double? hz) => hz is { } f ? EngineeringFormat.Format(f, "Hz") : "beyond the sweep";

    private static string ElementValue(string name, double value) => name switch
    {
        ['L', ..] => EngineeringFormat.Format(value, "H"),
        ['C', ..] => EngineeringFormat.Format(value, "F"),
        _ => EngineeringFormat.Format(value, "Ω"),
    };

    private static ResultSection Operating(OperatingPoint p)
    {
        var rows = new List<ResultRow>
        {
            new("flux", "Peak flux density (f min)", Fixed(p.PeakFluxDensityT * 1e3, 2) + " mT", "Faraday's law: B̂ = V/(4.44·f·N·Ae) for a sine; volt-seconds for square and pulse."),
        };
        if (p.SaturationFluxDensityT is { } bsat)
        {
            rows.Add(new("saturation", "Saturation (hot)", Fixed(bsat * 1e3, 0) + " mT · margin " + Fixed(p.SaturationMargin!.Value * 100, 0) + " %", "B_sat of the material at the hot temperature, and 1 − B̂/B_sat."));
        }

        rows.Add(new("core-loss", "Core loss", p.CoreLossW is { } core ? EngineeringFormat.Format(core, "W") + " (" + p.CoreLossMethod + ")" : "unknown (" + p.CoreLossMethod + ")", "Steinmetz or iGSE within the material's fitted range; otherwise the small-signal loss from μ″."));
        rows.Add(new("copper-loss", "Copper loss", EngineeringFormat.Format(p.CopperLossW, "W") + " (DC: " + EngineeringFormat.Format(p.CopperLossDcW, "W") + ")", "Sum of I²·Rac at the top of the band (and with DC resistance)."));
        rows.Add(new("temperature", "Temperature rise", Fixed(p.TemperatureRiseK, 1) + " K → " + Fixed(p.HotTemperatureC, 0) + " °C", "From total loss over the surface (McLyman's surface-dissipation relation; ±30 % or worse)."));
        return new ResultSection("operating", "Operating point", rows);
    }

    private static string OutcomeText(FitOutcome outcome) => outcome switch
    {
        FitOutcome.Fits => "fits",
        FitOutcome.Tight => "tight",
        _ => "does not fit",
    };

    private static string Fixed(double value, int decimals) =>
        value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}
