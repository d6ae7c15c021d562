using System.Net.Http.Headers;
using System.Text;
using System.Text.Json.Nodes;
using Seepage.Core.Tests.Support;

namespace Seepage.Api.Tests.Hardening;

/// <summary>
/// Makes hostile HTTP requests across every endpoint from a seed: damaged section JSON (members set to extreme numbers,
/// wrong types, control characters, deep nesting, duplicate members, truncation, bytes that are not UTF-8), studies with
/// damaged alternatives or CSV, spreadsheets that are garbage, truncated or hostile (huge declared ranges, long cells),
/// damaged multipart forms, odd content types, query strings and ids. <see cref="Next"/> returns the request and a
/// one-line description for the failure message.
/// </summary>
public sealed class HostileRequestGenerator(int seed, IReadOnlyList<string> knownIds)
{
    private readonly Random random = new(seed);

    private static readonly object?[] Values =
    [
        0, -1, 1e308, -1e308, 1e-308, 5e-324, 1e16, 0.5, 2.0, 1e6, -1e6, 3, "", "x", "\u001b[31mred\u001b[0m", "=HYPERLINK(\"x\")",
        "<script>alert(1)</script>", "'; DROP TABLE analyses; --", "../../etc/passwd", true, null, "NaN", "Infinity", int.MaxValue,
        long.MinValue, new string('a', 5000),
    ];

    private static readonly string[] ContentTypes =
    [
        "application/json", "text/csv", "text/plain", "application/xml", "application/octet-stream", "multipart/form-data",
        "multipart/form-data; boundary=", "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", "", "application/json; charset=latin1",
    ];

    public (HttpRequestMessage Request, string What) Next()
    {
        int kind = random.Next(12);
        return kind switch
        {
            0 or 1 => Post("/api/v1/analyses" + Query(), SectionBody(), "application/json"),
            2 => Post("/api/v1/sections/validate" + Query(), SectionBody(), Pick(ContentTypes)),
            3 => Post("/api/v1/sections/system" + Query(), SectionBody(), "application/json"),
            4 => Post("/api/v1/studies" + Query(), StudyBody(), "application/json"),
            5 => Post($"/api/v1/studies?base={Id()}" + (random.Next(2) == 0 ? "&background=true" : ""), Encoding.UTF8.GetBytes(StudyCsv()), "text/csv"),
            6 => Post("/api/v1/sections/import", Spreadsheet(out string type), type),
            7 => Multipart(),
            8 => Post(Pick(["/api/v1/analyses", "/api/v1/studies", "/api/v1/sections/import", "/api/v1/sections/validate"]),
                RandomBytes(), Pick(ContentTypes)),
            _ => Get(),
        };
    }

    private (HttpRequestMessage, string) Post(string path, byte[] body, string type)
    {
        var content = new ByteArrayContent(body);
        if (type.Length > 0) content.Headers.TryAddWithoutValidation("Content-Type", type);
        var preview = Encoding.UTF8.GetString(body, 0, Math.Min(body.Length, 160)).Replace('\n', ' ');
        return (new HttpRequestMessage(HttpMethod.Post, path) { Content = content }, $"POST {path} [{type}] {preview}");
    }

    private (HttpRequestMessage, string) Get()
    {
        string id = Id();
        string path = Pick([
            $"/api/v1/analyses/{id}", $"/api/v1/analyses/{id}/field", $"/api/v1/analyses/{id}/section", $"/api/v1/analyses/{id}/report",
            $"/api/v1/analyses/{id}/report?format={Pick(["pdf", "html", "docx", "", "%2500"])}", $"/api/v1/analyses/{id}/uplift.csv",
            $"/api/v1/analyses/{id}/exit.csv", $"/api/v1/studies/{id}", $"/api/v1/studies/{id}?format=csv", $"/api/v1/studies/{id}/report",
            $"/api/v1/examples/{id}", "/api/v1/examples", "/api/v1/sections/template.csv", "/api/v1/sections/template.xlsx",
        ]);
        return (new HttpRequestMessage(HttpMethod.Get, path), $"GET {path}");
    }

