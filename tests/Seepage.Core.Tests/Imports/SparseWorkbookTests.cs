using Seepage.Core.Imports;
using Seepage.Core.Tests.Support;

namespace Seepage.Core.Tests.Imports;

/// <summary>Workbooks saved by spreadsheet programs leave out empty rows and cells (the &lt;row r="7"&gt; and &lt;c r="C7"&gt;
/// references of ECMA-376 SpreadsheetML, "Office Open XML File Formats", 2016); the cell named in a problem must still be the
/// one the user sees.</summary>
public class SparseWorkbookTests
{
    private static byte[] Workbook(string sheetName, string sheetData) => MinimalWorkbook.Build(MinimalWorkbook.Of(sheetName, sheetData));

    private static string Text(string cell, string text) => MinimalWorkbook.Text(cell, text);

    [Fact]
    public void ReadXlsx_SparseRowsAndCells_ProblemNamesTheCellAsShown()
    {
        string data = $"""<row r="3">{Text("A3", "soils")}</row><row r="4">{Text("A4", "id")}{Text("C4", "kx")}</row>""" +
                      $"""<row r="7">{Text("A7", "sand")}{Text("C7", "fast")}</row>""";
        using var workbook = new MemoryStream(Workbook("my data", data));
        var import = SectionSpreadsheet.ReadXlsx(workbook);
        var p = Assert.Single(import.Problems, p => p.Message.Contains("'fast'"));
        Assert.Equal("sheet 'my data' row 7 column C", p.Location);
    }
}
