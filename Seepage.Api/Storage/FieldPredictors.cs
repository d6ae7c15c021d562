namespace Seepage.Api.Storage;

/// <summary>Guesses that shrink the stored field data and play no part in any figure served: the stored value is the
/// guess's residual, so each value comes back exactly whatever the guess. A triangle's gradient is guessed from the
/// plane through its three stored nodal heads; a velocity from a per-zone linear map of the gradient (fitted when
/// storing, kept with the data). Only + − × ÷ on stored values, so every machine makes the same guess.</summary>
public static class FieldPredictors
{
    /// <summary>Gradient [∂h/∂x, ∂h/∂y] of the plane through the heads at the three corners of triangle t.</summary>
    public static (double Gx, double Gy) PlaneGradient(double[] xy, double[] heads, int[] triangles, int t)
    {
        int a = triangles[3 * t], b = triangles[3 * t + 1], c = triangles[3 * t + 2];
        if ((uint)a >= heads.Length || (uint)b >= heads.Length || (uint)c >= heads.Length) return (0, 0);
        double x1 = xy[2 * a], y1 = xy[2 * a + 1], dx2 = xy[2 * b] - x1, dy2 = xy[2 * b + 1] - y1;
        double dx3 = xy[2 * c] - x1, dy3 = xy[2 * c + 1] - y1;
        double dh2 = heads[b] - heads[a], dh3 = heads[c] - heads[a];
        double det = dx2 * dy3 - dx3 * dy2;
        return det == 0 ? (0, 0) : ((dh2 * dy3 - dh3 * dy2) / det, (dh3 * dx2 - dh2 * dx3) / det);
    }

    /// <summary>Least-squares map v ≈ [a b; c d]·g per zone (row-major, four numbers per zone).</summary>
    public static double[] FitLinearMaps(double[] gradients, double[] velocities, int[] zones, int zoneCount)
    {
        var sums = new double[zoneCount * 7];           // Σgx², Σgxgy, Σgy², Σgx·vx, Σgy·vx, Σgx·vy, Σgy·vy
        for (int t = 0; t < zones.Length; t++)
        {
            double gx = gradients[2 * t], gy = gradients[2 * t + 1], vx = velocities[2 * t], vy = velocities[2 * t + 1];
            var s = sums.AsSpan(7 * zones[t], 7);
            s[0] += gx * gx; s[1] += gx * gy; s[2] += gy * gy; s[3] += gx * vx; s[4] += gy * vx; s[5] += gx * vy; s[6] += gy * vy;
        }
        var maps = new double[zoneCount * 4];
        for (int z = 0; z < zoneCount; z++)
        {
            var s = sums.AsSpan(7 * z, 7);
            double det = s[0] * s[2] - s[1] * s[1];
            if (det == 0 || !double.IsFinite(det)) continue;
            maps[4 * z] = (s[3] * s[2] - s[4] * s[1]) / det;
            maps[4 * z + 1] = (s[0] * s[4] - s[1] * s[3]) / det;
            maps[4 * z + 2] = (s[5] * s[2] - s[6] * s[1]) / det;
            maps[4 * z + 3] = (s[0] * s[6] - s[1] * s[5]) / det;
        }
        return maps;
    }

    /// <summary>Component <paramref name="k"/> (0: x, 1: y) of the mapped gradient of triangle t.</summary>
    public static double Mapped(double[] maps, double[] gradients, int[] zones, int t, int k)
    {
        int z = zones[t];
        if ((uint)(4 * z + 3) >= maps.Length) return 0;
        return maps[4 * z + 2 * k] * gradients[2 * t] + maps[4 * z + 2 * k + 1] * gradients[2 * t + 1];
    }
}
