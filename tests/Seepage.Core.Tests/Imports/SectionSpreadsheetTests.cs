using Seepage.Core.Imports;
using Seepage.Core.Sections;
using static Seepage.Core.Tests.Imports.SpreadsheetSupport;

namespace Seepage.Core.Tests.Imports;

public class SectionSpreadsheetTests
{
    private const string HandMade = """
        # a hand-made section
        soils
        id,kx (m/s),specificGravity,voidRatio
        sand,1e-5,2.65,0.65

        zones
        zone,soil,x,y
        1,sand,-20,0
        1,,20,0
        1,,20,-10
        1,,-20,-10
        cutoffs
        name,topX,topY,tipX,tipY
        pile,0,0,0,-5
        heads
        name,total (m),x,y
        up,4,-20,0
        up,,0,0
        down,0,0,0
        down,,20,0
        """;

    [Theory]
    [InlineData("twin-pile-weir")]
    [InlineData("cofferdam-sheet-pile")]
    [InlineData("spillway-slab-drain")]
    [InlineData("embankment-toe-drain")]
    [InlineData("levee-pervious-foundation")]
    public void ReadCsv_TemplateOfExample_GivesTheSameDocument(string name)
    {
        var example = Example(name);
        var import = SectionSpreadsheet.ReadCsv(SectionSpreadsheet.WriteCsv(example));
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.True(SameDocument(example, import.Document!), SectionParser.Write(import.Document!));
        Assert.True(SectionValidator.Validate(import.Document!).IsValid);
    }

    [Theory]
    [InlineData("twin-pile-weir")]
    [InlineData("cofferdam-sheet-pile")]
    [InlineData("spillway-slab-drain")]
    [InlineData("embankment-toe-drain")]
    [InlineData("levee-pervious-foundation")]
    public void ReadXlsx_TemplateOfExample_GivesTheSameDocument(string name)
    {
        var example = Example(name);
        using var workbook = new MemoryStream(SectionSpreadsheet.WriteXlsx(example));
        var import = SectionSpreadsheet.ReadXlsx(workbook);
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.True(SameDocument(example, import.Document!), SectionParser.Write(import.Document!));
    }

    // The evidence options travel through both spreadsheet forms too: gauges, element order, the convergence and
    // truncation checks, and a permeable wall (thickness and kx on a cutoff row).
    [Fact]
    public void ReadCsvAndXlsx_GaugesOrderChecksAndWall_GiveTheSameDocument()
    {
        var example = Example() with
        {
            Gauges = [new GaugeDocument { Name = "below the floor", Along = [[2, 0], [2, -28]] }, new GaugeDocument { Name = "bent", Along = [[20, 0], [25, -5], [25, -12]] }],
            Mesh = new MeshDocument { Size = 1.5, MinAngle = 28, Order = 2, ConvergenceCheck = true },
            TruncationCheck = false,
        };
        example = example with { Cutoffs = [example.Cutoffs![0] with { Thickness = 0.6, Kx = 1e-7 }, example.Cutoffs[1]] };
        var csv = SectionSpreadsheet.ReadCsv(SectionSpreadsheet.WriteCsv(example));
        Assert.True(csv.Problems.Count == 0, Describe(csv.Problems));
        Assert.True(SameDocument(example, csv.Document!), SectionParser.Write(csv.Document!));
        using var workbook = new MemoryStream(SectionSpreadsheet.WriteXlsx(example));
        var xlsx = SectionSpreadsheet.ReadXlsx(workbook);
        Assert.True(xlsx.Problems.Count == 0, Describe(xlsx.Problems));
        Assert.True(SameDocument(example, xlsx.Document!), SectionParser.Write(xlsx.Document!));
        Assert.True(SectionValidator.Validate(xlsx.Document!).IsValid);
    }

    [Fact]
    public void ReadCsv_NotAFlag_NamesTheCell()
    {
        string csv = HandMade + "\nmesh\nsize,convergenceCheck\n1,maybe\n";
        var import = SectionSpreadsheet.ReadCsv(csv);
        var problem = Assert.Single(import.Problems);
        Assert.Contains("'maybe' is not a yes/no value", problem.Message);
        Assert.Contains("column B", problem.Location);
    }

    [Fact]
    public void ReadCsv_AllBlocksOnOneSheetWithBlanksAndComments_ReadsEveryBlock()
    {
        
        var import = SectionSpreadsheet.ReadCsv(HandMade);
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        var doc = import.Document!;
        Assert.Single(doc.Soils!);
        Assert.Equal(4, doc.Zones![0].Outline!.Count);
        Assert.Equal(-5, doc.Cutoffs![0].Tip![1]);
        Assert.Equal([4.0, 0.0], doc.Heads!.Select(h => h.Total!.Value));
        Assert.True(SectionValidator.Validate(doc).IsValid);
    }

    [Fact]
    public void ReadCsv_SemicolonsAndDecimalCommas_ReadsNumbers()
    {
        var import = SectionSpreadsheet.ReadCsv(HandMade.Replace(',', ';').Replace("1e-5", "1,5E-5").Replace("0.65", "0,65"));
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.Equal(1.5e-5, import.Document!.Soils![0].Kx);
        Assert.Equal(0.65, import.Document!.Soils![0].VoidRatio);
        Assert.Equal(-5, import.Document!.Cutoffs![0].Tip![1]);
    }
}
