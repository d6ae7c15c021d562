using Microsoft.Data.Sqlite;

namespace Seepage.Api.Storage;

/// <summary>Analyses kept in an embedded SQLite database file, so they survive a restart.</summary>
public sealed class AnalysisStore
{
    private readonly SqliteFile _file;

    public AnalysisStore(string databasePath) => _file = new SqliteFile(databasePath, """
            PRAGMA journal_mode = WAL;
            CREATE TABLE IF NOT EXISTS analyses (
                id TEXT PRIMARY KEY, created_at TEXT NOT NULL, title TEXT NOT NULL,
                section_json TEXT NOT NULL, result_json TEXT NOT NULL, field_json TEXT NOT NULL);
            """);

    public async Task SaveAsync(StoredAnalysis a, CancellationToken cancellation)
    {
        await using var connection = Open();
        await using var command = connection.CreateCommand();
        command.CommandText = "INSERT INTO analyses VALUES ($id, $created, $title, $section, $result, $field)";
        command.Parameters.AddWithValue("$id", a.Id);
        command.Parameters.AddWithValue("$created", a.CreatedAt.ToString("O"));
        command.Parameters.AddWithValue("$title", a.Title);
        command.Parameters.AddWithValue("$section", a.SectionJson);
        command.Parameters.AddWithValue("$result", a.ResultJson);
        command.Parameters.AddWithValue("$field", a.FieldJson);
        await command.ExecuteNonQueryAsync(cancellation);
    }

    /// <summary>The named column of one analysis, or null when the id is unknown.</summary>
    public async Task<string?> GetJsonAsync(string id, AnalysisPart part, CancellationToken cancellation)
    {
        string column = part switch
        {
            AnalysisPart.Section => "section_json",
            AnalysisPart.Result => "result_json",
            _ => "field_json",
        };
        await using var connection = Open();
        await using var command = connection.CreateCommand();
        command.CommandText = $"SELECT {column} FROM analyses WHERE id = $id";
        command.Parameters.AddWithValue("$id", id);
        return await command.ExecuteScalarAsync(cancellation) as string;
    }

    private SqliteConnection Open() => _file.Open();
}

/// <summary>Which JSON of a stored analysis to read.</summary>
public enum AnalysisPart { Section, Result, Field }
