using Microsoft.Data.Sqlite;

namespace Seepage.Api.Storage;

/// <summary>Studies kept in the same SQLite file as the analyses (table <c>studies</c>): the definition as posted and the
/// study document (state and rows so far), updated as alternatives finish.</summary>
public sealed class StudyStore
{
    private readonly SqliteFile _file;
    private readonly SemaphoreSlim _write = new(1, 1);

    public StudyStore(string databasePath) => _file = new SqliteFile(databasePath, """
            CREATE TABLE IF NOT EXISTS studies (
                id TEXT PRIMARY KEY, created_at TEXT NOT NULL, title TEXT NOT NULL, status TEXT NOT NULL,
                definition_json TEXT NOT NULL, study_json TEXT NOT NULL, updated_at TEXT NOT NULL);
            """);

    public Task CreateAsync(string id, DateTimeOffset created, string title, string definitionJson, string studyJson, CancellationToken cancellation) =>
        WriteAsync("INSERT INTO studies VALUES ($id, $created, $title, 'running', $definition, $study, $created)", cancellation,
            ("$id", id), ("$created", created.ToString("O")), ("$title", title), ("$definition", definitionJson), ("$study", studyJson));

    public Task UpdateAsync(string id, string status, string studyJson, CancellationToken cancellation) =>
        WriteAsync("UPDATE studies SET status = $status, study_json = $study, updated_at = $now WHERE id = $id", cancellation,
            ("$id", id), ("$status", status), ("$study", studyJson), ("$now", DateTimeOffset.UtcNow.ToString("O")));

    /// <summary>The study document (JSON) of one study and when it was last written, or null when the id is unknown.</summary>
    public async Task<(string Json, DateTimeOffset Updated)?> GetJsonAsync(string id, CancellationToken cancellation)
    {
        await using var connection = Open();
        await using var command = connection.CreateCommand();
        command.CommandText = "SELECT study_json, updated_at FROM studies WHERE id = $id";
        command.Parameters.AddWithValue("$id", id);
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        if (!await reader.ReadAsync(cancellation)) return null;
        return (reader.GetString(0), DateTimeOffset.Parse(reader.GetString(1), System.Globalization.CultureInfo.InvariantCulture));
    }

    private async Task WriteAsync(string sql, CancellationToken cancellation, params (string Name, string Value)[] parameters)
    {
        await _write.WaitAsync(cancellation);
        try
        {
            await using var connection = Open();
            await using var command = connection.CreateCommand();
            command.CommandText = sql;
            foreach (var (name, value) in parameters) command.Parameters.AddWithValue(name, value);
            await command.ExecuteNonQueryAsync(cancellation);
        }
        finally { _write.Release(); }
    }

    private SqliteConnection Open() => _file.Open();
}
