using System.Text.Json;
using Microsoft.AspNetCore.Mvc;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Validation;
using Winding.Core.Plans;
using Winding.Core.Wire;
using Winding.Web.Hosting;

namespace Winding.Web.Api;

/// <summary>The HTTP API under <c>/api/v1</c>.</summary>
public static class WindingApi
{
    /// <summary>Largest accepted request body, bytes.</summary>
    public const long MaximumBodyBytes = 1_000_000;

    /// <summary>Maps the v1 endpoints.</summary>
    public static IEndpointRouteBuilder MapWindingApi(this IEndpointRouteBuilder endpoints)
    {
        var v1 = endpoints.MapGroup("/api/v1").WithTags("v1").DisableAntiforgery();
        v1.MapPost("/evaluate", EvaluateAsync)
            .WithName("Evaluate")
            .WithSummary("Evaluate a plan")
            .WithDescription("Takes a plan (core, windings, operating conditions; dimensions and wire diameters in mm, everything else SI) and returns the core's effective parameters and AL, and per winding the inductance, layer fit, length to cut and DC resistance, with warnings. Invalid input answers 400 with application/problem+json whose errors name each bad field.")
            .Accepts<PlanDocument>("application/json")
            .Produces<EvaluationResponse>(StatusCodes.Status200OK, "application/json")
            .ProducesValidationProblem()
            .WithMetadata(new RequestSizeLimitAttribute(MaximumBodyBytes));
        v1.MapGet("/wires", ListWires)
            .WithName("ListWires")
            .WithSummary("The standard wire table")
            .WithDescription("Every standard wire the planner knows: IEC 60317-0-1 metric enamelled sizes in grades 1–3 and AWG 10–44 (ASTM B258) in single and heavy film build, with conductor and maximum overall diameters and copper resistance per metre at 20 °C. Each id can be used as wire.standardId in a plan.")
            .Produces<IReadOnlyList<WireListResponse>>(StatusCodes.Status200OK, "application/json");
        return endpoints;
    }

    private static Microsoft.AspNetCore.Http.HttpResults.JsonHttpResult<List<WireListResponse>> ListWires() => TypedResults.Json(
        StandardWireTable.All.Select(w => new WireListResponse(
            w.Id,
            w.System == StandardWireSystem.Metric ? "metric" : "awg",
            w.SizeLabel,
            w.InsulationLabel,
            w.Description,
            w.ConductorDiameter.Metres,
            w.OverallDiameter.Metres,
            w.ConductorAreaM2,
            w.ResistancePerMetre20COhmPerM,
            w.OverallDiameterProvenance switch
            {
                ValueProvenance.Read => "read",
                ValueProvenance.FromMemoryCrossChecked => "from-memory-cross-checked",
                _ => "from-memory",
            })).ToList(),
        ApiJson.Options);

    private static async Task<IResult> EvaluateAsync(HttpRequest request, CatalogueProvider catalogue, CancellationToken cancellationToken)
    {
        var read = await ReadPlanAsync(request, catalogue.Catalogue, cancellationToken);
        if (!read.IsValid)
        {
            return ValidationProblem(read.Errors);
        }

        var evaluation = PlanEvaluator.Evaluate(read.Plan!);
        return TypedResults.Json(EvaluationResponseMapper.ToResponse(evaluation), ApiJson.Options);
    }

    /// <summary>Reads and validates a plan from a JSON request body; a JSON error becomes a field error at its path.</summary>
    private static async Task<PlanReadResult> ReadPlanAsync(HttpRequest request, CoreCatalogue catalogue, CancellationToken cancellationToken)
    {
        if (request.ContentType is { } type && !type.Contains("json", StringComparison.OrdinalIgnoreCase))
        {
            return new PlanReadResult(null, [new FieldError(string.Empty, "The request body must be JSON (Content-Type: application/json).")]);
        }

        PlanDocument? document;
        try
        {
            document = await JsonSerializer.DeserializeAsync<PlanDocument>(request.Body, CatalogueJson.Options, cancellationToken);
        }
        catch (JsonException e)
        {
            return new PlanReadResult(null, [new FieldError(JsonErrorText.FieldOf(e), JsonErrorText.ReasonOf(e))]);
        }

        return PlanReader.Read(document, catalogue);
    }

    private static Microsoft.AspNetCore.Http.HttpResults.ValidationProblem ValidationProblem(IReadOnlyList<FieldError> errors)
    {
        var grouped = errors
            .GroupBy(e => e.Field, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Select(e => e.Message).ToArray(), StringComparer.Ordinal);
        return TypedResults.ValidationProblem(grouped, title: "The plan has invalid fields.");
    }
}
