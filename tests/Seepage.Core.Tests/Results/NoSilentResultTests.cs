using System.Text.Json.Nodes;
using Seepage.Core.Results;
using Seepage.Core.Sections;
using Seepage.Core.Studies;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

/// <summary>Every figure says what it assumed and every check that did not run says why (issue 11). The expectations are
/// facts of the trade (common practice): a confined solution with negative pore pressure over a material part of an
/// embankment is the sign of a free surface; an exit surface that takes water in is not an exit; a prism under a floor is
/// not an exit; a verdict covers the checks it names.</summary>
public class NoSilentResultTests
{
    private static SectionDocument DesignExample() =>
        SectionParser.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json")), out _)!;

    // A trapezoidal embankment 60 m wide at the base and 10 m high with the reservoir (7 m) on its upstream slope and a toe
    // drain: its upper surface is not a head boundary, so confined flow is the wrong idealisation.
    private static SectionDocument Embankment() => new()
    {
        Title = "embankment, reservoir on the slope",
        Soils = [new SoilDocument { Id = "fill", Kx = 1e-6, SpecificGravity = 2.65, VoidRatio = 0.6 }],
        Zones = [new ZoneDocument { Soil = "fill", Outline = [P(-30, 0), P(30, 0), P(5, 10), P(-5, 10)] }],
        Heads = [new HeadDocument { Name = "reservoir", Along = [P(-30, 0), P(-12.5, 7)], Total = 7 }],
        Drains = [new DrainDocument { Name = "toe drain", Along = [P(20, 0), P(30, 0)] }],
        Mesh = new MeshDocument { Size = 1.0 },
    };

    [Fact]
    public void Analysis_EmbankmentAnalysedConfined_WarnsOfNegativePorePressureAndInflowAtTheExit()
    {
        var r = Analysis.Run(Valid(Embankment()));
        Assert.Contains(r.Warnings, w => w.StartsWith("Pore pressure is negative over", StringComparison.Ordinal) && w.Contains("\"unconfined\": true"));
        // The default exit surface is the only head, the reservoir face, where water enters.
        Assert.Contains(r.Warnings, w => w.Contains("exit surface receives inflow"));
        var exit = CheckSummary.Of(r).Single(c => c.Check == "exit");
        Assert.Null(exit.Pass);
        Assert.Contains("inflow", exit.Skipped);
    }

    [Fact]
    public void Analysis_SheetPile_NoNegativePressureWarning()
    {
        var r = Analysis.Run(Valid(SheetPile(5, 10, 40, 4, size: 1.0)));
        Assert.DoesNotContain(r.Warnings, w => w.StartsWith("Pore pressure is negative", StringComparison.Ordinal));
    }

    [Fact]
    public void Validate_ExitSurfaceOnNoFlowBoundary_Refused()
    {
        var doc = SheetPile(5, 10, 40, 4) with { ExitCheck = new ExitCheckDocument { Along = [P(-40, -10), P(40, -10)] } };
        var problem = Assert.Single(SectionValidator.Validate(doc).Problems);
        Assert.Equal("/exitCheck/along", problem.Pointer);
    }

    [Fact]
    public void Analysis_HeadsSwapped_ExitCheckNotApplicableWithWarning()
    {
        var doc = SheetPile(5, 10, 40, 4, size: 1.0);
        doc = doc with
        {
            Heads = [doc.Heads![0] with { Total = 0 }, doc.Heads[1] with { Total = 4 }],
            ExitCheck = new ExitCheckDocument { Along = [P(0, 0), P(40, 0)] },
        };
        var r = Analysis.Run(Valid(doc));
        Assert.Contains(r.Warnings, w => w.Contains("exit surface receives inflow"));
        Assert.Null(CheckSummary.Of(r).Single(c => c.Check == "exit").Pass);
    }

    [Fact]
    public void Analysis_DesignExample_UpstreamPileUnderTheFloorIsNoHeaveVerdictAndPassCoversCreep()
    {
        var r = Analysis.Run(Valid(DesignExample()));
        var upstream = r.Heave.Single(h => h.Cutoff == "upstream pile");
        Assert.NotNull(upstream.Factor);             // shown for information (the pinned figure stays)
        Assert.Null(upstream.Pass);
        Assert.Contains("under structure 'weir floor'", upstream.Skipped);
        Assert.Null(r.Heave.Single(h => h.Cutoff == "downstream pile").Skipped);

        // Lane: 21 m of steep contact + 24/3 m flat over H = 4.5 m gives 6.4, below fine sand's 7.0 (Lane 1935, from memory):
        // the verdict fails, and it says it covers the creep checks.
        var (pass, covers) = CheckSummary.Overall(CheckSummary.Of(r));
        Assert.False(r.Creep!.Lane.Pass);
        Assert.False(pass);
        Assert.Equal(["exit", "heave", "lane", "bligh"], covers);
    }

