using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;

namespace Seepage.Api.Tests;

/// <summary>An in-memory host of the API with its own SQLite file (a new temporary one unless given). A file the
/// factory made itself is deleted, with its WAL and shared-memory files, when the factory is disposed.</summary>
public sealed class SeepageFactory(string? databasePath = null, IReadOnlyDictionary<string, string>? settings = null)
    : WebApplicationFactory<Program>
{
    private readonly bool ownsFile = databasePath is null;

    public string DatabasePath { get; } = databasePath ?? Path.Combine(Path.GetTempPath(), $"seepage-test-{Guid.NewGuid():N}.db");

    /// <summary>A factory with configuration settings of its own, e.g. <c>["Limits:PostsPerMinute"] = "3"</c>.</summary>
    public SeepageFactory(IReadOnlyDictionary<string, string> settings) : this(null, settings) { }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting(ServiceSetup.DatabasePathKey, DatabasePath);
        foreach (var (key, value) in settings ?? new Dictionary<string, string>()) builder.UseSetting(key, value);
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing && ownsFile) DeleteDatabase(DatabasePath);
    }

    /// <summary>Deletes a test database and its companions (pooled connections are cleared first).</summary>
    public static void DeleteDatabase(string path)
    {
        SqliteConnection.ClearAllPools();
        foreach (string file in new[] { path, path + "-wal", path + "-shm" })
        {
            try { File.Delete(file); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        }
    }
}
