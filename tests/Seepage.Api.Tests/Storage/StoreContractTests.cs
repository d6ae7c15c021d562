using System.Text;
using Seepage.Api.Application;
using Seepage.Api.Storage;

namespace Seepage.Api.Tests.Storage;

/// <summary>The behaviour every store must have, run against each provider (<see cref="SqliteStoreTests"/>,
/// <see cref="PostgresStoreTests"/>).</summary>
public abstract class StoreContractTests : IDisposable
{
    private Database? _db;

    /// <summary>A new, empty database of the provider under test.</summary>
    protected abstract Database CreateDatabase();

    /// <summary>A second handle (another "process") on the database made by <see cref="CreateDatabase"/>.</summary>
    protected abstract Database SecondHandle();

    protected abstract void DeleteDatabase();

    private Database Db => _db ??= CreateDatabase();

    public void Dispose()
    {
        if (_db is IDisposable d) d.Dispose();
        if (_db is not null) DeleteDatabase();
        GC.SuppressFinalize(this);
    }

    private static StoredAnalysis Analysis(string id, string title, DateTimeOffset created) =>
        new(id, created, title, $"{{\"title\":\"{title}\"}}", $"{{\"id\":\"{id}\",\"title\":\"{title}\"}}", Encoding.UTF8.GetBytes("field " + id),
            "{\"flow\":1.5e-6}");

    [SkippableFact]
    public async Task SaveAnalysis_ThenRead_GivesEachPartBack()
    {
        var store = new SqlAnalysisStore(Db);
        await store.SaveAsync(Analysis("a1", "Weir", DateTimeOffset.UtcNow), default);
        Assert.Equal("{\"title\":\"Weir\"}", await store.GetJsonAsync("a1", AnalysisPart.Section, default));
        Assert.Equal("{\"id\":\"a1\",\"title\":\"Weir\"}", await store.GetJsonAsync("a1", AnalysisPart.Result, default));
        var field = await store.GetFieldAsync("a1", default);
        Assert.Equal("field a1", Encoding.UTF8.GetString(field!.Binary!));
        Assert.Null(await store.GetJsonAsync("nope", AnalysisPart.Result, default));
        Assert.Null(await store.GetFieldAsync("nope", default));
    }

    [SkippableFact]
    public async Task SaveAnalysis_SameIdTwice_KeepsTheFirst()
    {
        var store = new SqlAnalysisStore(Db);
        await store.SaveAsync(Analysis("a1", "first", DateTimeOffset.UtcNow), default);
        await store.SaveAsync(Analysis("a1", "second", DateTimeOffset.UtcNow), default);
        var page = await store.ListAsync(new ListQuery(1, 10, null), default);
        Assert.Equal("first", Assert.Single(page.Items).Title);
    }

    [SkippableFact]
    public async Task ListAnalyses_PagesNewestFirst_AndFiltersByTitle()
    {
        var store = new SqlAnalysisStore(Db);
        var t0 = new DateTimeOffset(2026, 1, 1, 0, 0, 0, TimeSpan.Zero);
        string[] titles = ["Weir A", "weir b", "Dam 50%", "Cofferdam", "WEIR c"];
        for (int i = 0; i < titles.Length; i++) await store.SaveAsync(Analysis($"a{i}", titles[i], t0.AddMinutes(i)), default);

        var first = await store.ListAsync(new ListQuery(1, 2, null), default);
        Assert.Equal(5, first.Total);
        Assert.Equal(["a4", "a3"], first.Items.Select(i => i.Id));
        Assert.Equal(t0.AddMinutes(4), first.Items[0].CreatedAt);
        Assert.Equal("{\"flow\":1.5e-6}", first.Items[0].SummaryJson);
        var third = await store.ListAsync(new ListQuery(3, 2, null), default);
        Assert.Equal(["a0"], third.Items.Select(i => i.Id));

        var weirs = await store.ListAsync(new ListQuery(1, 10, "weir"), default);
        Assert.Equal(3, weirs.Total);
        Assert.Equal(["a4", "a1", "a0"], weirs.Items.Select(i => i.Id));
        var percent = await store.ListAsync(new ListQuery(1, 10, "50%"), default);       // % is a character, not a wildcard
        Assert.Equal(["a2"], percent.Items.Select(i => i.Id));
        Assert.Empty((await store.ListAsync(new ListQuery(1, 10, "_"), default)).Items);
    }

    [SkippableFact]
    public async Task RenameAndDeleteAnalysis_ChangeOnlyTheOneNamed()
    {
        var store = new SqlAnalysisStore(Db);
        await store.SaveAsync(Analysis("a1", "old", DateTimeOffset.UtcNow), default);
        await store.SaveAsync(Analysis("a2", "other", DateTimeOffset.UtcNow), default);
        Assert.True(await store.RenameAsync("a1", "new", "{\"title\":\"new\"}", default));
        Assert.False(await store.RenameAsync("nope", "new", "{}", default));
        Assert.Equal("{\"title\":\"new\"}", await store.GetJsonAsync("a1", AnalysisPart.Result, default));
        Assert.True(await store.DeleteAsync("a1", default));
        Assert.False(await store.DeleteAsync("a1", default));
        Assert.Null(await store.GetFieldAsync("a1", default));
        Assert.Equal("other", Assert.Single((await store.ListAsync(new ListQuery(1, 10, null), default)).Items).Title);
    }

