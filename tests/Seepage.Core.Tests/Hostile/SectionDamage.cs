using System.Text.Json.Nodes;
using Seepage.Core.Sections;

namespace Seepage.Core.Tests.Hostile;

/// <summary>Damages a section document the way hostile or careless input does. Two families: damages that change what
/// the section says (deleted members, wrong kinds of value, NaN/∞ and extreme numbers, degenerate geometry, structural
/// changes), and damages that must never change it silently (misspelt or unknown members at any depth, unknown enumerated
/// values, other spellings of known ones, extension members): those are refused or leave the model exactly as it was.</summary>
internal sealed class SectionDamage(Random random)
{
    /// <summary>Damages applied, for the failure message.</summary>
    public List<string> Applied { get; } = [];

    /// <summary>True when a damage that changes the section was applied (so the model may legitimately differ).</summary>
    public bool ChangesValues { get; private set; }

    /// <summary>Unknown members put in (pointers): while they remain outside the contract, the section must be refused.</summary>
    public List<string> MustRefuseAt { get; } = [];

    /// <summary>Unknown enumerated values put in: while the member holds it, the section must be refused.</summary>
    public List<(string Pointer, string Value)> UnknownValues { get; } = [];

    private static readonly string[] Enumerated = ["conductivityUnit", "lengthUnit", "unitWeightUnit", "creepClass"];

    private static readonly string[] Junk = ["NaN", "Infinity", "-Infinity", "2e-4 m/s", "", " ", "null", "0x10", "1,5", "∞", "{}"];

    private static readonly string[] Extremes = ["1e308", "-1e308", "1e400", "-1e400", "5e-324", "0", "-0", "1e-320", "123456789012345678901234567890"];

    public void Apply(JsonObject root)
    {
        switch (random.Next(11))
        {
            case 0: Misspell(root); break;
            case 1: AddUnknown(root); break;
            case 2: EnumSpelling(root); break;
            case 3: UnknownEnum(root); break;
            case 4: root["x-note " + random.Next(100)] = "an extension member"; Applied.Add("extension"); break;
            case 5: Delete(root); break;
            case 6: WrongKind(root); break;
            case 7: Extreme(root); break;
            case 8: Degenerate(root); break;
            case 9: Structural(root); break;
            default: Misspell(root); break;
        }
    }

    private List<(string Pointer, JsonNode Node)> Nodes(JsonNode root)
    {
        var list = new List<(string, JsonNode)>();
        void Walk(JsonNode? n, string at)
        {
            if (n is null) return;
            list.Add((at, n));
            if (n is JsonObject o) foreach (var (k, v) in o) Walk(v, $"{at}/{k.Replace("~", "~0").Replace("/", "~1")}");
            else if (n is JsonArray a) for (int i = 0; i < a.Count; i++) Walk(a[i], $"{at}/{i}");
        }
        Walk(root, "");
        return list;
    }

    private T? Pick<T>(JsonNode root, Func<T, bool>? where = null) where T : JsonNode
    {
        var candidates = Nodes(root).Select(x => x.Node).OfType<T>().Where(n => where?.Invoke(n) ?? true).ToList();
        return candidates.Count == 0 ? null : candidates[random.Next(candidates.Count)];
    }

    private void Misspell(JsonObject root)
    {
        var obj = Pick<JsonObject>(root, o => o.Count > 0)!;
        var keys = obj.Select(p => p.Key).Where(k => !k.StartsWith("x-", StringComparison.Ordinal)).ToList();
        if (keys.Count == 0) return;
        string key = keys[random.Next(keys.Count)];
        string wrong = random.Next(4) switch
        {
            0 => key.ToLowerInvariant() == key ? key.ToUpperInvariant() : key.ToLowerInvariant(),
            1 when key.Length > 2 => key.Remove(random.Next(key.Length), 1),
            2 when key.Length > 2 => Swap(key, random.Next(key.Length - 1)),
            _ => key + "s",
        };
        if (wrong == key || obj.ContainsKey(wrong)) return;
        var value = obj[key];
        obj.Remove(key);
        obj[wrong] = value;
        MustRefuseAt.Add(obj.GetPath() is var path ? Pointer(path, wrong) : wrong);
        Applied.Add($"misspelt {key} → {wrong}");
    }

    private void AddUnknown(JsonObject root)
    {
        var obj = Pick<JsonObject>(root)!;
        string name = new[] { "colour", "kz", "depthh", "required", "notes", "Kx", "unit" }[random.Next(7)];
        if (obj.ContainsKey(name)) return;
        obj[name] = random.Next(2) == 0 ? JsonValue.Create(1.5) : JsonValue.Create("x");
        MustRefuseAt.Add(Pointer(obj.GetPath(), name));
        Applied.Add($"unknown member {name} at {obj.GetPath()}");
    }

    private void EnumSpelling(JsonObject root)
    {
        var (obj, key) = EnumMember(root);
        if (obj is null) return;
        string value = obj[key]!.GetValue<string>();
        obj[key] = random.Next(3) switch
        {
            0 => value.ToUpperInvariant(),
            1 => " " + value.Replace('-', ' ') + " ",
            _ => value.Replace('-', '_'),
        };
        Applied.Add($"{key} spelt '{obj[key]}'");
    }

