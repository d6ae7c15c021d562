using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Sections;

public class SectionValidatorTests
{
    private static IReadOnlyList<SectionProblem> Problems(SectionDocument doc) => SectionValidator.Validate(doc).Problems;

    private static void AssertProblemAt(SectionDocument doc, string pointer)
    {
        var problems = Problems(doc);
        Assert.True(problems.Any(p => p.Pointer == pointer),
            $"expected a problem at {pointer}; got:\n" + string.Join("\n", problems.Select(p => $"{p.Pointer}: {p.Message}")));
    }

    [Fact]
    public void Validate_DesignExample_IsValid()
    {
        string json = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));
        var doc = SectionParser.Parse(json, out var parseProblems);
        Assert.Empty(parseProblems);
        var model = Valid(doc!);
        Assert.Equal(2, model.Cutoffs.Count);
        Assert.Equal(5e-5, model.Soils[0].Ky);
        Assert.Equal(1e-7, model.Soils[1].Ky); // ky defaults to kx
    }

    // Values outside what any soil, water or local section can be are refused at the member, not carried into the
    // numerics: conductivity outside 1e-16 … 100 m/s (the soil range of Freeze & Cherry, "Groundwater", 1979,
    // table 2.2, recalled from memory, with a margin), unit weight of water outside 5 … 15 kN/m³, coordinates and
    // heads beyond ±1e6 m, and null items in a list (common practice).
    [Fact]
    public void Validate_OutOfRangeValuesAndNullItems_NameTheMember()
    {
        var doc = SheetPile(5, 10, 40, 4);
        AssertProblemAt(doc with { Soils = [doc.Soils![0] with { Kx = 1e300 }] }, "/soils/0/kx");
        AssertProblemAt(doc with { Soils = [doc.Soils![0] with { Kx = 1e-3, Ky = 1e-20 }] }, "/soils/0/ky");
        AssertProblemAt(doc with { ConductivityUnit = "cm/s", Soils = [doc.Soils![0] with { Kx = 2e4 }] }, "/soils/0/kx"); // 200 m/s
        Assert.Empty(Problems(doc with { ConductivityUnit = "cm/s", Soils = [doc.Soils![0] with { Kx = 5 }] })); // 0.05 m/s: gravel
        AssertProblemAt(doc with { WaterUnitWeight = 1e300 }, "/waterUnitWeight");
        AssertProblemAt(doc with { Heads = [doc.Heads![0] with { Total = 1e300 }, doc.Heads[1]] }, "/heads/0/total");
        AssertProblemAt(doc with { Cutoffs = [doc.Cutoffs![0] with { Tip = P(0, -2e6) }] }, "/cutoffs/0/tip");
        AssertProblemAt(doc with { Heads = [doc.Heads![0], null!] }, "/heads/1");
        AssertProblemAt(doc with { Structures = [null!] }, "/structures/0");
        AssertProblemAt(doc with { Zones = [doc.Zones![0], null!] }, "/zones/1");
        AssertProblemAt(doc with { Cutoffs = [doc.Cutoffs![0] with { Thickness = 0.5, Kx = 1e300 }] }, "/cutoffs/0/kx");
    }

    [Fact]
    public void Validate_UnknownSoil_NamesZoneSoil() =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with { Zones = [new ZoneDocument { Soil = "gravel", Outline = Rect(-30, -6, 30, 0) }] }, "/zones/0/soil");

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1e-5)]
    [InlineData(double.NaN)]
    public void Validate_BadConductivity_NamesKx(double kx) =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with { Soils = [new SoilDocument { Id = "sand", Kx = kx }] }, "/soils/0/kx");

    [Fact]
    public void Validate_SelfIntersectingOutline_NamesOutline() =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with
        { Zones = [new ZoneDocument { Soil = "sand", Outline = [P(-30, 0), P(30, -6), P(30, 0), P(-30, -6)] }] }, "/zones/0/outline");

    [Fact]
    public void Validate_ClockwiseOutline_IsStoredCounterClockwise()
    {
        var model = Valid(SheetPile(3, 6, 30, 4) with { Zones = [new ZoneDocument { Soil = "sand", Outline = [P(-30, 0), P(30, 0), P(30, -6), P(-30, -6)] }] });
        Assert.True(Seepage.Core.Geometry.PolygonMath.SignedArea(model.Zones[0].Outline) > 0);
    }

    [Fact]
    public void Validate_OverlappingZones_Reported() =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with
        {
            Zones = [new ZoneDocument { Soil = "sand", Outline = Rect(-30, -6, 30, 0) }, new ZoneDocument { Soil = "sand", Outline = Rect(-30, -8, 30, -5) }]
        }, "/zones/1/outline");

    [Fact]
    public void Validate_GapBetweenZones_Reported()
    {
        // A ring of four zones around an empty square.
        var doc = SheetPile(1, 6, 30, 4) with
        {
            Zones = [new ZoneDocument { Soil = "sand", Outline = Rect(-30, -3, 30, 0) }, new ZoneDocument { Soil = "sand", Outline = Rect(-30, -6, 30, -5) },
                     new ZoneDocument { Soil = "sand", Outline = Rect(-30, -5, 0, -3) }, new ZoneDocument { Soil = "sand", Outline = Rect(5, -5, 30, -3) }]
        };
        Assert.Contains(Problems(doc), p => p.Pointer == "/zones" && p.Message.Contains("gap"));
    }

    [Fact]
    public void Validate_HeadOffBoundary_NamesAlong() =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with
        { Heads = [new HeadDocument { Along = [P(-30, -1), P(0, -1)], Total = 4 }, new HeadDocument { Along = [P(0, 0), P(30, 0)], Total = 0 }] }, "/heads/0/along");

    [Fact]
    public void Validate_CutoffOutsideDomain_NamesCutoff() =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with { Cutoffs = [new CutoffDocument { Top = P(40, 0), Tip = P(40, -3) }] }, "/cutoffs/0");

    [Fact]
    public void Validate_CutoffClosingFlowPath_NamesTip() =>
        AssertProblemAt(SheetPile(3, 6, 30, 4) with { Cutoffs = [new CutoffDocument { Top = P(0, 0), Tip = P(0, -6) }] }, "/cutoffs/0/tip");

    [Fact]
    public void Validate_NoHeads_Reported() => AssertProblemAt(SheetPile(3, 6, 30, 4) with { Heads = [] }, "/heads");

    [Fact]
    public void Validate_IdenticalHeads_Reported()
    {
        var doc = SheetPile(3, 6, 30, 4) with
        { Heads = [new HeadDocument { Along = [P(-30, 0), P(0, 0)], Total = 2 }, new HeadDocument { Along = [P(0, 0), P(30, 0)], Total = 2 }] };
        Assert.Contains(Problems(doc), p => p.Pointer == "/heads" && p.Message.Contains("nothing drives"));
    }

    [Fact]
    public void Validate_TooManyVertices_Reported()
    {
        var ring = Enumerable.Range(0, SectionValidator.MaxVertices + 1).Select(i =>
        {
            double a = 2 * Math.PI * i / (SectionValidator.MaxVertices + 1);
            return P(10 * Math.Cos(a), 10 * Math.Sin(a));
        }).ToList();
        AssertProblemAt(SheetPile(3, 6, 30, 4) with { Zones = [new ZoneDocument { Soil = "sand", Outline = ring }] }, "");
    }

    [Fact]
    public void Validate_SeveralProblems_ReportsEveryOne()
    {
        var doc = SheetPile(3, 6, 30, 4) with
        {
            Soils = [new SoilDocument { Id = "sand", Kx = -1 }],
            ConductivityUnit = "furlong/fortnight",
            ExitCheck = new ExitCheckDocument { Depth = -1 },
        };
        var pointers = Problems(doc).Select(p => p.Pointer).ToHashSet();
        Assert.Contains("/soils/0/kx", pointers);
        Assert.Contains("/conductivityUnit", pointers);
        Assert.Contains("/exitCheck/depth", pointers);
    }

    [Fact]
    public void Parse_WrongType_GivesPointer()
    {
        var doc = SectionParser.Parse("""{ "soils": [ { "id": "a", "kx": "fast" } ] }""", out var problems);
        Assert.Null(doc);
        Assert.Equal("/soils/0/kx", Assert.Single(problems).Pointer);
    }

    [Fact]
    public void Parse_MalformedJson_GivesProblem()
    {
        var doc = SectionParser.Parse("""{ "soils": [ """, out var problems);
        Assert.Null(doc);
        Assert.Single(problems);
    }

    [Fact]
    public void Validate_ConductivityUnit_ConvertsToMetresPerSecond()
    {
        var model = Valid(SheetPile(3, 6, 30, 4) with { ConductivityUnit = "m/day", Soils = [new SoilDocument { Id = "sand", Kx = 8.64 }] });
        Assert.Equal(1e-4, model.Soils[0].Kx, 1e-15);
    }
}
