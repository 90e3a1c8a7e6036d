using System.Globalization;
using Winding.Core.Conductors;
using Winding.Core.Geometry;
using Winding.Core.Losses;
using Winding.Core.Magnetics;
using Winding.Core.Quantities;
using Winding.Core.Thermal;
using Winding.Core.Windings;

namespace Winding.Core.Plans;

/// <summary>
/// The plan at its operating conditions: the primary's magnetising inductance and the reactance rule at f_min, each
/// winding's current, AC resistance (f_max) and current density, the flux at f_min (worst case for flux), core loss,
/// copper loss, temperature rise, and the warnings that follow.
/// <list type="bullet">
/// <item>Currents (ideal transformer, common practice): the last winding carries V·n/R_L with n = N_last/N_first; the
/// primary carries √((V/R_L′)² + I_m²), R_L′ = R_L/n² and I_m = V/X_m(f_min); windings between carry only a stated
/// current.</item>
/// <item>Core loss: Steinmetz (sine) or iGSE (square, pulse) when the material has Steinmetz parameters and the point lies
/// in their fitted range; otherwise, for a tabulated material, the small-signal loss V²/R_p(f) of the primary's parallel
/// loss resistance from μ″ (IEC 60401-3 notation; physics-sources §2.2), the largest over the band.</item>
/// <item>Temperature rise: <see cref="TemperatureRise.Estimate"/> over the wound core's surface.</item>
/// </list>
/// </summary>
public static class OperatingAnalysis
{
    /// <summary>B̂/B_sat above which the core is called near saturation (common practice, no source).</summary>
    public const double NearSaturationShare = 0.7;

    /// <summary>Conductor diameter over skin depth above which a wire is called too thick (common practice).</summary>
    public const double MaximumSkinDepthRatio = 2;

    /// <summary>Current density above which a winding is called hot-running (4 A/mm², common practice, no source).</summary>
    public const double CurrentDensityLimitAPerM2 = 4e6;

    /// <summary>Temperature above which a surface is a burn risk to the touch (≈ 60–70 °C; common practice, no source).</summary>
    public const double TouchTemperatureC = 70;

    /// <summary>Insulation class B limit for enamelled wire and tape, °C (IEC 60085 thermal classes; from memory).</summary>
    public const double InsulationLimitC = 130;

    /// <summary>RMS voltage above the extra-low-voltage band for AC (50 V; IEC 61140 / IEC 60449 voltage bands).</summary>
    public const double ExtraLowVoltageAcRms = 50;

    /// <summary>Ripple-free DC voltage above the extra-low-voltage band (120 V; IEC 61140 / IEC 60449 voltage bands).</summary>
    public const double ExtraLowVoltageDc = 120;

    /// <summary>Power above which RF burns and exposure deserve a caution (10 W; common practice, no source).</summary>
    public const double HighPowerW = 10;

    /// <summary>Points across the band for the largest small-signal core loss.</summary>
    private const int BandSamples = 41;

    /// <summary>Analyses <paramref name="plan"/> at its operating conditions.</summary>
    /// <param name="plan">The plan; must carry operating conditions.</param>
    /// <param name="fits">The windings' fits in order.</param>
    /// <param name="dcResistancesOhm">Each winding's DC resistance of the length to cut at 20 °C.</param>
    /// <param name="warnings">Warnings are added here.</param>
    public static (MagnetizingBranch Magnetizing, OperatingPoint Point, IReadOnlyList<WindingElectrical> Windings) Analyse(
        TransformerPlan plan, IReadOnlyList<WindingFit> fits, IReadOnlyList<double> dcResistancesOhm, List<PlanWarning> warnings)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(fits);
        ArgumentNullException.ThrowIfNull(dcResistancesOhm);
        ArgumentNullException.ThrowIfNull(warnings);
        var op = plan.Operating ?? throw new ArgumentException("The plan has no operating conditions.", nameof(plan));
        var core = plan.Core;
        var shape = core.WoundGeometry;
        var effective = shape.EffectiveParameters();
        var material = core.Material;
        var primary = plan.Windings[0];
        var last = plan.Windings[^1];
        var ambientC = op.AmbientTemperatureC;

