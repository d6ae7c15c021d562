using Seepage.Api.Application;

namespace Seepage.Api.Storage;

/// <summary>Analyses in table <c>analyses</c> of either provider: section as JSON text, the result as Brotli-compressed JSON (older SQLite rows: text), field data as a
/// binary column (older SQLite rows keep their field JSON), key figures for listings as JSON.</summary>
public sealed class SqlAnalysisStore(Database db) : IAnalysisStore
{
    private readonly SqlWriter _writer = new(db);

    public Task SaveAsync(StoredAnalysis a, CancellationToken cancellation) =>
        _writer.ExecuteAsync("""
            INSERT INTO analyses (id, created_at, title, section_json, result_json, result_blob, field_json, field_blob, summary_json)
            VALUES (@id, @created, @title, @section, '', @result, '', @field, @summary) ON CONFLICT (id) DO NOTHING
            """, cancellation, ("@id", a.Id), ("@created", db.Time(a.CreatedAt)), ("@title", a.Title), ("@section", a.SectionJson),
            ("@result", TextCodec.Pack(a.ResultJson)), ("@field", a.Field), ("@summary", a.SummaryJson));

    public async Task<string?> GetJsonAsync(string id, AnalysisPart part, CancellationToken cancellation)
    {
        string columns = part == AnalysisPart.Section ? "section_json, NULL" : "result_json, result_blob";
        await using var connection = await db.OpenAsync(cancellation);
        await using var command = Sql.Command(connection, null, $"SELECT {columns} FROM analyses WHERE id = @id", ("@id", id));
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        if (!await reader.ReadAsync(cancellation)) return null;
        return reader.IsDBNull(1) ? reader.GetString(0) : TextCodec.Unpack((byte[])reader.GetValue(1));
    }

    public async Task<StoredField?> GetFieldAsync(string id, CancellationToken cancellation)
    {
        await using var connection = await db.OpenAsync(cancellation);
        await using var command = Sql.Command(connection, null, "SELECT field_blob, field_json FROM analyses WHERE id = @id", ("@id", id));
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        if (!await reader.ReadAsync(cancellation)) return null;
        return reader.IsDBNull(0) ? new StoredField(null, reader.GetString(1)) : new StoredField((byte[])reader.GetValue(0), null);
    }

    public Task<ListPage<StoredListing>> ListAsync(ListQuery query, CancellationToken cancellation) =>
        SqlListing.ReadAsync(db, "analyses", "id, created_at, title, summary_json", query,
            r => new StoredListing(r.GetString(0), db.ReadTime(r, 1), r.GetString(2), r.IsDBNull(3) ? null : r.GetString(3)), cancellation);

    public Task<bool> RenameAsync(string id, string title, string resultJson, CancellationToken cancellation) =>
        _writer.ChangedAsync("UPDATE analyses SET title = @title, result_json = '', result_blob = @result WHERE id = @id",
            cancellation, ("@id", id), ("@title", title), ("@result", TextCodec.Pack(resultJson)));

    public Task<bool> DeleteAsync(string id, CancellationToken cancellation) =>
        _writer.ChangedAsync("DELETE FROM analyses WHERE id = @id", cancellation, ("@id", id));

    public Task<int> DeleteOlderThanAsync(DateTimeOffset cutoff, CancellationToken cancellation) =>
        _writer.ExecuteAsync("DELETE FROM analyses WHERE created_at < @cutoff", cancellation, ("@cutoff", db.Time(cutoff)));
}
