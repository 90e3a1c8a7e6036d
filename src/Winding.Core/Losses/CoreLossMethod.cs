namespace Winding.Core.Losses;

/// <summary>The loss law a <see cref="CoreLoss"/> was computed with.</summary>
public enum CoreLossMethod
{
    /// <summary>Steinmetz for sinusoidal flux, Pv = k·f^α·B̂^β (Steinmetz 1892).</summary>
    Steinmetz,

    /// <summary>Improved generalised Steinmetz equation for piecewise-linear flux (Venkatachalam et al. 2002).</summary>
    ImprovedGeneralisedSteinmetz,
}
