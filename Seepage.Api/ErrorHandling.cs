using Microsoft.AspNetCore.Diagnostics;

namespace Seepage.Api;

/// <summary>Turns exceptions that escape an endpoint into RFC 9457 problem details: request-reading failures
/// (malformed or oversize bodies) are the client's (400/413), anything else a server fault (500).</summary>
public static class ErrorHandling
{
    /// <summary>Problem details for a status set without a body (an unknown route, a content type an endpoint does not take),
    /// naming the part of the request at fault in <c>errors</c>, as every other 4xx does.</summary>
    private static IResult StatusProblem(HttpContext http)
    {
        int status = http.Response.StatusCode;
        var (member, message) = status switch
        {
            415 => ("Content-Type", $"'{Core.SafeText.Of(http.Request.ContentType ?? "(none)")}' is not a content type this endpoint takes; see the OpenAPI document at /swagger/v1/swagger.json."),
            404 => ("path", "No resource or endpoint has this path."),
            405 => ("method", $"{Core.SafeText.Of(http.Request.Method, 12)} is not allowed on this path."),
            _ => ("request", $"The request was answered {status}."),
        };
        return Results.Problem(statusCode: status, detail: message,
            extensions: new Dictionary<string, object?> { ["errors"] = new Dictionary<string, string[]> { [member] = [message] } });
    }

    public static void UseSeepageErrorHandling(this WebApplication app)
    {
        app.UseExceptionHandler(handler => handler.Run(async context =>
        {
            var error = context.Features.Get<IExceptionHandlerFeature>()?.Error;
            var (status, title) = error switch
            {
                BadHttpRequestException { StatusCode: 413 } => (413, "The body is too large."),
                BadHttpRequestException bad => (bad.StatusCode, "The request could not be read."),
                OperationCanceledException => (499, "The request was cancelled."),
                _ => (500, "The analysis failed unexpectedly."),
            };
            if (status == 500) app.Logger.LogError(error, "Unhandled error");
            context.Response.StatusCode = status;
            string? detail = status == 500 ? null : Core.SafeText.Of(error?.Message, 300);
            // A query parameter that did not bind names itself ("Failed to bind parameter \"bool? background\" from ...").
            var bound = System.Text.RegularExpressions.Regex.Match(error?.Message ?? "", "parameter \"(?:[^\" ]+ )?([A-Za-z_]+)\"");
            var errors = status is >= 400 and < 500 && detail is not null
                ? new Dictionary<string, object?> { ["errors"] = new Dictionary<string, string[]> { [bound.Success ? bound.Groups[1].Value : "body"] = [detail] } }
                : null;
            await Results.Problem(statusCode: status, title: title, detail: detail, extensions: errors).ExecuteAsync(context);
        }));
        app.UseStatusCodePages(async pages => await StatusProblem(pages.HttpContext).ExecuteAsync(pages.HttpContext));
    }
}
