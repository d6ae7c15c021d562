using System.Diagnostics;
using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Unconfined;

/// <summary>An unconfined solution: the solved field (with the relative conductivity of each triangle), the nodes of
/// the seepage faces and drains, and the report of the iteration.</summary>
public sealed record UnconfinedSolution(FieldSolution Solution, IReadOnlyList<int> FaceNodes, UnconfinedReport Report);

/// <summary>
/// Unconfined steady flow on a fixed mesh: div(k_r(p) K ∇h) = 0 over the whole section, p = h − y the pressure head,
/// k_r the saturated–unsaturated relative conductivity (<see cref="RelativeConductivity"/>, taken as its exact mean
/// over each linear triangle). Picard iteration: with k_r frozen at the last heads, the linear SPD problem
/// K(k_r) h* = 0 with the head boundaries and the active seepage-face nodes fixed is solved by the usual AMG–CG;
/// then h ← h + ω (h* − h), the switch of the potential seepage faces is updated, and k_r recomputed. ω starts at 1
/// and halves (down to <see cref="UnconfinedOptions.MinDamping"/>) whenever the head change grows. The phreatic
/// surface is the level line p = 0 of the converged field.
/// </summary>
public static class UnconfinedSolver
{
    public const string MethodName = "Picard iteration on a fixed mesh";

    // Below this many unknowns the inner solves use IC(0) rather than AMG.
    private const int SmallSystem = 20_000;

    public static UnconfinedSolution Solve(SectionModel section, Mesh mesh, UnconfinedOptions options, SolverOptions solver,
        CancellationToken cancellation = default)
    {
        var clock = Stopwatch.StartNew();
        var boundary = new MeshBoundary(mesh);
        double tolerance = section.MatchTolerance;
        var tensors = section.Zones.Select(z => ConductivityTensor.Of(section.Soils[z.Soil])).ToList();
        var pattern = SparsityPattern.Of(mesh);
        var heads = FixedHeadBuilder.Build(mesh, boundary, section with { Drains = [] }, tolerance);
        var faces = new PotentialSeepageFaces(section.SeepageFaces.SelectMany(f => MeshBoundary.NodesOf(boundary.On(f.Along, tolerance)))
            .Concat(section.Drains.SelectMany(d => PolylineNodes.Of(boundary, d.Along, d.Internal, tolerance)))
            .Where(n => !heads.IsFixed[n]));
        double[] y = mesh.Y;
        double height = section.Heads.Max(h => h.Total) - y.Min();
        var kr = new RelativeConductivity(options.BandFraction * height, options.Floor);
        string method = FormattableString.Invariant(
            $"{MethodName}: saturated–unsaturated conductivity (band {kr.Band:G3} m, floor {kr.Floor:G2}), potential seepage faces switched");


        var factors = new double[mesh.TriangleCount]; Array.Fill(factors, 1.0);
        double[]? h = null;
        double previous = double.PositiveInfinity, change = double.NaN, omega = 1;
        int linear = 0, builtFor = -1, lastIterations = 0, freshIterations = 0;
        IPreconditioner? preconditioner = null;
        bool switchedSinceBuild = false;
        for (int iteration = 1; ; iteration++)
        {
            cancellation.ThrowIfCancellationRequested();
            // Inexact inner solves while the heads still move a lot; the full tolerance once they settle.
            double relative = change / height;
            double inner = double.IsFinite(relative) ? Math.Clamp(1e-3 * relative, solver.RelativeTolerance, 1e-6) : 1e-6;
            var fixedHeads = faces.Apply(heads, y);
            var full = GlobalAssembler.Assemble(mesh, pattern, tensors, factors);
            var system = LinearSystem.Condense(full, fixedHeads);
            var free = new double[system.Matrix.Size];
            if (h is not null) for (int r = 0; r < free.Length; r++) free[r] = h[system.FreeNodes[r]];
            // The AMG hierarchy of an earlier iteration still preconditions CG well while the free set is the same and
            // k_r has moved little; it is rebuilt when the switch changed or CG needs twice its fresh iteration count.
            // Small systems take IC(0), whose setup costs next to nothing against an AMG setup.
            bool rebuild = preconditioner is null || builtFor != system.Matrix.Size || switchedSinceBuild
                || lastIterations > Math.Max(8, 2 * freshIterations);
            if (rebuild)
            {
                preconditioner = system.Matrix.Size < SmallSystem
                    ? new IncompleteCholeskyPreconditioner(system.Matrix)
                    : new AlgebraicMultigridPreconditioner(system.Matrix, solver, cancellation);
                builtFor = system.Matrix.Size; switchedSinceBuild = false;
            }
            var report = ConjugateGradient.Solve(system.Matrix, system.Rhs, free, preconditioner!,
                solver with { RelativeTolerance = inner }, cancellation);
            lastIterations = report.Iterations;
            if (rebuild) freshIterations = Math.Max(report.Iterations, 4);
            linear += report.Iterations;
            var star = system.Expand(free);
            var reactions = new double[star.Length];
            full.Multiply(star, reactions);
            double flowScale = 0;
            for (int i = 0; i < star.Length; i++) if (fixedHeads.IsFixed[i]) flowScale += Math.Abs(reactions[i]);
            int switched = faces.Update(star, reactions, y, flowScale, height);
            switchedSinceBuild |= switched > 0;

            if (h is null) { change = height; h = star; }
            else
            {
                // The change that matters is where k_r can still move: deep in the unsaturated soil (p below −2δ in
                // both iterates) k_r sits at its floor and the heads, set by the floor's flow alone, do not feed back.
                change = 0;
                double dry = -2 * kr.Band;
                for (int i = 0; i < h.Length; i++)
                    if (star[i] - y[i] > dry || h[i] - y[i] > dry) change = Math.Max(change, Math.Abs(star[i] - h[i]));
                if (change > previous) omega = Math.Max(options.MinDamping, 0.5 * omega);
                else omega = Math.Min(1, 1.25 * omega);
                for (int i = 0; i < h.Length; i++) h[i] += omega * (star[i] - h[i]);
                previous = change;
            }
            bool settled = switched == 0 && change <= options.Tolerance * height
                && inner <= solver.RelativeTolerance;
            if (settled)
            {
                var field = new HeadField(mesh, star, tensors) { ElementFactors = (double[])factors.Clone() };
                var solution = new FieldSolution(mesh, boundary, null, fixedHeads, system, field, report);
                return new UnconfinedSolution(solution, faces.Nodes,
                    new UnconfinedReport(iteration, method, change, kr.Band, kr.Floor, linear, clock.Elapsed.TotalSeconds));
            }
            if (iteration >= options.MaxIterations)
                throw new SolverNotConvergedException("unconfined " + MethodName, iteration, change / height, options.Tolerance,
                    FormattableString.Invariant(
                        $"head change {change:G3} m (of H = {height:G4} m), {switched} seepage-face nodes switched in the last iteration"));
            UpdateFactors(mesh, h, kr, factors);
        }
    }

    // k_r of each triangle from the current heads: the exact mean over the triangle of k_r(h − y).
    private static void UpdateFactors(Mesh mesh, double[] h, RelativeConductivity kr, double[] factors)
    {
        var tri = mesh.Triangles; var y = mesh.Y;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            factors[t] = kr.ElementMean(h[a] - y[a], h[b] - y[b], h[c] - y[c]);
        }
    }
}
