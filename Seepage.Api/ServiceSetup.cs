using Seepage.Api.Endpoints;
using Seepage.Api.Jobs;
using Seepage.Api.Storage;

namespace Seepage.Api;

/// <summary>Registration of the service's parts.</summary>
public static class ServiceSetup
{
    /// <summary>Configuration key of the SQLite database file. Default: data/seepage.db under the content root.</summary>
    public const string DatabasePathKey = StorageSetup.DatabasePathKey;

    public static IServiceCollection AddSeepageServices(this IServiceCollection services, IConfiguration configuration,
        IWebHostEnvironment environment)
    {
        var db = services.AddSeepageStorage(configuration, environment);
        services.AddSeepageJobs(configuration, db);
        services.AddSeepageHealth();
        services.AddSingleton<AnalysisService>();
        services.AddSingleton<StudyService>();
        // Target searches and uncertainty studies are still kept in an SQLite file of their own (also when the analyses are
        // in PostgreSQL) until they move onto the store abstraction.
        services.AddSingleton(new DesignRunStore(configuration[StorageSetup.DatabasePathKey]
            ?? Path.Combine(environment.ContentRootPath, "data", "seepage.db")));
        services.AddSingleton<RunningJobs>();
        services.AddSingleton<TargetSearchService>();
        services.AddSingleton<UncertaintyService>();
        services.AddSingleton<ExampleCatalog>();
        services.AddSeepageErrorHandling();
        services.ConfigureHttpJsonOptions(o => o.SerializerOptions.NumberHandling = System.Text.Json.Serialization.JsonNumberHandling.Strict);
        return services;
    }

    /// <summary>The folder the page is served from: the copy of Seepage.Web beside the built app.</summary>
    public static string PageFolder() => Path.Combine(AppContext.BaseDirectory, "page");

    /// <summary>Prints the page address once the server listens, so the README's run command shows where to go.</summary>
    public static void LogPageAddress(this WebApplication app) =>
        app.Lifetime.ApplicationStarted.Register(() =>
        {
            foreach (string url in app.Urls)
                Console.WriteLine($"Seepage page: {url.Replace("0.0.0.0", "localhost").Replace("[::]", "localhost")}/  (OpenAPI: {url}/swagger)");
        });
}
