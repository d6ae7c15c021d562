using System.Data.Common;
using System.Globalization;
using Microsoft.Data.Sqlite;

namespace Seepage.Api.Storage;

/// <summary>The embedded default: one SQLite file in WAL mode (several readers beside one writer). Migrations run in an
/// immediate transaction, which takes the file's write lock, so two processes starting together apply them once.</summary>
public sealed class SqliteDatabase : Database
{
    private readonly string _connectionString;
    private readonly SemaphoreSlim _write = new(1, 1);

    public SqliteDatabase(string path)
    {
        Path = path;
        string? folder = System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(path));
        if (!string.IsNullOrEmpty(folder)) Directory.CreateDirectory(folder);
        _connectionString = new SqliteConnectionStringBuilder { DataSource = path, Pooling = false, DefaultTimeout = 60 }.ToString();
    }

    /// <summary>The database file.</summary>
    public string Path { get; }

    public override string Provider => "Sqlite";

    public override IReadOnlyList<Migration> Migrations => SqliteMigrations.All;

    public override string CaseInsensitiveLike => "LIKE";   // SQLite's LIKE ignores the case of ASCII letters

    public override SemaphoreSlim? WriteLock => _write;

    public override object Time(DateTimeOffset time) => time.ToUniversalTime().ToString("O", CultureInfo.InvariantCulture);

    public override DateTimeOffset ReadTime(DbDataReader reader, int ordinal) =>
        DateTimeOffset.Parse(reader.GetString(ordinal), CultureInfo.InvariantCulture);

    protected override async Task<DbConnection> OpenRawAsync(CancellationToken cancellation)
    {
        var connection = new SqliteConnection(_connectionString);
        await connection.OpenAsync(cancellation);
        return connection;
    }

    protected override Task PrepareAsync(DbConnection connection, CancellationToken cancellation) =>
        Sql.ExecuteAsync(connection, null, "PRAGMA journal_mode = WAL", cancellation);

    // BeginTransaction of Microsoft.Data.Sqlite is BEGIN IMMEDIATE: the write lock is already held.
    protected override Task LockAsync(DbConnection connection, DbTransaction transaction, CancellationToken cancellation) =>
        Task.CompletedTask;
}
