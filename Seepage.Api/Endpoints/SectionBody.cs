using Microsoft.Extensions.Options;
using System.Text;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>Reads a section document from a request body: size limit, JSON parse, validation.</summary>
public static class SectionBody
{
    /// <summary>Largest accepted body, bytes (4 MiB).</summary>
    public const int MaxBytes = 4 * 1024 * 1024;

    public sealed record Outcome(SectionModel? Model, string? Json, IReadOnlyList<SectionProblem> Problems, bool TooLarge);

    public static async Task<Outcome> ReadAsync(HttpRequest request, CancellationToken cancellation)
    {
        if (request.ContentLength > MaxBytes) return new Outcome(null, null, [], true);
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = await request.Body.ReadAsync(chunk, cancellation)) > 0)
        {
            buffer.Write(chunk, 0, read);
            if (buffer.Length > MaxBytes) return new Outcome(null, null, [], true);
        }
        string json = Encoding.UTF8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length);
        if (string.IsNullOrWhiteSpace(json))
            return new Outcome(null, json, [new SectionProblem("", "The body is empty; post a section document (JSON object).")], false);
        var document = SectionParser.Parse(json, out var parseProblems);
        if (document is null) return new Outcome(null, json, parseProblems, false);
        var outcome = SectionValidator.Validate(document);
        // Work over the server's budget is refused like any other problem, before anything starts.
        var limits = request.HttpContext.RequestServices.GetService<IOptions<ServiceLimits>>()?.Value;
        if (outcome.Model is { } model && limits?.OverBudget(model) is { } overBudget) return new Outcome(null, json, [overBudget], false);
        return new Outcome(outcome.Model, json, outcome.Problems, false);
    }

    /// <summary>Problems grouped by JSON pointer, the shape of the problem details' <c>errors</c> member.</summary>
    public static Dictionary<string, string[]> ToErrors(IEnumerable<SectionProblem> problems) =>
        problems.GroupBy(p => p.Pointer).ToDictionary(g => g.Key, g => g.Select(p => p.Message).ToArray());
}
