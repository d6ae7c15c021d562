using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Core.Imports;

namespace Seepage.Core.Studies;

/// <summary>Reads the alternatives of a study from CSV: a header row whose first cell names the name column and whose
/// other cells are JSON pointers into the section document, then one row per alternative (its name, then the value of each
/// pointer; a blank cell leaves the base value). Numbers, true/false and JSON arrays or objects (e.g. [14,-9]) are read as
/// such, other text as a string. Rows whose first cell starts with '#' and blank rows are skipped.</summary>
public static class StudyCsv
{
    public static IReadOnlyList<StudyAlternative> Read(string csv, List<ImportProblem> problems)
    {
        var grid = CsvText.Read(csv, SectionSpreadsheet.CsvSheet);
        var alternatives = new List<StudyAlternative>();
        int header = -1;
        var pointers = new List<(int Column, string Pointer)>();
        for (int r = 0; r < grid.Rows.Count; r++)
        {
            if (grid.IsBlank(r) || grid.Cell(r, 0) is string s && s.TrimStart().StartsWith('#')) continue;
            var cell = (int j) => new CellRef(grid.Name, r + 1, j + 1);
            if (header < 0)
            {
                header = r;
                for (int j = 1; j < grid.Rows[r].Count; j++)
                {
                    if (SheetGrid.IsBlankCell(grid.Rows[r][j])) continue;
                    string pointer = CsvText.Format(grid.Rows[r][j]).Trim();
                    if (JsonPointer.Tokens(pointer) is not { Count: > 0 })
                        problems.Add(new ImportProblem(cell(j), $"'{SafeText.Of(pointer)}' is not a JSON pointer into the section (RFC 6901), e.g. /cutoffs/1/tip/1."));
                    else if (pointers.FindIndex(p => p.Pointer == pointer) is var first and >= 0)
                        problems.Add(new ImportProblem(cell(j),
                            $"repeats the column {new CellRef(grid.Name, r + 1, pointers[first].Column + 1)} ('{SafeText.Of(pointer)}'); each member is varied in one column."));
                    else if (Sections.SectionContract.CheckPointer(pointer) is { } why)
                        problems.Add(new ImportProblem(cell(j), $"'{SafeText.Of(pointer)}' {why}"));
                    else pointers.Add((j, pointer));
                }
                if (pointers.Count == 0 && problems.Count == 0)
                    problems.Add(new ImportProblem(cell(1), "The header row names no section member to vary; put JSON pointers such as /heads/0/total after the name column."));
                continue;
            }
            string name = CsvText.Format(grid.Cell(r, 0)).Trim();
            if (name.Length == 0) name = $"row {r + 1}";
            var changes = new List<KeyValuePair<string, JsonNode?>>();
            foreach (var (j, pointer) in pointers)
            {
                object? value = grid.Cell(r, j);
                if (SheetGrid.IsBlankCell(value)) continue;
                changes.Add(new(pointer, Value(CsvText.Format(value).Trim())));
            }
            alternatives.Add(new StudyAlternative(name, changes));
        }
        if (header < 0) problems.Add(new ImportProblem(SectionSpreadsheet.CsvSheet, 1, 1, "The CSV is empty; its first row names the varied members (JSON pointers)."));
        return alternatives;
    }

    /// <summary>A cell's value as JSON: a number, true/false, a JSON array, object or quoted string, else the text itself.</summary>
    public static JsonNode? Value(string text)
    {
        if (BlockCells.TryParse(text, out double number) && double.IsFinite(number)) return JsonValue.Create(number);
        if (text is "true" or "false") return JsonValue.Create(text == "true");
        if (text.Length > 0 && text[0] is '[' or '{' or '"')
        {
            try { return JsonNode.Parse(text, documentOptions: new JsonDocumentOptions { AllowDuplicateProperties = false }); }
            catch (JsonException) { }
        }
        return JsonValue.Create(text);
    }
}
