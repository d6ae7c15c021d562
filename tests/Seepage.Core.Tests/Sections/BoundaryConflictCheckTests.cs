using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Sections;

/// <summary>Two boundary conditions on one stretch of boundary are refused with both pointers (before, the later head
/// silently won: 2 m against 99 m gave an 18 times larger, reversed flow); polylines that only meet at a point are fine.</summary>
public class BoundaryConflictCheckTests
{
    private static List<SectionProblem> Problems(SectionDocument doc) => SectionValidator.Validate(doc).Problems.ToList();

    [Fact]
    public void Validate_TwoHeadsOnTheSameStretch_RefusedNamingBoth()
    {
        var doc = SheetPile(5, 10, 40, 4);
        doc = doc with { Heads = [.. doc.Heads!, new HeadDocument { Name = "second", Along = [P(-30, 0), P(-10, 0)], Total = 99 }] };
        var problem = Assert.Single(Problems(doc), p => p.Pointer == "/heads/2/along");
        Assert.Contains("/heads/0/along", problem.Message);
    }

    [Fact]
    public void Validate_IdenticalHeads_Refused()
    {
        var doc = SheetPile(5, 10, 40, 4);
        doc = doc with { Heads = [.. doc.Heads!, doc.Heads![1] with { Total = 2 }] };
        Assert.Contains(Problems(doc), p => p.Pointer == "/heads/2/along" && p.Message.Contains("/heads/1/along"));
    }

    [Fact]
    public void Validate_DrainOnAHeadStretch_RefusedNamingBoth()
    {
        var doc = SheetPile(5, 10, 40, 4) with { Drains = [new DrainDocument { Name = "toe drain", Along = [P(10, 0), P(20, 0)] }] };
        var problem = Assert.Single(Problems(doc), p => p.Pointer == "/drains/0/along");
        Assert.Contains("/heads/1/along", problem.Message);
    }

    [Fact]
    public void Validate_HeadsMeetingAtOnePoint_Accepted()
    {
        var doc = SheetPile(5, 10, 40, 4); // upstream ends at (0, 0) where downstream begins
        Assert.DoesNotContain(Problems(doc), p => p.Pointer.StartsWith("/heads", StringComparison.Ordinal));
        var drained = doc with
        {
            Heads = [doc.Heads![0], doc.Heads![1] with { Along = [P(0, 0), P(20, 0)] }],
            Drains = [new DrainDocument { Name = "drain", Along = [P(20, 0), P(40, 0)] }],
        };
        Assert.Empty(Problems(drained));
    }

    [Fact]
    public void Validate_HeadOverlappingAcrossACorner_RefusedOnThePieceInCommon()
    {
        var doc = SheetPile(5, 10, 40, 4);
        doc = doc with { Heads = [.. doc.Heads!, new HeadDocument { Name = "side", Along = [P(40, -10), P(40, 0), P(30, 0)], Total = 1 }] };
        Assert.Contains(Problems(doc), p => p.Pointer == "/heads/2/along" && p.Message.Contains("(30, 0)") && p.Message.Contains("(40, 0)"));
    }
}
