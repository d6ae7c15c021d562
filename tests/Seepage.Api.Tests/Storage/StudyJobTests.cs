using System.Net;
using System.Text;
using System.Text.Json;
using Seepage.Api.Application;
using Seepage.Api.Storage;

namespace Seepage.Api.Tests.Storage;

/// <summary>Background studies run as jobs on the job engine: every alternative stored once, progress read from the
/// database, and (embedded default) a study left running when the process stopped resumed at the next start.</summary>
[Trait("Category", "Slow")] // background jobs, PostgreSQL
public sealed class StudyJobTests
{
    private static string Example() => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));

    private static string StudyBody(int alternatives) => $$"""
        { "base": {{Example()}}, "alternatives": [ {{string.Join(",", Enumerable.Range(0, alternatives).Select(i =>
            $$"""{ "name": "tip {{i}}", "changes": { "/heads/0/total": {{6.0 + 0.1 * i}}, "/mesh/size": 3 } }"""))}} ] }
        """;

    private static async Task<JsonElement> WaitDone(HttpClient client, string id)
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        while (true)
        {
            var study = JsonDocument.Parse(await client.GetStringAsync($"/api/v1/studies/{id}")).RootElement;
            if (study.GetProperty("status").GetString() != "running") return study;
            Assert.True(clock.Elapsed < TimeSpan.FromMinutes(4), "the study did not finish in 4 minutes");
            await Task.Delay(250);
        }
    }

    private static async Task BackgroundStudy_EveryRowOnce(HttpClient client)
    {
        var post = await client.PostAsync("/api/v1/studies?background=true", new StringContent(StudyBody(10), Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.Accepted, post.StatusCode);
        string id = JsonDocument.Parse(await post.Content.ReadAsStringAsync()).RootElement.GetProperty("id").GetString()!;
        var study = await WaitDone(client, id);
        Assert.Equal("done", study.GetProperty("status").GetString());
        var rows = study.GetProperty("rows").EnumerateArray().ToList();
        Assert.Equal(Enumerable.Range(0, 10), rows.Select(r => r.GetProperty("index").GetInt32()));
        Assert.All(rows, r => Assert.True(r.GetProperty("valid").GetBoolean()));
        Assert.Equal(10, rows.Select(r => r.GetProperty("analysisId").GetString()).Distinct().Count());
        Assert.Equal(10, study.GetProperty("done").GetInt32());
    }

    [Fact]
    public async Task BackgroundStudy_Sqlite_EveryRowOnce()
    {
        using var factory = new SeepageFactory();
        await BackgroundStudy_EveryRowOnce(factory.CreateClient());
    }

    [SkippableFact]
    public async Task BackgroundStudy_Postgres_EveryRowOnce()
    {
        var settings = SettingsFactory.Postgres(out string schema);
        try
        {
            using var factory = new SettingsFactory(settings);
            var client = factory.CreateClient();
            await BackgroundStudy_EveryRowOnce(client);
            Assert.Equal("Healthy", await client.GetStringAsync("/health/ready"));
        }
        finally
        {
            PostgresTestServer.DropSchema(schema);
            PostgresTestServer.DropSchema(schema + "_jobs");
        }
    }

    [Fact]
    public async Task StudyLeftRunning_NextStart_FinishesWithoutRedoingStoredRows()
    {
        string path = Path.Combine(Path.GetTempPath(), $"seepage-test-{Guid.NewGuid():N}.db");
        try
        {
            var db = new SqliteDatabase(path);
            var store = new SqlStudyStore(db);
            var definition = StudyDefinition.Parse(StudyBody(3));
            var header = new Contracts.StudyDto("sresume", "t", DateTimeOffset.UtcNow, "running", 0, 3, definition.Parameters, [], "c", 0);
            await store.CreateAsync(new StoredStudy("sresume", DateTimeOffset.UtcNow, "Cut off", 3, definition.ToJson(),
                JsonSerializer.Serialize(header, AnalysisService.Json)), default);
            const string kept = """{"index":1,"name":"tip 1","changes":{},"valid":false,"problems":{"":["kept"]},"seconds":0}""";
            await store.AddRowAsync("sresume", 1, kept, default);

            using var factory = new SeepageFactory(path);
            var client = factory.CreateClient();
            var study = await WaitDone(client, "sresume");
            Assert.Equal("done", study.GetProperty("status").GetString());
            var rows = study.GetProperty("rows").EnumerateArray().ToList();
            Assert.Equal([0, 1, 2], rows.Select(r => r.GetProperty("index").GetInt32()));
            Assert.Equal("kept", rows[1].GetProperty("problems").GetProperty("")[0].GetString());   // not run again
            Assert.True(rows[0].GetProperty("valid").GetBoolean());
        }
        finally { SeepageFactory.DeleteDatabase(path); }
    }

    [Fact]
    public async Task Health_LiveAndReady()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health/live")).StatusCode);
        Assert.Equal("Healthy", await client.GetStringAsync("/health/ready"));
    }
}
