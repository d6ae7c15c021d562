using System.Text;

namespace Seepage.Core.Imports;

/// <summary>Reads and writes comma-separated text (RFC 4180: fields holding a comma, a quote or a line break are
/// quoted, a quote inside is doubled). Text whose first non-comment line holding a separator has semicolons (and no commas
/// other than decimal commas) is read as semicolon-separated, as spreadsheets set to a decimal-comma locale save it.</summary>
public static class CsvText
{
    /// <summary>Splits <paramref name="text"/> into a grid named <paramref name="sheet"/>; every cell is a string or null.</summary>
    public static SheetGrid Read(string text, string sheet = "csv")
    {
        if (text.Length > 0 && text[0] == '\uFEFF') text = text[1..];
        char delimiter = DetectDelimiter(text);
        var rows = new List<IReadOnlyList<object?>>();
        var row = new List<object?>();
        var field = new StringBuilder();
        bool quoted = false, wasQuoted = false;
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i++; }
                else if (c == '"') quoted = false;
                else field.Append(c);
            }
            else if (c == '"' && field.Length == 0) { quoted = true; wasQuoted = true; }
            else if (c == delimiter) { row.Add(Cell(field, wasQuoted)); wasQuoted = false; }
            else if (c == '\r' || c == '\n')
            {
                if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n') i++;
                row.Add(Cell(field, wasQuoted)); wasQuoted = false;
                rows.Add(row);
                row = [];
            }
            else field.Append(c);
        }
        if (field.Length > 0 || row.Count > 0 || wasQuoted) { row.Add(Cell(field, wasQuoted)); rows.Add(row); }
        return new SheetGrid(sheet, rows);
    }

    /// <summary>Writes the grid as comma-separated text with CRLF line ends; doubles in invariant round-trip form, text that
    /// would start a formula escaped (<see cref="FormulaGuard"/>).</summary>
    public static string Write(IEnumerable<IReadOnlyList<object?>> rows)
    {
        var sb = new StringBuilder();
        foreach (var row in rows)
        {
            int last = row.Count - 1;
            while (last >= 0 && SheetGrid.IsBlankCell(row[last])) last--;
            for (int j = 0; j <= last; j++)
            {
                if (j > 0) sb.Append(',');
                sb.Append(Quote(Format(FormulaGuard.Escape(row[j]))));
            }
            sb.Append("\r\n");
        }
        return sb.ToString();
    }

    /// <summary>The text of a cell: doubles in invariant round-trip form ("R").</summary>
    public static string Format(object? cell) => cell switch
    {
        null => "",
        double d => d.ToString("R", System.Globalization.CultureInfo.InvariantCulture),
        IFormattable f => f.ToString(null, System.Globalization.CultureInfo.InvariantCulture),
        _ => cell.ToString() ?? "",
    };

    private static string Quote(string s) =>
        s.IndexOfAny([',', '"', '\r', '\n']) >= 0 || s != s.Trim() ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;

    private static object? Cell(StringBuilder field, bool quoted)
    {
        string s = FormulaGuard.Unescape(field.ToString());
        field.Clear();
        return s.Length == 0 && !quoted ? null : s;
    }

    // The separator is decided by the block and column-name rows, never by comment rows (first cell starting with '#'),
    // whose prose may hold commas. The first other line holding a comma or a semicolon decides: semicolons with no comma,
    // or with commas only between digits (decimal commas, as in "2,5;3,0"), mean ';'. Block-name rows hold neither.
    private static char DetectDelimiter(string text)
    {
        foreach (string raw in text.Split('\n'))
        {
            string line = raw.TrimStart().TrimStart('"').TrimStart();
            if (line.StartsWith('#')) continue;
            bool comma = line.Contains(','), semicolon = line.Contains(';');
            if (!comma && !semicolon) continue;
            return semicolon && (!comma || OnlyDecimalCommas(line)) ? ';' : ',';
        }
        return ',';
    }

    private static bool OnlyDecimalCommas(string line)
    {
        for (int i = 0; i < line.Length; i++)
            if (line[i] == ',' && (i == 0 || i + 1 >= line.Length || !char.IsAsciiDigit(line[i - 1]) || !char.IsAsciiDigit(line[i + 1])))
                return false;
        return true;
    }
}
