namespace Winding.Catalogue.Entries;

/// <summary>Effective parameters entered from a datasheet or a measurement (JSON: <c>effective</c>).</summary>
public sealed class EffectiveParametersDocument
{
    /// <summary>Effective area Ae, mm².</summary>
    public double? AreaMm2 { get; set; }

    /// <summary>Effective length le, mm.</summary>
    public double? LengthMm { get; set; }
}
