namespace Seepage.Api.Storage;

/// <summary>Schema of the SQLite file. Version 1 is the schema files had before migrations were versioned (so an older
/// file is taken over as it is); later versions only add.</summary>
public static class SqliteMigrations
{
    public static readonly IReadOnlyList<Migration> All =
    [
        new(1, """
            CREATE TABLE IF NOT EXISTS analyses (
                id TEXT PRIMARY KEY, created_at TEXT NOT NULL, title TEXT NOT NULL,
                section_json TEXT NOT NULL, result_json TEXT NOT NULL, field_json TEXT NOT NULL);
            CREATE TABLE IF NOT EXISTS studies (
                id TEXT PRIMARY KEY, created_at TEXT NOT NULL, title TEXT NOT NULL, status TEXT NOT NULL,
                definition_json TEXT NOT NULL, study_json TEXT NOT NULL, updated_at TEXT NOT NULL);
            """),
        new(2, """
            ALTER TABLE analyses ADD COLUMN field_blob BLOB;
            ALTER TABLE analyses ADD COLUMN summary_json TEXT;
            ALTER TABLE analyses ADD COLUMN result_blob BLOB;
            CREATE INDEX analyses_created ON analyses (created_at);
            ALTER TABLE studies ADD COLUMN total INTEGER NOT NULL DEFAULT 0;
            CREATE INDEX studies_created ON studies (created_at);
            CREATE TABLE study_rows (
                study_id TEXT NOT NULL, idx INTEGER NOT NULL, row_json TEXT NOT NULL, PRIMARY KEY (study_id, idx));
            """),
    ];
}
