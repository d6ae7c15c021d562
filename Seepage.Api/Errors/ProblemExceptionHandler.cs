using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Diagnostics;
using Seepage.Core.Meshing;
using Seepage.Core.Results;
using Seepage.Core.Solvers;

namespace Seepage.Api.Errors;

/// <summary>The one place where exceptions that escape an endpoint become RFC 9457 problem details:
/// <list type="bullet">
/// <item><see cref="RequestRefusedException"/> → the refusal it carries (413, 415).</item>
/// <item><see cref="MeshingException"/> → 400: the section is valid JSON but cannot be meshed (errors under "").</item>
/// <item><see cref="MatrixRefusedException"/> → 422: the assembled system was refused before solving.</item>
/// <item><see cref="SolverNotConvergedException"/> → 422 with the method, iterations, residual and target.</item>
/// <item><see cref="NonFiniteResultException"/> → 422 naming the member that is not finite.</item>
/// <item>a cancelled request → 499 (the client went away); a server time limit → 504.</item>
/// <item>request-reading failures → their own status (400, 413) with <c>errors</c> naming the query parameter
/// that did not bind, or the body; anything else → 500, logged.</item>
/// </list></summary>
public sealed partial class ProblemExceptionHandler(ILogger<ProblemExceptionHandler> logger) : IExceptionHandler
{
    /// <summary>Status for a request the client cancelled (a common convention; no standard code exists).</summary>
    public const int ClientClosedRequest = 499;

    public async ValueTask<bool> TryHandleAsync(HttpContext context, Exception exception, CancellationToken cancellation)
    {
        var problem = For(exception, context.RequestAborted.IsCancellationRequested);
        if (problem is IStatusCodeHttpResult { StatusCode: >= 500 and not StatusCodes.Status504GatewayTimeout })
            logger.LogError(exception, "Unhandled error");
        await problem.ExecuteAsync(context);
        return true;
    }

    /// <summary>The problem response for an exception; <paramref name="clientGone"/> tells a cancellation by the
    /// client from one by a server time limit.</summary>
    public static IResult For(Exception exception, bool clientGone) => exception switch
    {
        RequestRefusedException e => e.Problem,
        MeshingException e => ApiProblems.Invalid(new() { [""] = [e.Message] }, "The section could not be meshed.",
            e.Message),
        MatrixRefusedException e => AnalysisProblems.Refused(e),
        SolverNotConvergedException e => AnalysisProblems.NotConverged(e),
        NonFiniteResultException e => AnalysisProblems.NonFinite(e),
        OperationCanceledException when clientGone => TypedResults.Problem(statusCode: ClientClosedRequest,
            title: "The request was cancelled.", detail: "The client closed the request before the answer was ready."),
        OperationCanceledException or TimeoutException => TypedResults.Problem(
            statusCode: StatusCodes.Status504GatewayTimeout, title: "The request took longer than the server allows.",
            detail: exception.Message),
        BadHttpRequestException { StatusCode: StatusCodes.Status413PayloadTooLarge } => ApiProblems.TooLarge("Bodies"),
        BadHttpRequestException e => ApiProblems.Refused(e.StatusCode, "The request could not be read.",
            // A query parameter that did not bind names itself ("Failed to bind parameter \"bool? background\" …").
            BoundParameter().Match(e.Message) is { Success: true } m ? m.Groups[1].Value : "body",
            Core.SafeText.Of(e.Message, 300)),
        _ => TypedResults.Problem(statusCode: StatusCodes.Status500InternalServerError,
            title: "The analysis failed unexpectedly."),
    };

    [GeneratedRegex("parameter \"(?:[^\" ]+ )?([A-Za-z_]+)\"")]
    private static partial Regex BoundParameter();
}
