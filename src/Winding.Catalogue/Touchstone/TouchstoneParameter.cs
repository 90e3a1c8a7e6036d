namespace Winding.Catalogue.Touchstone;

/// <summary>The network parameter a Touchstone file holds (option-line token S, Y or Z).</summary>
public enum TouchstoneParameter
{
    /// <summary>S: the reflection coefficient Γ of the one-port against the reference resistance.</summary>
    Scattering,

    /// <summary>Y: admittance, normalised to the reference resistance in version 1 files (y = Y·R).</summary>
    Admittance,

    /// <summary>Z: impedance, normalised to the reference resistance in version 1 files (z = Z/R).</summary>
    Impedance,
}
