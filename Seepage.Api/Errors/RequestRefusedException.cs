using Microsoft.AspNetCore.Http.HttpResults;

namespace Seepage.Api.Errors;

/// <summary>Thrown by a body reader deep in a request's parsing when the body is refused as a whole (413, 415);
/// <see cref="ProblemExceptionHandler"/> answers with <see cref="Problem"/>, so readers whose callers only collect
/// per-member problems need not carry a refusal back.</summary>
public sealed class RequestRefusedException(ProblemHttpResult problem)
    : Exception(problem.ProblemDetails.Detail ?? problem.ProblemDetails.Title)
{
    /// <summary>The problem answered for the request.</summary>
    public ProblemHttpResult Problem { get; } = problem;
}
