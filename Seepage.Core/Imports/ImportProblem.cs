namespace Seepage.Core.Imports;

/// <summary>One problem found while reading a section from a spreadsheet: the cell concerned (sheet, 1-based row,
/// 1-based column) and a plain-language message. <see cref="Location"/> reads like
/// <c>sheet 'soils' row 4 column C</c>.</summary>
public sealed record ImportProblem(string Sheet, int Row, int Column, string Message)
{
    public ImportProblem(CellRef cell, string message) : this(cell.Sheet, cell.Row, cell.Column, message) { }

    /// <summary>The cell as a spreadsheet user names it; "section" for a problem of the whole section (empty sheet).</summary>
    public string Location => Sheet.Length == 0 ? "section" : new CellRef(Sheet, Row, Column).ToString();
}
