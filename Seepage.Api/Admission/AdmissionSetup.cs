using System.Threading.RateLimiting;
using Microsoft.AspNetCore.Http.Features;
using Microsoft.AspNetCore.RateLimiting;
using Microsoft.Extensions.Options;
using Seepage.Api.Endpoints;

namespace Seepage.Api.Admission;

/// <summary>Limits of what one request and one client may cost: <see cref="ServiceLimits"/> from configuration, multipart
/// form limits, the heavy-analysis gate and a per-client rate limit on POST requests (ASP.NET Core rate limiting, a token
/// bucket per client address refilled every second; 429 with Retry-After and problem details when empty).</summary>
public static class AdmissionSetup
{
    public static IServiceCollection AddSeepageAdmission(this IServiceCollection services, IConfiguration configuration)
    {
        services.Configure<ServiceLimits>(configuration.GetSection(ServiceLimits.Section));
        services.Configure<FormOptions>(o =>
        {
            o.MultipartBodyLengthLimit = SectionBody.MaxBytes;
            o.MultipartHeadersLengthLimit = 16 * 1024;
            o.ValueCountLimit = 64;
            o.ValueLengthLimit = SectionBody.MaxBytes;
        });
        services.AddSingleton<AnalysisGate>();
        services.AddRateLimiter(o => o.OnRejected = OnRejectedAsync);
        services.AddOptions<RateLimiterOptions>().Configure<IOptions<ServiceLimits>>((o, limits) =>
        {
            int perMinute = limits.Value.PostsPerMinute;
            o.RejectionStatusCode = StatusCodes.Status429TooManyRequests;
            o.GlobalLimiter = PartitionedRateLimiter.Create<HttpContext, string>(http =>
                perMinute > 0 && HttpMethods.IsPost(http.Request.Method)
                    ? RateLimitPartition.GetTokenBucketLimiter(http.Connection.RemoteIpAddress?.ToString() ?? "local", _ => new TokenBucketRateLimiterOptions
                    {
                        TokenLimit = perMinute, TokensPerPeriod = Math.Max(1, perMinute / 60), ReplenishmentPeriod = TimeSpan.FromSeconds(1),
                        QueueLimit = 0, AutoReplenishment = true,
                    })
                    : RateLimitPartition.GetNoLimiter("unlimited"));
        });
        return services;
    }

    public static void UseSeepageAdmission(this WebApplication app) => app.UseRateLimiter();

    /// <summary>The 429 of a full heavy-analysis line or an empty rate bucket: problem details with Retry-After.</summary>
    public static Microsoft.AspNetCore.Http.HttpResults.ProblemHttpResult TooBusy(HttpContext http, int retryAfterSeconds, string detail)
    {
        http.Response.Headers.RetryAfter = retryAfterSeconds.ToString(System.Globalization.CultureInfo.InvariantCulture);
        return TypedResults.Problem(statusCode: StatusCodes.Status429TooManyRequests, title: "The server is busy.", detail: detail,
            extensions: new Dictionary<string, object?>
            {
                ["retryAfter"] = retryAfterSeconds, ["errors"] = new Dictionary<string, string[]> { ["request"] = [detail] },
            });
    }

    private static async ValueTask OnRejectedAsync(OnRejectedContext context, CancellationToken cancellation)
    {
        int seconds = context.Lease.TryGetMetadata(MetadataName.RetryAfter, out var wait) ? Math.Max(1, (int)Math.Ceiling(wait.TotalSeconds)) : 1;
        int perMinute = context.HttpContext.RequestServices.GetRequiredService<IOptions<ServiceLimits>>().Value.PostsPerMinute;
        await TooBusy(context.HttpContext, seconds,
            $"This client has sent more than {perMinute} POST requests in a minute (Limits:PostsPerMinute); retry after {seconds} s.")
            .ExecuteAsync(context.HttpContext);
    }
}
