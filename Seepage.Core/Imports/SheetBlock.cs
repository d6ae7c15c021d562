namespace Seepage.Core.Imports;

/// <summary>One block found on a sheet: its name, the 0-based row of its column names, the 0-based column of each
/// canonical column name it has, and the 0-based rows of its data.</summary>
internal sealed record SheetBlock(string Name, SheetGrid Sheet, int HeaderRow, IReadOnlyDictionary<string, int> Columns,
    IReadOnlyList<int> DataRows)
{
    /// <summary>The unit written in the header of each column that has one (the text in parentheses or brackets).</summary>
    public IReadOnlyDictionary<string, string> Units { get; init; } = new Dictionary<string, string>();

    /// <summary>The cell of a column in a data row (column A when the block lacks that column).</summary>
    public CellRef At(int row, string column) =>
        new(Sheet.Name, row + 1, (Columns.TryGetValue(column, out int j) ? j : 0) + 1);

    public object? Value(int row, string column) => Columns.TryGetValue(column, out int j) ? Sheet.Cell(row, j) : null;
}
