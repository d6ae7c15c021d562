namespace Seepage.Api.Contracts;

/// <summary>Body of a rename: the new title (1 … 200 characters, no control characters).</summary>
public sealed record RenameDto(string Title);
