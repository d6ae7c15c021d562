using Seepage.Api.Application;

namespace Seepage.Api.Storage;

/// <summary>Studies in tables <c>studies</c> (definition, header, status) and <c>study_rows</c> (one row per alternative,
/// primary key study id + index, so a row is stored once however often its job runs) of either provider.</summary>
public sealed class SqlStudyStore(Database db) : IStudyStore
{
    private readonly SqlWriter _writer = new(db);

    public Task CreateAsync(StoredStudy s, CancellationToken cancellation) =>
        _writer.ExecuteAsync("""
            INSERT INTO studies (id, created_at, title, status, definition_json, study_json, updated_at, total)
            VALUES (@id, @created, @title, 'running', @definition, @header, @created, @total)
            """, cancellation, ("@id", s.Id), ("@created", db.Time(s.CreatedAt)), ("@title", s.Title), ("@definition", s.DefinitionJson),
            ("@header", s.HeaderJson), ("@total", s.Total));

    public async Task<bool> AddRowAsync(string studyId, int index, string rowJson, CancellationToken cancellation)
    {
        bool stored = await _writer.ChangedAsync("""
            INSERT INTO study_rows (study_id, idx, row_json) VALUES (@id, @idx, @row) ON CONFLICT (study_id, idx) DO NOTHING
            """, cancellation, ("@id", studyId), ("@idx", index), ("@row", rowJson));
        if (stored) await Touch(studyId, cancellation);
        return stored;
    }

    public async Task<bool> HasRowAsync(string studyId, int index, CancellationToken cancellation)
    {
        await using var connection = await db.OpenAsync(cancellation);
        return await Sql.ScalarAsync(connection, null, "SELECT 1 FROM study_rows WHERE study_id = @id AND idx = @idx", cancellation,
            ("@id", studyId), ("@idx", index)) is not null;
    }

    public async Task<StudyProgress?> ProgressAsync(string id, CancellationToken cancellation)
    {
        await using var connection = await db.OpenAsync(cancellation);
        await using var command = Sql.Command(connection, null, $"SELECT status, {DoneColumn}, total FROM studies WHERE id = @id", ("@id", id));
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        return await reader.ReadAsync(cancellation) ? new StudyProgress(reader.GetString(0), Int(reader.GetValue(1)), Int(reader.GetValue(2))) : null;
    }

    public Task SetStatusAsync(string id, string status, CancellationToken cancellation) =>
        _writer.ExecuteAsync("UPDATE studies SET status = @status, updated_at = @now WHERE id = @id", cancellation,
            ("@id", id), ("@status", status), ("@now", db.Time(DateTimeOffset.UtcNow)));

    public async Task<StudyRecord?> GetAsync(string id, CancellationToken cancellation)
    {
        await using var connection = await db.OpenAsync(cancellation);
        string title, status, header;
        DateTimeOffset updated;
        await using (var command = Sql.Command(connection, null,
            "SELECT title, status, study_json, updated_at FROM studies WHERE id = @id", ("@id", id)))
        await using (var reader = await command.ExecuteReaderAsync(cancellation))
        {
            if (!await reader.ReadAsync(cancellation)) return null;
            (title, status, header, updated) = (reader.GetString(0), reader.GetString(1), reader.GetString(2), db.ReadTime(reader, 3));
        }
        var rows = new List<string>();
        await using (var command = Sql.Command(connection, null,
            "SELECT row_json FROM study_rows WHERE study_id = @id ORDER BY idx", ("@id", id)))
        await using (var reader = await command.ExecuteReaderAsync(cancellation))
            while (await reader.ReadAsync(cancellation)) rows.Add(reader.GetString(0));
        return new StudyRecord(title, status, header, updated, rows);
    }

    public async Task<string?> GetDefinitionAsync(string id, CancellationToken cancellation)
    {
        await using var connection = await db.OpenAsync(cancellation);
        return await Sql.ScalarAsync(connection, null, "SELECT definition_json FROM studies WHERE id = @id", cancellation, ("@id", id))
            as string;
    }

    public async Task<IReadOnlyList<(string Id, int Total)>> RunningAsync(CancellationToken cancellation)
    {
        await using var connection = await db.OpenAsync(cancellation);
        await using var command = Sql.Command(connection, null, "SELECT id, total FROM studies WHERE status = 'running'");
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        var running = new List<(string, int)>();
        while (await reader.ReadAsync(cancellation)) running.Add((reader.GetString(0), Int(reader.GetValue(1))));
        return running;
    }

    public Task<ListPage<StudyListing>> ListAsync(ListQuery query, CancellationToken cancellation) =>
        SqlListing.ReadAsync(db, "studies",
            $"id, created_at, title, status, total, {DoneColumn}", query,
            r => new StudyListing(r.GetString(0), db.ReadTime(r, 1), r.GetString(2), r.GetString(3), Int(r.GetValue(5)), Int(r.GetValue(4))),
            cancellation);

    public Task<bool> RenameAsync(string id, string title, CancellationToken cancellation) =>
        _writer.ChangedAsync("UPDATE studies SET title = @title WHERE id = @id", cancellation, ("@id", id), ("@title", title));

    public async Task<bool> DeleteAsync(string id, CancellationToken cancellation)
    {
        await _writer.ExecuteAsync("DELETE FROM study_rows WHERE study_id = @id", cancellation, ("@id", id));
        return await _writer.ChangedAsync("DELETE FROM studies WHERE id = @id", cancellation, ("@id", id));
    }

    public async Task<int> DeleteOlderThanAsync(DateTimeOffset cutoff, CancellationToken cancellation)
    {
        var at = ("@cutoff", db.Time(cutoff));
        await _writer.ExecuteAsync("DELETE FROM study_rows WHERE study_id IN (SELECT id FROM studies WHERE created_at < @cutoff)",
            cancellation, at);
        return await _writer.ExecuteAsync("DELETE FROM studies WHERE created_at < @cutoff", cancellation, at);
    }

    private const string DoneColumn = "(SELECT COUNT(*) FROM study_rows r WHERE r.study_id = studies.id)";

    private static int Int(object value) => Convert.ToInt32(value, System.Globalization.CultureInfo.InvariantCulture);

    private Task Touch(string id, CancellationToken cancellation) =>
        _writer.ExecuteAsync("UPDATE studies SET updated_at = @now WHERE id = @id", cancellation, ("@id", id),
            ("@now", db.Time(DateTimeOffset.UtcNow)));
}
