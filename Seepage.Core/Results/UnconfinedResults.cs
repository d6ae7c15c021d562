using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>One polyline of the phreatic surface (p = 0), m, ordered upstream (low x) to downstream.</summary>
public sealed record PhreaticLine(IReadOnlyList<Point2> Points);

/// <summary>Water leaving through one seepage face: Flow in m³/s per m (positive out of the soil), ExitPoint the highest
/// point where water leaves (m; null when none leaves), WettedLength the length of the face where it leaves (m).</summary>
public sealed record SeepageFaceResult(string Name, double Flow, Point2? ExitPoint, double WettedLength);
