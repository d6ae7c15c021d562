using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Text;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using Seepage.Api;
using Seepage.Core;

namespace Seepage.Benchmarks;

/// <summary>
/// The service as a client sees it: the API runs in this process on Kestrel at a free loopback port (its own temporary
/// SQLite file), and the design example is posted one request at a time. Prints
/// <c>service case=design p50=s p95=s cpuPerAnalysis=s</c> over <c>--posts</c> (default 50) posts after 3 warm-ups,
/// and the same for <c>case=large</c>, the design example meshed at about 200,000 triangles (<c>--large-posts</c>,
/// default 10, after 1 warm-up). cpuPerAnalysis is the process CPU time (server and client) per post.
/// </summary>
public static class ServiceBenchmark
{
    public const int LargeTriangles = 200_000;

    public static void Run(string[] args)
    {
        int posts = 50, largePosts = 10;
        for (int i = 0; i + 1 < args.Length; i++)
        {
            if (args[i] == "--posts") posts = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
            if (args[i] == "--large-posts") largePosts = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
        }
        string db = Path.Combine(Path.GetTempPath(), $"seepage-bench-{Guid.NewGuid():N}.db");
        try
        {
            using var factory = new LoopbackFactory(db);
            factory.UseKestrel(0);
            factory.StartServer();
            var address = factory.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.First();
            using var client = new HttpClient { BaseAddress = new Uri(address), Timeout = TimeSpan.FromMinutes(5) };
            Measure(client, "design", DesignSection.Json(), 3, posts);
            if (largePosts > 0) Measure(client, "large", DesignSection.Json(LargeSize()), 1, largePosts);
        }
        finally
        {
            Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
            foreach (string f in new[] { db, db + "-wal", db + "-shm" }) File.Delete(f);
        }
    }

    /// <summary>Posts the section, checks for 201 and returns the wall seconds.</summary>
    internal static double Post(HttpClient client, string json)
    {
        var clock = Stopwatch.StartNew();
        using var content = new StringContent(json, Encoding.UTF8, "application/json");
        using var response = client.PostAsync("/api/v1/analyses", content).GetAwaiter().GetResult();
        _ = response.Content.ReadAsByteArrayAsync().GetAwaiter().GetResult();
        if (response.StatusCode != HttpStatusCode.Created)
            throw new InvalidOperationException($"POST answered {(int)response.StatusCode}");
        return clock.Elapsed.TotalSeconds;
    }

    private static void Measure(HttpClient client, string name, string json, int warmups, int posts)
    {
        for (int i = 0; i < warmups; i++) Post(client, json);
        var seconds = new List<double>();
        double cpu = CpuClock.Seconds();
        for (int i = 0; i < posts; i++) seconds.Add(Post(client, json));
        cpu = (CpuClock.Seconds() - cpu) / posts;
        var sorted = seconds.Order().ToArray();
        double p95 = sorted[Math.Min(sorted.Length - 1, (int)Math.Ceiling(0.95 * sorted.Length) - 1)];
        Console.WriteLine(FormattableString.Invariant(
            $"service case={name} p50={StageBenchmark.Median(seconds):F3} p95={p95:F3} cpuPerAnalysis={cpu:F3}"));
    }

    /// <summary>The mesh size (m) that gives the design example about <see cref="LargeTriangles"/> triangles.</summary>
    private static double LargeSize()
    {
        var model = DesignSection.Model(DesignSection.Json());
        int reference = Analysis.MakeMesh(model, []).TriangleCount;
        double size = model.Mesh.Size * Math.Sqrt((double)reference / LargeTriangles);
        var large = DesignSection.Model(DesignSection.Json(size));
        Console.Error.WriteLine(FormattableString.Invariant(
            $"service case=large size={size:F3} triangles={Analysis.MakeMesh(large, []).TriangleCount}"));
        return size;
    }

    // Any type of the API assembly names its entry point (this program has a Program class of its own).
    private sealed class LoopbackFactory(string databasePath) : WebApplicationFactory<Seepage.Api.Storage.AnalysisService>
    {
        protected override void ConfigureWebHost(IWebHostBuilder builder)
        {
            builder.UseSetting(ServiceSetup.DatabasePathKey, databasePath);
            builder.UseSetting("Logging:LogLevel:Default", "Warning");
        }
    }
}
