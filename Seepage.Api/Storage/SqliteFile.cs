using Microsoft.Data.Sqlite;

namespace Seepage.Api.Storage;

/// <summary>One SQLite database file shared by the stores: creates its folder and a table schema, opens connections.</summary>
public sealed class SqliteFile
{
    private readonly string _connectionString;

    /// <summary>Prepares the file at <paramref name="databasePath"/> and runs <paramref name="schema"/> (idempotent DDL).</summary>
    public SqliteFile(string databasePath, string schema)
    {
        string? folder = Path.GetDirectoryName(Path.GetFullPath(databasePath));
        if (!string.IsNullOrEmpty(folder)) Directory.CreateDirectory(folder);
        _connectionString = new SqliteConnectionStringBuilder { DataSource = databasePath, Pooling = false }.ToString();
        using var connection = Open();
        using var command = connection.CreateCommand();
        command.CommandText = schema;
        command.ExecuteNonQuery();
    }

    public SqliteConnection Open()
    {
        var connection = new SqliteConnection(_connectionString);
        connection.Open();
        return connection;
    }
}