    [SkippableFact]
    public async Task DeleteOlderThan_RemovesOnlyOldWork()
    {
        var analyses = new SqlAnalysisStore(Db);
        var studies = new SqlStudyStore(Db);
        var now = DateTimeOffset.UtcNow;
        await analyses.SaveAsync(Analysis("old", "t", now.AddDays(-40)), default);
        await analyses.SaveAsync(Analysis("new", "t", now.AddDays(-1)), default);
        await studies.CreateAsync(new StoredStudy("s-old", now.AddDays(-40), "t", 1, "{}", "{}"), default);
        await studies.AddRowAsync("s-old", 0, "{}", default);
        await studies.CreateAsync(new StoredStudy("s-new", now, "t", 1, "{}", "{}"), default);
        Assert.Equal(1, await analyses.DeleteOlderThanAsync(now.AddDays(-30), default));
        Assert.Equal(1, await studies.DeleteOlderThanAsync(now.AddDays(-30), default));
        Assert.Null(await analyses.GetFieldAsync("old", default));
        Assert.NotNull(await analyses.GetFieldAsync("new", default));
        Assert.Null(await studies.GetAsync("s-old", default));
        Assert.False(await studies.HasRowAsync("s-old", 0, default));
        Assert.NotNull(await studies.GetAsync("s-new", default));
    }

    [SkippableFact]
    public async Task StudyRows_StoredOncePerIndex_EvenWhenWrittenConcurrently()
    {
        var store = new SqlStudyStore(Db);
        await store.CreateAsync(new StoredStudy("s1", DateTimeOffset.UtcNow, "Study", 24, "{\"def\":1}", "{\"head\":1}"), default);
        var attempts = Enumerable.Range(0, 72).Select(k => Task.Run(() => store.AddRowAsync("s1", k % 24, $"{{\"index\":{k % 24}}}", default)));
        bool[] stored = await Task.WhenAll(attempts);
        Assert.Equal(24, stored.Count(s => s));
        var record = await store.GetAsync("s1", default);
        Assert.Equal(Enumerable.Range(0, 24).Select(i => $"{{\"index\":{i}}}"), record!.Rows);
        Assert.Equal("running", record.Status);
        Assert.Equal(new StudyProgress("running", 24, 24), await store.ProgressAsync("s1", default));
        Assert.True(await store.HasRowAsync("s1", 23, default));
        Assert.False(await store.HasRowAsync("s1", 24, default));
        Assert.Equal("{\"def\":1}", await store.GetDefinitionAsync("s1", default));
    }

    [SkippableFact]
    public async Task Studies_StatusRenameListAndDelete()
    {
        var store = new SqlStudyStore(Db);
        var t0 = new DateTimeOffset(2026, 2, 1, 0, 0, 0, TimeSpan.Zero);
        await store.CreateAsync(new StoredStudy("s1", t0, "Pile depths", 3, "{}", "{}"), default);
        await store.CreateAsync(new StoredStudy("s2", t0.AddHours(1), "Heads", 2, "{}", "{}"), default);
        await store.AddRowAsync("s1", 0, "{}", default);
        await store.SetStatusAsync("s2", "done", default);
        Assert.True(await store.RenameAsync("s1", "Pile depths, revised", default));
        Assert.False(await store.RenameAsync("nope", "x", default));

        var page = await store.ListAsync(new ListQuery(1, 10, null), default);
        Assert.Equal(2, page.Total);
        Assert.Equal(new StudyListing("s2", t0.AddHours(1), "Heads", "done", 0, 2), page.Items[0]);
        Assert.Equal(new StudyListing("s1", t0, "Pile depths, revised", "running", 1, 3), page.Items[1]);
        Assert.Equal(["s1"], (await store.ListAsync(new ListQuery(1, 10, "REVISED"), default)).Items.Select(i => i.Id));

        Assert.True(await store.DeleteAsync("s1", default));
        Assert.False(await store.DeleteAsync("s1", default));
        Assert.Null(await store.GetAsync("s1", default));
        Assert.Null(await store.ProgressAsync("s1", default));
        Assert.False(await store.HasRowAsync("s1", 0, default));
    }

    [SkippableFact]
    public async Task Migrate_TwoProcessesAtOnce_ApplyEachVersionOnce()
    {
        var first = Db;
        var second = SecondHandle();
        try
        {
            await Task.WhenAll(Task.Run(() => first.MigrateAsync(default)), Task.Run(() => second.MigrateAsync(default)));
            await using var connection = await first.OpenAsync(default);
            await using var command = Sql.Command(connection, null, "SELECT version FROM schema_version ORDER BY version");
            await using var reader = await command.ExecuteReaderAsync();
            var versions = new List<long>();
            while (await reader.ReadAsync()) versions.Add(Convert.ToInt64(reader.GetValue(0), System.Globalization.CultureInfo.InvariantCulture));
            Assert.Equal(first.Migrations.Select(m => (long)m.Version), versions);
            await new SqlAnalysisStore(second).SaveAsync(Analysis("a1", "t", DateTimeOffset.UtcNow), default);   // both can work
            Assert.NotNull(await new SqlAnalysisStore(first).GetFieldAsync("a1", default));
        }
        finally { (second as IDisposable)?.Dispose(); }
    }
}
