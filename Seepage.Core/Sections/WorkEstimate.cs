using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// What an analysis of a validated section will cost before it starts, in unknowns of the linear solves it makes:
/// triangles T ≈ Σ zone area / (0.25 h²) with h the smaller of mesh.size and the zone's size (an equilateral triangle of
/// edge h has area 0.433 h², but the mesher's quality triangles are smaller: measured on the design example, 0.25 h² fits
/// within 10 %; the graded refinement at tips and corners adds a few hundred each), unknowns per solve ≈ T/2 for linear triangles (Euler: V ≈ T/2) and ≈ 2T for
/// quadratic ones (a node per vertex and per edge, E ≈ 3T/2); the convergence check solves again on two uniform
/// refinements (4 T and 16 T: 1 + 4 + 16 = 21 times the work, its last solve the largest), the truncation check once more
/// on a domain up to twice as wide, the stream function once on the vertices. <see cref="Driver"/> is the member that
/// asks for the most: what to change when the estimate is over a budget.
/// </summary>
public sealed record WorkEstimate(double Triangles, double SolveUnknowns, double LargestSolveUnknowns, double TotalUnknowns,
    string Driver, string Breakdown)
{
    /// <summary>Triangles the graded refinement adds around each singular point (cutoff tip, structure end); measured on the
    /// design example: 300–500 at refinement 0.02.</summary>
    public const double TrianglesPerSingularPoint = 500;

    public static WorkEstimate Of(SectionModel section)
    {
        var mesh = section.Mesh;
        double triangles = 0, largestZone = 0;
        int largestZoneIndex = -1;
        for (int i = 0; i < section.Zones.Count; i++)
        {
            var zone = section.Zones[i];
            double h = Math.Min(mesh.Size, zone.Size ?? double.PositiveInfinity);
            double t = Math.Abs(PolygonMath.SignedArea(zone.Outline)) / (0.25 * h * h);
            triangles += t;
            if (zone.Size < mesh.Size && t > largestZone) { largestZone = t; largestZoneIndex = i; }
        }
        triangles += TrianglesPerSingularPoint * (section.Cutoffs.Count + 2 * section.Structures.Count);
        double perSolve = mesh.Order == 2 ? 2 * triangles : triangles / 2;
        double total = perSolve, largest = perSolve;
        var parts = new List<string> { FormattableString.Invariant($"about {triangles:N0} triangles, {perSolve:N0} unknowns per solve (order {mesh.Order})") };
        if (mesh.ConvergenceCheck)
        {
            total += 20 * perSolve; largest = 16 * perSolve;
            parts.Add("the convergence check solves on 4× and 16× the triangles (21× the work)");
        }
        if (section.TruncationCheck ?? triangles < Results.TruncationCheck.AutomaticBelowTriangles)
        {
            total += 2 * perSolve; largest = Math.Max(largest, 2 * perSolve);
            parts.Add("the truncation check solves on a domain up to twice as wide");
        }
        total += triangles / 2; // the stream function, on the vertices
        string driver = mesh.ConvergenceCheck ? "/mesh/convergenceCheck"
            : mesh.Order == 2 ? "/mesh/order"
            : largestZoneIndex >= 0 && largestZone > triangles / 2 ? $"/zones/{largestZoneIndex}/size" : "/mesh/size";
        return new WorkEstimate(triangles, perSolve, largest, total, driver, string.Join("; ", parts));
    }

    /// <summary>The member to name when the estimate is over a budget of <paramref name="maxTotal"/> unknowns in all and
    /// <paramref name="maxSolve"/> in one solve: the convergence check or order 2 when the plain analysis would fit, else the
    /// size that makes the most triangles. Null when within both.</summary>
    public SectionProblem? Exceeds(double maxTotal, double maxSolve)
    {
        if (TotalUnknowns <= maxTotal && LargestSolveUnknowns <= maxSolve) return null;
        double plain = Triangles / 2;
        string pointer = Driver;
        if (Driver == "/mesh/convergenceCheck" && (SolveUnknowns * 3 > maxTotal || SolveUnknowns > maxSolve))
            pointer = SolveUnknowns > plain ? "/mesh/order" : "/mesh/size";
        if (pointer == "/mesh/order" && plain * 3 > Math.Min(maxTotal, maxSolve)) pointer = "/mesh/size";
        return new SectionProblem(pointer, FormattableString.Invariant(
            $"asks for more work than this server accepts: {Breakdown}; about {TotalUnknowns:N0} unknowns in all solves, {LargestSolveUnknowns:N0} in the largest, against at most {maxTotal:N0} and {maxSolve:N0}. Use a coarser mesh (or zone) size, order 1, or leave out the convergence check."));
    }
}
