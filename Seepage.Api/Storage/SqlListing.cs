using System.Data.Common;
using Seepage.Api.Application;

namespace Seepage.Api.Storage;

/// <summary>A page of a table with columns id, created_at and title, newest first, filtered by a title substring.</summary>
public static class SqlListing
{
    /// <summary>Reads <paramref name="columns"/> (a select list) of one page; <paramref name="read"/> makes an item of a row.</summary>
    public static async Task<ListPage<T>> ReadAsync<T>(Database db, string table, string columns, ListQuery query,
        Func<DbDataReader, T> read, CancellationToken cancellation)
    {
        string where = query.Title is null ? "" : $"WHERE title {db.CaseInsensitiveLike} @title ESCAPE '\\'";
        (string, object?)[] filter = query.Title is null ? [] : [("@title", Sql.Contains(query.Title))];
        await using var connection = await db.OpenAsync(cancellation);
        int total = Convert.ToInt32(await Sql.ScalarAsync(connection, null, $"SELECT COUNT(*) FROM {table} {where}", cancellation, filter),
            System.Globalization.CultureInfo.InvariantCulture);
        await using var command = Sql.Command(connection, null,
            $"SELECT {columns} FROM {table} {where} ORDER BY created_at DESC, id LIMIT @take OFFSET @skip",
            [.. filter, ("@take", query.PageSize), ("@skip", query.Offset)]);
        await using var reader = await command.ExecuteReaderAsync(cancellation);
        var items = new List<T>();
        while (await reader.ReadAsync(cancellation)) items.Add(read(reader));
        return new ListPage<T>(items, total);
    }
}
