using System.IO.Compression;
using System.Xml;

namespace Seepage.Core.Imports;

/// <summary>
/// Looks through an .xlsx workbook (ECMA-376 SpreadsheetML: a zip of XML parts) before any cell is parsed and refuses one
/// that is larger than <see cref="SpreadsheetLimits"/> allow: more unpacked bytes than the limit (counted while reading, not
/// taken from the zip's own figures), a sheet whose declared range (<c>&lt;dimension ref="A1:XFD1048576"/&gt;</c>), rows or
/// cells go beyond the row or column limit, or a cell (inline or shared string) longer than the cell limit. Each refusal is
/// an <see cref="ImportProblem"/> on the sheet and cell concerned; the XML is read forward only, so the check costs at most
/// the unpacked limit.
/// </summary>
public static class XlsxPreflight
{
    private const string Main = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";

    /// <summary>The problems found (empty when the workbook is within the limits). Throws <see cref="InvalidDataException"/>
    /// when the bytes are not a zip.</summary>
    public static List<ImportProblem> Check(byte[] workbook, SpreadsheetLimits limits, CancellationToken cancellation)
    {
        var problems = new List<ImportProblem>();
        using var zip = new ZipArchive(new MemoryStream(workbook, writable: false), ZipArchiveMode.Read);
        long budget = limits.MaxUnpackedBytes;
        var names = SheetNames(zip);
        foreach (var entry in zip.Entries)
        {
            cancellation.ThrowIfCancellationRequested();
            if (entry.Length > budget)
            {
                problems.Add(new ImportProblem(names.GetValueOrDefault(entry.FullName, ""), 1, 1, Unpacked(limits)));
                return problems;
            }
            using var counted = new CountingStream(entry.Open(), budget);
            string sheet = names.GetValueOrDefault(entry.FullName, "");
            try
            {
                try
                {
                    if (names.ContainsKey(entry.FullName)) ScanSheet(counted, sheet, limits, problems, cancellation);
                    else if (entry.FullName.EndsWith("sharedStrings.xml", StringComparison.OrdinalIgnoreCase))
                        ScanSharedStrings(counted, limits, problems, cancellation);
                }
                catch (XmlException)
                {
                    // Malformed XML is left to the workbook reader, which reports it.
                }
                if (problems.Count > 0) return problems;
                counted.CopyTo(Stream.Null); // the rest of the part still counts
            }
            catch (CountingStream.LimitExceededException)
            {
                problems.Add(new ImportProblem(sheet, 1, 1, Unpacked(limits)));
                return problems;
            }
            budget -= counted.Count;
        }
        return problems;
    }

    private static string Unpacked(SpreadsheetLimits limits) =>
        FormattableString.Invariant($"The workbook unpacks to more than {limits.MaxUnpackedBytes / 1048576.0:0.#} MiB; a section fits in far less. Save only the section's sheets.");

    // Part path (xl/worksheets/sheet1.xml) → sheet name, from xl/workbook.xml and its relationships.
    private static Dictionary<string, string> SheetNames(ZipArchive zip)
    {
        var result = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        var ids = new Dictionary<string, string>();
        var targets = new Dictionary<string, string>();
        if (zip.GetEntry("xl/workbook.xml") is { Length: < 1 << 20 } book)
            foreach (var attributes in Elements(book, "sheet"))
                if (attributes.TryGetValue("id", out var id) && attributes.TryGetValue("name", out var name)) ids[id] = name;
        if (zip.GetEntry("xl/_rels/workbook.xml.rels") is { Length: < 1 << 20 } rels)
            foreach (var attributes in Elements(rels, "Relationship"))
                if (attributes.TryGetValue("Id", out var id) && attributes.TryGetValue("Target", out var target))
                    targets[id] = target.StartsWith('/') ? target[1..] : "xl/" + target;
        foreach (var (id, name) in ids)
            if (targets.TryGetValue(id, out var path)) result[path] = name;
        return result;
    }

    private static List<Dictionary<string, string>> Elements(ZipArchiveEntry entry, string localName)
    {
        var list = new List<Dictionary<string, string>>();
        try
        {
            using var reader = XmlReader.Create(entry.Open(), Settings);
            while (reader.Read())
                if (reader.NodeType == XmlNodeType.Element && reader.LocalName == localName)
                {
                    var attributes = new Dictionary<string, string>();
                    while (reader.MoveToNextAttribute()) attributes[reader.LocalName] = reader.Value;
                    list.Add(attributes);
                }
        }
        catch (XmlException) { }
        return list;
    }

    private static readonly XmlReaderSettings Settings = new()
    {
        DtdProcessing = DtdProcessing.Prohibit, XmlResolver = null, IgnoreWhitespace = true, IgnoreComments = true,
        MaxCharactersInDocument = 0,
    };

