using Microsoft.AspNetCore.Http.HttpResults;

namespace Seepage.Api.Endpoints;

/// <summary>The RFC 9457 problem responses shared by the section-taking endpoints.</summary>
public static class SectionProblems
{
    public static ValidationProblem Invalid(SectionBody.Outcome outcome) => TypedResults.ValidationProblem(
        SectionBody.ToErrors(outcome.Problems),
        title: "The section document has problems.",
        detail: $"{outcome.Problems.Count} problem(s) found; each is listed under the JSON pointer of the member concerned.");

    public static ProblemHttpResult TooLarge() => TypedResults.Problem(
        statusCode: StatusCodes.Status413PayloadTooLarge,
        title: "The body is too large.",
        detail: $"Section documents are limited to {SectionBody.MaxBytes / (1024 * 1024)} MiB.");
}
