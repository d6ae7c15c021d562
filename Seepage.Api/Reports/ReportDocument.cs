namespace Seepage.Api.Reports;

/// <summary>A printable report (design memo) as a list of blocks, written to HTML or PDF by the report writers.</summary>
public sealed record ReportDocument(string Title, string Subtitle, DateTimeOffset Date, string Caution, IReadOnlyList<ReportBlock> Blocks);

/// <summary>One block of a report.</summary>
public abstract record ReportBlock;

/// <summary>A section heading.</summary>
public sealed record ReportHeading(string Text) : ReportBlock;

/// <summary>A paragraph of plain text.</summary>
public sealed record ReportParagraph(string Text) : ReportBlock;

/// <summary>A bulleted list.</summary>
public sealed record ReportList(IReadOnlyList<string> Items) : ReportBlock;

/// <summary>A table: caption, column headings (with units) and rows of cell text.</summary>
public sealed record ReportTable(string Caption, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows) : ReportBlock;

/// <summary>A numbered figure with its caption.</summary>
public sealed record ReportFigure(string Caption, Figure Figure) : ReportBlock;
