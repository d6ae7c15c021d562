using Seepage.Core.Sections;

namespace Seepage.Core.Imports;

/// <summary>Sections to and from spreadsheets in the layout of <see cref="SectionSheetLayout"/>: CSV text (all blocks on one
/// sheet, named "csv" in problems) and .xlsx workbooks (blocks on any sheets; the templates put one block per sheet).</summary>
public static class SectionSpreadsheet
{
    /// <summary>Name of the one sheet of a CSV file in problem locations.</summary>
    public const string CsvSheet = "csv";

    /// <summary>The opening lines of every template.</summary>
    public static readonly IReadOnlyList<string> Notes =
    [
        "# Seepage section. Each block opens with a row holding only its name, then a row of column names, then its rows.",
        "# Lengths in m (y is elevation, up), heads in m of total head, conductivity in the section's conductivityUnit.",
        "# Rows whose first cell starts with # are skipped. " + AnalysisResult.Caution,
    ];

    public static SheetImport ReadCsv(string text) => SectionSheetReader.Read([CsvText.Read(text, CsvSheet)]);

    /// <summary>Reads a workbook; throws <see cref="InvalidDataException"/> when the bytes are not an .xlsx workbook.</summary>
    public static SheetImport ReadXlsx(Stream workbook) => SectionSheetReader.Read(XlsxWorkbook.Read(workbook));

    /// <summary>All blocks on one sheet, separated by blank rows, after the notes.</summary>
    public static string WriteCsv(SectionDocument document)
    {
        var rows = new List<IReadOnlyList<object?>>();
        rows.AddRange(Notes.Select(n => new object?[] { n }));
        foreach (var (block, blockRows) in SectionSheetWriter.Blocks(document))
        {
            rows.Add(Array.Empty<object?>());
            rows.Add([block]);
            rows.AddRange(blockRows);
        }
        return CsvText.Write(rows);
    }

    /// <summary>A "notes" sheet, then one sheet per block named after it (each opening with the block-name row).</summary>
    public static byte[] WriteXlsx(SectionDocument document)
    {
        var sheets = new List<SheetGrid> { new("notes", Notes.Select(n => (IReadOnlyList<object?>)new object?[] { n }).ToList()) };
        foreach (var (block, blockRows) in SectionSheetWriter.Blocks(document))
            sheets.Add(new SheetGrid(block, [new object?[] { block }, .. blockRows]));
        return XlsxWorkbook.Write(sheets);
    }
}
