using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Seepage.Api.Tests.Storage;

/// <summary>An in-memory host of the API with the given configuration settings (storage provider, connection string…).</summary>
public sealed class SettingsFactory(IReadOnlyDictionary<string, string> settings) : WebApplicationFactory<Program>
{
    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        foreach (var (key, value) in settings) builder.UseSetting(key, value);
    }

    /// <summary>Settings of a host on a new schema of the test PostgreSQL server (jobs in a schema of their own too).</summary>
    public static Dictionary<string, string> Postgres(out string schema)
    {
        string cs = PostgresTestServer.NewSchema(out schema);
        return new()
        {
            ["Storage:Provider"] = "PostgreSQL", ["ConnectionStrings:Seepage"] = cs, ["Jobs:Schema"] = schema + "_jobs",
            ["Jobs:InvisibilitySeconds"] = "15",
        };
    }
}
