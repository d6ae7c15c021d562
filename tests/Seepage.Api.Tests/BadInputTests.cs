using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

/// <summary>
/// Trust under bad input: many random damages to the design example (members deleted, set to the wrong type,
/// to zero, negative, huge or tiny numbers, empty or one-point polylines, points moved) are posted, each answered
/// with 201 or with 400 problem details that name a member (or 422 problem details with the solver's figures when
/// a valid section does not converge); never a server error, never a lost answer (RFC 9457 problem details).
/// </summary>
[Trait("Category", "Slow")]
public class BadInputTests
{
    // Trials per example in the test run; 1,500 per example were run by hand while hardening the validator.
    private const int Trials = 150;

    private static readonly string Example = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));

    [Theory]
    [InlineData("design example", 20261202)]
    [InlineData("twin-pile-weir", 7)]
    [InlineData("cofferdam-sheet-pile", 99)]
    [InlineData("spillway-slab-drain", 5)]
    public async Task Post_RandomlyDamagedSections_201Or400NeverServerError(string name, int seed)
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        string example = name == "design example" ? Example : await client.GetStringAsync($"/api/v1/examples/{name}");
        var random = new Random(seed);
        int created = 0, rejected = 0;
        for (int trial = 0; trial < Trials; trial++)
        {
            var doc = JsonNode.Parse(example)!;
            var damages = new List<string>();
            for (int k = 0, n = 1 + random.Next(3); k < n; k++) damages.Add(Damage(doc, random));
            string body = doc.ToJsonString();
            var response = await client.PostAsync("/api/v1/analyses", new StringContent(body, Encoding.UTF8, "application/json"));
            string text = await response.Content.ReadAsStringAsync();
            string what = $"trial {trial} ({string.Join("; ", damages)}): {(int)response.StatusCode} {text[..Math.Min(400, text.Length)]}";
            Assert.True(response.StatusCode is HttpStatusCode.Created or HttpStatusCode.BadRequest or HttpStatusCode.UnprocessableEntity, what);
            if (response.StatusCode == HttpStatusCode.Created) { created++; continue; }
            if (response.StatusCode == HttpStatusCode.UnprocessableEntity)
            {
                Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
                Assert.True(JsonDocument.Parse(text).RootElement.TryGetProperty("iterations", out _), what);
                continue;
            }
            rejected++;
            Assert.Equal("application/problem+json", response.Content.Headers.ContentType!.MediaType);
            var problem = JsonDocument.Parse(text).RootElement;
            Assert.True(problem.TryGetProperty("errors", out var errors) && errors.EnumerateObject().Any(), what);
            foreach (var e in errors.EnumerateObject())
                Assert.True(e.Value.GetArrayLength() > 0 && e.Value.EnumerateArray().All(m => m.GetString()!.Length > 5), what);
        }
        Assert.True(created > 0 && rejected > 0, $"{created} created, {rejected} rejected: the damages should give both");
    }

    // One random damage at a random member; returns what was done.
    private static string Damage(JsonNode doc, Random random)
    {
        var (parent, key, path) = PickMember(doc, random);
        JsonNode? value = random.Next(10) switch
        {
            0 => null,
            1 => JsonValue.Create("text"),
            2 => JsonValue.Create(0.0),
            3 => JsonValue.Create(-1.0),
            4 => JsonValue.Create(1e300),
            5 => JsonValue.Create(1e-300),
            6 => new JsonArray(),
            7 => new JsonArray(new JsonArray(1.0, 2.0)),
            8 => new JsonObject(),
            _ => JsonValue.Create(random.NextDouble() * 200 - 100),
        };
        if (random.Next(8) == 0)
        {
            if (parent is JsonObject o) o.Remove(key.ToString()!); else ((JsonArray)parent).RemoveAt((int)key);
            return $"removed {path}";
        }
        if (parent is JsonObject obj) obj[key.ToString()!] = value; else ((JsonArray)parent)[(int)key] = value;
        return $"{path} = {value?.ToJsonString() ?? "null"}";
    }

    private static (JsonNode Parent, object Key, string Path) PickMember(JsonNode doc, Random random)
    {
        JsonNode node = doc; string path = "";
        while (true)
        {
            var children = node switch
            {
                JsonObject o => o.Select(p => ((object)p.Key, p.Value)).ToList(),
                JsonArray a => a.Select((v, i) => ((object)i, v)).ToList(),
                _ => [],
            };
            if (children.Count == 0) throw new InvalidOperationException("picked a leaf's parent without children");
            var (key, child) = children[random.Next(children.Count)];
            string childPath = $"{path}/{key}";
            // Stop here with some chance, or when the child is a leaf or null.
            bool empty = child is JsonObject { Count: 0 } or JsonArray { Count: 0 };
            if (child is null || child is JsonValue || empty || random.Next(4) == 0) return (node, key, childPath);
            node = child; path = childPath;
        }
    }
}
