namespace Seepage.Core.Sections;

/// <summary>One value the analysis used for a member of the section document: as given, or the default filled in.</summary>
/// <param name="Member">JSON pointer of the member, e.g. <c>/exitCheck/depth</c>.</param>
/// <param name="Value">The value used (a number, text, true/false, or a list of points), in <paramref name="Unit"/>.</param>
/// <param name="Unit">Unit of the value ("m", "kN/m³", "m/s", "degrees", "" when dimensionless or text).</param>
/// <param name="Origin">"given" or "default".</param>
/// <param name="Note">What the value means or how the default was chosen.</param>
public sealed record Assumption(string Member, object Value, string Unit, string Origin, string Note);
