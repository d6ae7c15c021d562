using System.Text.Json.Nodes;

namespace Seepage.Core.Studies;

/// <summary>JSON pointers (RFC 6901, "JavaScript Object Notation (JSON) Pointer", 2013): <c>/cutoffs/1/tip/1</c> names the
/// second coordinate of the second cutoff's tip; <c>~1</c> stands for '/' and <c>~0</c> for '~' inside a name.</summary>
public static class JsonPointer
{
    /// <summary>The reference tokens of a pointer, unescaped; null when the text is not a pointer (it must be empty or
    /// start with '/').</summary>
    public static IReadOnlyList<string>? Tokens(string pointer)
    {
        if (pointer.Length == 0) return [];
        if (pointer[0] != '/') return null;
        return pointer[1..].Split('/').Select(t => t.Replace("~1", "/").Replace("~0", "~")).ToList();
    }

    /// <summary>Sets the member or array element the pointer names to a copy of <paramref name="value"/>: an object member is
    /// added or replaced, an array element replaced (index equal to the length, or "-", appends). Returns null on success,
    /// else why the pointer could not be followed.</summary>
    public static string? Set(JsonNode root, string pointer, JsonNode? value)
    {
        var tokens = Tokens(pointer);
        if (tokens is null) return "is not a JSON pointer; it must start with '/' (RFC 6901), e.g. /cutoffs/1/tip/1.";
        if (tokens.Count == 0) return "names the whole section; name a member such as /heads/0/total.";
        JsonNode? parent = root;
        for (int i = 0; i < tokens.Count - 1; i++)
        {
            parent = Child(parent, tokens[i]);
            if (parent is null) return $"cannot be followed: '{string.Join('/', tokens.Take(i + 1))}' is not in the base section.";
        }
        string last = tokens[^1];
        var copy = value?.DeepClone();
        switch (parent)
        {
            case JsonObject obj:
                obj[last] = copy;
                return null;
            case JsonArray array:
                if (last == "-" ) { array.Add(copy); return null; }
                if (!int.TryParse(last, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int index)
                    || index > array.Count)
                    return $"cannot be followed: '{last}' is not an index of an array of {array.Count} elements.";
                if (index == array.Count) array.Add(copy);
                else array[index] = copy;
                return null;
            default:
                return "cannot be followed: its parent is not an object or an array.";
        }
    }

    /// <summary>The node the pointer names, or null.</summary>
    public static JsonNode? Get(JsonNode? root, string pointer)
    {
        var tokens = Tokens(pointer);
        if (tokens is null) return null;
        foreach (string t in tokens) root = Child(root, t);
        return root;
    }

    private static JsonNode? Child(JsonNode? node, string token) => node switch
    {
        JsonObject obj => obj.TryGetPropertyValue(token, out var v) ? v : null,
        JsonArray array => int.TryParse(token, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int i)
            && i < array.Count ? array[i] : null,
        _ => null,
    };
}
