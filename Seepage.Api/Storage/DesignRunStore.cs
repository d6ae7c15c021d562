using Microsoft.Data.Sqlite;

namespace Seepage.Api.Storage;

/// <summary>Target searches and uncertainty studies, kept in the same SQLite file as the analyses (table
/// <c>design_runs</c>): the kind, the definition as posted, the answer document (state and results so far) and the rows
/// of every point or sample (JSON, for the CSV and workbook exports), updated as the run goes.</summary>
public sealed class DesignRunStore
{
    private readonly SqliteFile _file;
    private readonly SemaphoreSlim _write = new(1, 1);

    public DesignRunStore(string databasePath) => _file = new SqliteFile(databasePath, """
            CREATE TABLE IF NOT EXISTS design_runs (
                id TEXT PRIMARY KEY, kind TEXT NOT NULL, created_at TEXT NOT NULL, title TEXT NOT NULL, status TEXT NOT NULL,
                definition_json TEXT NOT NULL, document_json TEXT NOT NULL, rows_json TEXT NOT NULL, updated_at TEXT NOT NULL);
            """);

    public Task CreateAsync(string id, string kind, DateTimeOffset created, string title, string definitionJson, string documentJson,
        CancellationToken cancellation) =>
        WriteAsync("INSERT INTO design_runs VALUES ($id, $kind, $created, $title, 'running', $definition, $document, '[]', $created)",
            cancellation, ("$id", id), ("$kind", kind), ("$created", created.ToString("O")), ("$title", title),
            ("$definition", definitionJson), ("$document", documentJson));

    /// <summary>Writes the answer document, and the rows when given.</summary>
    public Task UpdateAsync(string id, string status, string documentJson, string? rowsJson, CancellationToken cancellation) =>
        rowsJson is null
            ? WriteAsync("UPDATE design_runs SET status = $status, document_json = $document, updated_at = $now WHERE id = $id",
                cancellation, ("$id", id), ("$status", status), ("$document", documentJson), ("$now", Now()))
            : WriteAsync("UPDATE design_runs SET status = $status, document_json = $document, rows_json = $rows, updated_at = $now " +
                "WHERE id = $id", cancellation, ("$id", id), ("$status", status), ("$document", documentJson), ("$rows", rowsJson),
                ("$now", Now()));

    /// <summary>The answer document (or the rows) of one run of the given kind and when it was last written; null when unknown.</summary>
    public async Task<(string Json, DateTimeOffset Updated)?> GetAsync(string id, string kind, bool rows, CancellationToken cancellation)
    {
        await using var connection = _file.Open();
        await using var command = connection.CreateCommand();
        command.CommandText = $"SELECT {(rows ? "rows_json" : "document_json")}, updated_at FROM design_runs WHERE id = $id AND kind = $kind";
        command.Parameters.AddWithValue("$id", id);
        command.Parameters.AddWithValue("$kind", kind);
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        if (!await reader.ReadAsync(cancellation)) return null;
        return (reader.GetString(0), DateTimeOffset.Parse(reader.GetString(1), System.Globalization.CultureInfo.InvariantCulture));
    }

    private static string Now() => DateTimeOffset.UtcNow.ToString("O");

    private async Task WriteAsync(string sql, CancellationToken cancellation, params (string Name, string Value)[] parameters)
    {
        await _write.WaitAsync(cancellation);
        try
        {
            await using var connection = _file.Open();
            await using var command = connection.CreateCommand();
            command.CommandText = sql;
            foreach (var (name, value) in parameters) command.Parameters.AddWithValue(name, value);
            await command.ExecuteNonQueryAsync(cancellation);
        }
        finally { _write.Release(); }
    }
}
