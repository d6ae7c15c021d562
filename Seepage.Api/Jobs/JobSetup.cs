using Hangfire;
using Hangfire.InMemory;
using Hangfire.PostgreSql;
using Hangfire.PostgreSql.Factories;
using Seepage.Api.Application;
using Seepage.Api.Storage;

namespace Seepage.Api.Jobs;

/// <summary>The job engine (Hangfire) for background studies. With PostgreSQL its queue lives in the same database (schema
/// <c>hangfire</c>), so every replica's workers share it and a job fetched by a replica that dies becomes visible again
/// after <c>Jobs:InvisibilitySeconds</c> (sliding: a live worker keeps it). With the SQLite default the queue is in memory
/// and <see cref="StudyResume"/> queues again, at start, every alternative of a running study that has no row yet (the
/// rows and definitions are in the SQLite file, so nothing is lost).</summary>
public static class JobSetup
{
    public const string WorkersKey = "Jobs:Workers";
    public const string InvisibilityKey = "Jobs:InvisibilitySeconds";

    public static IServiceCollection AddSeepageJobs(this IServiceCollection services, IConfiguration configuration, Database db)
    {
        JobStorage storage = db is PostgresDatabase pg ? PostgresStorage(pg.ConnectionString, configuration) : new InMemoryStorage();
        services.AddSingleton(storage);
        services.AddHangfire((provider, c) => c.SetDataCompatibilityLevel(CompatibilityLevel.Version_180)
            .UseSimpleAssemblyNameTypeSerializer().UseRecommendedSerializerSettings()
            .UseLogProvider(new HostLogProvider(provider.GetRequiredService<ILoggerFactory>())));
        services.AddHangfireServer((_, o) =>
        {
            o.WorkerCount = configuration.GetValue(WorkersKey, Environment.ProcessorCount);
            o.ServerName = $"{Environment.MachineName}:{Environment.ProcessId}";
        });
        services.AddTransient<StudyJob>();
        services.AddSingleton<IStudyScheduler, HangfireStudyScheduler>();
        if (db is not PostgresDatabase) services.AddHostedService<StudyResume>();
        return services;
    }

    private static PostgreSqlStorage PostgresStorage(string connectionString, IConfiguration configuration)
    {
        var options = new PostgreSqlStorageOptions
        {
            SchemaName = configuration["Jobs:Schema"] ?? "hangfire",
            PrepareSchemaIfNecessary = true,
            QueuePollInterval = TimeSpan.FromSeconds(1),
            InvisibilityTimeout = TimeSpan.FromSeconds(configuration.GetValue(InvisibilityKey, 60)),
            UseSlidingInvisibilityTimeout = true,
            EnableLongPolling = true,
        };
        return new PostgreSqlStorage(new NpgsqlConnectionFactory(connectionString, options), options);
    }
}

/// <summary>At start (embedded default, in-memory queue): queues again every alternative of each study still running.</summary>
public sealed class StudyResume(IStudyStore studies, IStudyScheduler scheduler, ILogger<StudyResume> logger) : BackgroundService
{
    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        foreach (var (id, total) in await studies.RunningAsync(stoppingToken))
        {
            await scheduler.ScheduleAsync(id, total, stoppingToken);
            logger.LogInformation("Study {Id}: resumed ({Total} alternatives; those with rows are skipped)", id, total);
        }
    }
}
