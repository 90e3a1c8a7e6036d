using System.Globalization;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc;
using Microsoft.Net.Http.Headers;
using Winding.Catalogue.Entries;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Store;
using Winding.Catalogue.Validation;
using Winding.Core.Plans;
using Winding.Web.Hosting;

namespace Winding.Web.Api;

/// <summary>
/// The catalogue under <c>/api/v1/cores</c> and <c>/api/v1/materials</c>: list, read (with an ETag), create, change and
/// delete (with If-Match: a stale version answers 412; a built-in entry answers 409 with a message to clone it), plus
/// problems, export and import (with a dry run).
/// </summary>
public static class CatalogueApi
{
    /// <summary>Maps the endpoints.</summary>
    public static IEndpointRouteBuilder MapCatalogueApi(this IEndpointRouteBuilder endpoints)
    {
        var v1 = endpoints.MapGroup("/api/v1").WithTags("catalogue").DisableAntiforgery();
        foreach (var kind in new[] { CatalogueEntryKind.Core, CatalogueEntryKind.Material })
        {
            var route = "/" + kind.Folder();
            var word = kind.Word();
            v1.MapGet(route, (CatalogueProvider p) => List(p, kind)).WithName("List" + word).WithSummary($"List every {word} (built-in and yours)");
            v1.MapGet(route + "/{id}", (string id, CatalogueProvider p, HttpResponse response) => Get(p, kind, id, response)).WithName("Get" + word).WithSummary($"One {word}, with its version as ETag");
            v1.MapPost(route, (HttpRequest request, CatalogueProvider p, CancellationToken ct) => CreateAsync(request, p, kind, ct))
                .WithName("Create" + word).WithSummary($"Add a {word} to your catalogue").Accepts<object>("application/json")
                .WithMetadata(new RequestSizeLimitAttribute(WindingApi.MaximumBodyBytes));
            v1.MapPut(route + "/{id}", (string id, HttpRequest request, CatalogueProvider p, CancellationToken ct) => UpdateAsync(request, p, kind, id, ct))
                .WithName("Update" + word).WithSummary($"Change one of your {word}s (If-Match: its version)").Accepts<object>("application/json")
                .WithMetadata(new RequestSizeLimitAttribute(WindingApi.MaximumBodyBytes));
            v1.MapDelete(route + "/{id}", (string id, HttpRequest request, CatalogueProvider p) => Delete(request, p, kind, id))
                .WithName("Delete" + word).WithSummary($"Delete one of your {word}s (If-Match: its version)");
        }

        v1.MapGet("/catalogue/problems", (CatalogueProvider p) => TypedResults.Json(p.Catalogue.Problems.Select(x => new CatalogueProblemResponse(x.FileName, x.JsonPath, x.Reason)).ToList(), ApiJson.Options))
            .WithName("CatalogueProblems").WithSummary("Catalogue files that could not be loaded (file, JSON path, reason)");
        v1.MapGet("/catalogue/export", (CatalogueProvider p) => TypedResults.Text(p.Store.ExportBundle(), "application/json"))
            .WithName("ExportCatalogue").WithSummary("All your entries as one bundle");
        v1.MapPost("/catalogue/import", ImportAsync)
            .WithName("ImportCatalogue").WithSummary("Import a bundle; ?dryRun=true reports what would be added, changed or refused").Accepts<object>("application/json")
            .WithMetadata(new RequestSizeLimitAttribute(10 * WindingApi.MaximumBodyBytes));
        return endpoints;
    }

    private static IResult List(CatalogueProvider provider, CatalogueEntryKind kind)
    {
        var catalogue = provider.Catalogue;
        return kind == CatalogueEntryKind.Core
            ? TypedResults.Json(catalogue.Cores.Select(c => ToResponse(c, provider)).ToList(), ApiJson.Options)
            : TypedResults.Json(catalogue.Materials.Select(ToResponse).ToList(), ApiJson.Options);
    }

