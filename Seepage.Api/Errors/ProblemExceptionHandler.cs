using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Core.Meshing;
using Seepage.Core.Solvers;

namespace Seepage.Api.Errors;

/// <summary>The one place where exceptions that escape an endpoint become RFC 9457 problem details:
/// <list type="bullet">
/// <item><see cref="MeshingException"/> → 400: the section is valid JSON but cannot be meshed (errors under "").</item>
/// <item><see cref="MatrixRefusedException"/> → 422: the assembled system was refused before solving.</item>
/// <item><see cref="SolverNotConvergedException"/> → 422 with the method, iterations, residual and target.</item>
/// <item>a cancelled request → 499 (the client went away); a server time limit → 504.</item>
/// <item>request-reading failures → their own status (400, 413); anything else → 500, logged.</item>
/// </list></summary>
public sealed class ProblemExceptionHandler(ILogger<ProblemExceptionHandler> logger) : IExceptionHandler
{
    /// <summary>Status for a request the client cancelled (a common convention; no standard code exists).</summary>
    public const int ClientClosedRequest = 499;

    public async ValueTask<bool> TryHandleAsync(HttpContext context, Exception exception, CancellationToken cancellation)
    {
        var problem = For(exception, context.RequestAborted.IsCancellationRequested);
        if (problem is ProblemHttpResult { StatusCode: >= 500 and not StatusCodes.Status504GatewayTimeout })
            logger.LogError(exception, "Unhandled error");
        await problem.ExecuteAsync(context);
        return true;
    }

    /// <summary>The problem response for an exception; <paramref name="clientGone"/> tells a cancellation by the
    /// client from one by a server time limit.</summary>
    public static IResult For(Exception exception, bool clientGone) => exception switch
    {
        MeshingException e => ApiProblems.Invalid(new() { [""] = [e.Message] }, "The section could not be meshed.",
            e.Message),
        MatrixRefusedException e => TypedResults.Problem(statusCode: StatusCodes.Status422UnprocessableEntity,
            title: "The assembled system was refused before solving.", detail: e.Message,
            extensions: new Dictionary<string, object?> { ["method"] = e.Method, ["reason"] = e.Reason }),
        SolverNotConvergedException e => TypedResults.Problem(statusCode: StatusCodes.Status422UnprocessableEntity,
            title: "The linear solve did not converge.", detail: e.Message,
            extensions: new Dictionary<string, object?>
            {
                ["method"] = e.Method, ["iterations"] = e.Iterations, ["residual"] = Finite(e.Residual),
                ["tolerance"] = e.Tolerance,
            }),
        OperationCanceledException when clientGone => TypedResults.Problem(statusCode: ClientClosedRequest,
            title: "The request was cancelled.", detail: "The client closed the request before the answer was ready."),
        OperationCanceledException or TimeoutException => TypedResults.Problem(
            statusCode: StatusCodes.Status504GatewayTimeout, title: "The request took longer than the server allows.",
            detail: exception.Message),
        BadHttpRequestException { StatusCode: StatusCodes.Status413PayloadTooLarge } => ApiProblems.TooLarge("Bodies"),
        BadHttpRequestException e => TypedResults.Problem(statusCode: e.StatusCode,
            title: "The request could not be read.", detail: e.Message),
        _ => TypedResults.Problem(statusCode: StatusCodes.Status500InternalServerError,
            title: "The analysis failed unexpectedly."),
    };

    // JSON has no NaN: a residual that was never computed is written as null.
    private static double? Finite(double value) => double.IsFinite(value) ? value : null;
}
