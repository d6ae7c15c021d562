using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Core.Imports;
using Seepage.Core.Sections;

namespace Seepage.Api.Errors;

/// <summary>The service's one vocabulary of RFC 9457 problem responses. Every endpoint answers bad input through
/// these, so the same fault reads the same everywhere: <c>errors</c> keyed by JSON pointer, spreadsheet cell or
/// query parameter, each with its messages.</summary>
public static class ApiProblems
{
    /// <summary>Problems grouped by key (JSON pointer, cell, parameter): the shape of the <c>errors</c> member.</summary>
    public static Dictionary<string, string[]> Errors<T>(IEnumerable<T> problems, Func<T, string> key,
        Func<T, string> message) =>
        problems.GroupBy(key).ToDictionary(g => g.Key, g => g.Select(message).ToArray());

    /// <summary>Section problems keyed by the JSON pointer of the member concerned.</summary>
    public static Dictionary<string, string[]> Errors(IEnumerable<SectionProblem> problems) =>
        Errors(problems, p => p.Pointer, p => p.Message);

    /// <summary>Spreadsheet problems keyed by the cell concerned ("sheet 'soils' row 4 column B").</summary>
    public static Dictionary<string, string[]> Errors(IEnumerable<ImportProblem> problems) =>
        Errors(problems, p => p.Location, p => p.Message);

    /// <summary>400: a document with problems, each listed under its key.</summary>
    public static ValidationProblem Invalid(Dictionary<string, string[]> errors, string title, string? detail = null) =>
        TypedResults.ValidationProblem(errors, title: title,
            detail: detail ?? $"{errors.Values.Sum(v => v.Length)} problem(s) found; each is listed under the " +
                "JSON pointer (or spreadsheet cell) concerned.");

    /// <summary>400: a section document with problems keyed by JSON pointer.</summary>
    public static ValidationProblem InvalidSection(IReadOnlyList<SectionProblem> problems) =>
        Invalid(Errors(problems), "The section document has problems.",
            $"{problems.Count} problem(s) found; each is listed under the JSON pointer of the member concerned.");

    /// <summary>400: a query parameter with a value it cannot take; names the parameter and the allowed values.</summary>
    public static ValidationProblem UnknownValue(string parameter, string value, IEnumerable<string> allowed)
    {
        string message = $"'{value}' is not a value of ?{parameter}=; use one of: {string.Join(", ", allowed)}.";
        return Invalid(new() { [parameter] = [message] }, $"Unknown value of the query parameter '{parameter}'.", message);
    }

    /// <summary>404: no stored item of this kind has the id.</summary>
    public static ProblemHttpResult NotFound(string kind, string id) => TypedResults.Problem(
        statusCode: StatusCodes.Status404NotFound, title: $"No such {kind}.", detail: $"No {kind} has the id '{id}'.");

    /// <summary>413: the body is larger than <see cref="RequestBody.MaxBytes"/>.</summary>
    public static ProblemHttpResult TooLarge(string what) => TypedResults.Problem(
        statusCode: StatusCodes.Status413PayloadTooLarge, title: "The body is too large.",
        detail: $"{what} are limited to {RequestBody.MaxBytes / (1024 * 1024)} MiB.");

    /// <summary>415: the body's Content-Type is not one the endpoint reads.</summary>
    public static ProblemHttpResult UnsupportedType(string type, IEnumerable<string> accepted) => TypedResults.Problem(
        statusCode: StatusCodes.Status415UnsupportedMediaType, title: "Unsupported Content-Type.",
        detail: $"'{type}' is not a type this endpoint reads; send {string.Join(" or ", accepted)}.");

    /// <summary>400 for a body that could be taken but not read (empty, not a spreadsheet, …).</summary>
    public static ProblemHttpResult Unreadable(string detail) => TypedResults.Problem(
        statusCode: StatusCodes.Status400BadRequest, title: "The body could not be read.", detail: detail);
}
