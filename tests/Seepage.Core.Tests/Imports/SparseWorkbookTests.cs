using System.IO.Compression;
using System.Text;
using Seepage.Core.Imports;

namespace Seepage.Core.Tests.Imports;

/// <summary>Workbooks saved by spreadsheet programs leave out empty rows and cells (the &lt;row r="7"&gt; and &lt;c r="C7"&gt;
/// references of ECMA-376 SpreadsheetML, "Office Open XML File Formats", 2016); the cell named in a problem must still be the
/// one the user sees.</summary>
public class SparseWorkbookTests
{
    private static byte[] Workbook(string sheetName, string sheetData)
    {
        using var stream = new MemoryStream();
        using (var zip = new ZipArchive(stream, ZipArchiveMode.Create, leaveOpen: true))
        {
            void Add(string path, string xml)
            {
                using var writer = new StreamWriter(zip.CreateEntry(path).Open(), new UTF8Encoding(false));
                writer.Write(xml);
            }
            const string pkg = "http://schemas.openxmlformats.org/package/2006/";
            const string main = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
            const string rel = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
            Add("[Content_Types].xml", $"""<Types xmlns="{pkg}content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/></Types>""");
            Add("_rels/.rels", $"""<Relationships xmlns="{pkg}relationships"><Relationship Id="rId1" Type="{rel}/officeDocument" Target="xl/workbook.xml"/></Relationships>""");
            Add("xl/workbook.xml", $"""<workbook xmlns="{main}" xmlns:r="{rel}"><sheets><sheet name="{sheetName}" sheetId="1" r:id="rId1"/></sheets></workbook>""");
            Add("xl/_rels/workbook.xml.rels", $"""<Relationships xmlns="{pkg}relationships"><Relationship Id="rId1" Type="{rel}/worksheet" Target="worksheets/sheet1.xml"/></Relationships>""");
            Add("xl/worksheets/sheet1.xml", $"""<worksheet xmlns="{main}"><sheetData>{sheetData}</sheetData></worksheet>""");
        }
        return stream.ToArray();
    }

    private static string Text(string cell, string text) => $"""<c r="{cell}" t="inlineStr"><is><t>{text}</t></is></c>""";

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
