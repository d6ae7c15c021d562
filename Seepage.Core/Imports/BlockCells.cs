using System.Globalization;

namespace Seepage.Core.Imports;

/// <summary>Reads typed values from the cells of blocks, reporting each unreadable cell, and records which cell each
/// JSON pointer of the section document came from.</summary>
internal sealed class BlockCells(List<ImportProblem> problems)
{
    public Dictionary<string, CellRef> Map { get; } = new(StringComparer.Ordinal);

    public List<ImportProblem> Problems => problems;

    /// <summary>Factors from the units in column headers to the section's units (see <see cref="HeaderUnits"/>).</summary>
    public Dictionary<(SheetBlock, string), double> Factors { get; set; } = [];

    /// <summary>Every block of the workbook (the header units of all of them are checked against the section's units).</summary>
    public IReadOnlyList<SheetBlock> Blocks { get; set; } = [];

    /// <summary>Notes that <paramref name="pointer"/> came from the cell of <paramref name="column"/> in <paramref name="row"/>.</summary>
    public void Mark(string pointer, SheetBlock block, int row, string column) => Map.TryAdd(pointer, block.At(row, column));

    /// <summary>The cell's text, trimmed; null when blank.</summary>
    public string? Text(SheetBlock block, int row, string column, string? pointer = null)
    {
        object? value = block.Value(row, column);
        if (SheetGrid.IsBlankCell(value)) return null;
        if (pointer is not null) Mark(pointer, block, row, column);
        return CsvText.Format(value).Trim();
    }

    /// <summary>The cell's yes/no value (true/false, yes/no, 1/0, any case); null when blank, a problem when unreadable.</summary>
    public bool? Flag(SheetBlock block, int row, string column, string pointer)
    {
        object? value = block.Value(row, column);
        Mark(pointer, block, row, column);
        if (SheetGrid.IsBlankCell(value)) return null;
        if (value is bool b) return b;
        if (value is double d && (d == 0 || d == 1)) return d == 1;
        switch (CsvText.Format(value).Trim().ToLowerInvariant())
        {
            case "true" or "yes" or "1": return true;
            case "false" or "no" or "0": return false;
        }
        problems.Add(new ImportProblem(block.At(row, column), $"'{SafeText.Of(CsvText.Format(value))}' is not a yes/no value (the '{column}' column takes true or false)."));
        return null;
    }

    /// <summary>The cell's number; null when blank (a problem when <paramref name="required"/>) or unreadable (a problem).</summary>
    public double? Number(SheetBlock block, int row, string column, string? pointer = null, bool required = false)
    {
        object? value = block.Value(row, column);
        if (pointer is not null) Mark(pointer, block, row, column);
        if (SheetGrid.IsBlankCell(value))
        {
            if (required) problems.Add(new ImportProblem(block.At(row, column), $"The '{column}' cell is empty; a number is needed."));
            return null;
        }
        double number;
        if (value is double d) number = d;
        else if (!TryParse(CsvText.Format(value).Trim(), out number))
        {
            problems.Add(new ImportProblem(block.At(row, column),
                $"'{SafeText.Of(CsvText.Format(value))}' is not a number (the '{column}' column takes numbers such as 2.5 or 3e-4)."));
            return null;
        }
        if (!double.IsFinite(number))
        {
            problems.Add(new ImportProblem(block.At(row, column), $"The '{column}' cell must hold a finite number."));
            return null;
        }
        return Factors.TryGetValue((block, column), out double factor) ? number * factor : number;
    }

    /// <summary>Reads invariant numbers ("2.5", "3e-4") and, failing that, a single decimal comma ("2,5").</summary>
    public static bool TryParse(string text, out double value)
    {
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value)) return true;
        return text.Count(c => c == ',') == 1 && !text.Contains('.') &&
            double.TryParse(text.Replace(',', '.'), NumberStyles.Float, CultureInfo.InvariantCulture, out value);
    }

    /// <summary>Groups the data rows by a key column (rows with the same key form one item, in order of first appearance);
    /// rows with a blank key are reported.</summary>
    public List<(string Key, List<int> Rows)> Group(SheetBlock block, string keyColumn)
    {
        var groups = new List<(string Key, List<int> Rows)>();
        foreach (int r in block.DataRows)
        {
            string? key = Text(block, r, keyColumn);
            if (key is null)
            {
                problems.Add(new ImportProblem(block.At(r, keyColumn), $"The '{keyColumn}' cell is empty; it names the item this row belongs to."));
                continue;
            }
            int i = groups.FindIndex(g => g.Key == key);
            if (i < 0) groups.Add((key, [r]));
            else groups[i].Rows.Add(r);
        }
        return groups;
    }

    /// <summary>Reads a polyline: one vertex (x, y) per row; pointers <c>{pointer}/{k}</c> for each vertex.</summary>
    public List<double[]> Vertices(SheetBlock block, IReadOnlyList<int> rows, string pointer)
    {
        var points = new List<double[]>();
        if (rows.Count > 0) Mark(pointer, block, rows[0], "x");
        foreach (int r in rows)
        {
            string p = $"{pointer}/{points.Count}";
            double? x = Number(block, r, "x", p + "/0", required: true);
            double? y = Number(block, r, "y", p + "/1", required: true);
            Mark(p, block, r, "x");
            if (x is { } vx && y is { } vy) points.Add([vx, vy]);
        }
        return points;
    }

    /// <summary>The first non-blank value of a column over the rows of an item, reporting later cells that differ.</summary>
    public object? Shared(SheetBlock block, IReadOnlyList<int> rows, string column, string pointer, Func<int, object?> read)
    {
        object? first = null;
        int firstRow = -1;
        foreach (int r in rows)
        {
            if (SheetGrid.IsBlankCell(block.Value(r, column))) continue;
            object? value = read(r);
            if (value is null) continue;
            if (first is null) { first = value; firstRow = r; Mark(pointer, block, r, column); }
            else if (!Equals(first, value))
                problems.Add(new ImportProblem(block.At(r, column),
                    $"'{SafeText.Of(CsvText.Format(block.Value(r, column)))}' differs from the '{column}' given in row {firstRow + 1} for the same item; leave it blank or repeat the same value."));
        }
        return first;
    }
}
