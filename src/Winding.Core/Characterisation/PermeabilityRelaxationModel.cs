namespace Winding.Core.Characterisation;

/// <summary>The relaxation model fitted to a measured complex-permeability spectrum (<see cref="RelaxationPermeability"/>).</summary>
public enum PermeabilityRelaxationModel
{
    /// <summary>Single-pole (Debye-type) relaxation, μ = μ∞ + (μi − μ∞)/(1 + j·f/f_r): fits μi and f_r.</summary>
    Debye,

    /// <summary>Cole–Cole relaxation, μ = μ∞ + (μi − μ∞)/(1 + (j·f/f_r)^(1−α)): fits μi, f_r and α.</summary>
    ColeCole,
}
