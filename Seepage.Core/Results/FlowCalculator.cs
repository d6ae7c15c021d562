using Seepage.Core.Fem;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Discharge from the consistent nodal fluxes: the reactions R = K h at fixed nodes are the flows entering
/// the soil there (m³/s per m); summed per boundary they give each boundary's flow, and since K·1 = 0 they
/// balance up to the solver's residual.
/// </summary>
public static class FlowCalculator
{
    public static (FlowSummary Summary, double[] Reactions) Compute(LinearSystem system, double[] heads, MeshBoundary boundary,
        SectionModel section, double tolerance, QuadraticDofs? quadratic = null)
    {
        var reactions = new double[heads.Length];
        system.Full.Multiply(heads, reactions);
        var isFixed = system.FixedHeads.IsFixed;
        double inflow = 0, outflow = 0;
        for (int i = 0; i < heads.Length; i++)
        {
            if (!isFixed[i]) { reactions[i] = 0; continue; }
            if (reactions[i] > 0) inflow += reactions[i]; else outflow -= reactions[i];
        }
        var claimed = new bool[heads.Length];
        var flows = new List<BoundaryFlow>();
        // Heads first (they win shared nodes, as in FixedHeadBuilder), then drains.
        foreach (var h in section.Heads) flows.Add(new BoundaryFlow(h.Name, "head", Sum(MeshBoundary.NodesOf(boundary.On(h.Along, tolerance), quadratic))));
        foreach (var d in section.Drains)
            flows.Add(new BoundaryFlow(d.Name, "drain", Sum(PolylineNodes.Of(boundary, d.Along, d.Internal, tolerance, quadratic))));
        foreach (var f in section.SeepageFaces)
            flows.Add(new BoundaryFlow(f.Name, "seepage face", Sum(MeshBoundary.NodesOf(boundary.On(f.Along, tolerance)))));
        double balance = inflow > 0 ? (inflow - outflow) / inflow : 0;
        return (new FlowSummary(inflow, outflow, balance, flows), reactions);

        double Sum(IEnumerable<int> nodes)
        {
            double s = 0;
            foreach (int n in nodes)
                if (!claimed[n]) { claimed[n] = true; s += reactions[n]; }
            return s;
        }
    }
}
