using System.Collections.Concurrent;
using System.Reflection;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace Seepage.Core.Sections;

/// <summary>
/// The shape of the section document, read by reflection from the document records themselves (so a member added to
/// a record is known here with no second list): which members each object has and what kind of value each takes.
/// Checks a posted document against it before it is read, so that an unknown member, at any depth, is refused at its
/// JSON pointer with the near names ("did you mean `requiredFactor`?"), and a value of the wrong kind is named with what
/// was expected and what was found. Top-level members whose names start with <c>x-</c> are extensions: kept with the
/// posted section and ignored by the analysis.
/// </summary>
public static class SectionContract
{
    private static readonly ConcurrentDictionary<Type, IReadOnlyDictionary<string, PropertyInfo>> Cache = new();

    /// <summary>Whether a top-level member is an extension (name starting with "x-"), which the analysis ignores.</summary>
    public static bool IsExtension(string name) => name.StartsWith("x-", StringComparison.Ordinal);

    /// <summary>The members (JSON names) of a contract record, keyed by name.</summary>
    public static IReadOnlyDictionary<string, PropertyInfo> MembersOf(Type record) => Cache.GetOrAdd(record, t =>
        t.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .Where(p => p.GetCustomAttribute<JsonExtensionDataAttribute>() is null && p.GetCustomAttribute<JsonIgnoreAttribute>() is null)
            .ToDictionary(p => p.GetCustomAttribute<JsonPropertyNameAttribute>()?.Name ?? JsonNamingPolicy.CamelCase.ConvertName(p.Name),
                p => p, StringComparer.Ordinal));

    /// <summary>Adds a problem for every unknown member, repeated member and value of the wrong kind in
    /// <paramref name="root"/>, at its JSON pointer.</summary>
    public static void Check(JsonElement root, List<SectionProblem> problems) =>
        Walk(typeof(SectionDocument), root, "", problems);

    /// <summary>Null when <paramref name="pointer"/> names a member (or array element) the contract has; otherwise why
    /// not, with the near names. Used for the changes of a study.</summary>
    public static string? CheckPointer(string pointer)
    {
        var tokens = Studies.JsonPointer.Tokens(pointer);
        if (tokens is null) return "is not a JSON pointer; it must start with '/' (RFC 6901), e.g. /cutoffs/1/tip/1.";
        Type type = typeof(SectionDocument);
        string at = "";
        foreach (string token in tokens)
        {
            type = Nullable.GetUnderlyingType(type) ?? type;
            if (ElementType(type) is { } element)
            {
                if (token != "-" && !token.All(char.IsAsciiDigit))
                    return $"cannot be followed: {Where(at)} is a list, so '{token}' must be an index (0, 1, …).";
                type = element;
            }
            else if (IsRecord(type))
            {
                var members = MembersOf(type);
                if (!members.TryGetValue(token, out var property))
                    return at.Length == 0 && IsExtension(token) ? null : Unknown(token, at, members.Keys);
                type = property.PropertyType;
            }
            else return $"cannot be followed: {Where(at)} is a single value and has no member '{token}'.";
            at += "/" + token;
        }
        return null;
    }