        // Magnetising branch at f_min.
        var (muPrime, muDoublePrime, extrapolated) = core.PermeabilityAt(op.MinFrequencyHz);
        var magnetizing = WindingImpedance.Calculate(primary.Turns, effective, op.MinFrequencyHz, muPrime, muDoublePrime);
        var n = (double)last.Turns / primary.Turns;
        var reflectedLoadOhm = plan.Windings.Count > 1 ? op.LoadResistanceOhm / (n * n) : op.LoadResistanceOhm;
        var seenOhm = op.SourceResistanceOhm > 0
            ? 2 * op.SourceResistanceOhm * reflectedLoadOhm / (op.SourceResistanceOhm + reflectedLoadOhm)
            : reflectedLoadOhm;
        var alAtFmin = InductanceFactor.FromHenriesPerTurnSquared(PhysicalConstants.VacuumPermeabilityHPerM * muPrime / effective.CoreFactorC1PerM);
        var turnsNeeded = TurnsSolver.ForReactance(alAtFmin, op.MinFrequencyHz, seenOhm, op.ReactanceFactor, material.AlTolerance);
        var branch = new MagnetizingBranch(op.MinFrequencyHz, magnetizing.SeriesInductanceH, magnetizing.SeriesReactanceOhm, magnetizing.SeriesResistanceOhm, magnetizing.ParallelResistanceOhm, seenOhm, op.ReactanceFactor, turnsNeeded, extrapolated);

        // Currents and windings at f_max.
        var magnetizingCurrentA = op.DriveVoltageRms / Math.Max(magnetizing.MagnitudeOhm, 1e-12);
        var electrical = new List<WindingElectrical>(plan.Windings.Count);
        double copperAcW = 0;
        double copperDcW = 0;
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var spec = plan.Windings[i];
            var stated = spec.RmsCurrentA is not null;
            double currentA;
            if (spec.RmsCurrentA is { } given)
            {
                currentA = given;
            }
            else if (i == 0)
            {
                currentA = plan.Windings.Count > 1
                    ? Math.Sqrt(Math.Pow(op.DriveVoltageRms / reflectedLoadOhm, 2) + magnetizingCurrentA * magnetizingCurrentA)
                    : op.DriveVoltageRms / Math.Max(magnetizing.MagnitudeOhm, 1e-12);
            }
            else if (i == plan.Windings.Count - 1)
            {
                currentA = op.DriveVoltageRms * n / op.LoadResistanceOhm;
            }
            else
            {
                currentA = 0;
            }

            var factor = WindingAcResistance.Evaluate(spec.Wire, Math.Max(1, fits[i].Layers), op.MaxFrequencyHz, ambientC);
            var rdcAmbientOhm = dcResistancesOhm[i] * spec.Wire.Metal.ResistivityOhmM(ambientC) / spec.Wire.Metal.Resistivity20OhmM;
            var racOhm = factor.AcResistanceOhm(rdcAmbientOhm);
            var lossW = currentA * currentA * racOhm;
            copperAcW += lossW;
            copperDcW += currentA * currentA * rdcAmbientOhm;
            var density = currentA / spec.Wire.ConductorAreaM2;
            var voltage = op.DriveVoltageRms * spec.Turns / primary.Turns;
            electrical.Add(new WindingElectrical(racOhm, factor, factor.SkinDepth.Metres, currentA, stated, density, lossW, voltage));

