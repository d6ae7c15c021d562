using System.Data.Common;
using Npgsql;

namespace Seepage.Api.Storage;

/// <summary>A PostgreSQL server (Npgsql, pooled connections). Migrations run in one transaction holding a
/// transaction-scoped advisory lock, so replicas starting together apply them once.</summary>
public sealed class PostgresDatabase(string connectionString) : Database, IDisposable
{
    /// <summary>Advisory lock key of the schema migrations (any constant the database's other users do not take).</summary>
    public const long MigrationLockKey = 0x5EE9A6E0001;

    private readonly NpgsqlDataSource _source = NpgsqlDataSource.Create(connectionString);

    public string ConnectionString { get; } = connectionString;

    public override string Provider => "PostgreSQL";

    public override IReadOnlyList<Migration> Migrations => PostgresMigrations.All;

    public override string CaseInsensitiveLike => "ILIKE";

    public override object Time(DateTimeOffset time) => time.ToUniversalTime();

    public override DateTimeOffset ReadTime(DbDataReader reader, int ordinal) => reader.GetFieldValue<DateTimeOffset>(ordinal);

    protected override async Task<DbConnection> OpenRawAsync(CancellationToken cancellation) =>
        await _source.OpenConnectionAsync(cancellation);

    protected override Task LockAsync(DbConnection connection, DbTransaction transaction, CancellationToken cancellation) =>
        Sql.ExecuteAsync(connection, transaction, "SELECT pg_advisory_xact_lock(@key)", cancellation, ("@key", MigrationLockKey));

    public void Dispose() => _source.Dispose();
}
