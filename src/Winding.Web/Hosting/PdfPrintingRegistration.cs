using Winding.Web.Sheets;

namespace Winding.Web.Hosting;

/// <summary>Registration of the sheet's PDF printer.</summary>
public static class PdfPrintingRegistration
{
    /// <summary>
    /// Registers <see cref="ChromiumPdfPrinter"/> as the app's <see cref="ISheetPdfPrinter"/> (one for the app: it limits how
    /// many prints run at once), with the executable from <c>Winding:ChromiumPath</c>, else <c>WINDING_CHROMIUM</c>, else
    /// <c>/usr/bin/chromium</c>, and the timeout from <c>Winding:PdfTimeoutSeconds</c> (default 30 s). A missing Chromium
    /// does not stop the app: printing then fails with <see cref="PdfPrinterUnavailableException"/>.
    /// </summary>
    public static IServiceCollection AddWindingPdfPrinting(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);
        services.AddSingleton(ChromiumPrinterOptions.FromConfiguration(configuration));
        services.AddSingleton<ChromiumPdfPrinter>();
        services.AddSingleton<ISheetPdfPrinter>(sp => sp.GetRequiredService<ChromiumPdfPrinter>());
        return services;
    }
}
