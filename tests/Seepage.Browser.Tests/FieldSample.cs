using System.Text.Json;

namespace Seepage.Browser.Tests;

/// <summary>Linear (P1) interpolation of the field endpoint's nodal heads, to check the page's hover readout.</summary>
public static class FieldSample
{
    /// <summary>Total head in m at (x, y) in m, or null when no triangle contains the point.</summary>
    public static double? HeadAt(JsonElement field, double x, double y)
    {
        var nodes = field.GetProperty("nodes").EnumerateArray().Select(n => (X: n[0].GetDouble(), Y: n[1].GetDouble())).ToArray();
        var heads = field.GetProperty("heads").EnumerateArray().Select(h => h.GetDouble()).ToArray();
        foreach (var t in field.GetProperty("triangles").EnumerateArray())
        {
            int a = t[0].GetInt32(), b = t[1].GetInt32(), c = t[2].GetInt32();
            var (pa, pb, pc) = (nodes[a], nodes[b], nodes[c]);
            double det = (pb.X - pa.X) * (pc.Y - pa.Y) - (pc.X - pa.X) * (pb.Y - pa.Y);
            if (Math.Abs(det) < 1e-14) continue;
            double lb = ((x - pa.X) * (pc.Y - pa.Y) - (pc.X - pa.X) * (y - pa.Y)) / det;
            double lc = ((pb.X - pa.X) * (y - pa.Y) - (x - pa.X) * (pb.Y - pa.Y)) / det;
            double la = 1 - lb - lc;
            if (la < -1e-9 || lb < -1e-9 || lc < -1e-9) continue;
            return la * heads[a] + lb * heads[b] + lc * heads[c];
        }
        return null;
    }
}
