namespace Seepage.Api.Storage;

/// <summary>Schema on a PostgreSQL server: the same tables and columns as <see cref="SqliteMigrations"/> reaches, with
/// native times and binary columns (field_json and result_json only stay so the stores' SQL is shared; they are empty here).</summary>
public static class PostgresMigrations
{
    public static readonly IReadOnlyList<Migration> All =
    [
        new(1, """
            CREATE TABLE analyses (
                id TEXT PRIMARY KEY, created_at TIMESTAMPTZ NOT NULL, title TEXT NOT NULL,
                section_json TEXT NOT NULL, result_json TEXT NOT NULL DEFAULT '', field_json TEXT NOT NULL DEFAULT '',
                field_blob BYTEA, summary_json TEXT, result_blob BYTEA);
            CREATE INDEX analyses_created ON analyses (created_at);
            CREATE TABLE studies (
                id TEXT PRIMARY KEY, created_at TIMESTAMPTZ NOT NULL, title TEXT NOT NULL, status TEXT NOT NULL,
                definition_json TEXT NOT NULL, study_json TEXT NOT NULL, updated_at TIMESTAMPTZ NOT NULL,
                total INTEGER NOT NULL DEFAULT 0);
            CREATE INDEX studies_created ON studies (created_at);
            CREATE TABLE study_rows (
                study_id TEXT NOT NULL, idx INTEGER NOT NULL, row_json TEXT NOT NULL, PRIMARY KEY (study_id, idx));
            """),
    ];
}
