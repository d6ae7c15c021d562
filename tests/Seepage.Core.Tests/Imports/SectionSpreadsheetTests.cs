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
    public void ReadXlsx_TemplateOfExample_GivesTheSameDocument(string name)
    {
        var example = Example(name);
        using var workbook = new MemoryStream(SectionSpreadsheet.WriteXlsx(example));
        var import = SectionSpreadsheet.ReadXlsx(workbook);
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.True(SameDocument(example, import.Document!), SectionParser.Write(import.Document!));
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
