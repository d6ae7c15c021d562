using System.Collections.Concurrent;
using System.Diagnostics;
using System.Net;
using System.Text.Json;
using System.Text.Json.Nodes;
using Xunit.Abstractions;

namespace Seepage.Api.Tests.Hardening;

/// <summary>
/// Thousands of generated hostile requests across every endpoint (<see cref="HostileRequestGenerator"/>), four at a time:
/// never a 5xx, and every 4xx is RFC 9457 problem details that name what was wrong — 400, 413, 415 and 429 an
/// <c>errors</c> member keyed by the JSON pointer, cell or request part, 404 and 422 a detail. The count is 2,000 by
/// default; <c>SEEPAGE_HOSTILE_REQUESTS=20000</c> runs the longer campaign (see DEVELOPERS.md).
/// </summary>
[Trait("Category", "Slow")] // 2,000 generated requests
public class HostileRequestTests(ITestOutputHelper output)
{
    [Fact]
    public async Task Generated_HostileRequests_No5xxAndEvery4xxNamesItsMember()
    {
        int count = int.TryParse(Environment.GetEnvironmentVariable("SEEPAGE_HOSTILE_REQUESTS"), out int n) && n > 0 ? n : 2_000;
        // The rate limit is off (it would answer most of these 429) and the work budget small, so the run stays short.
        using var factory = new SeepageFactory(new Dictionary<string, string>
        {
            ["Limits:PostsPerMinute"] = "0", ["Limits:MaxWorkUnknowns"] = "300000", ["Limits:MaxSolveUnknowns"] = "150000",
        });
        var client = factory.CreateClient();
        var seeded = await client.PostAsync("/api/v1/analyses", HostileSamples.Json(HostileSamples.Weir));
        string id = JsonNode.Parse(await seeded.Content.ReadAsStringAsync())!["id"]!.GetValue<string>();
        var statuses = new ConcurrentDictionary<int, int>();
        var failures = new ConcurrentQueue<string>();
        var clock = Stopwatch.StartNew();
        await Parallel.ForAsync(0, 4, async (worker, _) =>
        {
            var generator = new HostileRequestGenerator(20261203 + worker, [id]);
            for (int i = worker; i < count && failures.Count < 5; i += 4)
            {
                var (request, what) = generator.Next();
                using var response = await client.SendAsync(request);
                string text = await response.Content.ReadAsStringAsync();
                int status = (int)response.StatusCode;
                statuses.AddOrUpdate(status, 1, (_, c) => c + 1);
                if (Problem(status, response, text) is { } why)
                    failures.Enqueue($"#{i} {what}\n  → {status} {why}: {text[..Math.Min(300, text.Length)]}");
            }
        });
        string summary = string.Join(", ", statuses.OrderBy(s => s.Key).Select(s => $"{s.Key}: {s.Value}"));
        output.WriteLine($"hostile requests={statuses.Values.Sum()} seconds={clock.Elapsed.TotalSeconds:F1} 5xx={statuses.Where(s => s.Key >= 500).Sum(s => s.Value)} ({summary})");
        Assert.True(failures.IsEmpty, string.Join("\n", failures));
        Assert.Equal(count, statuses.Values.Sum());
    }

    // Why an answer is not acceptable, or null.
    private static string? Problem(int status, HttpResponseMessage response, string text)
    {
        if (status >= 500) return "server error";
        if (status < 400) return null;
        if (response.Content.Headers.ContentType?.MediaType != "application/problem+json") return "not problem details";
        JsonElement problem;
        try { problem = JsonDocument.Parse(text).RootElement; }
        catch (JsonException) { return "unreadable problem details"; }
        if (status is 400 or 413 or 415 or 429)
            return problem.TryGetProperty("errors", out var errors) && errors.ValueKind == JsonValueKind.Object && errors.EnumerateObject().Any()
                && errors.EnumerateObject().All(e => e.Value.ValueKind == JsonValueKind.Array && e.Value.GetArrayLength() > 0)
                ? null : "no errors member naming what was wrong";
        return problem.TryGetProperty("detail", out var detail) && detail.GetString()?.Length > 5 ? null : "no detail";
    }
}
