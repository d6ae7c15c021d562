using Seepage.Core.Fem;
using Seepage.Core.Solvers;

namespace Seepage.Core.Results;

/// <summary>
/// The stream function ψ of the solved flow, with v = (∂ψ/∂y, −∂ψ/∂x). Since K⁻¹v = −∇h is irrotational,
/// ψ solves div(M ∇ψ) = 0 with M = K / det K. On the boundary ψ is known: walking the boundary loop with the
/// domain on the left, ψ(B) − ψ(A) is the flow leaving through edge AB — zero on no-flow edges and cutoff
/// faces, the element flux on head and drain edges (scaled so that inflow and outflow close the loop).
/// Flow lines are then level lines of ψ.
/// </summary>
public static class StreamFunctionSolver
{
    /// <summary>Relative residual of the ψ solve. ψ only places the drawn flow lines (the discharge comes from the
    /// head solve's reactions), so 1e-7 is ample: the lines move by far less than a line width.</summary>
    public const double StreamTolerance = 1e-7;

    public static double[]? Solve(HeadField field, MeshBoundary boundary, SparsityPattern pattern, bool[] fixedHead,
        List<string> warnings, CancellationToken cancellation)
    {
        var mesh = field.Mesh;
        var edges = boundary.Edges;
        var outgoing = new Dictionary<int, int>(edges.Count);
        for (int e = 0; e < edges.Count; e++)
            if (!outgoing.TryAdd(edges[e].A, e))
            {
                warnings.Add("Flow lines: the domain boundary touches itself at a point; flow lines were not drawn.");
                return null;
            }

        // Outflow through each boundary edge (element flux; zero where either end is not a fixed head).
        var flux = new double[edges.Count];
        double outSum = 0, inSum = 0;
        for (int e = 0; e < edges.Count; e++)
        {
            var (a, b, t) = (edges[e].A, edges[e].B, edges[e].Triangle);
            if (!fixedHead[a] || !fixedHead[b]) continue;
            var (vx, vy) = field.Velocity(t);
            double dx = mesh.X[b] - mesh.X[a], dy = mesh.Y[b] - mesh.Y[a];
            flux[e] = vx * dy - vy * dx; // v · (dy, −dx): outward normal times length
            if (flux[e] > 0) outSum += flux[e]; else inSum -= flux[e];
        }
        if (outSum <= 0 || inSum <= 0) return null;
        double mean = 0.5 * (outSum + inSum);
        for (int e = 0; e < edges.Count; e++) flux[e] *= flux[e] > 0 ? mean / outSum : mean / inSum;

        var psi = new double[mesh.NodeCount];
        var onBoundary = new bool[mesh.NodeCount];
        int start = edges[0].A, node = start, walked = 0;
        do
        {
            if (!outgoing.TryGetValue(node, out int e) || walked++ > edges.Count)
            {
                warnings.Add("Flow lines: the domain boundary is not one closed loop; flow lines were not drawn.");
                return null;
            }
            onBoundary[node] = true;
            psi[edges[e].B] = psi[node] + flux[e];
            node = edges[e].B;
        } while (node != start);
        if (walked != edges.Count)
        {
            warnings.Add("Flow lines: the domain boundary has more than one loop; flow lines were not drawn.");
            return null;
        }

        var tensors = field.ZoneTensors.Select(k =>
        {
            double det = k.Kxx * k.Kyy - k.Kxy * k.Kxy;
            return new ConductivityTensor(k.Kxx / det, k.Kxy / det, k.Kyy / det);
        }).ToList();
        // A triangle whose tensor is scaled by f (relative conductivity) has M scaled by 1/f.
        var inverse = field.ElementFactors?.Select(f => 1 / f).ToArray();
        var full = GlobalAssembler.Assemble(mesh, pattern, tensors, inverse);
        var system = LinearSystem.Condense(full, new FixedHeads(onBoundary, psi));
        var x = new double[system.Matrix.Size];
        if (x.Length > 0) LinearSolver.Solve(system.Matrix, system.Rhs, x, new SolverOptions { RelativeTolerance = StreamTolerance }, cancellation);
        return system.Expand(x);
    }
}