            if (factor.SkinDepthRatio > MaximumSkinDepthRatio)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.WireThickerThanSkinDepth, WarningSeverity.Caution, $"windings[{i}].wire",
                    FrequencyText.Text($"Winding '{spec.Name}': each conductor is {factor.SkinDepthRatio:0.#} skin depths thick at {FrequencyText.Hz(op.MaxFrequencyHz)} (δ = {factor.SkinDepth.Millimetres:0.###} mm); above about 2 the extra copper carries little current. Consider several thinner strands in hand or Litz.")));
            }

            if (density > CurrentDensityLimitAPerM2)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.CurrentDensityHigh, WarningSeverity.Caution, $"windings[{i}].wire",
                    FrequencyText.Text($"Winding '{spec.Name}' carries {density / 1e6:0.#} A/mm² ({currentA:0.###} A); above about 4 A/mm² a small naturally cooled winding runs hot. Use thicker wire or more strands.")));
            }
        }

        // Flux at f_min and core loss.
        var flux = PeakFluxDensity.FromRmsVoltage(op.Waveform, op.DriveVoltageRms, op.MinFrequencyHz, primary.Turns, effective.EffectiveAreaM2);
        double? coreLossW = null;
        var coreLossMethod = "no loss data for this material";
        var outsideRange = false;
        CoreLoss? steinmetzLoss = material.Steinmetz is { } steinmetz ? CoreLoss.Calculate(steinmetz, flux, effective.EffectiveVolumeM3) : null;
        if (steinmetzLoss is { IsOutsideFittedRange: false })
        {
            coreLossW = steinmetzLoss.PowerW;
            coreLossMethod = steinmetzLoss.Method == CoreLossMethod.Steinmetz ? "Steinmetz equation" : "improved generalised Steinmetz equation (iGSE)";
        }
        else if (material.HasPermeabilityTable)
        {
            coreLossW = SmallSignalCoreLossW(plan, op, effective);
            coreLossMethod = "small-signal loss from μ″ (largest over the band)";
        }
        else if (steinmetzLoss is not null)
        {
            coreLossW = steinmetzLoss.PowerW;
            outsideRange = true;
            coreLossMethod = "Steinmetz equation, outside its fitted range";
        }

        // Temperature.
        var surfaceM2 = SurfaceAreaM2(shape, fits);
        var totalW = (coreLossW ?? 0) + copperAcW;
        var rise = totalW > 0 ? TemperatureRise.Estimate(totalW, surfaceM2).RiseK : 0;
        var hotC = ambientC + rise;
        var saturation = material.Saturation?.AtTemperatureT(hotC);
        double? margin = saturation is { } bsat ? 1 - flux.AmplitudeT / bsat : null;
        var point = new OperatingPoint(op.MinFrequencyHz, flux.AmplitudeT, saturation, margin, coreLossW, coreLossMethod, outsideRange, copperAcW, copperDcW, surfaceM2, rise, hotC);

        AddOperatingWarnings(plan, branch, point, electrical, warnings);
        return (branch, point, electrical);
    }

    private static double SmallSignalCoreLossW(TransformerPlan plan, OperatingConditions op, EffectiveParameters effective)
    {
        var primaryTurns = plan.Windings[0].Turns;
        var logStart = Math.Log10(op.MinFrequencyHz);
        var logStop = Math.Log10(op.MaxFrequencyHz);
        var worstW = 0.0;
        for (var k = 0; k < BandSamples; k++)
        {
            var f = Math.Pow(10, logStart + (logStop - logStart) * k / (BandSamples - 1));
            var (muPrime, muDoublePrime, _) = plan.Core.PermeabilityAt(f);
            if (muDoublePrime <= 0)
            {
                continue;
            }

            var impedance = WindingImpedance.Calculate(primaryTurns, effective, f, muPrime, muDoublePrime);
            if (impedance.ParallelResistanceOhm is { } rp && rp > 0)
            {
                worstW = Math.Max(worstW, op.DriveVoltageRms * op.DriveVoltageRms / rp);
            }
        }

        return worstW;
    }

    private static double SurfaceAreaM2(CoreShape shape, IReadOnlyList<WindingFit> fits)
    {
        var buildM = fits.Count == 0 ? 0 : fits.Max(f => f.BuildBelowM + f.BuildThicknessM);
        ToroidCore? ring = shape switch
        {
            ToroidCore toroid => toroid,
            SleeveCore sleeve => sleeve.Ring,
            _ => null,
        };
        if (ring is null)
        {
            return shape.SurfaceAreaM2;
        }

        var limitM = ring.InnerDiameter.Metres / 2 * 0.999;
        return WoundToroidSurfaceArea.AreaM2(ring, Length.FromMetres(Math.Min(buildM, limitM)));
    }

    private static void AddOperatingWarnings(TransformerPlan plan, MagnetizingBranch branch, OperatingPoint point, List<WindingElectrical> windings, List<PlanWarning> warnings)
    {
        var op = plan.Operating!;
        var material = plan.Core.Material;
        var needed = branch.ReactanceFactor * branch.ImpedanceSeenOhm;
        if (branch.ReactanceOhm < needed)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.LowReactance, branch.ReactanceOhm < branch.ImpedanceSeenOhm ? WarningSeverity.Error : WarningSeverity.Caution, "windings[0].turns",
                FrequencyText.Text($"Too little reactance at {FrequencyText.Hz(op.MinFrequencyHz)}: the primary's {branch.ReactanceOhm:0.#} Ω is under {branch.ReactanceFactor:0.##} × {branch.ImpedanceSeenOhm:0.#} Ω = {needed:0.#} Ω, so the bottom of the band is lost. About {branch.PrimaryTurnsNeeded} primary turns meet it even at the low end of the AL tolerance.")));
        }
        else if (plan.Windings[0].Turns < branch.PrimaryTurnsNeeded)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.LowReactance, WarningSeverity.Info, "windings[0].turns",
                FrequencyText.Text($"The primary meets X ≥ {branch.ReactanceFactor:0.##}·Z at {FrequencyText.Hz(op.MinFrequencyHz)} with the nominal AL, but not at the low end of its ±{material.AlTolerance * 100:0} % tolerance; {branch.PrimaryTurnsNeeded} turns would.")));
        }

        if (branch.PermeabilityExtrapolated)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.PermeabilityExtrapolated, WarningSeverity.Info, "operating.minFrequencyHz",
                FrequencyText.Text($"{FrequencyText.Hz(op.MinFrequencyHz)} lies outside the material's permeability table; its end value was used.")));
        }

        if (point.SaturationFluxDensityT is { } bsat)
        {
            if (point.PeakFluxDensityT >= bsat)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.FluxAboveLimit, WarningSeverity.Error, "operating.driveVoltageRms",
                    FrequencyText.Text($"The core saturates: B̂ = {point.PeakFluxDensityT * 1e3:0.#} mT at {FrequencyText.Hz(point.FluxFrequencyHz)} reaches B_sat = {bsat * 1e3:0} mT at {point.HotTemperatureC:0} °C. Add turns, use a larger core or lower the drive.")));
            }
            else if (point.PeakFluxDensityT >= NearSaturationShare * bsat)
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.NearSaturation, WarningSeverity.Caution, "operating.driveVoltageRms",
                    FrequencyText.Text($"Near saturation: B̂ = {point.PeakFluxDensityT * 1e3:0.#} mT is {point.PeakFluxDensityT / bsat * 100:0} % of B_sat ({bsat * 1e3:0} mT at {point.HotTemperatureC:0} °C).")));
            }
        }
        else
        {
            warnings.Add(new PlanWarning(
                WarningCodes.NoSaturationData, WarningSeverity.Info, "core.materialId",
                "The material has no saturation flux density, so the margin to saturation is unknown."));
        }

        if (point.CoreLossW is null)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.NoLossData, WarningSeverity.Info, "core.materialId",
                "The material has neither Steinmetz parameters nor a μ″ table, so core loss is not included in the temperature rise."));
        }
        else if (point.CoreLossOutsideFittedRange)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.SteinmetzOutOfRange, WarningSeverity.Info, "operating",
                "Core loss used the Steinmetz parameters outside the frequency or flux range they were fitted over; treat it as a rough guide."));
        }

        var hotLimitC = Math.Min(InsulationLimitC, (material.CurieTemperatureC ?? double.PositiveInfinity) - 20);
        if (point.HotTemperatureC >= hotLimitC)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.Hot, WarningSeverity.Error, "operating",
                FrequencyText.Text($"Too hot: about {point.HotTemperatureC:0} °C ({point.TemperatureRiseK:0} K rise from {point.TotalLossW:0.###} W), at or above {hotLimitC:0} °C (insulation class or 20 K below the Curie temperature). Reduce the loss or use a larger core.")));
        }
        else if (point.HotTemperatureC > TouchTemperatureC)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.Hot, WarningSeverity.Caution, "operating",
                FrequencyText.Text($"Hot: about {point.HotTemperatureC:0} °C ({point.TemperatureRiseK:0} K rise from {point.TotalLossW:0.###} W). Above about {TouchTemperatureC:0} °C a surface burns to the touch; keep it guarded and ventilated.")));
        }

        // A measured AL replaces the material's spread (the bench's own accuracy applies instead).
        if (material.AlTolerance >= 0.2 && plan.Measured.Al is null)
        {
            warnings.Add(new PlanWarning(
                WarningCodes.WideAlTolerance, WarningSeverity.Info, "core",
                FrequencyText.Text($"AL has a tolerance of ±{material.AlTolerance * 100:0} %: every inductance may be that far off. Measure the finished winding.")));
        }

        var pulse = op.Waveform.Shape == WaveformShape.Pulse;
        for (var i = 0; i < windings.Count; i++)
        {
            var volts = windings[i].VoltageRms;
            var peak = pulse ? volts / Math.Sqrt(op.Waveform.DutyCycle) : volts;
            if ((!pulse && volts > ExtraLowVoltageAcRms) || (pulse && peak > ExtraLowVoltageDc))
            {
                warnings.Add(new PlanWarning(
                    WarningCodes.AboveExtraLowVoltage, WarningSeverity.Caution, $"windings[{i}]",
                    FrequencyText.Text($"Winding '{plan.Windings[i].Name}' works at about {(pulse ? peak : volts):0} V{(pulse ? " peak" : " RMS")}, above the extra-low-voltage band ({(pulse ? "120 V ripple-free DC" : "50 V AC")}). Insulation, creepage and isolation must follow the applicable safety standard and your local codes; defer to licensed practice.")));
            }
        }

        var powerW = op.DriveVoltageRms * op.DriveVoltageRms / Math.Max(branch.ImpedanceSeenOhm, 1e-9);
        if (powerW > HighPowerW && op.MaxFrequencyHz >= 100e3)
        {
            // A sine at these frequencies is a radio signal (burns, exposure near antennas, licence conditions); a square
            // or pulse drive is a switching converter, where the same power means stored energy and hot parts instead.
            var message = op.Waveform.Shape == WaveformShape.Sine
                ? FrequencyText.Text($"About {powerW:0} W of RF passes through this transformer: RF burns are possible and exposure limits apply near antennas. Follow your licence conditions and local rules.")
                : FrequencyText.Text($"About {powerW:0} W is switched through this transformer: keep the converter enclosed while it runs, let its capacitors discharge and its parts cool before touching them, and follow the safety standard of the equipment and your local codes.");
            warnings.Add(new PlanWarning(WarningCodes.HighPower, WarningSeverity.Caution, "operating.driveVoltageRms", message));
        }
    }

}
