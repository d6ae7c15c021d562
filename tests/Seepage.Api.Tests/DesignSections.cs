using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

/// <summary>Small sections and helpers for the target-search and uncertainty-study endpoint tests.</summary>
internal static class DesignSections
{
    /// <summary>A sheet pile of 3 m in a 10 m sand layer, 40 m each side, 3 m of head, coarse mesh (fast).</summary>
    public static JsonObject SheetPile() => JsonNode.Parse("""
        { "title": "sheet pile in a layer", "soils": [ { "id": "sand", "kx": 1e-5, "specificGravity": 2.65, "voidRatio": 0.65 } ],
          "zones": [ { "soil": "sand", "outline": [[-40,0],[40,0],[40,-10],[-40,-10]] } ],
          "cutoffs": [ { "name": "pile", "top": [0,0], "tip": [0,-3] } ],
          "heads": [ { "name": "up", "along": [[-40,0],[0,0]], "total": 3 }, { "name": "down", "along": [[0,0],[40,0]], "total": 0 } ],
          "exitCheck": { "along": [[0,0],[40,0]], "depth": 0.5, "requiredFactor": 2.0 },
          "mesh": { "size": 2.0 }, "truncationCheck": false }
        """)!.AsObject();

    public static StringContent Json(JsonNode node) => new(node.ToJsonString(), Encoding.UTF8, "application/json");

    public static async Task<JsonElement> Read(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    /// <summary>Polls a run until it leaves "running" (at most the given time).</summary>
    public static async Task<JsonElement> WaitAsync(HttpClient client, string location, TimeSpan limit)
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        while (true)
        {
            var state = await client.GetFromJsonAsync<JsonElement>(location);
            if (state.GetProperty("status").GetString() != "running" || clock.Elapsed > limit) return state;
            await Task.Delay(200);
        }
    }
}
