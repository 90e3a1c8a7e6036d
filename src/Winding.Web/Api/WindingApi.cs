using System.Text.Json;
using Microsoft.AspNetCore.Mvc;
using Winding.Catalogue.Loading;
using Winding.Catalogue.Plans;
using Winding.Catalogue.Validation;
using Winding.Core.Plans;
using Winding.Core.Windings;
using Winding.Core.Wire;
using Winding.Web.Exports;
using Winding.Web.Hosting;
using Winding.Web.Sheets;

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
        v1.MapPost("/netlist", NetlistAsync)
            .WithName("Netlist")
            .WithSummary("SPICE netlist of a plan's equivalent circuit")
            .WithDescription("Takes a plan with operating conditions and returns an ngspice netlist (text/plain) of its linear equivalent circuit referred to the primary, with a frequency-independent core: node src (1 V AC), RS from src to in, node out across the referred load RL, and an .ac dec analysis over the plan's sweep. Runnable as is with ngspice -b.")
            .Accepts<PlanDocument>("application/json")
            .Produces<string>(StatusCodes.Status200OK, "text/plain")
            .ProducesValidationProblem()
            .WithMetadata(new RequestSizeLimitAttribute(MaximumBodyBytes));
        v1.MapPost("/sweep", SweepAsync)
            .WithName("Sweep")
            .WithSummary("A plan's response sweep as CSV")
            .WithDescription("Takes a plan with operating conditions and returns its response sweep (the sweep /evaluate returns) as RFC 4180 CSV with a header row: frequency (Hz), insertion loss (dB), return loss (dB), |Zin| (ohm), Zin phase (deg), Zin real (ohm), Zin imaginary (ohm), |Vout'| (V) and Vout' phase (deg) (the voltage across the load referred to the primary for a 1 V source), one row per frequency, numbers in the invariant culture, exact to the last digit. The file name comes from the plan's name. format is csv (the default).")
            .Accepts<PlanDocument>("application/json")
            .Produces<string>(StatusCodes.Status200OK, "text/csv")
            .ProducesValidationProblem()
            .WithMetadata(new RequestSizeLimitAttribute(MaximumBodyBytes));
        v1.MapPost("/wire-choices", WireChoicesAsync)
            .WithName("WireChoices")
            .WithSummary("Rank wire sizes for each winding of a plan")
            .WithDescription("Takes a plan with operating conditions and, for each winding, ranks the standard wires (and strands in hand) that fit with the other windings unchanged, stay within the winding's share of the window (0.4 utilisation), keep the current density at or under 4 A/mm² and stay within two skin depths at maxFrequencyHz. The current is the winding's rmsCurrentA, or derived from drive and load.")
            .Accepts<PlanDocument>("application/json")
            .Produces<WireChoicesResponse>(StatusCodes.Status200OK, "application/json")
            .ProducesValidationProblem()
            .WithMetadata(new RequestSizeLimitAttribute(MaximumBodyBytes));
        v1.MapPost("/sheet", SheetAsync)
            .WithName("Sheet")
            .WithSummary("The bench sheet of a plan, as HTML or PDF")
            .WithDescription("Takes a plan (the same document as /evaluate, validated the same way) and returns its bench sheet: the core, the windings table in winding order with lengths to cut, a to-scale cross-section, numbered build steps, the bench checks with expected values, limits and empty measured boxes, and safety cautions. Query format=html (default) answers one standalone text/html document with its styles inlined; format=pdf answers application/pdf printed by headless Chromium, or 503 with the reason when it is missing or fails. Query paper=a4 (default) or letter sets the page size. Every name in the plan is escaped. Invalid input answers 400 with application/problem+json whose errors name each bad field.")
            .Accepts<PlanDocument>("application/json")
            .Produces<string>(StatusCodes.Status200OK, "text/html", "application/pdf")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
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

    private static async Task<IResult> NetlistAsync(HttpRequest request, CatalogueProvider catalogue, CancellationToken cancellationToken)
    {
        var read = await ReadPlanAsync(request, catalogue.Catalogue, cancellationToken);
        if (!read.IsValid)
        {
            return ValidationProblem(read.Errors);
        }

        if (read.Plan!.Operating is null)
        {
            return ValidationProblem([new FieldError("operating", "Required for a netlist: the band sets the analysis range and the source and load resistances.")]);
        }

        var plan = read.Plan with { FrequencyIndependentCore = true };
        return TypedResults.Text(SpiceNetlist.Write(plan, PlanEvaluator.Evaluate(plan)), "text/plain; charset=utf-8");
    }

    private static async Task<IResult> SweepAsync(HttpRequest request, CatalogueProvider catalogue, [FromQuery] string? format, CancellationToken cancellationToken)
    {
        if (format is not null && !string.Equals(format, "csv", StringComparison.OrdinalIgnoreCase))
        {
            return ValidationProblem([new FieldError("format", $"Unknown format '{format}': the sweep is given as csv.")]);
        }

        var read = await ReadPlanAsync(request, catalogue.Catalogue, cancellationToken);
        if (!read.IsValid)
        {
            return ValidationProblem(read.Errors);
        }

        var plan = read.Plan!;
        if (plan.Operating is null)
        {
            return ValidationProblem([new FieldError("operating", "Required for a sweep: the band sets the frequency range and the source and load resistances.")]);
        }

        var response = PlanEvaluator.Evaluate(plan).Response!;
        return TypedResults.File(System.Text.Encoding.UTF8.GetBytes(SweepCsv.Write(response.Sweep)), SweepCsv.ContentType, ExportFileName.For(plan.Name, "csv"));
    }

    private static async Task<IResult> WireChoicesAsync(HttpRequest request, CatalogueProvider catalogue, CancellationToken cancellationToken)
    {
        var read = await ReadPlanAsync(request, catalogue.Catalogue, cancellationToken);
        if (!read.IsValid)
        {
            return ValidationProblem(read.Errors);
        }

        var plan = read.Plan!;
        if (plan.Operating is null)
        {
            return ValidationProblem([new FieldError("operating", "Required for wire choices: the band (for skin depth) and drive and load (for the currents).")]);
        }

        var evaluation = PlanEvaluator.Evaluate(plan);
        var windings = new List<WindingWireChoicesResponse>(plan.Windings.Count);
        for (var i = 0; i < plan.Windings.Count; i++)
        {
            var currentA = evaluation.Windings[i].Electrical!.RmsCurrentA;
            var frequencyHz = plan.Operating.MaxFrequencyHz;
            if (!(currentA > 0))
            {
                windings.Add(new WindingWireChoicesResponse(i, plan.Windings[i].Name, currentA, frequencyHz, "No current is known for this winding: give its rmsCurrentA.", []));
                continue;
            }

            var report = WireGaugePicker.ChooseWithReport(plan, i, Math.Min(currentA, WireGaugePicker.MaximumCurrentA), frequencyHz);
            windings.Add(new WindingWireChoicesResponse(
                i,
                plan.Windings[i].Name,
                currentA,
                frequencyHz,
                report.Summary,
                [.. report.Choices.Select(c => new WireChoiceResponse(
                    c.Rank,
                    c.StandardId,
                    c.Description,
                    c.StrandsInHand,
                    c.Passes,
                    EvaluationResponseMapper.OutcomeWord(c.Outcome),
                    c.Layers,
                    c.CurrentDensityAPerM2,
                    c.SkinDepthRatio,
                    c.DcResistance20COhm,
                    c.AcResistanceOhm,
                    c.CopperLossW,
                    c.Reasons))]));
        }

        return TypedResults.Json(new WireChoicesResponse(windings), ApiJson.Options);
    }

    private static async Task<IResult> SheetAsync(HttpRequest request, CatalogueProvider catalogue, TimeProvider time, SheetHtmlRenderer renderer, IServiceProvider services, string? format, string? paper, CancellationToken cancellationToken)
    {
        var errors = new List<FieldError>();
        var pdf = false;
        switch (format?.Trim().ToUpperInvariant())
        {
            case null or "" or "HTML":
                break;
            case "PDF":
                pdf = true;
                break;
            default:
                errors.Add(new FieldError("format", $"Unknown format '{format}': use html or pdf."));
                break;
        }

        if (!SheetPapers.TryParse(paper, out var sheetPaper))
        {
            errors.Add(new FieldError("paper", $"Unknown paper '{paper}': use a4 or letter."));
        }

        var (document, read) = await ReadDocumentAsync(request, catalogue.Catalogue, cancellationToken);
        if (errors.Count > 0 || !read.IsValid)
        {
            return ValidationProblem([.. errors, .. read.Errors]);
        }

        var plan = read.Plan!;
        var view = SheetViewBuilder.Build(plan, PlanEvaluator.Evaluate(plan), SheetViewBuilder.CoreName(document!, catalogue.Catalogue), SheetViewBuilder.Today(time), 0, "sent to the API, not saved");
        var html = await renderer.RenderAsync(view, sheetPaper);
        if (!pdf)
        {
            return TypedResults.Text(html, "text/html; charset=utf-8");
        }

        if (services.GetService<ISheetPdfPrinter>() is not { } printer)
        {
            return TypedResults.Problem(
                statusCode: StatusCodes.Status503ServiceUnavailable,
                title: "PDF printing is not available",
                detail: "This server has no PDF printer set up. Ask for format=html and print the page from a browser.");
        }

        try
        {
            var bytes = await printer.PrintAsync(html, sheetPaper, cancellationToken);
            return TypedResults.File(bytes, "application/pdf", "bench-sheet.pdf");
        }
        catch (SheetPrintException e)
        {
            return TypedResults.Problem(statusCode: StatusCodes.Status503ServiceUnavailable, title: "The PDF printer could not print the sheet", detail: e.Message);
        }
    }

    /// <summary>Reads and validates a plan from a JSON request body; a JSON error becomes a field error at its path.</summary>
    private static async Task<PlanReadResult> ReadPlanAsync(HttpRequest request, CoreCatalogue catalogue, CancellationToken cancellationToken) =>
        (await ReadDocumentAsync(request, catalogue, cancellationToken)).Read;

    /// <summary>Reads the plan document from a JSON request body and validates it.</summary>
    private static async Task<(PlanDocument? Document, PlanReadResult Read)> ReadDocumentAsync(HttpRequest request, CoreCatalogue catalogue, CancellationToken cancellationToken)
    {
        if (request.ContentType is { } type && !type.Contains("json", StringComparison.OrdinalIgnoreCase))
        {
            return (null, new PlanReadResult(null, [new FieldError(string.Empty, "The request body must be JSON (Content-Type: application/json).")]));
        }

        PlanDocument? document;
        try
        {
            document = await JsonSerializer.DeserializeAsync<PlanDocument>(request.Body, CatalogueJson.Options, cancellationToken);
        }
        catch (JsonException e)
        {
            return (null, new PlanReadResult(null, [new FieldError(JsonErrorText.FieldOf(e), JsonErrorText.ReasonOf(e))]));
        }

        return (document, PlanReader.Read(document, catalogue));
    }

    private static Microsoft.AspNetCore.Http.HttpResults.ValidationProblem ValidationProblem(IReadOnlyList<FieldError> errors)
    {
        var grouped = errors
            .GroupBy(e => e.Field, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Select(e => e.Message).ToArray(), StringComparer.Ordinal);
        return TypedResults.ValidationProblem(grouped, title: "The plan has invalid fields.");
    }
}
