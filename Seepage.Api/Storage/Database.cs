using System.Data.Common;

namespace Seepage.Api.Storage;

/// <summary>One relational database holding the stores' tables: opens connections (after the schema is migrated) and
/// knows the few places where the SQL of the two providers differs. <see cref="SqliteDatabase"/> and
/// <see cref="PostgresDatabase"/> are the two providers; the stores' SQL is otherwise shared.</summary>
public abstract class Database
{
    private readonly object _gate = new();
    private Task? _migrated;

    /// <summary>Provider name as configured (<c>Sqlite</c>, <c>PostgreSQL</c>).</summary>
    public abstract string Provider { get; }

    /// <summary>The schema's migrations, oldest first; versions increase from 1.</summary>
    public abstract IReadOnlyList<Migration> Migrations { get; }

    /// <summary>Operator of a case-insensitive LIKE.</summary>
    public abstract string CaseInsensitiveLike { get; }

    /// <summary>Serialises writers within the process where the database needs it (SQLite has one writer at a time).</summary>
    public virtual SemaphoreSlim? WriteLock => null;

    /// <summary>The parameter value of a point in time.</summary>
    public abstract object Time(DateTimeOffset time);

    /// <summary>Reads a point in time written by <see cref="Time"/>.</summary>
    public abstract DateTimeOffset ReadTime(DbDataReader reader, int ordinal);

    /// <summary>Opens a connection to a database whose schema is up to date.</summary>
    public async Task<DbConnection> OpenAsync(CancellationToken cancellation)
    {
        await MigrateAsync(cancellation);
        return await OpenRawAsync(cancellation);
    }

    /// <summary>Brings the schema up to date once per process (again after a failure); safe when several processes start
    /// together (the migrations run in one transaction holding a database-wide lock).</summary>
    public Task MigrateAsync(CancellationToken cancellation)
    {
        lock (_gate)
        {
            if (_migrated is null || _migrated.IsFaulted || _migrated.IsCanceled)
                _migrated = ApplyMigrationsAsync(CancellationToken.None);
            return _migrated.WaitAsync(cancellation);
        }
    }

    /// <summary>A connection, without the migration check.</summary>
    protected abstract Task<DbConnection> OpenRawAsync(CancellationToken cancellation);

    /// <summary>Runs before the migration transaction (SQLite: WAL mode, which cannot change inside one).</summary>
    protected virtual Task PrepareAsync(DbConnection connection, CancellationToken cancellation) => Task.CompletedTask;

    /// <summary>Takes the database-wide migration lock inside <paramref name="transaction"/>, released when it ends.</summary>
    protected abstract Task LockAsync(DbConnection connection, DbTransaction transaction, CancellationToken cancellation);

    /// <summary>In one transaction that holds the migration lock: applies the migrations not yet recorded in
    /// <c>schema_version</c>. A second process starting at the same time waits for the lock and then finds nothing to do.</summary>
    private async Task ApplyMigrationsAsync(CancellationToken cancellation)
    {
        await using var connection = await OpenRawAsync(cancellation);
        await PrepareAsync(connection, cancellation);
        await using var transaction = await connection.BeginTransactionAsync(cancellation);
        await LockAsync(connection, transaction, cancellation);
        await Sql.ExecuteAsync(connection, transaction,
            "CREATE TABLE IF NOT EXISTS schema_version (version INTEGER PRIMARY KEY, applied_at TEXT NOT NULL)", cancellation);
        long current = Convert.ToInt64(await Sql.ScalarAsync(connection, transaction,
            "SELECT COALESCE(MAX(version), 0) FROM schema_version", cancellation) ?? 0L, System.Globalization.CultureInfo.InvariantCulture);
        foreach (var migration in Migrations.Where(m => m.Version > current))
        {
            await Sql.ExecuteAsync(connection, transaction, migration.Sql, cancellation);
            await Sql.ExecuteAsync(connection, transaction, "INSERT INTO schema_version VALUES (@v, @t)", cancellation,
                ("@v", migration.Version), ("@t", DateTimeOffset.UtcNow.ToString("O")));
        }
        await transaction.CommitAsync(cancellation);
    }
}

/// <summary>One schema step: its version and the SQL that makes it (run once, in a transaction).</summary>
public sealed record Migration(int Version, string Sql);
