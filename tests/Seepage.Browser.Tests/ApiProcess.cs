using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using System.Reflection;
using System.Text;

namespace Seepage.Browser.Tests;

/// <summary>
/// The real Seepage.Api, built by the project reference and started as its own process on a free loopback
/// port with a temporary SQLite file, so the page is tested against the service it ships with.
/// </summary>
public sealed class ApiProcess : IAsyncDisposable
{
    private readonly Process? process;
    private readonly StringBuilder output = new();
    private readonly string dataDirectory;

    private ApiProcess(Process? process, Uri baseAddress, string dataDirectory)
    {
        this.process = process;
        BaseAddress = baseAddress;
        this.dataDirectory = dataDirectory;
    }

    /// <summary>Root address of the running service, e.g. http://127.0.0.1:41234/.</summary>
    public Uri BaseAddress { get; }

    /// <summary>What the service printed so far (for failure messages).</summary>
    public string Output { get { lock (output) return output.ToString(); } }

    /// <summary>
    /// Starts the service and waits until <c>GET /api/v1/examples</c> answers 200 (at most 60 s). With
    /// SEEPAGE_BROWSER_BASE_URL set, uses the service already running there instead.
    /// </summary>
    public static async Task<ApiProcess> StartAsync()
    {
        var external = Environment.GetEnvironmentVariable("SEEPAGE_BROWSER_BASE_URL");
        if (!string.IsNullOrEmpty(external))
        {
            var running = new ApiProcess(null, new Uri(external.TrimEnd('/') + "/"), "");
            await running.WaitUntilReadyAsync();
            return running;
        }
        var directory = Environment.GetEnvironmentVariable("SEEPAGE_API_DIR")
            ?? typeof(ApiProcess).Assembly.GetCustomAttributes<AssemblyMetadataAttribute>()
                .Single(a => a.Key == "SeepageApiDirectory").Value!;
        var dll = Path.Combine(directory, "Seepage.Api.dll");
        if (!File.Exists(dll)) throw new InvalidOperationException($"Seepage.Api.dll not found at {dll}; build the solution first.");
        var port = FreePort();
        var baseAddress = new Uri($"http://127.0.0.1:{port}/");
        var data = Directory.CreateTempSubdirectory("seepage-browser-").FullName;
        var start = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = directory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in new[] { dll, "--urls", baseAddress.ToString().TrimEnd('/'), "--contentRoot", directory,
                     "--Storage:DatabasePath", Path.Combine(data, "seepage.db") })
            start.ArgumentList.Add(arg);
        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        var process = Process.Start(start) ?? throw new InvalidOperationException("dotnet could not be started.");
        var api = new ApiProcess(process, baseAddress, data);
        process.OutputDataReceived += (_, e) => api.Append(e.Data);
        process.ErrorDataReceived += (_, e) => api.Append(e.Data);
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        await api.WaitUntilReadyAsync();
        return api;
    }

    private void Append(string? line)
    {
        if (line is null) return;
        lock (output) output.AppendLine(line);
    }

    private async Task WaitUntilReadyAsync()
    {
        using var client = new HttpClient { BaseAddress = BaseAddress, Timeout = TimeSpan.FromSeconds(5) };
        var deadline = DateTime.UtcNow.AddSeconds(60);
        while (DateTime.UtcNow < deadline)
        {
            if (process is { HasExited: true }) throw new InvalidOperationException($"Seepage.Api exited with code {process.ExitCode}:\n{Output}");
            try
            {
                using var response = await client.GetAsync("api/v1/examples");
                if (response.StatusCode == HttpStatusCode.OK) return;
            }
            catch (HttpRequestException) { }
            catch (TaskCanceledException) { }
            await Task.Delay(250);
        }
        throw new TimeoutException($"Seepage.Api did not answer GET /api/v1/examples within 60 s:\n{Output}");
    }

    private static int FreePort()
    {
        var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        var port = ((IPEndPoint)listener.LocalEndpoint).Port;
        listener.Stop();
        return port;
    }

    public async ValueTask DisposeAsync()
    {
        if (process is null) return;
        if (!process.HasExited)
        {
            process.Kill(entireProcessTree: true);
            await process.WaitForExitAsync();
        }
        process.Dispose();
        try { Directory.Delete(dataDirectory, recursive: true); } catch (IOException) { }
    }
}
