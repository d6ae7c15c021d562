namespace Seepage.Core.Imports;

/// <summary>A cell of a spreadsheet: sheet name, row number (1-based, as the spreadsheet shows it) and column
/// number (1-based; 1 = column A).</summary>
public sealed record CellRef(string Sheet, int Row, int Column)
{
    /// <summary>The column's letters as a spreadsheet shows them: 1 → A, 26 → Z, 27 → AA.</summary>
    public string ColumnLetters => Letters(Column);

    /// <summary>Reads like <c>sheet 'soils' row 4 column C</c>; this is also the key of the API's problem details.</summary>
    public override string ToString() => $"sheet '{Sheet}' row {Row} column {ColumnLetters}";

    public static string Letters(int column)
    {
        if (column < 1) return "?";
        var letters = new System.Text.StringBuilder();
        for (int c = column; c > 0; c = (c - 1) / 26) letters.Insert(0, (char)('A' + (c - 1) % 26));
        return letters.ToString();
    }
}
