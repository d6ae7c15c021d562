using Seepage.Core.Sections;

namespace Seepage.Core.Imports;

/// <summary>What reading a spreadsheet gave: the section document (null when any cell could not be read), the problems
/// with their cells, and the cell each JSON pointer of the document came from.</summary>
public sealed record SheetImport(SectionDocument? Document, IReadOnlyList<ImportProblem> Problems, IReadOnlyDictionary<string, CellRef> Cells)
{
    /// <summary>The cell a JSON pointer of the document came from: the pointer itself or its nearest parent that came from a
    /// cell (so <c>/zones/0/outline</c> names the zone's first vertex row); null when no cell gave it.</summary>
    public CellRef? Locate(string pointer)
    {
        for (string p = pointer; ; p = p[..p.LastIndexOf('/')])
        {
            if (Cells.TryGetValue(p, out var cell)) return cell;
            if (p.Length == 0 || p.LastIndexOf('/') < 0) return null;
        }
    }

    /// <summary>Validator problems placed on the cells they concern; a problem no cell gave keeps sheet "" (the whole
    /// section) with its pointer in the message.</summary>
    public IReadOnlyList<ImportProblem> Place(IEnumerable<SectionProblem> problems) =>
        problems.Select(p => Locate(p.Pointer) is { } cell
            ? new ImportProblem(cell, $"{p.Message} ({(p.Pointer.Length == 0 ? "section" : p.Pointer)})")
            : new ImportProblem("", 0, 0, $"{(p.Pointer.Length == 0 ? "" : p.Pointer + ": ")}{p.Message}")).ToList();
}
