namespace Winding.Core.Plans;

/// <summary>The stable codes of plan warnings. Clients may rely on these strings.</summary>
public static class WarningCodes
{
    /// <summary>Not every turn of a winding finds room on the core.</summary>
    public const string WireDoesNotFit = "wire-does-not-fit";

    /// <summary>Every turn finds room but hand winding will be hard.</summary>
    public const string FitsButTight = "fits-but-tight";

    /// <summary>The wire's overall diameter was not given; the standard enamel build was assumed.</summary>
    public const string OverallDiameterAssumed = "overall-diameter-assumed";

    /// <summary>The primary's reactance at f_min is under k times the impedance it works at.</summary>
    public const string LowReactance = "low-reactance";

    /// <summary>The peak flux density reaches saturation.</summary>
    public const string FluxAboveLimit = "flux-above-limit";

    /// <summary>The peak flux density is near saturation.</summary>
    public const string NearSaturation = "near-saturation";

    /// <summary>The wound core runs hot.</summary>
    public const string Hot = "hot";

    /// <summary>A conductor is thicker than two skin depths at f_max.</summary>
    public const string WireThickerThanSkinDepth = "wire-thicker-than-skin-depth";

    /// <summary>A winding's current density is high.</summary>
    public const string CurrentDensityHigh = "current-density-high";

    /// <summary>The AL tolerance is wide (±20 % or more).</summary>
    public const string WideAlTolerance = "wide-al-tolerance";

    /// <summary>A winding works above the extra-low-voltage band: safety standards apply.</summary>
    public const string AboveExtraLowVoltage = "above-extra-low-voltage";

    /// <summary>Enough RF power for burns and exposure limits to matter.</summary>
    public const string HighPower = "high-power";

    /// <summary>A frequency lies outside the material's permeability table.</summary>
    public const string PermeabilityExtrapolated = "permeability-extrapolated";

    /// <summary>The material has no saturation data.</summary>
    public const string NoSaturationData = "no-saturation-data";

    /// <summary>The material has no loss data.</summary>
    public const string NoLossData = "no-loss-data";

    /// <summary>Steinmetz parameters were used outside their fitted range.</summary>
    public const string SteinmetzOutOfRange = "steinmetz-out-of-range";

    /// <summary>A 1 dB or 3 dB edge of the response lies inside the requested band.</summary>
    public const string BandEdgeInsideBand = "band-edge-inside-band";

    /// <summary>A self-resonance lies inside the band.</summary>
    public const string SelfResonanceInBand = "self-resonance-in-band";

    /// <summary>The return loss at the primary is worse than the limit somewhere in the band.</summary>
    public const string PoorReturnLoss = "poor-return-loss";
}