    private void UnknownEnum(JsonObject root)
    {
        var (obj, key) = EnumMember(root);
        if (obj is null) return;
        obj[key] = new[] { "cm/sec", "feet", "kN/m^3", "Fine sand!", "gravelly", "mm/s", "lb" }[random.Next(7)];
        UnknownValues.Add((Pointer(obj.GetPath(), key), obj[key]!.GetValue<string>()));
        Applied.Add($"{key} set to unknown '{obj[key]}'");
    }

    // An enumerated member with a value (added with its default name when the example has none).
    private (JsonObject? Obj, string Key) EnumMember(JsonObject root)
    {
        string key = Enumerated[random.Next(Enumerated.Length)];
        if (key == "creepClass")
        {
            var soil = Pick<JsonObject>(root, o => IsText(o["creepClass"]));
            return (soil, key);
        }
        root[key] ??= key switch { "conductivityUnit" => "m/s", "lengthUnit" => "m", _ => "kN/m3" };
        return IsText(root[key]) ? (root, key) : (null, key);
    }

    private static bool IsText(JsonNode? n) => n is JsonValue v && v.GetValueKind() == System.Text.Json.JsonValueKind.String;

    private void Delete(JsonObject root)
    {
        var obj = Pick<JsonObject>(root, o => o.Count > 0)!;
        var keys = obj.Select(p => p.Key).ToList();
        if (keys.Count == 0) return;
        string key = keys[random.Next(keys.Count)];
        obj.Remove(key);
        Changed($"deleted {Pointer(obj.GetPath(), key)}");
    }

    private void WrongKind(JsonObject root)
    {
        var (pointer, node) = NonRoot(root);
        JsonNode replacement = random.Next(5) switch
        {
            0 => JsonValue.Create(Junk[random.Next(Junk.Length)])!,
            1 => new JsonArray(),
            2 => new JsonObject { ["x"] = 1 },
            3 => JsonValue.Create(random.Next(2) == 0)!,
            _ => JsonValue.Create(42.5)!,
        };
        Replace(node, replacement);
        Changed($"{pointer} replaced by {replacement.ToJsonString()}");
    }

    private void Extreme(JsonObject root)
    {
        var value = Pick<JsonValue>(root, v => v.GetValueKind() == System.Text.Json.JsonValueKind.Number);
        if (value is null) return;
        string text = Extremes[random.Next(Extremes.Length)];
        Replace(value, JsonNode.Parse(text.Contains("e400") ? "\"__raw__" + text + "\"" : text)!);
        Changed($"{value.GetPath()} = {text}");
    }

    private void Degenerate(JsonObject root)
    {
        var line = Pick<JsonArray>(root, a => a.Count > 0 && a.All(p => p is JsonArray { Count: 2 }));
        if (line is null) return;
        switch (random.Next(4))
        {
            case 0: while (line.Count > 1) line.RemoveAt(line.Count - 1); break;
            case 1: line.Insert(0, line[0]!.DeepClone()); break;
            case 2: for (int i = 1; i < line.Count; i++) line[i] = line[0]!.DeepClone(); break;
            default: line[random.Next(line.Count)] = new JsonArray(random.Next(-1000, 1000) * 1e3, random.Next(-1000, 1000)); break;
        }
        Changed($"degenerate polyline {line.GetPath()}");
    }

    private void Structural(JsonObject root)
    {
        var (pointer, node) = NonRoot(root);
        switch (random.Next(3))
        {
            case 0: Replace(node, null); break;
            case 1:
                if (node is JsonArray a) a.Add(null);
                else Replace(node, new JsonArray(node.DeepClone()));
                break;
            default:
                JsonNode deep = JsonValue.Create(1)!;
                for (int i = 0; i < 40; i++) deep = new JsonArray(deep);
                Replace(node, deep);
                break;
        }
        Changed($"structure changed at {pointer}");
    }

    private (string Pointer, JsonNode Node) NonRoot(JsonObject root)
    {
        var nodes = Nodes(root).Where(n => n.Pointer.Length > 0).ToList();
        return nodes[random.Next(nodes.Count)];
    }

    private void Changed(string what) { ChangesValues = true; Applied.Add(what); }

    private static void Replace(JsonNode node, JsonNode? replacement)
    {
        switch (node.Parent)
        {
            case JsonObject o: o[node.GetPropertyName()] = replacement; break;
            case JsonArray a: a[node.GetElementIndex()] = replacement; break;
        }
    }

    private static string Swap(string s, int i) => string.Concat(s.AsSpan(0, i), s[i + 1].ToString(), s[i].ToString(), s.AsSpan(i + 2));

    // A JsonNode path ($.soils[0].kx) to a pointer (/soils/0/kx) with one more member.
    private static string Pointer(string path, string member) =>
        SectionParser.ToPointer(path) + "/" + member.Replace("~", "~0").Replace("/", "~1");
}
