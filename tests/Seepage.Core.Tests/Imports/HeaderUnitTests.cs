using Seepage.Core.Imports;
using static Seepage.Core.Tests.Imports.SpreadsheetSupport;

namespace Seepage.Core.Tests.Imports;

/// <summary>A unit in a column header is honoured or refused at the header cell, never ignored (issue 11). Factors:
/// 1 cm/s = 0.01 m/s, 1 ft = 0.3048 m (NIST SP 811, 2008).</summary>
public class HeaderUnitTests
{
    private static SheetImport WithHeader(string block, string from, string to)
    {
        int line = CsvLine(block, ""); // the column-name row follows the block-name row
        string header = SectionSpreadsheet.WriteCsv(Example()).Split("\r\n")[line - 1];
        Assert.Contains(from, header);
        return SectionSpreadsheet.ReadCsv(CsvWithLine(line, header.Replace(from, to)));
    }

    [Fact]
    public void ReadCsv_ConductivityHeaderInCmPerSecond_Converted()
    {
        var import = WithHeader("soils", "kx (m/s)", "kx (cm/s)");
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        var expected = Example().Soils!.Select(s => s.Kx * 0.01);
        Assert.Equal(expected, import.Document!.Soils!.Select(s => s.Kx));
        Assert.Equal(Example().Soils!.Select(s => s.Ky), import.Document.Soils!.Select(s => s.Ky)); // ky still in m/s
    }

    [Fact]
    public void ReadCsv_LengthHeaderInFeet_ConvertedToTheSectionsMetres()
    {
        var import = WithHeader("zone vertices", "x (m)", "x (ft)");
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        var expected = Example().Zones!.SelectMany(z => z.Outline!).Select(p => p[0] * 0.3048);
        Assert.Equal(expected, import.Document!.Zones!.SelectMany(z => z.Outline!).Select(p => p[0]));
    }

    [Theory]
    [InlineData("kx (m/s)", "kx (cm/sec)")]
    [InlineData("kx (m/s)", "kx [mm/s]")]
    [InlineData("specificGravity", "specificGravity (kN/m3)")]
    [InlineData("beddingAngle (degrees)", "beddingAngle (rad)")]
    public void ReadCsv_UnitThatDoesNotFit_RefusedAtTheHeaderCell(string from, string to)
    {
        var import = WithHeader("soils", from, to);
        Assert.Null(import.Document);
        var problem = Assert.Single(import.Problems);
        Assert.Equal(CsvLine("soils", "id"), problem.Row);
        Assert.Contains(to.Split(' ')[0], problem.Message);
    }

    [Fact]
    public void ReadCsv_MisspeltColumn_SuggestsTheColumn()
    {
        var import = WithHeader("checks", "requiredFactor", "requiredfactr");
        Assert.Contains("did you mean `requiredFactor`?", Assert.Single(import.Problems).Message, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void WriteCsv_SectionInFeet_RoundTripsWithItsUnits()
    {
        var doc = Example() with { LengthUnit = "ft", UnitWeightUnit = "pcf", WaterUnitWeight = 62.4 };
        string csv = SectionSpreadsheet.WriteCsv(doc);
        Assert.Contains("x (ft)", csv);
        Assert.Contains("waterUnitWeight (pcf)", csv);
        var import = SectionSpreadsheet.ReadCsv(csv);
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.True(SameDocument(doc, import.Document!));
    }

    // A template saved by a spreadsheet set to a decimal-comma locale: semicolons between cells, decimal commas, and the
    // comment rows (whose prose holds commas) kept as they were.
    [Fact]
    public void ReadCsv_SemicolonTemplateWithCommentRows_ReadsLikeTheCommaTemplate()
    {
        var grid = CsvText.Read(SectionSpreadsheet.WriteCsv(Example()));
        var lines = grid.Rows.Select(row => row.Count > 0 && row[0] is string s && s.StartsWith('#')
            ? CsvText.Write([row]).TrimEnd()
            : string.Join(';', row.Select(c => CsvText.Format(c) is var t && double.TryParse(t,
                System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out _) ? t.Replace('.', ',') : t)));
        string text = string.Join("\r\n", lines);
        Assert.Matches(@";-?\d+,\d", text);                    // decimal commas are present
        Assert.Contains(',', text.Split("\r\n")[0]);        // and the first row is a comment with commas
        var import = SectionSpreadsheet.ReadCsv(text);
        Assert.True(import.Problems.Count == 0, Describe(import.Problems));
        Assert.True(SameDocument(Example(), import.Document!));
    }
}
