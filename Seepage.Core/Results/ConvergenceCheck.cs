using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core.Results;

/// <summary>
/// Convergence evidence: the section is solved again on two uniform refinements of the analysis mesh (each triangle
/// split into four, h → h/2 → h/4). For a figure with values f0, f1, f2 the observed order is
/// p = log2((f1 − f0)/(f2 − f1)), the Richardson estimate f∞ = f2 + (f2 − f1)/(2^p − 1) (Richardson, "The deferred
/// approach to the limit", Phil. Trans. R. Soc. A 226, 1927; Roache, "Verification and Validation in Computational
/// Science and Engineering", 1998), and the estimated error of the reported (base-mesh) value |f0 − f∞|/|f∞|.
/// When the differences change sign no order is defined and the error estimate falls back to |f0 − f2|/|f2|.
/// </summary>
public static class ConvergenceCheck
{
    /// <summary>Estimated relative error above which a warning is given (2 %).</summary>
    public const double WarningLevel = 0.02;

    public static ConvergenceResult Run(SectionModel section, FieldSolution base0, SolverOptions options, List<string> warnings,
        CancellationToken cancellation)
    {
        var solutions = new List<FieldSolution> { base0 };
        var mesh = base0.Mesh;
        for (int k = 0; k < 2; k++)
        {
            mesh = UniformRefinement.Split(mesh);
            solutions.Add(FieldSolver.Solve(section, mesh, base0.Field.Order, options, cancellation));
        }
        var values = solutions.Select(s => KeyFigures.Of(section, s)).ToList();
        var figures = new List<ConvergenceFigure?>
        {
            Figure("flow", "m³/s per m", values.Select(v => (double?)v.Flow)),
            Figure("maxExitGradient", "dimensionless", values.Select(v => v.ExitGradient)),
            Figure("upliftForce", "kN/m", values.Select(v => v.UpliftForce)),
        }.Where(f => f is not null).Select(f => f!).ToList();
        foreach (var f in figures.Where(f => f.EstimatedError > WarningLevel))
            warnings.Add(FormattableString.Invariant(
                $"Convergence: the estimated error of {f.Name} on the analysis mesh is {f.EstimatedError:P1} (> 2 %); refine the mesh or use mesh.order 2."));
        return new ConvergenceResult(solutions.Select(s => s.Mesh.TriangleCount).ToArray(), figures);
    }

    private static ConvergenceFigure? Figure(string name, string unit, IEnumerable<double?> raw)
    {
        var v = raw.ToList();
        if (v.Any(x => x is null)) return null;
        double f0 = v[0]!.Value, f1 = v[1]!.Value, f2 = v[2]!.Value;
        double d1 = f1 - f0, d2 = f2 - f1;
        double? order = null, limit = null, error;
        if (d1 * d2 > 0 && Math.Abs(d2) < Math.Abs(d1))
        {
            order = Math.Log(d1 / d2, 2);
            limit = f2 + d2 / (Math.Pow(2, order.Value) - 1);
            error = Math.Abs(f0 - limit.Value) / Math.Max(Math.Abs(limit.Value), 1e-300);
        }
        else if (d1 == 0 && d2 == 0) error = 0;
        else error = Math.Abs(f0 - f2) / Math.Max(Math.Abs(f2), 1e-300);
        return new ConvergenceFigure(name, unit, [f0, f1, f2], order, limit, error.Value);
    }
}

/// <summary>The three meshes' triangle counts and the convergence of each key figure.</summary>
public sealed record ConvergenceResult(int[] Triangles, IReadOnlyList<ConvergenceFigure> Figures);

/// <summary>One figure on the analysis mesh and two uniform refinements (unit as named), its observed order, the
/// Richardson estimate (same unit) and the estimated relative error of the analysis-mesh value.</summary>
public sealed record ConvergenceFigure(string Name, string Unit, double[] Values, double? ObservedOrder, double? Extrapolated,
    double EstimatedError);
