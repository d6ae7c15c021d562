using Seepage.Core.Fem;
using Seepage.Core.Results;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class StreamFunctionWalkTests
{
    // The range of ψ is the discharge (continuity, common practice): here against the consistent nodal reactions of the
    // same solution, and the walked ψ against the one solved from div(K/det K ∇ψ) = 0, as fractions of the range (what
    // places the drawn flow lines), on an anisotropic two-layer section with a contrast of 2000.
    [Fact]
    public void Solve_DesignExample_RangeIsTheFlowAndMatchesTheSolvedStreamFunction()
    {
        var doc = Seepage.Core.Sections.SectionParser.Parse(File.ReadAllText("design-example.section.json"), out _)!;
        var model = Valid(doc);
        var mesh = Seepage.Core.Analysis.MakeMesh(model, []);
        var s = FieldSolver.Solve(model, mesh, 1, new());
        double flow = KeyFigures.Of(model, s).Flow;
        var walked = StreamFunctionWalk.Solve(s.Field, s.Boundary, CancellationToken.None)!;
        var solved = StreamFunctionSolver.Solve(s.Field, s.Boundary, SparsityPattern.Of(mesh), s.FixedHeads.IsFixed, [],
            CancellationToken.None)!;
        double range = walked.Max() - walked.Min();
        Assert.True(Math.Abs(range / flow - 1) < 0.01, $"ψ range {range:E6}, flow {flow:E6}");
        // Away from the cutoff tips (singular points, where ψ turns fastest) the two agree to 2 % of the range (half the closest line spacing); within
        // 0.25 m of a tip to 5 % (the drawn lines are 1/Nf ≥ 4 % of the range apart).
        double lo = solved.Min(), span = solved.Max() - lo, wlo = walked.Min();
        var tips = model.Cutoffs.Select(c => c.Tip).ToList();
        for (int i = 0; i < walked.Length; i++)
        {
            double difference = Math.Abs((walked[i] - wlo) / range - (solved[i] - lo) / span);
            bool nearTip = tips.Any(t => Math.Abs(t.X - mesh.X[i]) < 0.25 && Math.Abs(t.Y - mesh.Y[i]) < 0.25);
            Assert.True(difference < (nearTip ? 0.05 : 0.02), $"walked and solved ψ differ by {difference:P2} of the range at ({mesh.X[i]:F2}, {mesh.Y[i]:F2})");
        }
    }
}
