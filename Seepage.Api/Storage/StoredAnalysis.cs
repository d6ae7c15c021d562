namespace Seepage.Api.Storage;

/// <summary>One stored analysis: the posted section, the result document and the field data, all as JSON.</summary>
public sealed record StoredAnalysis(string Id, DateTimeOffset CreatedAt, string Title, string SectionJson, string ResultJson, string FieldJson);
