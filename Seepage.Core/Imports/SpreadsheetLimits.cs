namespace Seepage.Core.Imports;

/// <summary>How much of a spreadsheet is read at most, checked before any cell is parsed (a workbook is a zip: a few kB can
/// unpack to gigabytes or declare a million rows). A section's template fills a few dozen rows of at most eight columns.</summary>
public sealed record SpreadsheetLimits
{
    /// <summary>Bytes of all the parts of an .xlsx workbook once unpacked (default 16 MiB).</summary>
    public long MaxUnpackedBytes { get; init; } = 16 * 1024 * 1024;

    /// <summary>Rows of one sheet (default 20,000: a zone outline or a polyline of up to the validator's vertex limit).</summary>
    public int MaxRows { get; init; } = 20_000;

    /// <summary>Columns of one sheet (default 64).</summary>
    public int MaxColumns { get; init; } = 64;

    /// <summary>Characters of one cell (default 4,000: a description paragraph).</summary>
    public int MaxCellLength { get; init; } = 4_000;

    public static readonly SpreadsheetLimits Default = new();

    /// <summary>Adds a problem (and returns false) when a grid as read has more rows or columns, or a longer cell, than allowed.</summary>
    public bool Check(SheetGrid grid, List<ImportProblem> problems)
    {
        if (grid.Rows.Count > MaxRows)
        {
            problems.Add(new ImportProblem(grid.Name, MaxRows + 1, 1, FormattableString.Invariant($"The sheet goes beyond row {MaxRows:N0}, the most that is read.")));
            return false;
        }
        for (int r = 0; r < grid.Rows.Count; r++)
        {
            var row = grid.Rows[r];
            if (row.Count > MaxColumns && !row.Skip(MaxColumns).All(SheetGrid.IsBlankCell))
            {
                problems.Add(new ImportProblem(grid.Name, r + 1, MaxColumns + 1, FormattableString.Invariant(
                    $"The row goes beyond column {CellRef.Letters(MaxColumns)}, the last that is read.")));
                return false;
            }
            for (int j = 0; j < row.Count; j++)
                if (row[j] is string { Length: var length } text && length > MaxCellLength)
                {
                    problems.Add(new ImportProblem(grid.Name, r + 1, j + 1, FormattableString.Invariant(
                        $"The cell holds {length:N0} characters ('{SafeText.Of(text, 24)}'); at most {MaxCellLength:N0} are read.")));
                    return false;
                }
        }
        return true;
    }
}
