using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Seepage.Api.Tests;

/// <summary>An in-memory host of the API with its own SQLite file (a new temporary one unless given).</summary>
public sealed class SeepageFactory(string? databasePath = null) : WebApplicationFactory<Program>
{
    public string DatabasePath { get; } = databasePath ?? Path.Combine(Path.GetTempPath(), $"seepage-test-{Guid.NewGuid():N}.db");

    protected override void ConfigureWebHost(IWebHostBuilder builder) =>
        builder.UseSetting(ServiceSetup.DatabasePathKey, DatabasePath);
}