    private string Id() => random.Next(4) switch
    {
        0 when knownIds.Count > 0 => knownIds[random.Next(knownIds.Count)],
        1 => Pick(["twin-pile-weir", "cofferdam-sheet-pile", "..%2F..%2Fappsettings.json", "%2500", "a' OR '1'='1", "%E2%80%AE"]),
        2 => new string('z', random.Next(1, 300)),
        _ => Uri.EscapeDataString(RandomText(random.Next(1, 20)).Replace("\0", "")),
    };

    private string Query() => random.Next(4) != 0 ? "" : "?" + Pick(["format=csv", "background=maybe", "background=true", "base=",
        "format=" + Uri.EscapeDataString(RandomText(5)), "x=" + new string('q', 3000), "%%%"]);

    private byte[] SectionBody()
    {
        var doc = HostileSamples.WeirNode();
        for (int k = random.Next(1, 4); k > 0; k--) Damage(doc);
        string text = doc.ToJsonString();
        text = random.Next(8) switch
        {
            0 => text[..random.Next(text.Length)], // truncated
            1 => text.Replace("\"kx\":", "\"kx\":1,\"kx\":"), // duplicate member
            2 => new string('[', random.Next(30, 200)) + text, // deep nesting
            _ => text,
        };
        var bytes = Encoding.UTF8.GetBytes(text);
        if (random.Next(15) == 0 && bytes.Length > 0) bytes[random.Next(bytes.Length)] = 0xFF; // not UTF-8
        return bytes;
    }

    // One random change at a random place of the tree: a value replaced, a member removed, an item duplicated.
    private void Damage(JsonNode root)
    {
        var (parent, key) = RandomPlace(root);
        if (parent is JsonObject o && key is string name)
        {
            switch (random.Next(4))
            {
                case 0: o.Remove(name); break;
                case 1: o[name] = new JsonArray(); break;
                default: o[name] = Value(); break;
            }
        }
        else if (parent is JsonArray a && key is int i)
        {
            switch (random.Next(3))
            {
                case 0: a.Add(a[i]?.DeepClone()); break;
                case 1: a.RemoveAt(i); break;
                default: a[i] = Value(); break;
            }
        }
        else if (root is JsonObject top) top[Pick(["extra", "mesh", "gauges", "drains", "title"])] = Value();
    }

    private (JsonNode? Parent, object? Key) RandomPlace(JsonNode root)
    {
        JsonNode node = root;
        (JsonNode?, object?) place = (null, null);
        for (int depth = 0; depth < 6; depth++)
        {
            if (node is JsonObject o && o.Count > 0)
            {
                var member = o.ElementAt(random.Next(o.Count));
                place = (o, member.Key);
                if (member.Value is null || random.Next(3) == 0) break;
                node = member.Value;
            }
            else if (node is JsonArray a && a.Count > 0)
            {
                int i = random.Next(a.Count);
                place = (a, i);
                if (a[i] is null || random.Next(3) == 0) break;
                node = a[i]!;
            }
            else break;
        }
        return place;
    }

    private JsonNode? Value()
    {
        var v = Pick(Values);
        return v switch
        {
            null => null,
            string s => JsonValue.Create(s),
            bool b => JsonValue.Create(b),
            int n => JsonValue.Create(n),
            long n => JsonValue.Create(n),
            double d => random.Next(5) == 0 ? new JsonArray(d, d) : JsonValue.Create(d),
            _ => null,
        };
    }

    private byte[] StudyBody()
    {
        var alternatives = new JsonArray();
        for (int i = random.Next(0, 4); i > 0; i--)
        {
            var changes = new JsonObject();
            for (int k = random.Next(0, 3); k > 0; k--)
                changes[Pick(["/heads/0/total", "/structureLength", "/mesh/size", "/soils/0/kx", "/zones/0/size", "/cutoffs/0/tip/1",
                    "/nope", "", "/soils/-1", "/heads/99/total", "/mesh/convergenceCheck"])] = Value();
            alternatives.Add(new JsonObject { ["name"] = random.Next(3) == 0 ? Value() : $"alt {i}", ["changes"] = random.Next(8) == 0 ? Value() : changes });
        }
        var study = new JsonObject { ["base"] = random.Next(6) == 0 ? Value() : HostileSamples.WeirNode(), ["alternatives"] = alternatives };
        if (random.Next(2) == 0 && study["base"] is JsonObject baseSection) baseSection.Remove("truncationCheck");
        string text = study.ToJsonString();
        if (random.Next(6) == 0) text = text.Replace("\"alternatives\":", "\"base\":{},\"alternatives\":");
        if (random.Next(8) == 0) text = text[..random.Next(text.Length)];
        return Encoding.UTF8.GetBytes(text);
    }

