using System.Diagnostics;
using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using Seepage.Core.Studies;
using static Seepage.Core.Tests.Imports.SpreadsheetSupport;

namespace Seepage.Core.Tests.Studies;

public class StudyRunnerTests
{
    private static readonly double[] Tips = [-5, -6, -7, -8, -9];

    private static StudyAlternative Tip(double y) =>
        new($"downstream pile tip at {y} m", [new("/cutoffs/1/tip/1", JsonValue.Create(y))]);

    [Trait("Category", "Slow")]
    [Fact]
    public void Run_FiveCutoffDepths_FlowFallsWithDepthAndRowsMatchSingleAnalyses()
    {
        var baseSection = JsonNode.Parse(ExampleJson())!;
        var clock = Stopwatch.StartNew();
        var rows = StudyRunner.Run(baseSection, Tips.Select(Tip).ToList());
        double seconds = clock.Elapsed.TotalSeconds;
        Assert.Equal(5, rows.Count);
        Assert.All(rows, r => Assert.True(r.Analysed, string.Join("; ", r.Problems.Select(p => p.Message))));

        // A deeper cutoff lengthens every flow path, so the discharge falls monotonically with depth (common practice; from memory:
        // e.g. Harr, "Groundwater and Seepage", 1962, the sheet pile in a layer of finite depth: q/kH falls as s/T grows).
        for (int i = 1; i < rows.Count; i++)
            Assert.True(rows[i].Flow < rows[i - 1].Flow, $"tip {Tips[i]} m: {rows[i].Flow:E6} not below {rows[i - 1].Flow:E6}");

        // Each row is the analysis of the base with the change applied by hand.
        for (int i = 0; i < rows.Count; i++)
        {
            var doc = Example();
            doc.Cutoffs![1].Tip![1] = Tips[i];
            var single = Analysis.Run(SectionValidator.Validate(doc).Model!);
            Assert.Equal(single.Flow.PerMetre, rows[i].Flow!.Value, single.Flow.PerMetre * 1e-12);
            Assert.Equal(single.Uplift.Sum(u => u.Force), rows[i].UpliftForce!.Value, 1e-9);
            Assert.Equal(single.Exit!.MaxGradient, rows[i].MaxExitGradient!.Value, 1e-12);
        }
        Console.WriteLine($"Five-alternative study: {seconds:F2} s on {Environment.ProcessorCount} cores");
    }
}
