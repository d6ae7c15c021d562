namespace Seepage.Core.Imports;

/// <summary>Finds the blocks of <see cref="SectionSheetLayout"/> on the sheets, reporting rows outside any block and
/// unknown, repeated or missing column names with their cells.</summary>
internal static class SheetBlockScanner
{
    public static List<SheetBlock> Scan(IReadOnlyList<SheetGrid> sheets, List<ImportProblem> problems)
    {
        var blocks = new List<SheetBlock>();
        foreach (var sheet in sheets)
        {
            if (sheet.Name.StartsWith('#') || SectionSheetLayout.Normalise(sheet.Name) == "notes") continue;
            string? implied = SectionSheetLayout.BlockNamed(sheet.Name);
            string? current = null;
            bool expectHeader = false;
            int header = -1;
            Dictionary<string, int> columns = [];
            Dictionary<string, string> units = [];
            List<int> data = [];

            void Close()
            {
                if (current is not null && header >= 0) blocks.Add(new SheetBlock(current, sheet, header, columns, data) { Units = units });
                current = null; header = -1; columns = []; units = []; data = [];
            }

            for (int r = 0; r < sheet.Rows.Count; r++)
            {
                if (sheet.IsBlank(r) || IsComment(sheet.Cell(r, 0))) continue;
                string? named = BlockNameRow(sheet, r);
                if (named is not null)
                {
                    Close();
                    current = named; expectHeader = true;
                    continue;
                }
                if (current is null)
                {
                    if (implied is null)
                    {
                        problems.Add(new ImportProblem(new CellRef(sheet.Name, r + 1, FirstFilled(sheet, r) + 1),
                            "This row is outside any block. Open each block with a row holding only its name in column A (" +
                            string.Join(", ", SectionSheetLayout.Blocks) + ")."));
                        continue;
                    }
                    current = implied; expectHeader = true;
                }
                if (expectHeader)
                {
                    header = r;
                    columns = ReadHeader(sheet, r, current, problems, units);
                    expectHeader = false;
                    continue;
                }
                data.Add(r);
            }
            Close();
        }
        return blocks;
    }

    private static Dictionary<string, int> ReadHeader(SheetGrid sheet, int r, string block, List<ImportProblem> problems,
        Dictionary<string, string> units)
    {
        var columns = new Dictionary<string, int>();
        var row = sheet.Rows[r];
        for (int j = 0; j < row.Count; j++)
        {
            if (SheetGrid.IsBlankCell(row[j])) continue;
            string text = CsvText.Format(row[j]);
            string? column = SectionSheetLayout.ColumnNamed(block, text);
            var cell = new CellRef(sheet.Name, r + 1, j + 1);
            if (column is null)
            {
                string bare = text.Split('(', '[')[0].Trim();
                string near = Sections.NearMatch.Suggestion(bare, SectionSheetLayout.Columns[block]) is { } s ? $" {char.ToUpperInvariant(s[0])}{s[1..]}" : "";
                problems.Add(new ImportProblem(cell, $"'{SafeText.Of(text)}' is not a column of the '{block}' block.{near} Its columns are " +
                    string.Join(", ", SectionSheetLayout.Columns[block]) + "."));
            }
            else if (!columns.TryAdd(column, j))
                problems.Add(new ImportProblem(cell, $"The column '{column}' appears twice in the '{block}' block."));
            else if (HeaderUnits.Of(text) is { } unit) units[column] = unit;
        }
        foreach (string required in SectionSheetLayout.RequiredColumns[block].Where(c => !columns.ContainsKey(c)))
            problems.Add(new ImportProblem(new CellRef(sheet.Name, r + 1, row.Count + 1),
                $"The '{block}' block needs a column named '{required}' in its column-name row."));
        return columns;
    }

    private static string? BlockNameRow(SheetGrid sheet, int r)
    {
        if (sheet.Cell(r, 0) is not string first) return null;
        string? block = SectionSheetLayout.BlockNamed(first);
        if (block is null) return null;
        for (int j = 1; j < sheet.Rows[r].Count; j++)
            if (!SheetGrid.IsBlankCell(sheet.Rows[r][j])) return null;
        return block;
    }

    private static bool IsComment(object? cell) => cell is string s && s.TrimStart().StartsWith('#');

    private static int FirstFilled(SheetGrid sheet, int r)
    {
        for (int j = 0; j < sheet.Rows[r].Count; j++)
            if (!SheetGrid.IsBlankCell(sheet.Rows[r][j])) return j;
        return 0;
    }
}
