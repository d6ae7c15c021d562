using Seepage.Core.Fem;
using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>Finds the triangle under a point (uniform bucket grid over triangle bounding boxes) and interpolates
/// head there (linear or quadratic, element by element).</summary>
public sealed class FieldSampler
{
    private readonly HeadField _field;
    private readonly double _minX, _minY, _cell;
    private readonly int _nx, _ny;
    private readonly int[] _cellStart, _cellItems;

    public FieldSampler(HeadField field)
    {
        _field = field;
        var m = field.Mesh;
        _minX = m.X.Min(); _minY = m.Y.Min();
        double w = m.X.Max() - _minX, h = m.Y.Max() - _minY;
        int target = Math.Max(1, m.TriangleCount / 2);
        _cell = Math.Max(Math.Sqrt(w * h / target), 1e-9 * Math.Max(w, h));
        _nx = Math.Max(1, (int)(w / _cell) + 1); _ny = Math.Max(1, (int)(h / _cell) + 1);
        var counts = new int[_nx * _ny + 1];
        ForEachCell((t, c) => counts[c + 1]++);
        for (int i = 0; i < _nx * _ny; i++) counts[i + 1] += counts[i];
        _cellStart = (int[])counts.Clone();
        _cellItems = new int[counts[^1]];
        var next = (int[])counts.Clone();
        ForEachCell((t, c) => _cellItems[next[c]++] = t);
    }

    public HeadField Field => _field;

    private void ForEachCell(Action<int, int> visit)
    {
        var m = _field.Mesh; var tri = m.Triangles;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            int x0 = CellX(Math.Min(m.X[a], Math.Min(m.X[b], m.X[c]))), x1 = CellX(Math.Max(m.X[a], Math.Max(m.X[b], m.X[c])));
            int y0 = CellY(Math.Min(m.Y[a], Math.Min(m.Y[b], m.Y[c]))), y1 = CellY(Math.Max(m.Y[a], Math.Max(m.Y[b], m.Y[c])));
            for (int i = x0; i <= x1; i++) for (int j = y0; j <= y1; j++) visit(t, j * _nx + i);
        }
    }

    private int CellX(double x) => Math.Clamp((int)((x - _minX) / _cell), 0, _nx - 1);
    private int CellY(double y) => Math.Clamp((int)((y - _minY) / _cell), 0, _ny - 1);

    /// <summary>The triangle containing p (with a small tolerance), or −1 outside the mesh.</summary>
    public int Locate(Point2 p)
    {
        var m = _field.Mesh; var tri = m.Triangles;
        int cell = CellY(p.Y) * _nx + CellX(p.X);
        int best = -1; double bestMin = -1e-9;
        for (int k = _cellStart[cell]; k < _cellStart[cell + 1]; k++)
        {
            int t = _cellItems[k];
            var (l0, l1, l2) = Barycentric(t, p);
            double least = Math.Min(l0, Math.Min(l1, l2));
            if (least > bestMin) { bestMin = least; best = t; if (least >= 0) return t; }
        }
        return best;
    }

    /// <summary>Barycentric coordinates of p in triangle t.</summary>
    public (double, double, double) Barycentric(int t, Point2 p) => _field.Barycentric(t, p);

    /// <summary>Total head (m) at p, or null outside the mesh (P1 or P2, element-wise).</summary>
    public double? Head(Point2 p)
    {
        int t = Locate(p);
        if (t < 0) return null;
        var (l0, l1, l2) = Barycentric(t, p);
        return _field.Value(t, l0, l1, l2);
    }
}