    private string StudyCsv()
    {
        var header = new List<string> { "name" };
        for (int k = random.Next(0, 4); k > 0; k--) header.Add(Pick(["/heads/0/total", "/heads/0/total", "/mesh/size", "nope", "", "/soils/0/kx", "\"/a,b\""]));
        var lines = new List<string> { string.Join(Pick([",", ";", "\t"]), header) };
        for (int r = random.Next(0, 4); r > 0; r--)
            lines.Add(string.Join(",", header.Select(_ => Convert.ToString(Pick(Values), System.Globalization.CultureInfo.InvariantCulture)?.Replace(",", "") ?? "")));
        return string.Join(Pick(["\r\n", "\n", "\r"]), lines);
    }

    private byte[] Spreadsheet(out string type)
    {
        type = Pick(["text/csv", "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", "application/csv", "text/plain"]);
        return random.Next(6) switch
        {
            0 => RandomBytes(),
            1 => MinimalWorkbook.Build(MinimalWorkbook.Of("soils", MinimalWorkbook.Text("A1", "soils"), Pick(["A1:XFD1048576", "A1:B2", "ZZZZ9", ""]))),
            2 => MinimalWorkbook.Build(MinimalWorkbook.Of(Pick(["section", "soils", "<x>"]), MinimalWorkbook.Text(Pick(["A1", "XFD1", "A99999"]), RandomText(random.Next(1, 9000))))),
            3 => Truncate(MinimalWorkbook.Build(MinimalWorkbook.Of("section", MinimalWorkbook.Text("A1", "section")))),
            _ => Encoding.UTF8.GetBytes(Csv()),
        };
    }

    private string Csv()
    {
        var sb = new StringBuilder();
        foreach (string block in new[] { "section", "soils", "zones", "heads", "cutoffs", "mesh" }.Where(_ => random.Next(3) != 0))
        {
            sb.Append(block).Append("\r\n");
            for (int r = random.Next(0, 4); r > 0; r--)
                sb.Append(string.Join(",", Enumerable.Range(0, random.Next(1, 9)).Select(_ => Convert.ToString(Pick(Values), System.Globalization.CultureInfo.InvariantCulture)?.Replace("\"", "") ?? ""))).Append("\r\n");
            sb.Append("\r\n");
        }
        return sb.ToString();
    }

    private (HttpRequestMessage, string) Multipart()
    {
        string boundary = "b" + random.Next(1000);
        var file = Spreadsheet(out _);
        var sb = new StringBuilder();
        sb.Append($"--{boundary}\r\nContent-Disposition: form-data; name=\"file\"; filename=\"{Pick(["a.csv", "a.xlsx", "a.txt", "", "../../x.csv"])}\"\r\n");
        if (random.Next(2) == 0) sb.Append($"Content-Type: {Pick(ContentTypes)}\r\n");
        sb.Append("\r\n");
        var head = Encoding.UTF8.GetBytes(sb.ToString());
        var tail = Encoding.UTF8.GetBytes(random.Next(3) == 0 ? "" : $"\r\n--{Pick([boundary, "other"])}--\r\n");
        byte[] body = [.. head, .. file, .. tail];
        if (random.Next(4) == 0) body = Truncate(body);
        var content = new ByteArrayContent(body);
        content.Headers.TryAddWithoutValidation("Content-Type", $"multipart/form-data; boundary={(random.Next(6) == 0 ? "" : boundary)}");
        return (new HttpRequestMessage(HttpMethod.Post, "/api/v1/sections/import") { Content = content }, $"POST multipart ({body.Length} bytes)");
    }

    private byte[] Truncate(byte[] bytes) => bytes[..random.Next(bytes.Length)];

    private byte[] RandomBytes()
    {
        var bytes = new byte[random.Next(0, 2000)];
        random.NextBytes(bytes);
        return bytes;
    }

    private string RandomText(int length) =>
        new(Enumerable.Range(0, length).Select(_ => (char)Pick<int>([random.Next(0, 32), random.Next(32, 127), random.Next(0x80, 0x2FFF)])).ToArray());

    private T Pick<T>(IReadOnlyList<T> items) => items[random.Next(items.Count)];
}
