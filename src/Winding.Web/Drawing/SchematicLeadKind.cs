namespace Winding.Web.Drawing;

/// <summary>Which end or tap of a winding a lead brings out.</summary>
public enum SchematicLeadKind
{
    /// <summary>The winding's start (where the phasing dot is).</summary>
    Start,

    /// <summary>A tap, some turns from the start.</summary>
    Tap,

    /// <summary>The winding's finish.</summary>
    Finish,
}
