using System.Text;
using System.Text.Json;

namespace Seepage.Core.Sections;

/// <summary>Finds the first member given twice in one JSON object (RFC 8259 leaves which one counts to the reader, so it is
/// refused rather than guessed) and returns its JSON pointer (RFC 6901), e.g. <c>/alternatives/0/changes/~1heads~10~1total</c>.
/// The text must be syntactically valid JSON (comments and trailing commas allowed).</summary>
public static class DuplicateMemberFinder
{
    public static string? Find(string json)
    {
        var reader = new Utf8JsonReader(Encoding.UTF8.GetBytes(json),
            new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true, MaxDepth = 64 });
        // One frame per open container: the member names seen (objects) or the next index (arrays), and the frame's key.
        var frames = new Stack<(HashSet<string>? Names, int Index, string Key)>();
        string pendingKey = "";
        try
        {
            while (reader.Read())
            {
                switch (reader.TokenType)
                {
                    case JsonTokenType.StartObject or JsonTokenType.StartArray:
                        string key = ElementKey(frames, pendingKey);
                        frames.Push((reader.TokenType == JsonTokenType.StartObject ? new HashSet<string>() : null, 0, key));
                        break;
                    case JsonTokenType.EndObject or JsonTokenType.EndArray:
                        frames.Pop();
                        Advance(frames);
                        break;
                    case JsonTokenType.PropertyName:
                        pendingKey = reader.GetString()!;
                        if (!frames.Peek().Names!.Add(pendingKey)) return Pointer(frames, pendingKey);
                        break;
                    default:
                        Advance(frames);
                        break;
                }
            }
        }
        catch (JsonException)
        {
            return null; // not valid JSON: the parser reports that
        }
        return null;
    }

    // The key under which the value about to start sits: the pending member name in an object, the index in an array.
    private static string ElementKey(Stack<(HashSet<string>? Names, int Index, string Key)> frames, string pendingKey) =>
        frames.Count == 0 ? "" : frames.Peek().Names is null ? frames.Peek().Index.ToString(System.Globalization.CultureInfo.InvariantCulture) : pendingKey;

    private static void Advance(Stack<(HashSet<string>? Names, int Index, string Key)> frames)
    {
        if (frames.Count > 0 && frames.Peek().Names is null)
        {
            var top = frames.Pop();
            frames.Push(top with { Index = top.Index + 1 });
        }
    }

    private static string Pointer(Stack<(HashSet<string>? Names, int Index, string Key)> frames, string last)
    {
        var keys = frames.Reverse().Skip(1).Select(f => f.Key).Append(last);
        return string.Concat(keys.Select(k => "/" + k.Replace("~", "~0").Replace("/", "~1")));
    }
}
