using Seepage.Core.Geometry;

namespace Seepage.Core.Meshing;

/// <summary>Collects graph vertices, merging points closer than the tolerance (spatial hash of cell = tolerance).</summary>
internal sealed class VertexPool(double tolerance)
{
    private readonly Dictionary<(long, long), List<int>> _cells = new();
    public List<Point2> Points { get; } = [];
    public int Merged { get; private set; }

    public int Add(Point2 p)
    {
        long cx = (long)Math.Floor(p.X / tolerance), cy = (long)Math.Floor(p.Y / tolerance);
        for (long dx = -1; dx <= 1; dx++)
            for (long dy = -1; dy <= 1; dy++)
                if (_cells.TryGetValue((cx + dx, cy + dy), out var list))
                    foreach (int i in list)
                        if (Points[i].DistanceTo(p) <= tolerance)
                        {
                            if (Points[i] != p) Merged++;
                            return i;
                        }
        Points.Add(p);
        if (!_cells.TryGetValue((cx, cy), out var cell)) _cells[(cx, cy)] = cell = [];
        cell.Add(Points.Count - 1);
        return Points.Count - 1;
    }
}
