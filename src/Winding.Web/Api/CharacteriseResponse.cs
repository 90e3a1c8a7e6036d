namespace Winding.Web.Api;

/// <summary>The answer of the characterisation endpoints.</summary>
/// <param name="Shape">Core shape.</param>
/// <param name="EffectiveLengthM">le, m (IEC 60205).</param>
/// <param name="EffectiveAreaM2">Ae, m².</param>
/// <param name="EffectiveVolumeM3">Ve, m³.</param>
/// <param name="AlH">AL = L/N² from the inductance measurement, H per turn² (null without one).</param>
/// <param name="EffectivePermeability">μe = AL·C1/μ0 (null without an inductance measurement).</param>
/// <param name="MuPrime">μs′ at the measurement frequency (null without a resistance or Q).</param>
/// <param name="MuDoublePrime">μs″ estimate at the measurement frequency (null without a resistance or Q).</param>
/// <param name="Permeability">μ′, μ″ from each measured impedance.</param>
/// <param name="Fit">The relaxation-model fit (null with fewer than three usable points).</param>
/// <param name="NearestMaterials">The generic material classes nearest the measured μ.</param>
public sealed record CharacteriseResponse(
    string Shape,
    double EffectiveLengthM,
    double EffectiveAreaM2,
    double EffectiveVolumeM3,
    double? AlH,
    double? EffectivePermeability,
    double? MuPrime,
    double? MuDoublePrime,
    IReadOnlyList<PermeabilityPointResponse> Permeability,
    RelaxationFitResponse? Fit,
    IReadOnlyList<NearestMaterialResponse> NearestMaterials);

/// <summary>One permeability point.</summary>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="Real">μ′.</param>
/// <param name="Imaginary">μ″.</param>
public sealed record PermeabilityPointResponse(double FrequencyHz, double Real, double Imaginary);

/// <summary>A Cole–Cole relaxation fit of the measured permeability.</summary>
/// <param name="Model">Model name.</param>
/// <param name="InitialPermeability">Fitted μi.</param>
/// <param name="RelaxationFrequencyHz">Fitted relaxation frequency, Hz.</param>
/// <param name="Alpha">Fitted Cole–Cole exponent.</param>
/// <param name="RmsRelativeResidual">RMS of the relative residuals.</param>
/// <param name="Converged">Whether the least-squares fit converged.</param>
/// <param name="Permeability">The fitted curve, sampled.</param>
public sealed record RelaxationFitResponse(string Model, double InitialPermeability, double RelaxationFrequencyHz, double Alpha, double RmsRelativeResidual, bool Converged, IReadOnlyList<PermeabilityPointResponse> Permeability);

/// <summary>A nearby material class.</summary>
/// <param name="Id">Material id.</param>
/// <param name="Name">Material name.</param>
/// <param name="InitialPermeability">Its μi.</param>
public sealed record NearestMaterialResponse(string Id, string Name, double InitialPermeability);
