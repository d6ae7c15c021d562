using System.Globalization;
using Seepage.Core.Sections;

namespace Seepage.Core.Tests.Examples;

public class ExampleSectionTests
{
    // Every shipped example section is analysed and its key figures are pinned, so docs and demos cannot go stale.
    // The values are what this code computed on the deterministic default mesh (not published values; the
    // analytic checks are elsewhere). A change of the mesher or of a default changes them: re-pin with the reason
    // stated in the commit message. Tolerance: 1e-6 relative (the solver stops at a relative residual of 1e-8).
    private const double Tolerance = 1e-6;

    // file, flow (m³/s per m), uplift force on all bases (kN/m), max exit gradient, heave factors (one per cutoff)
    public static TheoryData<string, double, double, double, string> Pinned => new()
    {
        // Re-pinned 2026-12-02 after the final mesher landed (its refinement order and interface grading changed the meshes).
        { "design-example.section.json", 0.00010373264909972733, 996.0411441646188, 0.12129243066857498, "12.414888342227057 6.141022941501233" },
        { "examples/twin-pile-weir.section.json", 0.00024033290695964075, 1136.64400167369, 0.13004793894855649, "13.411328333838993 6.250580205653824" },
        // Closed form for this one (Harr 1962, s/T = 1/2): q = kH/2 = 1.0e-4 m³/s per m; the pinned FE value is 0.5 % above.
        { "examples/cofferdam-sheet-pile.section.json", 0.00010048643060622947, 0, 0.24199219205603736, "3.540924133699999" },
        { "examples/spillway-slab-drain.section.json", 0.00015514640393632655, 651.0714182541179, 0.09171335203807196, "5.054647319181518" },
        // Unconfined examples (phreatic surface found by the Picard iteration; the iteration is deterministic).
        // The embankment's water all goes into the toe drain, so no exit station is wetted (exit check not made: 0 here).
        { "examples/embankment-toe-drain.section.json", 3.087291064817179E-06, 0, 0, "" },
        { "examples/levee-pervious-foundation.section.json", 0.0002472804052769807, 0, 0.24276621695004777, "" },
    };

    [Trait("Category", "Slow")] // every shipped example, unconfined ones included
    [Theory]
    [MemberData(nameof(Pinned))]
    public void Analysis_ExampleSection_KeyFiguresAsPinned(string file, double flow, double uplift, double exit, string heave)
    {
        var doc = SectionParser.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, file)), out var problems);
        Assert.True(doc is not null, string.Join("; ", problems.Select(p => p.Message)));
        var outcome = SectionValidator.Validate(doc!);
        Assert.True(outcome.IsValid, string.Join("; ", outcome.Problems.Select(p => $"{p.Pointer}: {p.Message}")));
        var r = Seepage.Core.Analysis.Run(outcome.Model!);
        double u = r.Uplift.Sum(x => x.Force), e = r.Exit?.MaxGradient ?? 0;
        string h = string.Join(" ", r.Heave.Select(x => (x.Factor ?? 0).ToString("R", CultureInfo.InvariantCulture)));
        string actual = FormattableString.Invariant($"{file}: flow {r.Flow.PerMetre:R}, uplift {u:R}, exit {e:R}, heave [{h}]");
        Assert.True(Close(flow, r.Flow.PerMetre), actual);
        Assert.True(Close(uplift, u), actual);
        Assert.True(Close(exit, e), actual);
        var pinned = heave.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(x => double.Parse(x, CultureInfo.InvariantCulture)).ToList();
        Assert.True(pinned.Count == r.Heave.Count, actual);
        for (int i = 0; i < pinned.Count; i++) Assert.True(Close(pinned[i], r.Heave[i].Factor ?? 0), actual);
    }

    private static bool Close(double pinned, double actual) =>
        Math.Abs(actual - pinned) <= Tolerance * Math.Max(Math.Abs(pinned), 1e-12) || (pinned == 0 && actual == 0);
}
