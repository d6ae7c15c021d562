using System.Text.Json.Nodes;
using Seepage.Core.Imports;
using Seepage.Core.Sections;

namespace Seepage.Core.Tests.Imports;

/// <summary>The shipped example sections and helpers to compare documents.</summary>
internal static class SpreadsheetSupport
{
    public static string ExampleJson(string name = "twin-pile-weir") =>
        File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "examples", name + ".section.json"));

    public static SectionDocument Example(string name = "twin-pile-weir") => SectionParser.Parse(ExampleJson(name), out _)!;

    public static bool SameDocument(SectionDocument a, SectionDocument b) =>
        JsonNode.DeepEquals(JsonNode.Parse(SectionParser.Write(a)), JsonNode.Parse(SectionParser.Write(b)));

    public static string Describe(IEnumerable<ImportProblem> problems) => string.Join("\n", problems.Select(p => $"{p.Location}: {p.Message}"));

    /// <summary>The template CSV with one line replaced (lines counted from 1, as a spreadsheet numbers rows).</summary>
    public static string CsvWithLine(int line, string text)
    {
        var lines = SectionSpreadsheet.WriteCsv(Example()).Split("\r\n").ToList();
        lines[line - 1] = text;
        return string.Join("\r\n", lines);
    }

    /// <summary>The 1-based line of the CSV template that starts with <paramref name="start"/> (after the block named).</summary>
    public static int CsvLine(string block, string start)
    {
        var lines = SectionSpreadsheet.WriteCsv(Example()).Split("\r\n");
        int b = Array.IndexOf(lines, block);
        for (int i = b + 1; i < lines.Length; i++)
            if (lines[i].StartsWith(start, StringComparison.Ordinal)) return i + 1;
        throw new InvalidOperationException($"No line starting with '{start}' after '{block}'.");
    }
}
