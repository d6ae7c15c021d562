using Seepage.Core.Imports;
using Seepage.Core.Sections;
using static Seepage.Core.Tests.Imports.SpreadsheetSupport;

namespace Seepage.Core.Tests.Imports;

/// <summary>Each kind of spreadsheet error names the sheet, row and column of the cell concerned.</summary>
public class SpreadsheetProblemTests
{
    private static ImportProblem Only(SheetImport import)
    {
        Assert.True(import.Problems.Count == 1, Describe(import.Problems));
        Assert.Null(import.Document);
        return import.Problems[0];
    }

    [Fact]
    public void ReadCsv_TextWhereNumberExpected_NamesTheCell()
    {
        int line = CsvLine("soils", "medium-sand");
        var p = Only(SectionSpreadsheet.ReadCsv(CsvWithLine(line, "medium-sand,fast,1E-04,0,2.66,0.6,,medium-sand")));
        Assert.Equal(("csv", line, 2), (p.Sheet, p.Row, p.Column));
        Assert.Equal($"sheet 'csv' row {line} column B", p.Location);
        Assert.Contains("'fast' is not a number", p.Message);
    }

    [Fact]
    public void ReadCsv_UnknownColumnName_NamesTheHeaderCell()
    {
        int line = CsvLine("cutoffs", "name");
        var p = Only(SectionSpreadsheet.ReadCsv(CsvWithLine(line, "name,topX,topY,tipX,tipY,thickness,colour")));
        Assert.Equal(("csv", line, 7), (p.Sheet, p.Row, p.Column));
        Assert.Contains("'colour' is not a column of the 'cutoffs' block", p.Message);
    }

    [Fact]
    public void ReadCsv_MissingRequiredColumn_NamesTheHeaderRow()
    {
        int line = CsvLine("heads", "name");
        var import = SectionSpreadsheet.ReadCsv(CsvWithLine(line, "name,x,y"));
        Assert.Contains(import.Problems, p => p.Row == line && p.Message.Contains("needs a column named 'total'"));
    }

    [Fact]
    public void ReadCsv_EmptyRequiredCell_NamesTheCell()
    {
        int line = CsvLine("zone vertices", "1,");
        var p = Only(SectionSpreadsheet.ReadCsv(CsvWithLine(line, "1,medium-sand,,0,")));
        Assert.Equal(("csv", line, 3), (p.Sheet, p.Row, p.Column));
        Assert.Contains("'x' cell is empty", p.Message);
    }

    [Fact]
    public void ReadCsv_RowOutsideAnyBlock_NamesTheRow()
    {
        var p = Only(SectionSpreadsheet.ReadCsv(CsvWithLine(1, ",stray text")));
        Assert.Equal(("csv", 1, 2), (p.Sheet, p.Row, p.Column));
        Assert.Contains("outside any block", p.Message);
    }

    [Fact]
    public void ReadCsv_ConflictingTotalHeadOnOneBoundary_NamesTheLaterCell()
    {
        int first = CsvLine("heads", "headwater");
        var p = Only(SectionSpreadsheet.ReadCsv(CsvWithLine(first + 1, "headwater,6.5,-10,0")));
        Assert.Equal(("csv", first + 1, 2), (p.Sheet, p.Row, p.Column));
        Assert.Contains($"row {first}", p.Message);
    }

    [Fact]
    public void ReadCsv_UnknownCheck_NamesTheCell()
    {
        int line = CsvLine("checks", "heave");
        var p = Only(SectionSpreadsheet.ReadCsv(CsvWithLine(line, "slide,,,,1.5")));
        Assert.Equal(("csv", line, 1), (p.Sheet, p.Row, p.Column));
    }

    [Fact]
    public void ReadCsv_MissingSoilsBlock_Reported()
    {
        string csv = "heads\r\nname,total,x,y\r\nup,1,0,0\r\n";
        var import = SectionSpreadsheet.ReadCsv(csv);
        Assert.Contains(import.Problems, p => p.Message.Contains("No 'soils' block"));
        Assert.Contains(import.Problems, p => p.Message.Contains("No 'zone vertices' block"));
    }

    [Fact]
    public void Place_ValidatorProblemOfReadableCell_NamesTheCellItCameFrom()
    {
        int line = CsvLine("soils", "silt");
        var import = SectionSpreadsheet.ReadCsv(CsvWithLine(line, "silt,-2E-07,,,2.7,0.85,,very-fine-sand-or-silt"));
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        var outcome = SectionValidator.Validate(import.Document!);
        var placed = import.Place(outcome.Problems);
        Assert.Contains(placed, p => (p.Sheet, p.Row, p.Column) == ("csv", line, 2) && p.Message.Contains("/soils/1/kx"));
    }

    [Fact]
    public void Place_ValidatorProblemOfVertex_NamesTheVertexRow()
    {
        // Move the tip of the downstream pile below the model's base (y = -28 m): the validator names /cutoffs/1/tip.
        int line = CsvLine("cutoffs", "downstream pile");
        var import = SectionSpreadsheet.ReadCsv(CsvWithLine(line, "downstream pile,14,0,14,-40,,"));
        var placed = import.Place(SectionValidator.Validate(import.Document!).Problems);
        Assert.NotEmpty(placed);
        Assert.All(placed, p => Assert.Equal(("csv", line), (p.Sheet, p.Row)));
    }

    [Fact]
    public void ReadXlsx_TextWhereNumberExpected_NamesSheetRowAndColumn()
    {
        var sheets = SectionSheetWriter.Blocks(Example())
            .Select(b => new SheetGrid(b.Block, [new object?[] { b.Block }, .. b.Rows])).ToList();
        int soils = sheets.FindIndex(s => s.Name == "soils");
        var rows = sheets[soils].Rows.Select(r => r.ToArray()).ToList();
        rows[3][4] = "heavy";                        // row 4 (second soil), column E (specificGravity)
        sheets[soils] = new SheetGrid("soils", rows);
        using var workbook = new MemoryStream(XlsxWorkbook.Write(sheets));
        var p = Only(SectionSpreadsheet.ReadXlsx(workbook));
        Assert.Equal("sheet 'soils' row 4 column E", p.Location);
    }

    [Fact]
    public void ReadXlsx_SheetNamedAfterBlockWithoutNameRow_ReadsTheBlock()
    {
        var sheets = SectionSheetWriter.Blocks(Example()).Select(b => new SheetGrid(b.Block, b.Rows)).ToList();
        using var workbook = new MemoryStream(XlsxWorkbook.Write(sheets));
        var import = SectionSpreadsheet.ReadXlsx(workbook);
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.True(SameDocument(Example(), import.Document!));
    }

    [Fact]
    public void ReadXlsx_NotAWorkbook_ThrowsInvalidData()
    {
        using var bytes = new MemoryStream("soils,id"u8.ToArray());
        Assert.Throws<InvalidDataException>(() => SectionSpreadsheet.ReadXlsx(bytes));
    }
}
