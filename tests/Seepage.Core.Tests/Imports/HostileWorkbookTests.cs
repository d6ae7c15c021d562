using System.Diagnostics;
using Seepage.Core.Imports;
using Seepage.Core.Tests.Support;
using static Seepage.Core.Tests.Support.MinimalWorkbook;

namespace Seepage.Core.Tests.Imports;

/// <summary>Workbooks made to tie up the server (as a probe found: a 19 KB one declaring A1:XFD1048576 took 167 s, a 3.8 MB
/// one never answered, a 116 KB one with a 100 MB cell came back as a 100 MB error) are refused before any cell is parsed,
/// quickly, with a short message on the sheet concerned.</summary>
public class HostileWorkbookTests
{
    private static (SheetImport Import, double Seconds) Read(byte[] workbook, CancellationToken cancellation = default)
    {
        var clock = Stopwatch.StartNew();
        var import = SectionSpreadsheet.ReadXlsx(new MemoryStream(workbook), cancellation: cancellation);
        return (import, clock.Elapsed.TotalSeconds);
    }

    private static string Row(int r) => $"""<row r="{r}"><c r="A{r}"><v>{r}</v></c><c r="B{r}"><v>{r * 0.5}</v></c><c r="C{r}"><v>7</v></c></row>""";

    [Fact]
    public void ReadXlsx_SheetsDeclaringTheWholeGrid_RefusedAtOnce()
    {
        var sheets = Enumerable.Range(1, 6).Select(i => Of($"sheet {i}", Text("A1", "soils") + Row(2), "A1:XFD1048576")).ToArray();
        var workbook = Build(sheets);
        var (import, seconds) = Read(workbook);
        Assert.Null(import.Document);
        var problem = Assert.Single(import.Problems);
        Assert.Equal("sheet 1", problem.Sheet);
        Assert.Contains("A1:XFD1048576", problem.Message);
        Assert.True(seconds < 2, $"{seconds:F1} s for a {workbook.Length / 1024} KB workbook");
    }

    [Trait("Category", "Slow")] // a workbook of the row limit
    [Fact]
    public void ReadXlsx_RowsBeyondTheLimit_RefusedAtTheRowLimit()
    {
        var workbook = Build(new Sheet("data", null, w => { for (int r = 1; r <= 30_000; r++) w.Write(Row(r)); }));
        var (import, seconds) = Read(workbook);
        var problem = Assert.Single(import.Problems);
        Assert.True(problem.Row == SpreadsheetLimits.Default.MaxRows + 1, problem.Message);
        Assert.True(seconds < 5, $"{seconds:F1} s for a {workbook.Length / 1024} KB workbook");
    }

    [Fact]
    public void ReadXlsx_OneHundredMegabyteCell_RefusedWithAShortMessage()
    {
        var workbook = Build(new Sheet("soils", null, w =>
        {
            w.Write("""<row r="1"><c r="A1" t="inlineStr"><is><t>""");
            var chunk = new string('x', 1 << 20);
            for (int i = 0; i < 100; i++) w.Write(chunk);
            w.Write("</t></is></c></row>");
        }));
        var (import, seconds) = Read(workbook);
        var problem = Assert.Single(import.Problems);
        Assert.True(problem.Message.Length < 300, problem.Message);
        Assert.True(seconds < 5, $"{seconds:F1} s for a {workbook.Length / 1024} KB workbook");
    }

    [Fact]
    public void ReadXlsx_LongCellWithinTheUnpackedLimit_RefusedAtTheCell()
    {
        var workbook = Build(Of("soils", Text("A1", "soils") + $"""<row r="2">{Text("A2", new string('y', 50_000))}</row>"""));
        var problem = Assert.Single(Read(workbook).Import.Problems);
        Assert.Equal(("soils", 2), (problem.Sheet, problem.Row));
        Assert.True(problem.Message.Length < 300, problem.Message);
    }

    [Fact]
    public void ReadXlsx_CellBeyondTheLastColumn_Refused()
    {
        var workbook = Build(Of("soils", $"""<row r="1">{Text("A1", "soils")}{Text("ZZ1", "far")}</row>"""));
        var problem = Assert.Single(Read(workbook).Import.Problems);
        Assert.Contains("column", problem.Message);
    }

    [Fact]
    public void ReadXlsx_Cancelled_Stops()
    {
        var workbook = Build(new Sheet("data", null, w => { for (int r = 1; r <= 5_000; r++) w.Write(Row(r)); }));
        using var cancelled = new CancellationTokenSource();
        cancelled.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => Read(workbook, cancelled.Token));
    }

    [Fact]
    public void ReadCsv_HugeCell_RefusedWithAShortExcerpt()
    {
        var import = SectionSpreadsheet.ReadCsv("section\r\ntitle\r\n" + new string('\u001b', 1_000_000) + "\r\n");
        var problem = Assert.Single(import.Problems);
        Assert.True(problem.Message.Length < 300, problem.Message);
        Assert.DoesNotContain('\u001b', problem.Message);
    }

    [Fact]
    public void ReadXlsx_TemplateOfExample_StillReads()
    {
        var workbook = SectionSpreadsheet.WriteXlsx(SpreadsheetSupport.Example());
        Assert.Empty(Read(workbook).Import.Problems);
    }
}
