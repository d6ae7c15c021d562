using Npgsql;

namespace Seepage.Api.Tests.Storage;

/// <summary>The PostgreSQL server of the tests, named by the environment variable <see cref="Variable"/> (a connection
/// string; ./test.sh starts a throw-away cluster and sets it). Each test gets a schema of its own, dropped afterwards.
/// Without the variable the PostgreSQL tests are reported as skipped, unless <see cref="RequireVariable"/> is set (as
/// ./test.sh does), when they fail.</summary>
public static class PostgresTestServer
{
    public const string Variable = "SEEPAGE_TEST_POSTGRES";
    public const string RequireVariable = "SEEPAGE_REQUIRE_POSTGRES";

    /// <summary>The server's connection string; skips the calling test when there is none.</summary>
    public static string ConnectionString()
    {
        string? cs = Environment.GetEnvironmentVariable(Variable);
        if (string.IsNullOrEmpty(cs) && Environment.GetEnvironmentVariable(RequireVariable) == "1")
            throw new InvalidOperationException($"{RequireVariable}=1 but {Variable} is not set: the PostgreSQL tests cannot run.");
        Skip.If(string.IsNullOrEmpty(cs), $"PostgreSQL tests skipped: set {Variable} to a connection string (./test.sh starts a server).");
        return cs!;
    }

    /// <summary>Creates a new schema and returns a connection string whose search path is it.</summary>
    public static string NewSchema(out string schema)
    {
        string cs = ConnectionString();
        schema = "t_" + Guid.NewGuid().ToString("N")[..12];
        using (var connection = new NpgsqlConnection(cs))
        {
            connection.Open();
            using var command = new NpgsqlCommand($"CREATE SCHEMA {schema}", connection);
            command.ExecuteNonQuery();
        }
        return new NpgsqlConnectionStringBuilder(cs) { SearchPath = schema }.ToString();
    }

    public static void DropSchema(string schema)
    {
        NpgsqlConnection.ClearAllPools();
        using var connection = new NpgsqlConnection(ConnectionString());
        connection.Open();
        using var command = new NpgsqlCommand($"DROP SCHEMA IF EXISTS {schema} CASCADE", connection);
        command.ExecuteNonQuery();
    }
}
