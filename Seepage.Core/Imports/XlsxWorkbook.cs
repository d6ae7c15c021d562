using MiniExcelLibs;

namespace Seepage.Core.Imports;

/// <summary>Reads and writes .xlsx workbooks as grids (MiniExcel). Numeric cells come back as doubles, text as strings.</summary>
public static class XlsxWorkbook
{
    /// <summary>Reads every sheet, at most <see cref="SpreadsheetLimits.MaxRows"/> + 1 rows and
    /// <see cref="SpreadsheetLimits.MaxColumns"/> + 1 columns of each (the one beyond is kept so the limit check can name it).
    /// Throws <see cref="InvalidDataException"/> when the bytes are not an xlsx workbook.</summary>
    public static IReadOnlyList<SheetGrid> Read(Stream stream, SpreadsheetLimits? limits = null, CancellationToken cancellation = default)
    {
        limits ??= SpreadsheetLimits.Default;
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        try
        {
            buffer.Position = 0;
            var names = MiniExcel.GetSheetNames(buffer);
            var sheets = new List<SheetGrid>();
            foreach (string name in names)
            {
                buffer.Position = 0;
                var rows = new List<IReadOnlyList<object?>>();
                foreach (IDictionary<string, object?> row in MiniExcel.Query(buffer, useHeaderRow: false, sheetName: name))
                {
                    cancellation.ThrowIfCancellationRequested();
                    if (rows.Count > limits.MaxRows) break;
                    var cells = new List<object?>();
                    foreach (var (key, value) in row)
                    {
                        int column = ColumnNumber(key);
                        if (column > limits.MaxColumns + 1) continue;
                        while (cells.Count < column) cells.Add(null);
                        cells[column - 1] = Normalise(value);
                    }
                    rows.Add(cells);
                }
                sheets.Add(new SheetGrid(name, rows));
            }
            return sheets;
        }
        catch (Exception ex) when (ex is not InvalidDataException and not OutOfMemoryException and not OperationCanceledException)
        {
            throw new InvalidDataException($"The body is not a readable .xlsx workbook: {ex.Message}", ex);
        }
    }

    /// <summary>Writes the sheets (in order) to a new workbook; doubles become numeric cells.</summary>
    public static byte[] Write(IEnumerable<SheetGrid> sheets)
    {
        var book = new Dictionary<string, object>();
        foreach (var sheet in sheets)
        {
            int width = Math.Max(1, sheet.Rows.Count == 0 ? 1 : sheet.Rows.Max(r => r.Count));
            var rows = sheet.Rows.Select(r =>
            {
                IDictionary<string, object?> row = new Dictionary<string, object?>();
                for (int j = 0; j < width; j++) row[CellRef.Letters(j + 1)] = j < r.Count ? FormulaGuard.Escape(r[j]) : null;
                return row;
            }).ToList();
            book[sheet.Name] = rows;
        }
        using var stream = new MemoryStream();
        MiniExcel.SaveAs(stream, book, printHeader: false);
        return stream.ToArray();
    }

    private static object? Normalise(object? value) => value switch
    {
        null => null,
        string s => FormulaGuard.Unescape(s),
        double d => d,
        float f => (double)f,
        int or long or decimal or short => Convert.ToDouble(value, System.Globalization.CultureInfo.InvariantCulture),
        bool b => b ? "true" : "false",
        DateTime t => t.ToString("s", System.Globalization.CultureInfo.InvariantCulture),
        _ => Convert.ToString(value, System.Globalization.CultureInfo.InvariantCulture),
    };

    private static int ColumnNumber(string letters)
    {
        int n = 0;
        foreach (char c in letters.ToUpperInvariant())
            if (c is >= 'A' and <= 'Z') n = 26 * n + (c - 'A' + 1);
        return Math.Max(1, n);
    }
}
