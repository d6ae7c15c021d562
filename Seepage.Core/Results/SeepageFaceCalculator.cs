using Seepage.Core.Fem;
using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// What leaves through each seepage face of an unconfined solution, from the consistent nodal reactions of its
/// active (h = y) nodes: the flow out (m³/s per m), the exit point (the highest active node, where the phreatic
/// surface meets the face) and the wetted length (the face edges whose two ends are both active, m). Nodes held by a
/// head boundary (the tailwater below the face) count with that boundary, as in the flow summary.
/// </summary>
public static class SeepageFaceCalculator
{
    public static IReadOnlyList<SeepageFaceResult> Compute(SectionModel section, MeshBoundary boundary, FixedHeads fixedHeads,
        IReadOnlyCollection<int> faceNodes, double[] reactions, double tolerance)
    {
        var results = new List<SeepageFaceResult>();
        var candidate = faceNodes.ToHashSet();
        var claimed = new HashSet<int>();
        foreach (var face in section.SeepageFaces)
        {
            var edges = boundary.On(face.Along, tolerance);
            double flow = 0, wetted = 0;
            Point2? exit = null;
            foreach (int n in MeshBoundary.NodesOf(edges))
            {
                if (!fixedHeads.IsFixed[n] || !candidate.Contains(n) || !claimed.Add(n)) continue;
                flow -= reactions[n];
                var p = boundary.Node(n);
                if (exit is null || p.Y > exit.Value.Y) exit = p;
            }
            foreach (var e in edges)
                if (fixedHeads.IsFixed[e.A] && fixedHeads.IsFixed[e.B]) wetted += boundary.Node(e.A).DistanceTo(boundary.Node(e.B));
            results.Add(new SeepageFaceResult(face.Name, flow, exit, wetted));
        }
        return results;
    }
}
