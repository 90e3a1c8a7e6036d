using System.Text.RegularExpressions;

namespace Winding.Web.Display;

/// <summary>
/// What each plan input means, with where its rule comes from, shown as the field's tooltip. Keyed by the field id;
/// a winding's fields (<c>windings-2-turns</c>) share the definition of their last part (<c>turns</c>), and a typed core's
/// dimensions on the plan page (<c>core-outerDiameter</c>) share the catalogue editor's (<c>edit-outerDiameter</c>).
/// </summary>
public static partial class InputHelp
{
    /// <summary>The sentence every length field's tooltip ends with.</summary>
    public const string Units = "In mm or inches as chosen with mm / inch at the top; a unit typed after the number wins: 0.5 mm, 0.02 in, 20 mil, 0.02\". \"m\" alone is refused (milli or metres?).";

    private static readonly Dictionary<string, string> Definitions = new(StringComparer.Ordinal)
    {
        ["min-frequency"] = "Lowest frequency of the band: the worst case for magnetising reactance and flux density (B = V/(4.44·f·N·Ae) for a sine, Faraday's law). Accepts 1.8 MHz, 1800k, 1.8e6.",
        ["max-frequency"] = "Highest frequency of the band: sets skin and proximity loss (Dowell 1966) and is checked against leakage and self-resonance.",
        ["source-resistance"] = "Resistance of whatever drives the primary, Ω (0 for a stiff voltage source). With the load it sets the impedance the magnetising reactance works against, 2·(RS ∥ RL′).",
        ["load-resistance"] = "Resistance across the last winding, Ω; referred to the primary by the square of the turns ratio (ideal-transformer relation).",
        ["drive-voltage"] = "RMS voltage across the primary at the operating point; sets flux density, core loss and currents.",
        ["ambient"] = "Air temperature around the core, °C; the estimated temperature rise is added to it.",
        ["duty-cycle"] = "Fraction of each period the pulse is on (0 … 1); the volt-seconds of the longest on-time set the peak flux.",
        ["turns"] = "Whole turns through the core. On a ring core each pass through the hole is one turn (common practice, no source).",
        ["conductor"] = "Bare copper diameter as on the spool label (IEC 60317 nominal for a metric wire; ASTM B258 for AWG, e.g. AWG 24 = 0.0201 in). Accepts 0.4 or 0,4. " + Units,
        ["overall"] = "Diameter over the enamel or insulation: what sets how many turns fit per layer. Empty: the IEC 60317-0-1 grade 1 build is assumed. " + Units,
        ["in-hand"] = "Identical wires wound side by side as one turn (parallel strands): more copper area, same turns. Empty: 1.",
        ["current"] = "RMS current in this winding, A; empty to derive it from the drive and load (first and last winding).",
        ["sector-start"] = "Where this winding's sector begins, degrees around a ring core.",
        ["sector-end"] = "Where this winding's sector ends, degrees around a ring core.",
        ["wrap-thickness"] = "Total thickness of the insulation wrapped over this winding; it adds distance (less capacitance, more leakage). " + Units,
        ["measure-od"] = "Outer diameter of the core, measured with a caliper. " + Units,
        ["measure-id"] = "Inner diameter of a toroid, or the bore of a sleeve, measured with a caliper. " + Units,
        ["measure-length"] = "Height of a toroid, or length of a sleeve along its bore, measured with a caliper. " + Units,
        ["measure-gap"] = "Split sleeves: the two faces' residual gaps added together. " + Units,
        ["edit-outerDiameter"] = "Outer diameter of the ring or sleeve (IEC 60205 dimension). " + Units,
        ["edit-innerDiameter"] = "Inner diameter of the ring, or bore of the sleeve. " + Units,
        ["edit-height"] = "Height of the ring, or of a two-hole core. " + Units,
        ["edit-coatingThickness"] = "Thickness of the ring's coating (paint or parylene); it narrows the hole. " + Units,
        ["edit-length"] = "Length of the sleeve or two-hole core along its holes. " + Units,
        ["edit-residualGap"] = "Split sleeves: both faces' residual gaps together; empty or 0 for a solid sleeve. " + Units,
        ["edit-holeDiameter"] = "Diameter of each hole of a two-hole core. " + Units,
        ["edit-holeSpacing"] = "Distance between the centres of the two holes. " + Units,
        ["edit-width"] = "Width of a two-hole core across both holes. " + Units,
        ["edit-windowBreadth"] = "Bobbin window breadth along the leg: the room for the turns of one layer. " + Units,
        ["edit-windowHeight"] = "Bobbin window height from the leg outwards: the room for the layers. " + Units,
        ["edit-legDiameter"] = "Diameter of a round centre leg. " + Units,
        ["edit-legWidth"] = "Width of a rectangular centre leg. " + Units,
        ["edit-legDepth"] = "Depth of a rectangular centre leg. " + Units,
        ["edit-bobbinWall"] = "Thickness of the bobbin wall between the leg and the first layer. " + Units,
        ["taps"] = "Turn counts at which a tap is brought out, counted from the winding's start, separated by commas.",
        ["wire-kind"] = "How the wire is described: a wire from the built-in table, a metric enamelled size and grade (IEC 60317), an AWG size and film build (ASTM B258 diameters, NEMA MW 1000 builds), a Litz bundle, hook-up wire with a thick insulation, or diameters measured with a micrometer.",
        ["metric-size"] = "Nominal bare diameter of metric enamelled wire, one of the IEC 60317-0-1 sizes (e.g. 0.50, 0.56, 0.63 mm); its overall diameter comes from that standard's table for the grade. " + Units,
        ["grade"] = "Enamel grade of metric wire per IEC 60317-0-1: grade 1 has the thinnest film, grade 3 the thickest (more voltage between turns, fewer turns per layer).",
        ["awg"] = "American Wire Gauge size from 10 to 44; the bare diameter follows ASTM B258 (e.g. AWG 24 = 0.0201 in).",
        ["build"] = "Film build of AWG magnet wire (NEMA MW 1000): single, or heavy with about twice the film.",
        ["litz-strands"] = "Number of insulated strands in the Litz bundle (at least 2). The strands share the current, so each one's skin effect counts, not the bundle's (Sullivan 1999).",
        ["litz-strand"] = "Bare diameter of one strand of the Litz bundle, as on its label (e.g. 0.1 mm). " + Units,
        ["litz-bundle"] = "Overall diameter of the Litz bundle over its serving, measured with a micrometer: what sets how many turns fit per layer. " + Units,
        ["hookup-conductor"] = "Diameter of the hook-up wire's conductor (the bare copper, or the diameter of equal area for a stranded conductor). " + Units,
        ["hookup-insulation"] = "Radial thickness of the hook-up wire's insulation (PVC, PTFE, silicone): (overall diameter − conductor diameter) / 2. " + Units,
        ["metal"] = "Conductor metal: copper (IEC 60028, 1/58 Ω·mm²/m at 20 °C) or aluminium (61 % IACS, about 1.6 times the resistance of copper of the same size).",
        ["core-shape"] = "Shape of the typed core: a ring (toroid), a sleeve (tube, solid or split clamp-on), a two-hole core, or a bobbin core with entered effective parameters.",
        ["core-family"] = "Family of a bobbin core (E, pot, RM-like or other); it only names the core.",
        ["core-effective-area"] = "Effective cross-section Ae in mm² from the core's data (IEC 60205); a bobbin core needs it, a two-hole core may override its estimate.",
        ["core-effective-length"] = "Effective magnetic path length le from the core's data (IEC 60205), with the area. " + Units,
        ["core-datasheet-al"] = "AL of the bobbin core from its data, nH per turn² (L = AL·N²); empty to compute it from μi and Ae/le.",
        ["core-material-basis"] = "What the core's magnetic behaviour is taken from: an AL measured on this very core (test turns, AL = L/N², IEC 62044-2), a generic material class from the catalogue, or an initial permeability μi you know.",
        ["core-material"] = "A generic material class from the catalogue: its μ′, μ″ against frequency, loss and saturation are used.",
        ["core-mu"] = "Initial relative permeability μi of the core material at low excitation (IEC 60401-3 notation); a frequency-independent material is assumed.",
        ["core-measured-al"] = "AL measured on this core, nH per turn²: wind a few turns spread round it, measure L at a low level well below the winding's resonance, AL = L/N² (IEC 62044-2). Given, it replaces the computed AL everywhere. A plain number is nH; 0.12 µH is understood.",
        ["core-stack"] = "Identical cores stacked side by side and wound as one (area and AL add up); empty for one core.",
    };

    /// <summary>The definition for the field <paramref name="id"/>, or null when there is none.</summary>
    public static string? For(string? id)
    {
        if (string.IsNullOrEmpty(id))
        {
            return null;
        }

        return Definitions.TryGetValue(id, out var text) ? text
            : WindingField().Match(id) is { Success: true } m && Definitions.TryGetValue(m.Groups[1].Value, out var shared) ? shared
            : id.StartsWith("core-", StringComparison.Ordinal) && Definitions.TryGetValue("edit-" + id["core-".Length..], out var dimension) ? dimension
            : null;
    }

    [GeneratedRegex(@"^windings-\d+-(.+)$", RegexOptions.CultureInvariant)]
    private static partial Regex WindingField();
}
