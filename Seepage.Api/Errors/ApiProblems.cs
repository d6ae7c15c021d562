using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Core.Imports;
using Seepage.Core.Sections;

namespace Seepage.Api.Errors;

/// <summary>The service's one vocabulary of RFC 9457 problem responses for requests it cannot take. Every endpoint
/// answers bad input through these, so the same fault reads the same everywhere: 400, 413 and 415 carry
/// <c>errors</c> keyed by JSON pointer, spreadsheet cell, query parameter or request part ("body",
/// "Content-Type"), each with its messages; 404 and 409 a detail. Analyses that could not finish are
/// <see cref="AnalysisProblems"/>.</summary>
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
                "JSON pointer (or spreadsheet cell, or query parameter) concerned.");

    /// <summary>400: a section document with problems keyed by JSON pointer.</summary>
    public static ValidationProblem InvalidSection(IReadOnlyList<SectionProblem> problems) =>
        Invalid(Errors(problems), "The section document has problems.",
            $"{problems.Count} problem(s) found; each is listed under the JSON pointer of the member concerned.");

    /// <summary>400: a query parameter with a value it cannot take; names the parameter and the allowed values.</summary>
    public static ValidationProblem UnknownValue(string parameter, string value, IEnumerable<string> allowed)
    {
        string message = $"'{Core.SafeText.Of(value, 60)}' is not a value of ?{parameter}=; use one of: " +
            $"{string.Join(", ", allowed)}.";
        return Invalid(new() { [parameter] = [message] }, $"Unknown value of the query parameter '{parameter}'.", message);
    }

    /// <summary>404: no stored item of this kind has the id.</summary>
    public static ProblemHttpResult NotFound(string kind, string id) => TypedResults.Problem(
        statusCode: StatusCodes.Status404NotFound, title: $"No such {kind}.",
        detail: $"No {kind} has the id '{Core.SafeText.Of(id, 80)}'.");

    /// <summary>409: the request is understood but the item is not in a state to take it.</summary>
    public static ProblemHttpResult Conflict(string title, string detail) => TypedResults.Problem(
        statusCode: StatusCodes.Status409Conflict, title: title, detail: detail);

    /// <summary>413: the body is larger than <see cref="RequestBody.MaxBytes"/>.</summary>
    public static ProblemHttpResult TooLarge(string what) =>
        Refused(StatusCodes.Status413PayloadTooLarge, "The body is too large.", "body",
            $"{what} are limited to {RequestBody.MaxBytes / (1024 * 1024)} MiB.");

    /// <summary>415: the body's Content-Type is not one the endpoint reads.</summary>
    public static ProblemHttpResult UnsupportedType(string type, IEnumerable<string> accepted) =>
        Refused(StatusCodes.Status415UnsupportedMediaType, "Unsupported Content-Type.", "Content-Type",
            $"'{Core.SafeText.Of(type, 80)}' is not a type this endpoint reads; send {string.Join(" or ", accepted)}.");

    /// <summary>400 for a body that could be taken but not read (empty, not a spreadsheet, …), or for the request
    /// part <paramref name="member"/>.</summary>
    public static ProblemHttpResult Unreadable(string detail, string member = "body") =>
        Refused(StatusCodes.Status400BadRequest, "The body could not be read.", member, detail);

    /// <summary>A refusal naming the request part at fault in <c>errors</c>.</summary>
    public static ProblemHttpResult Refused(int status, string title, string member, string message) =>
        TypedResults.Problem(statusCode: status, title: title, detail: message,
            extensions: new Dictionary<string, object?> { ["errors"] = new Dictionary<string, string[]> { [member] = [message] } });

    /// <summary>Problem details for a status set without a body (an unknown route, a method or a content type an
    /// endpoint does not take), naming the part of the request at fault in <c>errors</c>.</summary>
    public static IResult ForStatus(HttpContext http)
    {
        int status = http.Response.StatusCode;
        var (member, message) = status switch
        {
            415 => ("Content-Type", $"'{Core.SafeText.Of(RequestBody.MediaType(http.Request.ContentType) is { Length: > 0 } t ? t : "(none)")}' " +
                "is not a type this endpoint reads; the OpenAPI document (/swagger/v1/swagger.json) lists each operation's types."),
            404 => ("path", "No resource or endpoint has this path."),
            405 => ("method", $"{Core.SafeText.Of(http.Request.Method, 12)} is not allowed on this path."),
            _ => ("request", $"The request was answered {status}."),
        };
        return Refused(status, Microsoft.AspNetCore.WebUtilities.ReasonPhrases.GetReasonPhrase(status), member, message);
    }
}
