namespace Seepage.Core.Sections;

/// <summary>Flow-net options of a section: <c>headDrops</c> is Nd, the number of equal head drops between the
/// highest and lowest fixed heads (a whole number 2 … 60; default: chosen so the cells are squares and there are
/// at least four flow channels).</summary>
public sealed record FlowNetDocument
{
    public int? HeadDrops { get; init; }
}

/// <summary>The title block printed at the head of the design memo (every member optional, free text).</summary>
public sealed record TitleBlockDocument
{
    public string? Project { get; init; }
    public string? JobNumber { get; init; }
    public string? PreparedBy { get; init; }
    public string? CheckedBy { get; init; }
    public string? Revision { get; init; }
}
