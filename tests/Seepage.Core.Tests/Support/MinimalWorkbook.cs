using System.IO.Compression;
using System.Text;

namespace Seepage.Core.Tests.Support;

/// <summary>Builds .xlsx workbooks by hand (ECMA-376 SpreadsheetML, "Office Open XML File Formats", 2016: a zip of a content
/// types part, relationships, the workbook and one part per sheet), so tests can make the damaged and hostile ones no
/// spreadsheet program would save. Each sheet's data is written by a callback, so a huge part is streamed, never held.</summary>
public static class MinimalWorkbook
{
    public const string Main = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";

    /// <summary>A sheet: its name, the &lt;dimension ref&gt; it declares (null: none) and a writer of its &lt;sheetData&gt; content.</summary>
    public sealed record Sheet(string Name, string? Dimension, Action<TextWriter> Data);

    public static Sheet Of(string name, string sheetData, string? dimension = null) => new(name, dimension, w => w.Write(sheetData));

    public static string Text(string cell, string text) => $"""<c r="{cell}" t="inlineStr"><is><t>{text}</t></is></c>""";

    public static byte[] Build(params Sheet[] sheets)
    {
        using var stream = new MemoryStream();
        using (var zip = new ZipArchive(stream, ZipArchiveMode.Create, leaveOpen: true))
        {
            void Add(string path, Action<TextWriter> write)
            {
                using var writer = new StreamWriter(zip.CreateEntry(path, CompressionLevel.SmallestSize).Open(), new UTF8Encoding(false));
                write(writer);
            }
            const string pkg = "http://schemas.openxmlformats.org/package/2006/";
            const string rel = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
            string overrides = string.Concat(sheets.Select((_, i) =>
                $"""<Override PartName="/xl/worksheets/sheet{i + 1}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>"""));
            Add("[Content_Types].xml", w => w.Write($"""<Types xmlns="{pkg}content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>{overrides}</Types>"""));
            Add("_rels/.rels", w => w.Write($"""<Relationships xmlns="{pkg}relationships"><Relationship Id="rId1" Type="{rel}/officeDocument" Target="xl/workbook.xml"/></Relationships>"""));
            string list = string.Concat(sheets.Select((s, i) => $"""<sheet name="{s.Name}" sheetId="{i + 1}" r:id="rId{i + 1}"/>"""));
            Add("xl/workbook.xml", w => w.Write($"""<workbook xmlns="{Main}" xmlns:r="{rel}"><sheets>{list}</sheets></workbook>"""));
            string rels = string.Concat(sheets.Select((_, i) => $"""<Relationship Id="rId{i + 1}" Type="{rel}/worksheet" Target="worksheets/sheet{i + 1}.xml"/>"""));
            Add("xl/_rels/workbook.xml.rels", w => w.Write($"""<Relationships xmlns="{pkg}relationships">{rels}</Relationships>"""));
            for (int i = 0; i < sheets.Length; i++)
            {
                var sheet = sheets[i];
                Add($"xl/worksheets/sheet{i + 1}.xml", w =>
                {
                    w.Write($"""<worksheet xmlns="{Main}">""");
                    if (sheet.Dimension is { } d) w.Write($"""<dimension ref="{d}"/>""");
                    w.Write("<sheetData>");
                    sheet.Data(w);
                    w.Write("</sheetData></worksheet>");
                });
            }
        }
        return stream.ToArray();
    }
}