    [Fact]
    public void Figures_StudyRow_OneColumnPerCheckAndPassCoversThem()
    {
        var row = StudyRunner.RunOne(JsonNode.Parse(SectionParser.Write(DesignExample()))!, 0,
            new StudyAlternative("base", []), null, default).Row;
        Assert.True(row.ExitPass);
        Assert.True(row.HeavePass);
        Assert.False(row.LanePass);
        Assert.False(row.BlighPass);
        Assert.False(row.Pass);
        Assert.Equal(["exit", "heave", "lane", "bligh"], row.PassCovers);
    }

    [Fact]
    public void Analysis_SkippedChecks_SayWhy()
    {
        var doc = DesignExample();
        doc = doc with
        {
            Structures = [new StructureDocument { Name = "floor, upstream part", Base = [P(-12, 0), P(0, 0)] },
                          new StructureDocument { Name = "floor, downstream part", Base = [P(0, 0), P(12, 0)] }],
            TruncationCheck = false,
        };
        var checks = CheckSummary.Of(Analysis.Run(Valid(doc)));
        Assert.Contains("2 structures", checks.Single(c => c.Check == "independentVariables").Skipped);
        Assert.Equal("truncationCheck is false.", checks.Single(c => c.Check == "truncation").Skipped);
        Assert.Contains("mesh.convergenceCheck", checks.Single(c => c.Check == "convergence").Skipped);
    }

    [Trait("Category", "Slow")] // a large mesh
    [Fact]
    public void Analysis_LargeMesh_TruncationSkippedWithTheTriangleCount()
    {
        // A drain on the downstream surface: the first-order estimate does not apply, and the wider solve is not run by itself.
        var doc = SheetPile(5, 10, 40, 4, size: 0.25);
        doc = doc with
        {
            Heads = [doc.Heads![0], doc.Heads[1] with { Along = [P(0, 0), P(20, 0)] }],
            Drains = [new DrainDocument { Name = "toe drain", Along = [P(20, 0), P(40, 0)] }],
        };
        var r = Analysis.Run(Valid(doc));
        Assert.True(r.Mesh.TriangleCount >= TruncationCheck.AutomaticBelowTriangles, $"{r.Mesh.TriangleCount} triangles");
        Assert.Null(r.Truncation);
        Assert.Contains("triangles", CheckSummary.Of(r).Single(c => c.Check == "truncation").Skipped);
    }

    [Fact]
    public void Validate_Defaults_EchoedWithTheirOriginAndTheDefaultExitSurfaceWarned()
    {
        var doc = SheetPile(5, 10, 40, 4) with { ExitCheck = new ExitCheckDocument { RequiredFactor = 4 } };
        var model = Valid(doc);
        Assumption At(string member) => model.Assumptions.Single(a => a.Member == member);
        Assert.Equal(("default", (object)0.5), (At("/exitCheck/depth").Origin, At("/exitCheck/depth").Value));
        Assert.Equal(("given", (object)4.0), (At("/exitCheck/requiredFactor").Origin, At("/exitCheck/requiredFactor").Value));
        Assert.Equal("default", At("/exitCheck/along").Origin);
        Assert.Contains("'downstream'", At("/exitCheck/along").Note);
        Assert.Equal("default", At("/waterUnitWeight").Origin);
        Assert.Contains(model.Warnings, w => w.Contains("exitCheck.along is not given"));
        var analysed = model.Analysed!;
        Assert.Equal(0.5, analysed.ExitCheck!.Depth);
        Assert.Equal(1.5, analysed.HeaveCheck!.RequiredFactor);
        Assert.Equal(9.81, analysed.WaterUnitWeight);
        Assert.Equal(1, analysed.Mesh!.Order);
        Assert.Equal(analysed.Soils![0].Kx, analysed.Soils[0].Ky);
    }
}
