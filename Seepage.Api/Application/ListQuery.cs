namespace Seepage.Api.Application;

/// <summary>A page of a listing, newest first: page number from 1, page size, and an optional title filter (a
/// case-insensitive substring of the title).</summary>
public sealed record ListQuery(int Page, int PageSize, string? Title)
{
    /// <summary>Rows skipped before the page.</summary>
    public int Offset => (Page - 1) * PageSize;
}

/// <summary>One page of stored items and the number of items matching the filter.</summary>
public sealed record ListPage<T>(IReadOnlyList<T> Items, int Total);
