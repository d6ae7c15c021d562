namespace Seepage.Api.Contracts;

/// <summary>An entry of the example list: name (for /api/v1/examples/{name}), title and description.</summary>
public sealed record ExampleDto(string Name, string Title, string Description, bool IsDefault);

/// <summary>The answer of a successful section check.</summary>
public sealed record SectionCheckDto(bool Valid, IReadOnlyList<string> Warnings);
