namespace Winding.Core.Conductors;

/// <summary>Which branch of <see cref="IsolatedWireSkinEffect"/> produced a value.</summary>
public enum SkinEffectMethod
{
    /// <summary>Small-argument series 1 + x⁴/192 (x below <see cref="IsolatedWireSkinEffect.SmallArgumentLimit"/>).</summary>
    SmallArgumentSeries,

    /// <summary>The exact Kelvin-function solution.</summary>
    KelvinFunctions,

    /// <summary>Large-argument asymptote x/(2√2) + 1/4 + … (x at or above <see cref="IsolatedWireSkinEffect.LargeArgumentLimit"/>).</summary>
    LargeArgumentAsymptote,
}
