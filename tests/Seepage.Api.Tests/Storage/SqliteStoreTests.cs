using Seepage.Api.Storage;

namespace Seepage.Api.Tests.Storage;

/// <summary>The store contract on the embedded SQLite file, plus taking over a file made before migrations were versioned.</summary>
public sealed class SqliteStoreTests : StoreContractTests
{
    private readonly string _path = Path.Combine(Path.GetTempPath(), $"seepage-store-{Guid.NewGuid():N}.db");

    protected override Database CreateDatabase() => new SqliteDatabase(_path);

    protected override Database SecondHandle() => new SqliteDatabase(_path);

    protected override void DeleteDatabase() => SeepageFactory.DeleteDatabase(_path);

    [Fact]
    public async Task Migrate_FileFromBeforeVersionedMigrations_KeepsItsAnalysesAndStudies()
    {
        try
        {
            using (var connection = new Microsoft.Data.Sqlite.SqliteConnection($"Data Source={_path};Pooling=False"))
            {
                connection.Open();
                using var command = connection.CreateCommand();
                command.CommandText = """
                    CREATE TABLE analyses (id TEXT PRIMARY KEY, created_at TEXT NOT NULL, title TEXT NOT NULL,
                        section_json TEXT NOT NULL, result_json TEXT NOT NULL, field_json TEXT NOT NULL);
                    CREATE TABLE studies (id TEXT PRIMARY KEY, created_at TEXT NOT NULL, title TEXT NOT NULL, status TEXT NOT NULL,
                        definition_json TEXT NOT NULL, study_json TEXT NOT NULL, updated_at TEXT NOT NULL);
                    INSERT INTO analyses VALUES ('aold', '2026-01-01T00:00:00.0000000+00:00', 'Old', '{}', '{"title":"Old"}', '{"id":"aold"}');
                    INSERT INTO studies VALUES ('sold', '2026-01-01T00:00:00.0000000+00:00', 'Old study', 'done', '{}',
                        '{"rows":[{"index":0}]}', '2026-01-01T00:00:00.0000000+00:00');
                    """;
                command.ExecuteNonQuery();
            }
            var db = new SqliteDatabase(_path);
            var analyses = new SqlAnalysisStore(db);
            var field = await analyses.GetFieldAsync("aold", default);
            Assert.Null(field!.Binary);
            Assert.Equal("{\"id\":\"aold\"}", field.Json);
            var listed = Assert.Single((await analyses.ListAsync(new(1, 10, null), default)).Items);
            Assert.Null(listed.SummaryJson);
            var study = await new SqlStudyStore(db).GetAsync("sold", default);
            Assert.Equal("{\"rows\":[{\"index\":0}]}", study!.HeaderJson);
            Assert.Empty(study.Rows);
        }
        finally { DeleteDatabase(); }
    }
}
