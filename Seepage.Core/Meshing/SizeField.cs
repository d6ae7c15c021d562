namespace Seepage.Core.Meshing;

/// <summary>
/// Wanted edge length (metres) over the domain: the smallest of the zone's size (its seed's size, capped by
/// <see cref="MeshOptions.Size"/>) and of every size target grown linearly with distance,
/// h(x) = min(h_zone, min_i (s_i + (G − 1)·|x − x_i|)), G = <see cref="MeshOptions.Grading"/>. Two
/// elements of size h one element apart then differ in size by at most the factor G.
/// </summary>
internal sealed class SizeField
{
    private readonly double[] _zoneSize;
    private readonly double _defaultSize;
    private readonly double[] _tx, _ty, _ts;
    private readonly double _slope;

    public SizeField(PlanarGraph graph, MeshOptions options)
    {
        _defaultSize = options.Size;
        int maxZone = graph.Regions.Count == 0 ? 0 : graph.Regions.Max(r => r.Zone);
        _zoneSize = new double[maxZone + 1];
        Array.Fill(_zoneSize, options.Size);
        foreach (var r in graph.Regions)
            if (r.Size is double s && s > 0) _zoneSize[r.Zone] = Math.Min(_zoneSize[r.Zone], s);
        var targets = graph.RefineNear.Where(t => t.Size > 0 && double.IsFinite(t.Point.X) && double.IsFinite(t.Point.Y)).ToArray();
        _tx = targets.Select(t => t.Point.X).ToArray();
        _ty = targets.Select(t => t.Point.Y).ToArray();
        _ts = targets.Select(t => t.Size).ToArray();
        _slope = Math.Max(options.Grading - 1, 0.05);
        Smallest = Math.Min(_zoneSize.Min(), _ts.Length > 0 ? _ts.Min() : double.PositiveInfinity);
    }

    /// <summary>The smallest size anywhere, metres.</summary>
    public double Smallest { get; }

    public double At(double x, double y, int zone)
    {
        double h = zone >= 0 && zone < _zoneSize.Length ? _zoneSize[zone] : _defaultSize;
        for (int i = 0; i < _tx.Length; i++)
        {
            double dx = x - _tx[i], dy = y - _ty[i];
            double lower = _ts[i] + _slope * Math.Sqrt(dx * dx + dy * dy);
            if (lower < h) h = lower;
        }
        return h;
    }
}
