using Winding.Core.Characterisation;
using Winding.Core.Geometry;

namespace Winding.Catalogue.Characterisation;

/// <summary>What a characterisation found.</summary>
/// <param name="Shape">The core shape as understood.</param>
/// <param name="Effective">Its effective parameters.</param>
/// <param name="FromInductance">AL, μe and the μ″ estimate from the inductance measurement (null without one).</param>
/// <param name="MeasuredPermeability">μ′, μ″ from the impedance points (empty without them).</param>
/// <param name="Fit">The relaxation-model fit of those points (null with fewer than three usable points).</param>
/// <param name="NearestClasses">The catalogue's material classes nearest the measured μ.</param>
public sealed record CharacterisationResult(
    CoreShape Shape,
    EffectiveParameters Effective,
    CharacterisedCore? FromInductance,
    IReadOnlyList<MeasuredPermeability> MeasuredPermeability,
    PermeabilityRelaxationFit? Fit,
    IReadOnlyList<MaterialClassMatch> NearestClasses);
