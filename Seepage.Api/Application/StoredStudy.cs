namespace Seepage.Api.Application;

/// <summary>A new study: id, creation time, title, number of alternatives, the definition as posted and the header (the
/// study document without rows, JSON).</summary>
public sealed record StoredStudy(string Id, DateTimeOffset CreatedAt, string Title, int Total, string DefinitionJson, string HeaderJson);

/// <summary>A stored study as read: title and status from their columns, the header JSON, when it was last written, and
/// the rows stored so far (JSON, index order).</summary>
public sealed record StudyRecord(string Title, string Status, string HeaderJson, DateTimeOffset UpdatedAt, IReadOnlyList<string> Rows);

/// <summary>One line of a study listing: id, creation time (UTC), title, status and rows stored of the total.</summary>
public sealed record StudyListing(string Id, DateTimeOffset CreatedAt, string Title, string Status, int Done, int Total);

/// <summary>How far a study is: its status and how many of its <c>Total</c> alternatives have their row stored.</summary>
public sealed record StudyProgress(string Status, int Done, int Total);
