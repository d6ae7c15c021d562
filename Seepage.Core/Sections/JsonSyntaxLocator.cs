using System.Text;
using System.Text.Json;

namespace Seepage.Core.Sections;

/// <summary>Finds the JSON pointer of the member being read where a JSON text stops being valid, so that a syntax
/// error in a section is reported at its member (a truncated <c>{ "soils": [</c> at <c>/soils/0</c>).</summary>
internal static class JsonSyntaxLocator
{
    private sealed class Frame(bool array)
    {
        public bool Array { get; } = array;
        public int Index { get; set; } = -1;
        public string? Property { get; set; }
    }

    /// <summary>The pointer of the innermost member open where reading fails; "" when it fails at the top level or
    /// the text reads to its end.</summary>
    public static string PointerOfFailure(string json)
    {
        var frames = new List<Frame>();
        var reader = new Utf8JsonReader(Encoding.UTF8.GetBytes(json), new JsonReaderOptions
        {
            CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true, MaxDepth = 32, // as the parser: a too-deep text fails here too
        });
        try
        {
            while (reader.Read())
            {
                switch (reader.TokenType)
                {
                    case JsonTokenType.PropertyName:
                        if (frames.Count > 0) frames[^1].Property = reader.GetString();
                        break;
                    case JsonTokenType.StartObject or JsonTokenType.StartArray:
                        if (frames.Count > 0 && frames[^1].Array) frames[^1].Index++;
                        frames.Add(new Frame(reader.TokenType == JsonTokenType.StartArray));
                        break;
                    case JsonTokenType.EndObject or JsonTokenType.EndArray:
                        if (frames.Count > 0) frames.RemoveAt(frames.Count - 1);
                        break;
                    default:
                        if (frames.Count > 0 && frames[^1].Array) frames[^1].Index++;
                        break;
                }
            }
            return "";
        }
        catch (JsonException)
        {
            var pointer = new StringBuilder();
            foreach (var f in frames)
            {
                if (f.Array) pointer.Append('/').Append(Math.Max(f.Index, 0));
                else if (f.Property is { } name) pointer.Append('/').Append(name.Replace("~", "~0").Replace("/", "~1"));
            }
            return pointer.ToString();
        }
    }
}
