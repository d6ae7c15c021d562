using Seepage.Core.Imports;
using Seepage.Core.Sections;
using static Seepage.Core.Tests.Imports.SpreadsheetSupport;

namespace Seepage.Core.Tests.Imports;

/// <summary>A section read from its template analyses to the same figures as the JSON example it was written from. The mesh
/// and the solve are deterministic, so equal documents give equal flows to rounding.</summary>
public class SpreadsheetAnalysisTests
{
    private static double Flow(SectionDocument doc) => Analysis.Run(SectionValidator.Validate(doc).Model!).Flow.PerMetre;

    [Fact]
    public void Analyse_TemplateCsvAndXlsx_SameFlowAsJsonExample()
    {
        var example = Example();
        double expected = Flow(example);
        var csv = SectionSpreadsheet.ReadCsv(SectionSpreadsheet.WriteCsv(example));
        using var workbook = new MemoryStream(SectionSpreadsheet.WriteXlsx(example));
        var xlsx = SectionSpreadsheet.ReadXlsx(workbook);
        Assert.True(expected > 0);
        Assert.Equal(expected, Flow(csv.Document!), expected * 1e-12);
        Assert.Equal(expected, Flow(xlsx.Document!), expected * 1e-12);
    }
}
