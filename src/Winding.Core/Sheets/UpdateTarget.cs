namespace Winding.Core.Sheets;

/// <summary>What a suggested update changes.</summary>
public enum UpdateTarget
{
    /// <summary>The measured AL of the wound core (the plan's <c>measured.alNh</c>; per single core for the catalogue).</summary>
    CoreAl,

    /// <summary>The plan's measured leakage inductance (<c>measured.leakageInductanceH</c>).</summary>
    LeakageInductance,

    /// <summary>A winding's measured self-capacitance (<c>measured.selfCapacitanceF[i]</c>).</summary>
    SelfCapacitance,
}
