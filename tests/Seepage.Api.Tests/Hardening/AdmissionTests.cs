using System.Diagnostics;
using System.Net;
using System.Text.Json.Nodes;
using static Seepage.Api.Tests.Hardening.HostileSamples;

namespace Seepage.Api.Tests.Hardening;

/// <summary>Admission control: work over the budget refused before it starts (naming the member that asks for it, zone
/// sizes included), heavy analyses queued behind a cap with 429 + Retry-After when the line is full while small ones pass,
/// and a per-client rate limit on POST requests.</summary>
public class AdmissionTests
{
    [Fact]
    public async Task Post_TinyZoneSize_400NamesTheZone()
    {
        using var factory = new SeepageFactory();
        var section = WeirNode();
        section["zones"]![1]!["size"] = 0.01; // 800 m² at 1 cm: the mesh size alone would pass
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(section));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("/zones/1/size", await ErrorKeys(response));
    }

    [Fact]
    public async Task Post_ConvergenceCheckOverBudget_400NamesIt()
    {
        using var factory = new SeepageFactory(new Dictionary<string, string> { ["Limits:MaxWorkUnknowns"] = "20000" });
        var section = WeirNode();
        section["mesh"] = new JsonObject { ["size"] = 1.0, ["convergenceCheck"] = true };
        var response = await factory.CreateClient().PostAsync("/api/v1/analyses", Json(section));
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("/mesh/convergenceCheck", await ErrorKeys(response));
        var validate = await factory.CreateClient().PostAsync("/api/v1/sections/validate", Json(section));
        Assert.Equal(HttpStatusCode.BadRequest, validate.StatusCode);
    }

    [Trait("Category", "Slow")] // fills the heavy line
    [Fact]
    public async Task Post_HeavyLineFull_429WithRetryAfterWhileSmallOnesAnswer()
    {
        // Every analysis of 5,000 unknowns or more is heavy here: one runs, one waits, a third is turned away.
        using var factory = new SeepageFactory(new Dictionary<string, string>
        {
            ["Limits:HeavyWorkUnknowns"] = "5000", ["Limits:HeavyConcurrency"] = "1", ["Limits:HeavyQueueLength"] = "1",
            ["Limits:RetryAfterSeconds"] = "7",
        });
        var client = factory.CreateClient();
        var heavy = WeirNode();
        heavy["mesh"] = new JsonObject { ["size"] = 0.3 };
        var running = Enumerable.Range(0, 4).Select(_ => client.PostAsync("/api/v1/analyses", Json(heavy))).ToList();
        var small = WeirNode();
        small["mesh"] = new JsonObject { ["size"] = 8.0 };
        await Task.Delay(300);
        var clock = Stopwatch.StartNew();
        var quick = await client.PostAsync("/api/v1/analyses", Json(small));
        double seconds = clock.Elapsed.TotalSeconds;
        var answers = await Task.WhenAll(running);
        Assert.Equal(HttpStatusCode.Created, quick.StatusCode);
        Assert.True(seconds < 2, $"the small analysis took {seconds:F2} s beside the heavy ones");
        var refused = answers.Where(a => a.StatusCode == HttpStatusCode.TooManyRequests).ToList();
        Assert.NotEmpty(refused);
        Assert.Contains(answers, a => a.StatusCode == HttpStatusCode.Created);
        Assert.All(refused, r => Assert.Equal("7", r.Headers.GetValues("Retry-After").Single()));
        Assert.Contains("request", await ErrorKeys(refused[0]));
    }

    [Fact]
    public async Task Post_MoreThanTheRateLimit_429WithRetryAfter()
    {
        using var factory = new SeepageFactory(new Dictionary<string, string> { ["Limits:PostsPerMinute"] = "3" });
        var client = factory.CreateClient();
        var codes = new List<HttpStatusCode>();
        HttpResponseMessage? last = null;
        for (int i = 0; i < 5; i++)
        {
            last = await client.PostAsync("/api/v1/sections/validate", Json(Weir));
            codes.Add(last.StatusCode);
        }
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK, HttpStatusCode.OK], codes.Take(3));
        Assert.Equal(HttpStatusCode.TooManyRequests, codes[4]);
        Assert.True(int.Parse(last!.Headers.GetValues("Retry-After").Single()) >= 1);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/api/v1/examples")).StatusCode); // GETs are not limited
    }
}
