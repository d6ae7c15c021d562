using Seepage.Api.Application;

namespace Seepage.Api.Storage;

/// <summary>Chooses the database from configuration: <c>Storage:Provider</c> = <c>Sqlite</c> (default; the file at
/// <c>Storage:DatabasePath</c>, default data/seepage.db under the content root) or <c>PostgreSQL</c> (connection string
/// <c>ConnectionStrings:Seepage</c>), and registers the stores on it. The schema is migrated when the host starts.</summary>
public static class StorageSetup
{
    public const string ProviderKey = "Storage:Provider";
    public const string DatabasePathKey = "Storage:DatabasePath";
    public const string ConnectionName = "Seepage";

    /// <summary>Registers the database and the stores; returns the database (the job engine keeps its queue there too).</summary>
    public static Database AddSeepageStorage(this IServiceCollection services, IConfiguration configuration,
        IWebHostEnvironment environment)
    {
        var db = CreateDatabase(configuration, environment);
        services.AddSingleton(db);
        services.AddSingleton<IAnalysisStore>(new SqlAnalysisStore(db));
        services.AddSingleton<IStudyStore>(new SqlStudyStore(db));
        services.AddHostedService<MigrationStartup>();
        return db;
    }

    public static Database CreateDatabase(IConfiguration configuration, IWebHostEnvironment environment)
    {
        string provider = configuration[ProviderKey] ?? "Sqlite";
        if (provider.Equals("PostgreSQL", StringComparison.OrdinalIgnoreCase) || provider.Equals("Postgres", StringComparison.OrdinalIgnoreCase))
            return new PostgresDatabase(configuration.GetConnectionString(ConnectionName) is { Length: > 0 } cs ? cs
                : throw new InvalidOperationException(
                    $"{ProviderKey} is PostgreSQL but ConnectionStrings:{ConnectionName} (ConnectionStrings__{ConnectionName}) is not set."));
        if (!provider.Equals("Sqlite", StringComparison.OrdinalIgnoreCase))
            throw new InvalidOperationException($"{ProviderKey} is '{provider}'; use Sqlite (default) or PostgreSQL.");
        return new SqliteDatabase(configuration[DatabasePathKey] ?? Path.Combine(environment.ContentRootPath, "data", "seepage.db"));
    }
}

/// <summary>Migrates the schema before the server takes requests.</summary>
public sealed class MigrationStartup(Database db, ILogger<MigrationStartup> logger) : IHostedService
{
    public async Task StartAsync(CancellationToken cancellationToken)
    {
        await db.MigrateAsync(cancellationToken);
        logger.LogInformation("Storage: {Provider}, schema version {Version}", db.Provider, db.Migrations[^1].Version);
    }

    public Task StopAsync(CancellationToken cancellationToken) => Task.CompletedTask;
}
