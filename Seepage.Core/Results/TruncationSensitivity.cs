using Seepage.Core.Fem;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// First-order estimate of the relative change of the flow when the lateral boundaries move out, from the one head
/// solution. With heads at two levels only, the energy E = ∫ ∇h·K∇h dA equals Q·ΔH. Moving a no-flow boundary out by δ
/// changes E by δ ∫ ∇h·K∇h ds along it to first order (the shape derivative of the Dirichlet energy; the solution's own
/// change enters only at second order because it minimises E), so ΔQ/Q ≈ Σ δ_side ∫_side ∇h·K∇h ds / (Q·ΔH)
/// (Sokolowski &amp; Zolésio, "Introduction to Shape Optimization", 1992, from memory). Far from the structures the
/// disturbance decays with distance (Harr, "Groundwater and Seepage", 1962, ch. 5), so the strip added beyond the
/// boundary carries less than its edge does: the linear estimate is an upper bound of the true change.
/// </summary>
public static class TruncationSensitivity
{
    /// <summary>The estimated relative change of the flow, or null where the estimate does not apply: drains or more
    /// than two head levels (E is then not Q·ΔH), or a head boundary on a lateral side (not a no-flow side).</summary>
    public static double? Estimate(SectionModel section, FieldSolution solution, double flow, double left, double right,
        double pushLeft, double pushRight, double tolerance)
    {
        if (section.Drains.Count > 0) return null;
        var levels = section.Heads.Select(h => h.Total).Distinct().ToList();
        if (levels.Count != 2 || flow <= 0) return null;
        double energy = flow * Math.Abs(levels[0] - levels[1]);
        var mesh = solution.Mesh;
        var field = solution.Field;
        var isFixed = solution.FixedHeads.IsFixed;
        double added = 0;
        foreach (var edge in solution.Boundary.Edges)
        {
            double xa = mesh.X[edge.A], xb = mesh.X[edge.B];
            double push = Math.Abs(xa - left) <= tolerance && Math.Abs(xb - left) <= tolerance ? pushLeft
                : Math.Abs(xa - right) <= tolerance && Math.Abs(xb - right) <= tolerance ? pushRight : 0;
            if (push == 0) continue;
            if (isFixed[edge.A] && isFixed[edge.B]) return null;
            added += push * EdgeEnergy(field, edge, mesh.Y[edge.B] - mesh.Y[edge.A]);
        }
        return added / energy;
    }

    // ∫ ∇h·K∇h ds along one vertical boundary edge of length |dy|, two-point Gauss: exact for the constant (P1) and
    // the squared linear (P2) gradient.
    private static double EdgeEnergy(HeadField field, BoundaryEdge edge, double dy)
    {
        var tri = field.Mesh.Triangles;
        int t = edge.Triangle;
        var k = field.ZoneTensors[field.Mesh.Zones[t]];
        double sum = 0;
        Span<double> l = stackalloc double[3];
        foreach (double s in (ReadOnlySpan<double>)[0.5 - 0.5 / Math.Sqrt(3), 0.5 + 0.5 / Math.Sqrt(3)])
        {
            for (int i = 0; i < 3; i++) l[i] = tri[3 * t + i] == edge.A ? 1 - s : tri[3 * t + i] == edge.B ? s : 0;
            var (gx, gy) = field.GradientAt(t, l[0], l[1], l[2]);
            sum += 0.5 * (gx * (k.Kxx * gx + k.Kxy * gy) + gy * (k.Kxy * gx + k.Kyy * gy));
        }
        return sum * Math.Abs(dy);
    }
}
