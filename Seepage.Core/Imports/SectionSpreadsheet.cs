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

    public static SheetImport ReadCsv(string text, SpreadsheetLimits? limits = null) => Read([CsvText.Read(text, CsvSheet)], limits);

    /// <summary>Reads a workbook, refusing one beyond <paramref name="limits"/> before any cell is parsed (see
    /// <see cref="XlsxPreflight"/>); throws <see cref="InvalidDataException"/> when the bytes are not an .xlsx workbook.</summary>
    public static SheetImport ReadXlsx(Stream workbook, SpreadsheetLimits? limits = null, CancellationToken cancellation = default)
    {
        limits ??= SpreadsheetLimits.Default;
        using var buffer = new MemoryStream();
        workbook.CopyTo(buffer);
        byte[] bytes = buffer.ToArray();
        List<ImportProblem> problems;
        try { problems = XlsxPreflight.Check(bytes, limits, cancellation); }
        catch (InvalidDataException ex) { throw new InvalidDataException($"The body is not a readable .xlsx workbook: {ex.Message}", ex); }
        return problems.Count > 0 ? new SheetImport(null, problems, new Dictionary<string, CellRef>())
            : Read(XlsxWorkbook.Read(new MemoryStream(bytes), limits, cancellation), limits);
    }

    private static SheetImport Read(IReadOnlyList<SheetGrid> sheets, SpreadsheetLimits? limits)
    {
        var problems = new List<ImportProblem>();
        foreach (var sheet in sheets)
            if (!(limits ?? SpreadsheetLimits.Default).Check(sheet, problems)) return new SheetImport(null, problems, new Dictionary<string, CellRef>());
        return SectionSheetReader.Read(sheets);
    }

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
