using Winding.Core.Quantities;
using Winding.Core.Wire;

namespace Winding.Core.Conductors;

/// <summary>
/// The AC resistance factor F_R = Rac/Rdc of a layered winding of a <see cref="WindingWire"/> at one frequency, and so
/// Rac = F_R·Rdc (sinusoidal current; for other waveforms sum over the harmonics).
/// </summary>
/// <remarks>
/// <para>
/// <b>Solid and hook-up wire</b> (<see cref="AcResistanceMethod.DowellRoundWire"/>): Dowell's method
/// (<see cref="DowellFactor.Average"/>) with the round-wire conversion Δ = (π/4)^(3/4)·(d/δ)·√(d/t)
/// (<see cref="DowellFactor.RoundWireDelta"/>; physics-sources.md §5), d the bare diameter, δ the skin depth of the
/// metal at the temperature. How p and t are taken: p is the number of layers of the winding. Every element in hand is a
/// conductor of its layer: the k elements of one turn lie side by side in the same layer, so they add conductors to the
/// layer, not layers, and t is the centre-to-centre pitch of neighbouring elements (by default the element overall
/// diameter: turns and elements touching). The elements are assumed to share the current equally. The split into
/// <see cref="AcResistanceFactor.SkinFactor"/> (Δ·ς1, Dowell's single layer) and the proximity rest follows Dowell's
/// two terms. Dowell's single layer lies beside a core and is not the isolated wire of <see cref="IsolatedWireSkinEffect"/>.
/// </para>
/// <para>
/// <b>Litz</b> (<see cref="AcResistanceMethod.LitzStrandSkinAndWindingProximity"/>), assuming ideal transposition (every
/// strand carries I/(k·n) and visits every position in the bundle). Included:
/// </para>
/// <list type="number">
/// <item><description>Skin effect of each strand: the exact isolated-wire Rac/Rdc of a strand of diameter d_s
/// (<see cref="IsolatedWireSkinEffect"/>, physics-sources.md §4.2).</description></item>
/// <item><description>Proximity loss of the strands in the winding's field, in its low-frequency form
/// G = π²·(n·p)²·d_s⁶/(192·δ⁴·t²), with n strands per element, p layers and t the element pitch. This is the
/// bundle-level result of C. R. Sullivan, "Optimal choice for number of strands in a litz-wire transformer winding",
/// IEEE Trans. Power Electron. 14(2):283–291, 1999 (from memory): F_R = 1 + (π·ω·μ0·N·n)²·d_s⁶·k/(768·ρ²·b²) with
/// N/b = p/t and k = 1 for one winding section, rewritten with ω·μ0/ρ = 2/δ². It is derived here from the eddy loss of
/// a round conductor in a uniform transverse field, P′ = π·ω²·B̂²·d⁴/(128·ρ) per metre (low frequency), averaged over
/// the mean square of the 1-D winding field, ⟨Ĥ²⟩ = p²·Î²/(3·(k·t)²) for k elements in hand (the result does not
/// depend on k).</description></item>
/// </list>
/// <para>
/// Not included for Litz: (a) the field of a bundle's own current inside that bundle beyond what the 1-D layer field
/// already represents (for one layer of touching bundles it would add up to about 0.15/p² of G, derived here, not from
/// a source); (b) the fall of proximity loss below the low-frequency form once strands are thicker than about one skin
/// depth (<see cref="AcResistanceFactor.SkinDepthRatio"/> above 1): G then overestimates, which is conservative;
/// (c) losses from imperfect transposition (unequal strand currents, bundle-level eddy currents between strand
/// groups); (d) Dowell's treatment of the bundle as a solid conductor, which does not apply to Litz.
/// </para>
/// <para>
/// Validity: 1-D layered field, sinusoidal current, μr = 1 conductor. On a toroid the layers are wedge-shaped and the
/// result is an estimate (physics-sources.md §5).
/// </para>
/// </remarks>
public static class WindingAcResistance
{
    /// <summary>The highest frequency accepted, 1 THz: far above any winding use, and it keeps every result finite.</summary>
    public const double MaximumFrequencyHz = 1e12;

    /// <summary>F_R = Rac/Rdc of a winding (see the class remarks for the methods and how p and t are taken).</summary>
    /// <param name="wire">The winding wire.</param>
    /// <param name="layers">p, the winding's number of layers, at least 1.</param>
    /// <param name="frequencyHz">f in Hz, above 0 and at most <see cref="MaximumFrequencyHz"/>.</param>
    /// <param name="temperatureC">Conductor temperature in °C, finite and giving a positive resistivity.</param>
    /// <param name="elementPitch">Centre-to-centre distance t of neighbouring elements in a layer (the turn pitch of one
    /// element); by default the element overall diameter (touching). At least the strand diameter.</param>
    /// <returns>The factor, its parts and the quantities used.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static AcResistanceFactor Evaluate(WindingWire wire, int layers, double frequencyHz, double temperatureC = 20, Length? elementPitch = null)
    {
        ArgumentNullException.ThrowIfNull(wire);
        ArgumentOutOfRangeException.ThrowIfLessThan(layers, 1);
        if (!double.IsFinite(frequencyHz) || frequencyHz <= 0 || frequencyHz > MaximumFrequencyHz)
        {
            throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "The frequency must be above 0 Hz and at most 1e12 Hz.");
        }

        var pitch = elementPitch ?? wire.ElementOverallDiameter;
        var strandDiameter = wire.StrandDiameter;
        if (pitch < strandDiameter)
        {
            throw new ArgumentOutOfRangeException(nameof(elementPitch), pitch, "The element pitch must be at least the strand diameter.");
        }

        var skinDepth = SkinDepth.FromResistivity(SkinDepth.Resistivity(wire.Metal, temperatureC), frequencyHz);
        var dOverDelta = strandDiameter.Metres / skinDepth.Metres;

        if (wire.Kind == WireKind.Litz)
        {
            var strandSkin = IsolatedWireSkinEffect.ResistanceRatio(IsolatedWireSkinEffect.Argument(strandDiameter, skinDepth));
            var np = (double)wire.StrandsPerElement * layers;
            var dOverT = strandDiameter.Metres / pitch.Metres;
            var proximity = Math.PI * Math.PI / 192 * np * np * Math.Pow(dOverDelta, 4) * dOverT * dOverT;
            return new AcResistanceFactor(
                AcResistanceMethod.LitzStrandSkinAndWindingProximity, strandSkin, proximity, skinDepth, dOverDelta, double.NaN, double.NaN, layers, pitch);
        }

        var delta = DowellFactor.RoundWireDelta(strandDiameter, pitch, skinDepth);
        var skin = DowellFactor.Average(delta, 1);
        var total = DowellFactor.Average(delta, layers);
        return new AcResistanceFactor(
            AcResistanceMethod.DowellRoundWire,
            skin,
            Math.Max(0, total - skin),
            skinDepth,
            dOverDelta,
            delta,
            DowellFactor.Porosity(strandDiameter, pitch),
            layers,
            pitch);
    }
}
