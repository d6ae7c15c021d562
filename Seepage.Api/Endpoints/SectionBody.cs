using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.Extensions.Options;
using Seepage.Api.Errors;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>Reads a section document from a request body (<see cref="RequestBody"/>: JSON only, size-bounded),
/// parses and validates it.</summary>
public static class SectionBody
{
    /// <summary>Largest accepted body, bytes; the same limit as every other body.</summary>
    public const int MaxBytes = RequestBody.MaxBytes;

    /// <summary>The validated model and the JSON as posted; or the refusal of the body (413, 415); or the
    /// problems.</summary>
    public sealed record Outcome(SectionModel? Model, string? Json, IReadOnlyList<SectionProblem> Problems,
        ProblemHttpResult? Refusal)
    {
        /// <summary>400 listing the problems when the section is not valid, else null.</summary>
        public ValidationProblem? Invalid =>
            Refusal is null && (Model is null || Problems.Count > 0) ? ApiProblems.InvalidSection(Problems) : null;
    }

    public static async Task<Outcome> ReadAsync(HttpRequest request, CancellationToken cancellation)
    {
        var body = await RequestBody.ReadAsync(request, "Section documents", [RequestBody.Json], cancellation);
        if (body.Refusal is { } refusal) return new Outcome(null, null, [], refusal);
        string json = body.Text;
        if (string.IsNullOrWhiteSpace(json))
            return new Outcome(null, json,
                [new SectionProblem("", "The body is empty; post a section document (JSON object).")], null);
        var document = SectionParser.Parse(json, out var parseProblems);
        if (document is null) return new Outcome(null, json, parseProblems, null);
        var outcome = SectionValidator.Validate(document);
        // Work over the server's budget is refused like any other problem, before anything starts.
        var limits = request.HttpContext.RequestServices.GetService<IOptions<ServiceLimits>>()?.Value;
        if (outcome.Model is { } model && limits?.OverBudget(model) is { } overBudget)
            return new Outcome(null, json, [overBudget], null);
        return new Outcome(outcome.Model, json, outcome.Problems, null);
    }
}
