using System.Text.Json.Nodes;

namespace Seepage.Api.Contracts;

/// <summary>The body of POST /api/v1/studies: the base section document and the alternatives, each a name and changes keyed
/// by JSON pointer (RFC 6901) into the section, e.g. <c>{ "/cutoffs/1/tip/1": -8.0, "/heads/0/total": 7.5 }</c>.</summary>
public sealed record StudyRequestDto(JsonObject Base, IReadOnlyList<StudyAlternativeDto> Alternatives);

/// <summary>One alternative: a name and the section members it changes (JSON pointer → value; lengths in m, heads in m).</summary>
public sealed record StudyAlternativeDto(string Name, IReadOnlyDictionary<string, JsonNode?> Changes);
