namespace Seepage.Api.Application;

/// <summary>One analysis as stored: the posted section and the result document as JSON, the field data in the compact
/// binary form of <c>FieldCodec</c>, and the key figures shown in listings (JSON of <c>AnalysisSummaryDto</c>).</summary>
public sealed record StoredAnalysis(string Id, DateTimeOffset CreatedAt, string Title, string SectionJson, string ResultJson,
    byte[] Field, string SummaryJson);

/// <summary>Which JSON document of a stored analysis to read.</summary>
public enum AnalysisPart { Section, Result }

/// <summary>The field data of a stored analysis: the compact binary form, or (analyses stored before it) the JSON.</summary>
public sealed record StoredField(byte[]? Binary, string? Json);

/// <summary>One line of a listing: id, creation time (UTC), title and the key figures (JSON, null for old entries).</summary>
public sealed record StoredListing(string Id, DateTimeOffset CreatedAt, string Title, string? SummaryJson);
