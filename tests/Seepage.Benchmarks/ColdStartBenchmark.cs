using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Net.Sockets;

namespace Seepage.Benchmarks;

/// <summary>
/// First response of a fresh service process: starts the built API (<c>dotnet Seepage.Api.dll</c>, or <c>--api path</c>,
/// e.g. a published folder's dll) on a free loopback port with its own temporary SQLite file, posts the design example
/// until the first 201 and prints <c>coldstart firstResponse=s</c> (median of <c>--runs</c>, default 3, fresh processes;
/// seconds from process start to the 201) and <c>coldstart appFolderMB=…</c> (size of the folder holding the dll).
/// </summary>
public static class ColdStartBenchmark
{
    public static void Run(string[] args)
    {
        int runs = 3;
        string? api = null;
        for (int i = 0; i + 1 < args.Length; i++)
        {
            if (args[i] == "--runs") runs = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
            if (args[i] == "--api") api = args[i + 1];
        }
        api ??= DefaultApi();
        string json = DesignSection.Json();
        var seconds = new List<double>();
        for (int r = 0; r < runs; r++) seconds.Add(FirstResponse(api, json));
        Console.WriteLine(FormattableString.Invariant($"coldstart firstResponse={StageBenchmark.Median(seconds):F3}"));
        long bytes = new DirectoryInfo(Path.GetDirectoryName(api)!).EnumerateFiles("*", SearchOption.AllDirectories).Sum(f => f.Length);
        Console.WriteLine(FormattableString.Invariant($"coldstart appFolderMB={bytes / 1e6:F1}"));
    }

    private static double FirstResponse(string api, string json)
    {
        int port = FreePort();
        string db = Path.Combine(Path.GetTempPath(), $"seepage-cold-{Guid.NewGuid():N}.db");
        var start = new ProcessStartInfo("dotnet") { UseShellExecute = false, RedirectStandardOutput = true, RedirectStandardError = true };
        start.ArgumentList.Add(api);
        start.ArgumentList.Add("--urls");
        start.ArgumentList.Add($"http://127.0.0.1:{port}");
        start.Environment["Storage__DatabasePath"] = db;
        start.Environment["Logging__LogLevel__Default"] = "Warning";
        using var client = new HttpClient { BaseAddress = new Uri($"http://127.0.0.1:{port}"), Timeout = TimeSpan.FromSeconds(60) };
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(start) ?? throw new InvalidOperationException("could not start the API");
        process.OutputDataReceived += (_, _) => { };
        process.ErrorDataReceived += (_, _) => { };
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        try
        {
            while (true)
            {
                if (clock.Elapsed > TimeSpan.FromSeconds(60)) throw new TimeoutException("no response within 60 s");
                if (process.HasExited) throw new InvalidOperationException($"the API exited with code {process.ExitCode}");
                try
                {
                    ServiceBenchmark.Post(client, json);
                    return clock.Elapsed.TotalSeconds;
                }
                catch (HttpRequestException) { Thread.Sleep(10); }
            }
        }
        finally
        {
            process.Kill(entireProcessTree: true);
            process.WaitForExit();
            foreach (string f in new[] { db, db + "-wal", db + "-shm" }) File.Delete(f);
        }
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    /// <summary>The API's own Release build beside this repository's solution file.</summary>
    private static string DefaultApi()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "Seepage.sln")))
                return Path.Combine(dir.FullName, "Seepage.Api", "bin", "Release", "net10.0", "Seepage.Api.dll");
        throw new InvalidOperationException("Seepage.sln not found above the benchmark; pass --api path/to/Seepage.Api.dll");
    }
}
