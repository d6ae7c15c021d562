using PdfSharp.Fonts;

namespace Seepage.Api.Reports;

/// <summary>Fonts for the PDF reports (PDFsharp needs a font resolver off Windows): a sans-serif TrueType family with a bold
/// face, looked up among the system's fonts (DejaVu Sans, Liberation Sans, Noto Sans, Arial, in that order; Debian package
/// fonts-dejavu-core). The family is registered under <see cref="Family"/>.</summary>
public sealed class ReportFonts : IFontResolver
{
    public const string Family = "SeepageReport";

    private static readonly string[] Folders = ["/usr/share/fonts", "/usr/local/share/fonts", "/Library/Fonts", @"C:\Windows\Fonts"];
    private static readonly (string Regular, string Bold)[] Candidates =
    [
        ("DejaVuSans.ttf", "DejaVuSans-Bold.ttf"), ("LiberationSans-Regular.ttf", "LiberationSans-Bold.ttf"),
        ("NotoSans-Regular.ttf", "NotoSans-Bold.ttf"), ("arial.ttf", "arialbd.ttf"),
    ];
    private static readonly Lazy<(byte[] Regular, byte[] Bold)?> Faces = new(Find);
    private static readonly object Gate = new();

    /// <summary>Whether a usable font was found (without one no PDF can be written).</summary>
    public static bool Available => Faces.Value is not null;

    /// <summary>Installs the resolver once per process.</summary>
    public static void Install()
    {
        lock (Gate)
            if (GlobalFontSettings.FontResolver is not ReportFonts) GlobalFontSettings.FontResolver = new ReportFonts();
    }

    public FontResolverInfo? ResolveTypeface(string familyName, bool bold, bool italic) =>
        new(bold ? Family + "#bold" : Family + "#regular");

    public byte[]? GetFont(string faceName) =>
        Faces.Value is { } f ? (faceName.EndsWith("#bold", StringComparison.Ordinal) ? f.Bold : f.Regular) : null;

    private static (byte[], byte[])? Find()
    {
        var files = Folders.Where(Directory.Exists)
            .SelectMany(d => { try { return Directory.EnumerateFiles(d, "*.ttf", SearchOption.AllDirectories); } catch (IOException) { return []; } catch (UnauthorizedAccessException) { return []; } })
            .GroupBy(Path.GetFileName, StringComparer.OrdinalIgnoreCase).ToDictionary(g => g.Key!, g => g.First(), StringComparer.OrdinalIgnoreCase);
        foreach (var (regular, bold) in Candidates)
            if (files.TryGetValue(regular, out var r))
                return (File.ReadAllBytes(r), File.ReadAllBytes(files.TryGetValue(bold, out var b) ? b : r));
        return null;
    }
}
