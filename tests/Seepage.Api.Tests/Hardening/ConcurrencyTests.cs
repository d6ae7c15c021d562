using System.Diagnostics;
using System.Net;
using System.Text.Json.Nodes;
using Xunit.Abstractions;
using static Seepage.Api.Tests.Hardening.HostileSamples;

namespace Seepage.Api.Tests.Hardening;

/// <summary>Fifty analyses at once on a loopback Kestrel server (the service's real HTTP stack): none fails or times out,
/// and each result is the same as the same section run alone (no cross-talk). Prints the line
/// <c>concurrency analyses=50 p95=… errors=…</c>; the latency is a figure to read, not asserted (the machine is shared).</summary>
[Trait("Category", "Slow")] // fifty analyses at once
public class ConcurrencyTests(ITestOutputHelper output)
{
    [Fact]
    public async Task FiftyConcurrentAnalyses_NoErrorsResultsAsSerial()
    {
        using var factory = new SeepageFactory(new Dictionary<string, string> { ["Limits:PostsPerMinute"] = "0" });
        factory.UseKestrel(0);
        factory.StartServer();
        using var client = factory.CreateClient();
        client.Timeout = TimeSpan.FromMinutes(3);
        JsonObject Section(int i)
        {
            var s = WeirNode();
            s["heads"]![0]!["total"] = 3.0 + 0.1 * (i % 10);
            return s;
        }
        async Task<(double Flow, double Seconds, HttpStatusCode Status)> Run(int i)
        {
            var clock = Stopwatch.StartNew();
            var response = await client.PostAsync("/api/v1/analyses", Json(Section(i)));
            double seconds = clock.Elapsed.TotalSeconds;
            if (response.StatusCode != HttpStatusCode.Created) return (double.NaN, seconds, response.StatusCode);
            var flow = JsonNode.Parse(await response.Content.ReadAsStringAsync())!["flow"]!["perMetre"]!.GetValue<double>();
            return (flow, seconds, response.StatusCode);
        }
        var serial = new Dictionary<int, double>();
        for (int i = 0; i < 10; i++) serial[i] = (await Run(i)).Flow;
        var results = await Task.WhenAll(Enumerable.Range(0, 50).Select(Run));
        var times = results.Select(r => r.Seconds).Order().ToList();
        int errors = results.Count(r => r.Status != HttpStatusCode.Created);
        output.WriteLine(FormattableString.Invariant($"concurrency analyses=50 p95={times[(int)Math.Ceiling(0.95 * times.Count) - 1]:F3} errors={errors}"));
        Assert.Equal(0, errors);
        for (int i = 0; i < 50; i++) Assert.Equal(serial[i % 10], results[i].Flow);
    }
}
