using System.Globalization;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc;
using Winding.Catalogue.Characterisation;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Touchstone;
using Winding.Catalogue.Validation;
using Winding.Web.Hosting;

namespace Winding.Web.Api;

/// <summary>Characterisation of salvaged cores: <c>POST /api/v1/characterise</c> and <c>/characterise/touchstone</c>.</summary>
public static class CharacteriseApi
{
    /// <summary>Largest Touchstone upload, bytes.</summary>
    public const long MaximumUploadBytes = 2 * 1024 * 1024;

    /// <summary>Maps the endpoints.</summary>
    public static IEndpointRouteBuilder MapCharacteriseApi(this IEndpointRouteBuilder endpoints)
    {
        var v1 = endpoints.MapGroup("/api/v1/characterise").WithTags("v1").DisableAntiforgery();
        v1.MapPost(string.Empty, CharacteriseAsync)
            .WithName("Characterise")
            .WithSummary("Characterise a salvaged core from a test winding")
            .WithDescription("Core dimensions (mm) and a test winding's measured inductance at a frequency (optionally with series resistance or Q), and/or measured impedances → effective parameters, AL, μe, μ″, a Cole–Cole fit of μ′(f), μ″(f) and the nearest generic material classes.")
            .Accepts<CharacteriseDocument>("application/json")
            .Produces<CharacteriseResponse>(StatusCodes.Status200OK, "application/json")
            .ProducesValidationProblem()
            .WithMetadata(new RequestSizeLimitAttribute(WindingApi.MaximumBodyBytes));
        v1.MapPost("/touchstone", TouchstoneAsync)
            .WithName("CharacteriseTouchstone")
            .WithSummary("Characterise a salvaged core from a Touchstone .s1p file of its test winding")
            .WithDescription("multipart/form-data with 'file' (a Touchstone version 1 one-port file, at most 2 MiB), 'core' (JSON: shape and dimensionsMm, or catalogueId), 'turns' and optionally 'windingResistanceOhm'. A malformed file is refused with its line number.")
            .Produces<CharacteriseResponse>(StatusCodes.Status200OK, "application/json")
            .ProducesValidationProblem()
            .WithMetadata(new RequestSizeLimitAttribute(MaximumUploadBytes + 64 * 1024));
        return endpoints;
    }

    private static async Task<IResult> CharacteriseAsync(HttpRequest request, CatalogueProvider catalogue, CancellationToken cancellationToken)
    {
        CharacteriseDocument? document;
        try
        {
            document = await JsonSerializer.DeserializeAsync<CharacteriseDocument>(request.Body, CatalogueJson.Options, cancellationToken);
        }
        catch (JsonException e)
        {
            return Problem([new FieldError(JsonErrorText.FieldOf(e), JsonErrorText.ReasonOf(e))]);
        }

        var (result, errors) = CharacterisationReader.Read(document, catalogue.Catalogue);
        return result is null ? Problem(errors) : TypedResults.Json(ToResponse(result), ApiJson.Options);
    }

    private static async Task<IResult> TouchstoneAsync(HttpRequest request, CatalogueProvider catalogue, CancellationToken cancellationToken)
    {
        if (!request.HasFormContentType)
        {
            return Problem([new FieldError("file", "Send multipart/form-data with a 'file' field holding the .s1p file.")]);
        }

        var form = await request.ReadFormAsync(cancellationToken);
        var file = form.Files.GetFile("file");
        if (file is null || file.Length == 0)
        {
            return Problem([new FieldError("file", "Required: a Touchstone .s1p file.")]);
        }

        if (file.Length > MaximumUploadBytes)
        {
            return Problem([new FieldError("file", $"The file is larger than {MaximumUploadBytes / 1024 / 1024} MiB.")]);
        }

        string text;
        using (var reader = new StreamReader(file.OpenReadStream()))
        {
            text = await reader.ReadToEndAsync(cancellationToken);
        }

        var parsed = TouchstoneFile.Parse(text);
        if (!parsed.IsValid)
        {
            var where = parsed.Error!.LineNumber is { } line ? string.Create(CultureInfo.InvariantCulture, $"Line {line}: ") : string.Empty;
            return Problem([new FieldError("file", where + parsed.Error.Reason)]);
        }

        CharacteriseCoreDocument? core;
        try
        {
            core = JsonSerializer.Deserialize<CharacteriseCoreDocument>(form["core"].ToString() is { Length: > 0 } json ? json : "null", CatalogueJson.Options);
        }
        catch (JsonException e)
        {
            return Problem([new FieldError("core", "Not valid JSON: " + JsonErrorText.ReasonOf(e))]);
        }

        var document = new CharacteriseDocument
        {
            Core = core,
            Turns = int.TryParse(form["turns"], NumberStyles.Integer, CultureInfo.InvariantCulture, out var turns) ? turns : null,
            WindingResistanceOhm = double.TryParse(form["windingResistanceOhm"], NumberStyles.Float, CultureInfo.InvariantCulture, out var rw) ? rw : null,
            Impedances = [.. parsed.File!.Points.Where(p => p.FrequencyHz > 0).Select(p => (ImpedancePointDocument?)new ImpedancePointDocument { FrequencyHz = p.FrequencyHz, Re = p.ImpedanceOhm.Real, Im = p.ImpedanceOhm.Imaginary })],
        };
        var (result, errors) = CharacterisationReader.Read(document, catalogue.Catalogue);
        return result is null ? Problem(errors) : TypedResults.Json(ToResponse(result), ApiJson.Options);
    }

    /// <summary>Maps a characterisation to the API answer.</summary>
    public static CharacteriseResponse ToResponse(CharacterisationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var p = result.FromInductance;
        return new CharacteriseResponse(
            result.Shape.ShapeName,
            result.Effective.EffectiveLengthM,
            result.Effective.EffectiveAreaM2,
            result.Effective.EffectiveVolumeM3,
            p?.Al.HenriesPerTurnSquared,
            p?.EffectivePermeability,
            p?.Permeability?.MuPrime,
            p?.Permeability?.MuDoublePrime,
            [.. result.MeasuredPermeability.Select(m => new PermeabilityPointResponse(m.FrequencyHz, m.MuPrime, m.MuDoublePrime))],
            result.Fit is { } fit
                ? new RelaxationFitResponse(
                    fit.Model.ToString(),
                    fit.Parameters.InitialPermeability,
                    fit.Parameters.RelaxationFrequencyHz,
                    fit.Parameters.Alpha,
                    fit.RmsRelativeResidual,
                    fit.Converged,
                    [.. fit.Curve.Points.Select(c => new PermeabilityPointResponse(c.FrequencyHz, c.MuPrime, c.MuDoublePrime))])
                : null,
            [.. result.NearestClasses.Select(c => new NearestMaterialResponse(c.Id, c.Name, c.InitialPermeability))]);
    }

    private static Microsoft.AspNetCore.Http.HttpResults.ValidationProblem Problem(IReadOnlyList<FieldError> errors) =>
        TypedResults.ValidationProblem(
            errors.GroupBy(e => e.Field, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.Select(e => e.Message).ToArray(), StringComparer.Ordinal),
            title: "The measurement has invalid fields.");
}
