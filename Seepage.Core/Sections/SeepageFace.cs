using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>A potential seepage face along a boundary polyline (m): h = y where water leaves, no flow elsewhere.</summary>
public sealed record SeepageFace(string Name, IReadOnlyList<Point2> Along);
