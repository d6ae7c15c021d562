namespace Seepage.Core.Sections;

/// <summary>A potential seepage face: a polyline of the domain boundary (list of [x, y], m) where water may leave at
/// atmospheric pressure (h = y where it flows out, no flow where the pressure would be negative).</summary>
public sealed record SeepageFaceDocument
{
    public string? Name { get; init; }
    public List<double[]>? Along { get; init; }
}
