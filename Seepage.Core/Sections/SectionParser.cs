using System.Text.Json;

namespace Seepage.Core.Sections;

/// <summary>Reads a section document from JSON text, turning syntax and type errors into problems with a
/// JSON pointer instead of exceptions.</summary>
public static class SectionParser
{
    private static readonly JsonSerializerOptions Options = new()
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
        try
        {
            var document = JsonSerializer.Deserialize<SectionDocument>(json, Options);
            if (document is null)
            {
                problems = [new SectionProblem("", "The body is JSON null; a section document (object) is expected.")];
                return null;
            }
            problems = [];
            return document;
        }
        catch (JsonException ex)
        {
            problems = [new SectionProblem(ToPointer(ex.Path), Describe(ex))];
            return null;
        }
    }

    /// <summary>Serialises a document back to JSON with the contract's names.</summary>
    public static string Write(SectionDocument document) => JsonSerializer.Serialize(document, Options);

    private static string Describe(JsonException ex)
    {
        string position = ex.LineNumber is { } line ? $" (line {line + 1}, byte {ex.BytePositionInLine + 1})" : "";
        string message = ex.Message;
        int cut = message.IndexOf(" Path:", StringComparison.Ordinal);
        if (cut > 0) message = message[..cut];
        return $"Malformed or mistyped JSON{position}: {message}";
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
