using System.Text.Json;

namespace Seepage.Core.Sections;

/// <summary>Reads a section document from JSON text, turning syntax and type errors into problems with a
/// JSON pointer instead of exceptions.</summary>
public static class SectionParser
{
    internal static readonly JsonSerializerOptions Options = new()
    {
        PropertyNameCaseInsensitive = false,
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        ReadCommentHandling = JsonCommentHandling.Skip,
        AllowTrailingCommas = true,
        MaxDepth = 32,
        AllowDuplicateProperties = false,
    };

    /// <summary>Parses <paramref name="json"/>; returns the document, or null with the problems.</summary>
    public static SectionDocument? Parse(string json, out IReadOnlyList<SectionProblem> problems)
    {
        JsonDocument parsed;
        try { parsed = JsonDocument.Parse(json, DocumentOptions); }
        catch (JsonException ex)
        {
            problems = [new SectionProblem(ex.Path is null ? JsonSyntaxLocator.PointerOfFailure(json) : ToPointer(ex.Path),
                Describe(ex))];
            return null;
        }
        using (parsed)
        {
            if (parsed.RootElement.ValueKind != JsonValueKind.Object)
            {
                problems = [new SectionProblem("", $"must be a section document (a JSON object); found {Kind(parsed.RootElement)}.")];
                return null;
            }
            var found = new List<SectionProblem>();
            SectionContract.Check(parsed.RootElement, found);
            problems = found;
            if (found.Count > 0) return null;
            try { return parsed.RootElement.Deserialize<SectionDocument>(Options); }
            catch (JsonException ex)
            {
                // Not reached for a document the contract check passed; kept so that a gap there is still a 400.
                problems = [new SectionProblem(ToPointer(ex.Path), "has a value of the wrong kind for this member.")];
                return null;
            }
        }
    }

    private static readonly JsonDocumentOptions DocumentOptions = new()
    {
        CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true, MaxDepth = 32,
    };

    private static string Kind(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.Array => "a list", JsonValueKind.String => "text", JsonValueKind.Number => "a number",
        JsonValueKind.Null => "null", _ => e.ValueKind.ToString().ToLowerInvariant(),
    };

    /// <summary>Serialises a document back to JSON with the contract's names.</summary>
    public static string Write(SectionDocument document) => JsonSerializer.Serialize(document, Options);

    // A syntax error: where it is (line and character, counted from 1) and what the reader expected there.
    private static string Describe(JsonException ex)
    {
        string position = ex.LineNumber is { } line ? $" at line {line + 1}, character {ex.BytePositionInLine + 1}" : "";
        string message = ex.Message;
        foreach (string tail in new[] { " LineNumber:", " Path:" })
        {
            int cut = message.IndexOf(tail, StringComparison.Ordinal);
            if (cut > 0) message = message[..cut];
        }
        message = message.Trim().TrimEnd('.');
        return $"is not valid JSON{position}: {message}.";
    }

    /// <summary>Turns a System.Text.Json path such as <c>$.soils[0].kx</c> into the pointer <c>/soils/0/kx</c>.</summary>
    public static string ToPointer(string? path)
    {
        if (string.IsNullOrEmpty(path) || path == "$") return "";
        var sb = new System.Text.StringBuilder();
        int i = path.StartsWith('$') ? 1 : 0;
        while (i < path.Length)
        {
            char c = path[i];
            if (c == '.')
            {
                int end = i + 1;
                while (end < path.Length && path[end] != '.' && path[end] != '[') end++;
                sb.Append('/').Append(path, i + 1, end - i - 1);
                i = end;
            }
            else if (c == '[')
            {
                int end = path.IndexOf(']', i);
                if (end < 0) break;
                string inner = path.Substring(i + 1, end - i - 1).Trim('\'');
                sb.Append('/').Append(inner);
                i = end + 1;
            }
            else i++;
        }
        return sb.ToString();
    }
}
