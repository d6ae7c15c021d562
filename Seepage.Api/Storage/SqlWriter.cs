namespace Seepage.Api.Storage;

/// <summary>Runs one writing statement on its own connection, behind the database's write lock where it has one.</summary>
public sealed class SqlWriter(Database db)
{
    public async Task<int> ExecuteAsync(string sql, CancellationToken cancellation, params (string Name, object? Value)[] parameters)
    {
        var gate = db.WriteLock;
        if (gate is not null) await gate.WaitAsync(cancellation);
        try
        {
            await using var connection = await db.OpenAsync(cancellation);
            return await Sql.ExecuteAsync(connection, null, sql, cancellation, parameters);
        }
        finally { gate?.Release(); }
    }

    /// <summary>True when the statement changed at least one row.</summary>
    public async Task<bool> ChangedAsync(string sql, CancellationToken cancellation, params (string Name, object? Value)[] parameters) =>
        await ExecuteAsync(sql, cancellation, parameters) > 0;
}
