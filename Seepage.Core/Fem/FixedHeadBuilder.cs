using Seepage.Core.Meshing;
using Seepage.Core.Sections;

namespace Seepage.Core.Fem;

/// <summary>Fixes the total head on the nodes of head boundaries (h = total) and drains (h = y, zero pressure).
/// A node on a drain and a head boundary takes the head boundary's value.</summary>
public static class FixedHeadBuilder
{
    public static FixedHeads Build(Mesh mesh, MeshBoundary boundary, SectionModel section, double tolerance)
    {
        var isFixed = new bool[mesh.NodeCount];
        var value = new double[mesh.NodeCount];
        foreach (var drain in section.Drains)
            foreach (int n in MeshBoundary.NodesOf(boundary.On(drain.Along, tolerance)))
            { isFixed[n] = true; value[n] = mesh.Y[n]; }
        foreach (var head in section.Heads)
            foreach (int n in MeshBoundary.NodesOf(boundary.On(head.Along, tolerance)))
            { isFixed[n] = true; value[n] = head.Total; }
        return new FixedHeads(isFixed, value);
    }
}
