using System.Data.Common;

namespace Seepage.Api.Storage;

/// <summary>Small helpers for parameterised commands (names start with <c>@</c>, understood by both providers).</summary>
public static class Sql
{
    public static DbCommand Command(DbConnection connection, DbTransaction? transaction, string sql,
        params (string Name, object? Value)[] parameters)
    {
        var command = connection.CreateCommand();
        command.CommandText = sql;
        command.Transaction = transaction;
        foreach (var (name, value) in parameters)
        {
            var p = command.CreateParameter();
            p.ParameterName = name;
            p.Value = value ?? DBNull.Value;
            command.Parameters.Add(p);
        }
        return command;
    }

    public static async Task<int> ExecuteAsync(DbConnection connection, DbTransaction? transaction, string sql,
        CancellationToken cancellation, params (string Name, object? Value)[] parameters)
    {
        await using var command = Command(connection, transaction, sql, parameters);
        return await command.ExecuteNonQueryAsync(cancellation);
    }

    public static async Task<object?> ScalarAsync(DbConnection connection, DbTransaction? transaction, string sql,
        CancellationToken cancellation, params (string Name, object? Value)[] parameters)
    {
        await using var command = Command(connection, transaction, sql, parameters);
        var value = await command.ExecuteScalarAsync(cancellation);
        return value is DBNull ? null : value;
    }

    /// <summary>A LIKE pattern matching <paramref name="text"/> anywhere, with <c>\</c> escaping <c>%</c> and <c>_</c>.</summary>
    public static string Contains(string text) =>
        "%" + text.Replace("\\", "\\\\").Replace("%", "\\%").Replace("_", "\\_") + "%";
}
