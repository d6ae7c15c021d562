using Seepage.Core.Fem;
using Seepage.Core.Geometry;
using Seepage.Core.Meshing;

namespace Seepage.Core.Results;

/// <summary>Level lines of a P1 nodal field: in each triangle the level crosses two edges at linearly
/// interpolated points; the pieces are joined into polylines through the mesh edges they share. An optional mask
/// keeps the lines to the triangles it marks (the saturated soil of an unconfined section).</summary>
public static class ContourTracer
{
    public static List<List<Point2>> Trace(Mesh mesh, double[] values, double level, bool[]? keep = null)
    {
        var tri = mesh.Triangles;
        // Each piece joins two crossed mesh edges, keyed by their (min, max) node pair.
        var pieces = new List<(long A, long B, Point2 Pa, Point2 Pb)>();
        Span<long> keys = stackalloc long[2];
        Span<Point2> pts = stackalloc Point2[2];
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            if (keep is not null && !keep[t]) continue;
            int found = 0;
            for (int e = 0; e < 3 && found < 2; e++)
            {
                int i = tri[3 * t + e], j = tri[3 * t + (e + 1) % 3];
                double vi = values[i] - level, vj = values[j] - level;
                if ((vi < 0) == (vj < 0)) continue;
                double s = vi / (vi - vj);
                keys[found] = EdgeKey.Of(i, j);
                pts[found] = new Point2(mesh.X[i] + s * (mesh.X[j] - mesh.X[i]), mesh.Y[i] + s * (mesh.Y[j] - mesh.Y[i]));
                found++;
            }
            if (found == 2) pieces.Add((keys[0], keys[1], pts[0], pts[1]));
        }
        return Join(pieces);
    }

    private static List<List<Point2>> Join(List<(long A, long B, Point2 Pa, Point2 Pb)> pieces)
    {
        var byKey = new Dictionary<long, List<int>>(EdgeKey.Comparer);
        for (int p = 0; p < pieces.Count; p++)
        {
            Add(pieces[p].A, p); Add(pieces[p].B, p);
        }
        var used = new bool[pieces.Count];
        var lines = new List<List<Point2>>();
        for (int p = 0; p < pieces.Count; p++)
        {
            if (used[p]) continue;
            used[p] = true;
            var line = new LinkedList<Point2>([pieces[p].Pa, pieces[p].Pb]);
            Extend(pieces[p].B, atEnd: true);
            Extend(pieces[p].A, atEnd: false);
            lines.Add(line.ToList());

            void Extend(long key, bool atEnd)
            {
                while (true)
                {
                    int next = -1;
                    foreach (int q in byKey[key]) if (!used[q]) { next = q; break; }
                    if (next < 0) return;
                    used[next] = true;
                    var (a, b, pa, pb) = pieces[next];
                    var (farKey, farPoint) = a == key ? (b, pb) : (a, pa);
                    if (atEnd) line.AddLast(farPoint); else line.AddFirst(farPoint);
                    key = farKey;
                }
            }
        }
        return lines;

        void Add(long key, int p)
        {
            if (!byKey.TryGetValue(key, out var list)) byKey[key] = list = [];
            list.Add(p);
        }
    }
}
