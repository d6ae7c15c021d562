using System.Globalization;
using System.Text.Json;
using Seepage.Api.Application;

namespace Seepage.Api.Endpoints;

/// <summary>Reads the query of a listing (<c>page</c> from 1, <c>pageSize</c> 1 … 100, default 20, <c>title</c> a substring of
/// at most 200 characters) and the body of a rename (<c>{ "title": "…" }</c>); problems are keyed by the member's name.</summary>
public static class ListParameters
{
    public const int DefaultPageSize = 20, MaxPageSize = 100, MaxTitleLength = 200;

    public static ListQuery? Read(string? page, string? pageSize, string? title, Dictionary<string, string[]> errors)
    {
        int p = Number(page, "page", 1, int.MaxValue / MaxPageSize, 1, errors);
        int size = Number(pageSize, "pageSize", 1, MaxPageSize, DefaultPageSize, errors);
        if (title is { Length: > MaxTitleLength }) errors["title"] = [$"must be at most {MaxTitleLength} characters."];
        return errors.Count > 0 ? null : new ListQuery(p, size, string.IsNullOrEmpty(title) ? null : title);
    }

    /// <summary>The new title of a rename body, or null with the problems keyed by JSON pointer.</summary>
    public static async Task<string?> ReadTitleAsync(HttpRequest request, Dictionary<string, string[]> errors, CancellationToken cancellation)
    {
        JsonDocument document;
        try { document = await JsonDocument.ParseAsync(request.Body, new JsonDocumentOptions { MaxDepth = 8 }, cancellation); }
        catch (JsonException ex) { errors[""] = ["Malformed JSON: " + ex.Message]; return null; }
        using (document)
        {
            if (document.RootElement.ValueKind != JsonValueKind.Object) { errors[""] = ["must be an object { \"title\": \"…\" }."]; return null; }
            foreach (var member in document.RootElement.EnumerateObject())
                if (member.Name != "title") errors["/" + member.Name] = ["is not a member of a rename; only title can be changed."];
            if (!document.RootElement.TryGetProperty("title", out var t) || t.ValueKind != JsonValueKind.String)
                errors["/title"] = ["must be a string."];
            else if (t.GetString()!.Trim() is var text && (text.Length == 0 || text.Length > MaxTitleLength))
                errors["/title"] = [$"must have 1 to {MaxTitleLength} characters."];
            else if (text.Any(char.IsControl)) errors["/title"] = ["must not contain control characters."];
            return errors.Count > 0 ? null : t.GetString()!.Trim();
        }
    }

    private static int Number(string? text, string name, int min, int max, int fallback, Dictionary<string, string[]> errors)
    {
        if (text is null) return fallback;
        if (int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int value) && value >= min && value <= max) return value;
        errors[name] = [$"'{Excerpt(text)}' is not a whole number from {min} to {max}."];
        return fallback;
    }

    private static string Excerpt(string text) => text.Length <= 20 ? text : text[..20] + "…";
}
