namespace Winding.Web.Planning;

/// <summary>What a typed core's magnetic behaviour is taken from.</summary>
public enum CoreMaterialBasis
{
    /// <summary>A measured AL of the core alone: the plan carries it as the measured AL (<c>measured.alNh</c>) and a
    /// frequency-independent material whose μi is the μe that AL gives on these dimensions (μe = AL·C1/μ0).</summary>
    MeasuredAl,

    /// <summary>A generic material class from the catalogue (<c>core.materialId</c>).</summary>
    MaterialClass,

    /// <summary>An initial permeability μi typed by the user (<c>core.initialPermeability</c>).</summary>
    Permeability,
}
