using Microsoft.AspNetCore.Diagnostics;

namespace Seepage.Api;

/// <summary>Turns exceptions that escape an endpoint into RFC 9457 problem details: request-reading failures
/// (malformed or oversize bodies) are the client's (400/413), anything else a server fault (500).</summary>
public static class ErrorHandling
{
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
            await Results.Problem(statusCode: status, title: title, detail: status == 500 ? null : error?.Message).ExecuteAsync(context);
        }));
        app.UseStatusCodePages();
    }
}
