using Seepage.Core.Fem;
using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>
/// Builds the flow net: equipotentials at Nd equal head drops between the highest and lowest fixed heads, and
/// flow lines as level lines of the stream function at Nf equal shares of the discharge. Nf is chosen so the
/// cells are near-square for the reference conductivity (Nf ≈ Nd·q/(k·ΔH)), which makes the net readable
/// the way a hand-drawn one is: q = k·ΔH·Nf/Nd.
/// </summary>
public static class FlowNetBuilder
{
    public const int DefaultHeadDrops = 12;

    public static FlowNet Build(HeadField field, double[]? psi, double discharge, double highHead, double lowHead,
        double referenceConductivity, int headDrops = DefaultHeadDrops, bool[]? saturated = null)
    {
        double dh = highHead - lowHead;
        var equipotentials = new List<Equipotential>();
        if (dh > 0)
            for (int k = 1; k < headDrops; k++)
            {
                double level = highHead - k * dh / headDrops;
                equipotentials.Add(new Equipotential(level, Paths(field, field.Heads, level, saturated)));
            }
        double shape = dh > 0 && referenceConductivity > 0 ? discharge / (referenceConductivity * dh) : 0;
        int channels = Math.Clamp((int)Math.Round(shape * headDrops), 2, 24);
        var flowLines = new List<FlowLine>();
        if (psi is not null)
        {
            double lo = psi.Min(), hi = psi.Max();
            for (int k = 1; k < channels; k++)
            {
                double fraction = (double)k / channels;
                flowLines.Add(new FlowLine(fraction, Paths(field, psi, lo + fraction * (hi - lo), saturated)));
            }
        }
        return new FlowNet(equipotentials, flowLines, channels, headDrops, shape, dh, referenceConductivity, psi);
    }

    private static List<IReadOnlyList<Point2>> Paths(HeadField field, double[] values, double level, bool[]? saturated) =>
        ContourTracer.Trace(field.Mesh, values, level, saturated).Select(p => (IReadOnlyList<Point2>)p).ToList();
}
