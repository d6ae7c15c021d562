namespace Seepage.Core.Imports;

/// <summary>The cells of one sheet as read: row i of <see cref="Rows"/> is spreadsheet row i + 1, cell j of a row is
/// column j + 1. A cell is null (blank), a string, or a double (a numeric cell of a workbook).</summary>
public sealed record SheetGrid(string Name, IReadOnlyList<IReadOnlyList<object?>> Rows)
{
    /// <summary>The cell at 0-based row and column, null when outside the rows read.</summary>
    public object? Cell(int row, int column) =>
        row >= 0 && row < Rows.Count && column >= 0 && column < Rows[row].Count ? Rows[row][column] : null;

    /// <summary>Whether every cell of the row is blank (null or white space).</summary>
    public bool IsBlank(int row) => Rows[row].All(IsBlankCell);

    public static bool IsBlankCell(object? cell) => cell is null || cell is string s && string.IsNullOrWhiteSpace(s);
}