    private static IResult Get(CatalogueProvider provider, CatalogueEntryKind kind, string id, HttpResponse response)
    {
        var catalogue = provider.Catalogue;
        if (kind == CatalogueEntryKind.Core && catalogue.CoresById.TryGetValue(id, out var core))
        {
            response.Headers.ETag = Tag(core.Version);
            return TypedResults.Json(ToResponse(core, provider), ApiJson.Options);
        }

        if (kind == CatalogueEntryKind.Material && catalogue.MaterialsById.TryGetValue(id, out var material))
        {
            response.Headers.ETag = Tag(material.Version);
            return TypedResults.Json(ToResponse(material), ApiJson.Options);
        }

        return TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: $"No {kind.Word()} with the id '{id}'.");
    }

    private static async Task<IResult> CreateAsync(HttpRequest request, CatalogueProvider provider, CatalogueEntryKind kind, CancellationToken ct)
    {
        var json = await ReadBodyAsync(request, ct);
        var result = provider.Store.Create(kind, json);
        if (result.Succeeded)
        {
            provider.Reload();
            request.HttpContext.Response.Headers.ETag = Tag(result.Version ?? 1);
            return TypedResults.Created($"/api/v1/{kind.Folder()}/{result.Id}", new { id = result.Id, version = result.Version });
        }

        return Failure(result);
    }

    private static async Task<IResult> UpdateAsync(HttpRequest request, CatalogueProvider provider, CatalogueEntryKind kind, string id, CancellationToken ct)
    {
        if (ExpectedVersion(request) is not { } expected)
        {
            return TypedResults.Problem(statusCode: StatusCodes.Status428PreconditionRequired, title: "Send If-Match with the version you changed (the ETag of GET), so that no one else's change is overwritten.");
        }

        var json = await ReadBodyAsync(request, ct);
        var result = provider.Store.Update(kind, id, json, expected);
        if (result.Succeeded)
        {
            provider.Reload();
            request.HttpContext.Response.Headers.ETag = Tag(result.Version ?? 0);
            return TypedResults.Ok(new { id = result.Id, version = result.Version });
        }

        return Failure(result);
    }

    private static IResult Delete(HttpRequest request, CatalogueProvider provider, CatalogueEntryKind kind, string id)
    {
        if (ExpectedVersion(request) is not { } expected)
        {
            return TypedResults.Problem(statusCode: StatusCodes.Status428PreconditionRequired, title: "Send If-Match with the version you are deleting.");
        }

        var result = provider.Store.Delete(kind, id, expected);
        if (result.Succeeded)
        {
            provider.Reload();
            return TypedResults.NoContent();
        }

        return Failure(result);
    }

    private static async Task<IResult> ImportAsync(HttpRequest request, CatalogueProvider provider, bool? dryRun, CancellationToken ct)
    {
        var json = await ReadBodyAsync(request, ct);
        var report = provider.Store.ImportBundle(json, dryRun ?? false);
        if (!(dryRun ?? false))
        {
            provider.Reload();
        }

        return TypedResults.Json(report, ApiJson.Options);
    }

    private static IResult Failure(StoreResult result)
    {
        var errors = result.Errors.GroupBy(e => e.Field, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.Select(e => e.Message).ToArray(), StringComparer.Ordinal);
        return result.Outcome switch
        {
            StoreOutcome.Invalid => TypedResults.ValidationProblem(errors, title: result.Message),
            StoreOutcome.NotFound => TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: result.Message),
            StoreOutcome.Conflict => TypedResults.Problem(statusCode: StatusCodes.Status412PreconditionFailed, title: result.Message),
            StoreOutcome.ReadOnly or StoreOutcome.AlreadyExists or StoreOutcome.InUse => TypedResults.Problem(statusCode: StatusCodes.Status409Conflict, title: result.Message),
            _ => TypedResults.Problem(statusCode: StatusCodes.Status500InternalServerError, title: result.Message),
        };
    }

    private static int? ExpectedVersion(HttpRequest request)
    {
        var header = request.Headers.IfMatch.ToString().Trim();
        if (header.StartsWith("W/", StringComparison.Ordinal))
        {
            header = header[2..];
        }

        header = header.Trim('"');
        return int.TryParse(header, NumberStyles.Integer, CultureInfo.InvariantCulture, out var version) ? version : null;
    }

    private static string Tag(int version) => string.Create(CultureInfo.InvariantCulture, $"\"{version}\"");

    private static async Task<string> ReadBodyAsync(HttpRequest request, CancellationToken ct)
    {
        using var reader = new StreamReader(request.Body);
        return await reader.ReadToEndAsync(ct);
    }

    private static CoreEntryResponse ToResponse(CatalogueCore core, CatalogueProvider provider)
    {
        var read = provider.Store.Read(CatalogueEntryKind.Core, core.Id);
        DimensionsMmDocument? dims = null;
        if (read.Json is { } json)
        {
            try
            {
                dims = JsonSerializer.Deserialize<CoreEntryDocument>(json, CatalogueJson.Options)?.DimensionsMm;
            }
            catch (JsonException)
            {
                dims = null;
            }
        }

        var al = new PlanCore(core.Shape, 1, core.Material.Material).InductanceFactor.HenriesPerTurnSquared;
        return new CoreEntryResponse(core.Id, core.Name, core.Shape.ShapeName, dims, core.Material.Id, al, core.BuiltIn, core.Version, core.Source);
    }

    private static MaterialEntryResponse ToResponse(CatalogueMaterial material) => new(
        material.Id,
        material.Name,
        material.Family,
        material.Material.InitialPermeability,
        [.. material.PermeabilityPoints.Select(p => new PermeabilityPointResponse(p.FrequencyHz, p.MuPrime, p.MuDoublePrime))],
        material.BuiltIn,
        material.Version,
        material.Source);
}
