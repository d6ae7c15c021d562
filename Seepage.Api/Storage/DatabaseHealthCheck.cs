using Microsoft.AspNetCore.Diagnostics.HealthChecks;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace Seepage.Api.Storage;

/// <summary>Ready when the database answers a query (schema migrated); <c>/health/live</c> only says the process serves.</summary>
public sealed class DatabaseHealthCheck(Database db) : IHealthCheck
{
    public async Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        try
        {
            using var timeout = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
            timeout.CancelAfter(TimeSpan.FromSeconds(5));
            await using var connection = await db.OpenAsync(timeout.Token);
            await Sql.ScalarAsync(connection, null, "SELECT COUNT(*) FROM schema_version", timeout.Token);
            return HealthCheckResult.Healthy($"{db.Provider} answers.");
        }
        catch (Exception ex) when (ex is not OperationCanceledException || !cancellationToken.IsCancellationRequested)
        {
            return HealthCheckResult.Unhealthy($"{db.Provider} does not answer: {ex.GetType().Name}.");
        }
    }
}

/// <summary>The health endpoints: <c>/health/live</c> (the process serves) and <c>/health/ready</c> (the database answers).</summary>
public static class HealthSetup
{
    public static IServiceCollection AddSeepageHealth(this IServiceCollection services)
    {
        services.AddHealthChecks().AddCheck<DatabaseHealthCheck>("database", tags: ["ready"]);
        return services;
    }

    public static void MapSeepageHealth(this IEndpointRouteBuilder app)
    {
        app.MapHealthChecks("/health/live", new HealthCheckOptions { Predicate = _ => false }).WithTags("Health");
        app.MapHealthChecks("/health/ready", new HealthCheckOptions { Predicate = c => c.Tags.Contains("ready") }).WithTags("Health");
    }
}
