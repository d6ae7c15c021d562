namespace Seepage.Api.Contracts;

/// <summary>One page of stored studies, newest first: page number (from 1), page size, how many match the filter, items.</summary>
public sealed record StudyListDto(int Page, int PageSize, int Total, IReadOnlyList<StudyListItemDto> Items);

/// <summary>A stored study in a listing: id, title, when it was made (UTC), status, and <c>done</c> of <c>total</c>
/// alternatives.</summary>
public sealed record StudyListItemDto(string Id, string Title, DateTimeOffset CreatedAt, string Status, int Done, int Total);
