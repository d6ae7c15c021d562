namespace Seepage.Core.Meshing;

/// <summary>Orders points along a Hilbert curve over their bounding box, so that points close in the order
/// are close in the plane (better cache use in point location and in the solver's matrix).</summary>
internal static class HilbertOrder
{
    private const int Bits = 16;

    /// <summary>Hilbert index of (x, y) on a 2¹⁶ × 2¹⁶ grid over the box (standard rotate-and-flip
    /// construction of the curve).</summary>
    public static long Index(double x, double y, double minX, double minY, double scale)
    {
        int n = 1 << Bits;
        int ix = (int)Math.Clamp((x - minX) * scale, 0, n - 1);
        int iy = (int)Math.Clamp((y - minY) * scale, 0, n - 1);
        long d = 0;
        for (int s = n / 2; s > 0; s /= 2)
        {
            int rx = (ix & s) > 0 ? 1 : 0;
            int ry = (iy & s) > 0 ? 1 : 0;
            d += (long)s * s * ((3 * rx) ^ ry);
            if (ry == 0)
            {
                if (rx == 1) { ix = s - 1 - ix; iy = s - 1 - iy; }
                (ix, iy) = (iy, ix);
            }
        }
        return d;
    }

    /// <summary>Returns the indices 0..count−1 sorted along the curve (ties by index, so deterministic).</summary>
    public static int[] Sort(double[] x, double[] y, int count)
    {
        double minX = double.PositiveInfinity, minY = double.PositiveInfinity, maxX = double.NegativeInfinity, maxY = double.NegativeInfinity;
        for (int i = 0; i < count; i++)
        {
            minX = Math.Min(minX, x[i]); maxX = Math.Max(maxX, x[i]);
            minY = Math.Min(minY, y[i]); maxY = Math.Max(maxY, y[i]);
        }
        double extent = Math.Max(maxX - minX, maxY - minY);
        double scale = extent > 0 ? ((1 << Bits) - 1) / extent : 1;
        var keys = new long[count];
        var order = new int[count];
        for (int i = 0; i < count; i++)
        {
            keys[i] = (Index(x[i], y[i], minX, minY, scale) << 23) | (uint)i;
            order[i] = i;
        }
        if (count >= (1 << 23)) throw new MeshingException($"Too many nodes ({count}) for the node ordering.");
        Array.Sort(keys, order);
        return order;
    }
}
