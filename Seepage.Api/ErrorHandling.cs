using Seepage.Api.Errors;

namespace Seepage.Api;

/// <summary>Exceptions that escape an endpoint become RFC 9457 problem details (<see cref="ProblemExceptionHandler"/>);
/// bare status codes (404, 405, a route that does not take the body's type) get a problem body too
/// (<see cref="ApiProblems.ForStatus"/>), naming the part of the request at fault in <c>errors</c>.</summary>
public static class ErrorHandling
{
    public static IServiceCollection AddSeepageErrorHandling(this IServiceCollection services)
    {
        services.AddProblemDetails();
        services.AddExceptionHandler<ProblemExceptionHandler>();
        return services;
    }

    public static void UseSeepageErrorHandling(this WebApplication app)
    {
        app.UseExceptionHandler();
        app.UseStatusCodePages(async pages =>
            await ApiProblems.ForStatus(pages.HttpContext).ExecuteAsync(pages.HttpContext));
    }
}
