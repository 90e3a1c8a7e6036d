using MudBlazor.Services;
using Winding.Web.Api;
using Winding.Web.Components;
using Winding.Web.Planning;

namespace Winding.Web.Hosting;

/// <summary>Service registration and the request pipeline, kept out of Program.cs.</summary>
public static class WindingHostingExtensions
{
    /// <summary>The address served when none is configured: loopback only.</summary>
    public const string DefaultAddress = "http://localhost:5080";

    /// <summary>
    /// Serves on <see cref="DefaultAddress"/> unless an address is configured (<c>--urls</c>, <c>ASPNETCORE_URLS</c>,
    /// <c>ASPNETCORE_HTTP_PORTS</c> or the launch profile).
    /// </summary>
    public static WebApplicationBuilder UseDefaultAddress(this WebApplicationBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        var configured = builder.Configuration["urls"] ?? builder.Configuration["http_ports"] ?? builder.Configuration["https_ports"];
        if (string.IsNullOrWhiteSpace(configured))
        {
            builder.WebHost.UseUrls(DefaultAddress);
        }

        return builder;
    }

    /// <summary>Registers Winding's services.</summary>
    public static IServiceCollection AddWinding(this IServiceCollection services, IConfiguration configuration)
    {
        services.AddRazorComponents().AddInteractiveServerComponents();
        services.AddMudServices();
        services.AddProblemDetails();
        services.AddOpenApi();
        // Numbers are numbers: the API reads plans strictly (no numbers in strings), and the OpenAPI schema says so.
        services.ConfigureHttpJsonOptions(options => options.SerializerOptions.NumberHandling = System.Text.Json.Serialization.JsonNumberHandling.Strict);
        services.AddSingleton(WindingPaths.FromConfiguration(configuration));
        services.AddSingleton<CatalogueProvider>();
        services.AddSingleton(sp => new Winding.Catalogue.Plans.PlanStore(sp.GetRequiredService<WindingPaths>().DataDirectory, sp.GetRequiredService<TimeProvider>()));
        services.AddSingleton(TimeProvider.System);
        // ISheetPdfPrinter is not registered here: without one, POST /api/v1/sheet?format=pdf answers 503.
        services.AddSingleton<Sheets.SheetHtmlRenderer>();
        return services.AddWindingViewModels();
    }

    /// <summary>
    /// Registers the pages' view models: per-circuit state (scoped), the start page's plan list, and the unit system
    /// (<see cref="Display.DisplayUnits"/>, cascaded to every component as a <see cref="Display.UnitSystem"/>). The tests and the
    /// edit-to-redraw benchmark use this too, so they render the pages with the app's own set.
    /// </summary>
    public static IServiceCollection AddWindingViewModels(this IServiceCollection services)
    {
        services.AddScoped<PlanningState>();
        services.AddTransient<SavedPlansModel>();
        services.AddScoped<Characterising.CharacterisationState>();
        services.AddScoped<Display.BrowserPreferences>();
        services.AddScoped<Display.FieldFocus>();
        services.AddScoped<Display.DisplayUnits>();
        services.AddCascadingValue(sp => sp.GetRequiredService<Display.DisplayUnits>().Source);
        services.AddScoped<Sheets.SheetLoader>();
        return services;
    }

    /// <summary>Builds the request pipeline: errors, static assets, API, OpenAPI and the Blazor app.</summary>
    public static WebApplication UseWinding(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (!app.Environment.IsDevelopment())
        {
            app.UseExceptionHandler("/Error", createScopeForErrors: true);
        }

        app.UseStatusCodePagesWithReExecute("/not-found", createScopeForStatusCodePages: true);
        app.UseAntiforgery();
        app.MapStaticAssets();
        app.MapOpenApi();
        app.MapWindingApi();
        app.MapCharacteriseApi();
        app.MapCatalogueApi();
        app.MapRazorComponents<App>().AddInteractiveServerRenderMode();

        // Load the catalogue at start-up so that file problems are logged at once.
        _ = app.Services.GetRequiredService<CatalogueProvider>();
        return app;
    }
}
