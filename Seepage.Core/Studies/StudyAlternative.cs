using System.Text.Json.Nodes;

namespace Seepage.Core.Studies;

/// <summary>One alternative of a study: its name and the changes to the base section, each a JSON pointer into the
/// section document (RFC 6901) and the value to put there (lengths in m, heads in m, conductivities in the section's unit).</summary>
public sealed record StudyAlternative(string Name, IReadOnlyList<KeyValuePair<string, JsonNode?>> Changes);
