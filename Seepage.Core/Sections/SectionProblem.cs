namespace Seepage.Core.Sections;

/// <summary>One problem found in a section document: a JSON pointer (RFC 6901) to the offending member and a
/// plain-language message.</summary>
public sealed record SectionProblem(string Pointer, string Message);