    private static void Walk(Type type, JsonElement e, string at, List<SectionProblem> problems)
    {
        var underlying = Nullable.GetUnderlyingType(type);
        if (e.ValueKind == JsonValueKind.Null)
        {
            if (type.IsValueType && underlying is null) problems.Add(new(at, $"must be {Expected(type)}; found null."));
            return;
        }
        type = underlying ?? type;
        if (type == typeof(object) || type == typeof(JsonElement)) return;
        if (type == typeof(string)) { Expect(e, JsonValueKind.String, type, at, problems); return; }
        if (type == typeof(bool))
        {
            if (e.ValueKind is not (JsonValueKind.True or JsonValueKind.False)) Wrong(type, e, at, problems);
            return;
        }
        if (type == typeof(double))
        {
            if (!Expect(e, JsonValueKind.Number, type, at, problems)) return;
            if (!e.TryGetDouble(out double d) || !double.IsFinite(d))
                problems.Add(new(at, $"is {e.GetRawText()}, beyond the range of a number."));
            return;
        }
        if (type == typeof(int))
        {
            if (Expect(e, JsonValueKind.Number, type, at, problems) && !e.TryGetInt32(out _))
                problems.Add(new(at, $"must be a whole number; found {e.GetRawText()}."));
            return;
        }
        if (ElementType(type) is { } element)
        {
            if (!Expect(e, JsonValueKind.Array, type, at, problems)) return;
            int i = 0;
            foreach (var item in e.EnumerateArray()) Walk(element, item, $"{at}/{i++}", problems);
            return;
        }
        if (type.IsGenericType && type.GetGenericTypeDefinition() == typeof(Dictionary<,>))
        {
            if (!Expect(e, JsonValueKind.Object, type, at, problems)) return;
            foreach (var p in e.EnumerateObject()) Walk(type.GetGenericArguments()[1], p.Value, $"{at}/{Escape(p.Name)}", problems);
            return;
        }
        if (!IsRecord(type) || !Expect(e, JsonValueKind.Object, type, at, problems)) return;
        var members = MembersOf(type);
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var p in e.EnumerateObject())
        {
            string pointer = $"{at}/{Escape(p.Name)}";
            if (!seen.Add(p.Name)) { problems.Add(new(pointer, "appears twice in the same object; give each member once.")); continue; }
            if (members.TryGetValue(p.Name, out var property)) Walk(property.PropertyType, p.Value, pointer, problems);
            else if (!(at.Length == 0 && IsExtension(p.Name))) problems.Add(new(pointer, Unknown(p.Name, at, members.Keys)));
        }
    }

    private static string Unknown(string name, string at, IEnumerable<string> members)
    {
        var names = members.ToList();
        string near = NearMatch.Suggestion(name, names) is { } s ? " " + char.ToUpperInvariant(s[0]) + s[1..] : "";
        string extension = at.Length == 0 ? " (names starting with x- are extensions the analysis ignores)" : "";
        return $"is not a member of {Where(at)}.{near} Its members are {string.Join(", ", names)}{extension}.";
    }

    private static string Where(string at) => at.Length == 0 ? "the section document" : at;

    private static bool Expect(JsonElement e, JsonValueKind kind, Type type, string at, List<SectionProblem> problems)
    {
        if (e.ValueKind == kind) return true;
        Wrong(type, e, at, problems);
        return false;
    }

    private static void Wrong(Type type, JsonElement e, string at, List<SectionProblem> problems)
    {
        string message = $"must be {Expected(type)}; found {Found(e)}.";
        if (e.ValueKind == JsonValueKind.String && (type == typeof(double) || type == typeof(int)))
        {
            string text = e.GetString()!.Trim();
            int digits = 0;
            while (digits < text.Length && (char.IsAsciiDigit(text[digits]) || text[digits] is '.' or '-' or '+' or 'e' or 'E')) digits++;
            if (digits == text.Length && digits > 0) message += " Write the number without quotes.";
            else if (digits > 0)
                message += " Write the number alone: units are set for the whole section by conductivityUnit, lengthUnit and unitWeightUnit.";
        }
        problems.Add(new(at, message));
    }

    private static string Expected(Type type)
    {
        type = Nullable.GetUnderlyingType(type) ?? type;
        if (type == typeof(double)) return "a number";
        if (type == typeof(int)) return "a whole number";
        if (type == typeof(bool)) return "true or false";
        if (type == typeof(string)) return "text (a JSON string)";
        if (type == typeof(double[])) return "a point [x, y] (two numbers)";
        if (ElementType(type) == typeof(double[])) return "a list of points [[x, y], …]";
        if (ElementType(type) is not null) return "a list (JSON array)";
        return "an object";
    }

    private static string Found(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.String => $"the text \"{Short(e.GetString()!)}\"",
        JsonValueKind.Number => $"the number {Short(e.GetRawText())}",
        JsonValueKind.True or JsonValueKind.False => e.GetRawText(),
        JsonValueKind.Array => $"a list of {e.GetArrayLength()} items",
        JsonValueKind.Object => "an object",
        _ => "null",
    };

    private static string Short(string s) => s.Length <= 40 ? s : s[..40] + "…";

    private static bool IsRecord(Type type) => type.IsClass && type != typeof(string) && ElementType(type) is null && !type.IsGenericType;

    private static Type? ElementType(Type type) =>
        type.IsArray ? type.GetElementType()
        : type.IsGenericType && type.GetGenericTypeDefinition() == typeof(List<>) ? type.GetGenericArguments()[0] : null;

    private static string Escape(string name) => name.Replace("~", "~0").Replace("/", "~1");
}
