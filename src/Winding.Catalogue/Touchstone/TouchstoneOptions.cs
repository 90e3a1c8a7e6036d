namespace Winding.Catalogue.Touchstone;

/// <summary>
/// The settings of a Touchstone version 1 option line <c># &lt;unit&gt; &lt;parameter&gt; &lt;format&gt; R &lt;n&gt;</c>; any item left
/// out takes its default, GHz S MA R 50 (Touchstone File Format Specification, version 1.1, EIA/IBIS Open Forum 2002,
/// from memory).
/// </summary>
/// <param name="FrequencyUnit">Unit of the frequency column.</param>
/// <param name="Parameter">S, Y or Z.</param>
/// <param name="Format">MA, DB or RI.</param>
/// <param name="ReferenceResistanceOhm">Reference resistance R, Ω, positive.</param>
public sealed record TouchstoneOptions(
    TouchstoneFrequencyUnit FrequencyUnit, TouchstoneParameter Parameter, TouchstoneDataFormat Format, double ReferenceResistanceOhm)
{
    /// <summary>The defaults of the specification: GHz, S, MA, R 50 Ω.</summary>
    public static TouchstoneOptions Default { get; } =
        new(TouchstoneFrequencyUnit.GHz, TouchstoneParameter.Scattering, TouchstoneDataFormat.MagnitudeAngle, 50);

    /// <summary>Hz per unit of the frequency column.</summary>
    public double HertzPerUnit => FrequencyUnit switch
    {
        TouchstoneFrequencyUnit.Hz => 1,
        TouchstoneFrequencyUnit.KHz => 1e3,
        TouchstoneFrequencyUnit.MHz => 1e6,
        _ => 1e9,
    };
}
