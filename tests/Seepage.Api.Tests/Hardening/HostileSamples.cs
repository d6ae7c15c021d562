using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests.Hardening;

/// <summary>Small, fast inputs for the hardening tests: an invented weir on two soils with two sheet piles and a coarse
/// mesh (a few hundred triangles), and helpers to post and read problem details.</summary>
public static class HostileSamples
{
    /// <summary>Invented scenario: a 20 m floor on 10 m of sand over clay, piles at both ends, 6 m against 1 m of head.</summary>
    public const string Weir = """
        {
          "title": "Hardening sample weir",
          "soils": [ { "id": "sand", "kx": 1e-4 }, { "id": "clay", "kx": 1e-7 } ],
          "zones": [
            { "soil": "sand", "outline": [[-40,0],[40,0],[40,-10],[-40,-10]] },
            { "soil": "clay", "outline": [[-40,-10],[40,-10],[40,-20],[-40,-20]] }
          ],
          "structures": [ { "name": "floor", "base": [[-10,0],[10,0]] } ],
          "cutoffs": [
            { "name": "upstream pile", "top": [-10,0], "tip": [-10,-4] },
            { "name": "downstream pile", "top": [10,0], "tip": [10,-5] }
          ],
          "heads": [
            { "name": "headwater", "along": [[-40,0],[-10,0]], "total": 6.0 },
            { "name": "tailwater", "along": [[10,0],[40,0]], "total": 1.0 }
          ],
          "mesh": { "size": 4 },
          "truncationCheck": false
        }
        """;

    public static JsonObject WeirNode() => (JsonObject)JsonNode.Parse(Weir)!;

    public static StringContent Json(string text) => new(text, Encoding.UTF8, "application/json");

    public static StringContent Json(JsonNode node) => Json(node.ToJsonString());

    public static StringContent Csv(string text) => new(text, Encoding.UTF8, "text/csv");

    public static ByteArrayContent Bytes(byte[] bytes, string type)
    {
        var content = new ByteArrayContent(bytes);
        content.Headers.ContentType = MediaTypeHeaderValue.Parse(type);
        return content;
    }

    public static async Task<JsonElement> Problem(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    /// <summary>The keys of the problem's <c>errors</c> member (empty when there is none).</summary>
    public static async Task<List<string>> ErrorKeys(HttpResponseMessage response)
    {
        var problem = await Problem(response);
        return problem.TryGetProperty("errors", out var errors) && errors.ValueKind == JsonValueKind.Object
            ? errors.EnumerateObject().Select(e => e.Name).ToList() : [];
    }
}