    private static void ScanSheet(Stream part, string sheet, SpreadsheetLimits limits, List<ImportProblem> problems,
        CancellationToken cancellation)
    {
        using var reader = XmlReader.Create(part, Settings);
        int rows = 0, currentRow = 0;
        while (reader.Read())
        {
            if (reader.NodeType != XmlNodeType.Element || reader.NamespaceURI != Main) continue;
            switch (reader.LocalName)
            {
                case "dimension" when reader.GetAttribute("ref") is { } range:
                    var (lastRow, lastColumn) = RangeEnd(range);
                    if (lastRow > limits.MaxRows || lastColumn > limits.MaxColumns)
                    {
                        problems.Add(new ImportProblem(sheet, 1, 1, FormattableString.Invariant(
                            $"The sheet declares the range {SafeText.Of(range, 24)} ({lastRow:N0} rows × {lastColumn:N0} columns); at most {limits.MaxRows:N0} rows and {limits.MaxColumns} columns are read. Save only the section's cells.")));
                        return;
                    }
                    break;
                case "row":
                    if (++rows % 1024 == 0) cancellation.ThrowIfCancellationRequested();
                    int row = int.TryParse(reader.GetAttribute("r"), out int r) ? r : rows;
                    currentRow = row;
                    if (row > limits.MaxRows || rows > limits.MaxRows)
                    {
                        problems.Add(new ImportProblem(sheet, Math.Min(row, limits.MaxRows + 1), 1, FormattableString.Invariant(
                            $"The sheet goes beyond row {limits.MaxRows:N0}, the most that is read.")));
                        return;
                    }
                    break;
                case "c" when reader.GetAttribute("r") is { } cell:
                    var (cellRow, column) = RangeEnd(cell);
                    if (column > limits.MaxColumns)
                    {
                        problems.Add(new ImportProblem(sheet, cellRow, limits.MaxColumns, FormattableString.Invariant(
                            $"The sheet has a cell ({SafeText.Of(cell, 12)}) beyond column {CellRef.Letters(limits.MaxColumns)}, the last that is read.")));
                        return;
                    }
                    break;
                case "v" or "t" when TextLength(reader) > limits.MaxCellLength:
                    problems.Add(new ImportProblem(sheet, Math.Max(1, currentRow), 1, FormattableString.Invariant(
                        $"A cell of row {Math.Max(1, currentRow)} holds more than {limits.MaxCellLength:N0} characters, the most one cell may hold.")));
                    return;
            }
        }
    }

    private static void ScanSharedStrings(Stream part, SpreadsheetLimits limits, List<ImportProblem> problems, CancellationToken cancellation)
    {
        using var reader = XmlReader.Create(part, Settings);
        int index = -1;
        long length = 0;
        while (reader.Read())
        {
            if (reader.NodeType == XmlNodeType.Element && reader.LocalName == "si") { index++; length = 0; cancellation.ThrowIfCancellationRequested(); }
            else if (reader.NodeType == XmlNodeType.Element && reader.LocalName == "t" && (length += TextLength(reader)) > limits.MaxCellLength)
            {
                problems.Add(new ImportProblem("", 0, 0, FormattableString.Invariant(
                    $"Shared text number {index + 1} of the workbook holds more than {limits.MaxCellLength:N0} characters, the most one cell may hold.")));
                return;
            }
        }
    }

    // Length of an element's text, read in chunks (never held whole); leaves the reader on the element's end.
    private static long TextLength(XmlReader reader)
    {
        if (reader.IsEmptyElement) return 0;
        long length = 0;
        var buffer = new char[8192];
        while (reader.Read() && reader.NodeType is XmlNodeType.Text or XmlNodeType.CDATA or XmlNodeType.Whitespace
                   or XmlNodeType.SignificantWhitespace)
        {
            int read;
            while ((read = reader.ReadValueChunk(buffer, 0, buffer.Length)) > 0) length += read;
        }
        return length;
    }

    // "A1:XFD1048576" → (1048576, 16384); "C7" → (7, 3).
    private static (int Row, int Column) RangeEnd(string range)
    {
        string end = range[(range.LastIndexOf(':') + 1)..];
        int column = 0, row = 0, i = 0;
        for (; i < end.Length && char.IsAsciiLetter(end[i]) && column < 1 << 24; i++) column = 26 * column + (char.ToUpperInvariant(end[i]) - 'A' + 1);
        for (; i < end.Length && char.IsAsciiDigit(end[i]) && row < 1 << 27; i++) row = 10 * row + (end[i] - '0');
        return (row, column);
    }
}
