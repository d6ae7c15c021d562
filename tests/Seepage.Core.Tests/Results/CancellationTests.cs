using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

// The service passes the request's abort token to Analysis.Run: a client that goes away must stop the mesher and the
// solver, not only the stages after them.
public class CancellationTests
{
    private static Seepage.Core.Sections.SectionModel Design(double size)
    {
        var doc = Seepage.Core.Sections.SectionParser.Parse(File.ReadAllText("design-example.section.json"), out _)!;
        return Valid(doc with { Mesh = doc.Mesh! with { Size = size } });
    }

    [Fact]
    public void Run_CancelledWhileMeshing_MesherStops()
    {
        using var source = new CancellationTokenSource();
        // Cancelled from a thread of its own: a timer of the token source runs on the thread pool, which a loaded test run
        // can starve for longer than the whole mesh takes.
        var canceller = new Thread(() => { Thread.Sleep(50); source.Cancel(); }) { IsBackground = true };
        canceller.Start();
        var stages = new List<string>();
        // About two million triangles: meshing alone takes well over a second.
        Assert.ThrowsAny<OperationCanceledException>(() => Seepage.Core.Analysis.Run(Design(0.09),
            new AnalysisOptions { StageDone = stages.Add }, source.Token));
        Assert.Empty(stages);
    }

    [Fact]
    public void Run_CancelledAfterAssembly_SolverStops()
    {
        using var source = new CancellationTokenSource();
        var stages = new List<string>();
        Assert.ThrowsAny<OperationCanceledException>(() => Seepage.Core.Analysis.Run(Design(1.0), new AnalysisOptions
        {
            StageDone = s => { stages.Add(s); if (s == "assembly") source.Cancel(); },
        }, source.Token));
        Assert.Equal(["mesh", "assembly"], stages);
    }
}
