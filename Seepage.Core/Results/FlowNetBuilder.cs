using Seepage.Core.Fem;
using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>
/// Builds the flow net: equipotentials at Nd equal head drops between the highest and lowest fixed heads, and
/// flow lines as level lines of the stream function, one every k·ΔH/Nd of discharge (k the reference
/// conductivity). Each cell then carries Δq = k·Δh with Δh = ΔH/Nd, which is the curvilinear square of a
/// hand-drawn net (in the section transformed for anisotropy), and Nf = q/(k·ΔH/Nd) = shape factor × Nd has a
/// fractional part, as a sketched net does: q = k·ΔH·Nf/Nd (Harr, "Groundwater and Seepage", 1962, ch. 2;
/// Cedergren, "Seepage, Drainage, and Flow Nets", 1989).
/// </summary>
public static class FlowNetBuilder
{
    /// <summary>Nd used when the shape factor already gives between <see cref="MinChannels"/> and
    /// <see cref="MaxChannels"/> channels.</summary>
    public const int DefaultHeadDrops = 12;

    /// <summary>Fewest flow channels the automatic Nd aims for (a net with fewer does not read as a net).</summary>
    public const int MinChannels = 4;

    /// <summary>Most flow channels the automatic Nd aims for.</summary>
    public const int MaxChannels = 24;

    /// <summary>Range of Nd, automatic or set by the section (<c>flowNet.headDrops</c>).</summary>
    public const int MinHeadDrops = 2, MaxHeadDrops = 60;

    /// <summary>Most flow lines drawn whatever Nd is set (bounds the drawing work).</summary>
    public const int MaxFlowLines = 80;

    /// <summary>Nd for square cells and at least <see cref="MinChannels"/> channels: 12, raised to ⌈4/S⌉ when
    /// S·12 &lt; 4, lowered to ⌊24/S⌋ when S·12 &gt; 24, within 4 … 60 (S the shape factor q/(k·ΔH)).</summary>
    public static int ChooseHeadDrops(double shapeFactor)
    {
        if (!(shapeFactor > 0) || !double.IsFinite(shapeFactor)) return DefaultHeadDrops;
        int nd = DefaultHeadDrops;
        if (shapeFactor * nd < MinChannels) nd = (int)Math.Ceiling(MinChannels / shapeFactor - 1e-9);
        else if (shapeFactor * nd > MaxChannels) nd = (int)Math.Floor(MaxChannels / shapeFactor + 1e-9);
        return Math.Clamp(nd, 4, MaxHeadDrops);
    }

    /// <summary>Builds the net; <paramref name="headDrops"/> null chooses Nd by <see cref="ChooseHeadDrops"/>.</summary>
    public static FlowNet Build(HeadField field, double[]? psi, double discharge, double highHead, double lowHead,
        double referenceConductivity, int? headDrops = null, bool[]? saturated = null)
    {
        double dh = highHead - lowHead;
        double shape = dh > 0 && referenceConductivity > 0 ? Math.Abs(discharge) / (referenceConductivity * dh) : 0;
        int nd = headDrops is { } given ? Math.Clamp(given, MinHeadDrops, MaxHeadDrops) : ChooseHeadDrops(shape);
        var equipotentials = new List<Equipotential>();
        if (dh > 0)
            for (int k = 1; k < nd; k++)
            {
                double level = highHead - k * dh / nd;
                equipotentials.Add(new Equipotential(level, Paths(field, field.Heads, level, saturated)));
            }
        double exact = shape * nd;
        // Flow lines at whole channels j/Nf (Nf exact); the last channel, by the far boundary, is the part one.
        int whole = exact > 0 ? (int)Math.Ceiling(exact - 1e-6) : 0;
        var flowLines = new List<FlowLine>();
        if (psi is not null && exact > 0)
        {
            double lo = psi.Min(), hi = psi.Max();
            for (int j = 1; j < Math.Min(whole, MaxFlowLines + 1); j++)
            {
                double fraction = j / exact;
                if (fraction >= 1 - 1e-6) break;
                flowLines.Add(new FlowLine(fraction, Paths(field, psi, lo + fraction * (hi - lo), saturated)));
            }
        }
        return new FlowNet(equipotentials, flowLines, whole, nd, shape, dh, referenceConductivity, psi)
        {
            HeadDropsSource = headDrops is null ? "automatic" : "section",
        };
    }

    private static List<IReadOnlyList<Point2>> Paths(HeadField field, double[] values, double level, bool[]? saturated) =>
        ContourTracer.Trace(field.Mesh, values, level, saturated).Select(p => (IReadOnlyList<Point2>)p).ToList();
}
