using Seepage.Core.Meshing;
using Seepage.Core.Sections;

namespace Seepage.Core.Fem;

/// <summary>Fixes the total head on the nodes of head boundaries (h = total) and drains (h = y, zero pressure).
/// A node on a drain and a head boundary takes the head boundary's value. With quadratic elements the mid nodes
/// of the boundary edges are fixed as well (h = y is linear along an edge, so P2 carries it exactly). A drain inside
/// the domain fixes the nodes of the mesh edges on it. In an unconfined section a head applies only where it is not
/// below the ground: nodes of a sloping face above the reservoir level stay free (no flow, or a seepage face).</summary>
public static class FixedHeadBuilder
{
    public static FixedHeads Build(Mesh mesh, MeshBoundary boundary, SectionModel section, double tolerance,
        QuadraticDofs? quadratic = null)
    {
        int count = quadratic?.Count ?? mesh.NodeCount;
        double[] y = quadratic?.Y ?? mesh.Y;
        var isFixed = new bool[count];
        var value = new double[count];
        foreach (var drain in section.Drains)
            foreach (int n in PolylineNodes.Of(boundary, drain.Along, drain.Internal, tolerance, quadratic))
            { isFixed[n] = true; value[n] = y[n]; }
        foreach (var head in section.Heads)
            foreach (int n in MeshBoundary.NodesOf(boundary.On(head.Along, tolerance), quadratic))
            {
                if (section.Unconfined && y[n] > head.Total + tolerance) continue;
                isFixed[n] = true; value[n] = head.Total;
            }
        return new FixedHeads(isFixed, value);
    }
}
