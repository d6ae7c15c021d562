using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// The size of an analysis before it runs, from the zone areas and edge lengths. An equilateral triangle of edge h
/// has area √3/4·h² ≈ 0.433 h², but the quality mesher keeps every edge at or below h and grades strongly at tips
/// and corners: measured on sheet-pile sections at h = 1, 0.5 and 0.25 m its triangles average 0.20–0.24 h², so a
/// zone of area A takes about A/(0.22 h²) triangles (within about 15 %). A planar triangulation has about half as many nodes as triangles; quadratic
/// elements add a node per edge (about 1.5 per triangle), about four times the unknowns. The convergence check
/// solves twice more on uniform refinements (each triangle into four), the largest with 16 times the triangles.
/// </summary>
public sealed record SizeEstimate(long Triangles, long Unknowns, int Order, bool ConvergenceCheck, long LargestSolveUnknowns)
{
    /// <summary>How many times the unknowns of a plain linear (order 1) solve the largest solve has.</summary>
    public double Multiplier => (double)LargestSolveUnknowns / (Triangles / 2 + 1);

    /// <summary>Mean triangle area of the quality mesher in units of h² (measured, see the type's remarks).</summary>
    public const double AreaPerTriangle = 0.22;

    public static SizeEstimate Of(SectionModel section)
    {
        double triangles = 0;
        foreach (var zone in section.Zones)
        {
            double h = Math.Min(zone.Size ?? section.Mesh.Size, section.Mesh.Size);
            triangles += Math.Abs(PolygonMath.SignedArea(zone.Outline)) / (AreaPerTriangle * h * h);
        }
        long t = (long)Math.Ceiling(triangles);
        long nodes = t / 2 + 1;
        long unknowns = section.Mesh.Order == 2 ? nodes + 3 * t / 2 : nodes;
        long largest = section.Mesh.ConvergenceCheck ? 16 * unknowns : unknowns;
        return new SizeEstimate(t, unknowns, section.Mesh.Order, section.Mesh.ConvergenceCheck, largest);
    }
}
