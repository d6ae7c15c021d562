using Seepage.Core.Sections;
using L = Seepage.Core.Imports.SectionSheetLayout;

namespace Seepage.Core.Imports;

/// <summary>Builds a <see cref="SectionDocument"/> from the blocks of <see cref="SectionSheetLayout"/> on one or more sheets.
/// Every unreadable cell is reported with its sheet, row and column; the physics is left to <see cref="SectionValidator"/>,
/// whose JSON pointers <see cref="SheetImport.Locate"/> turns back into cells.</summary>
public static class SectionSheetReader
{
    public static SheetImport Read(IReadOnlyList<SheetGrid> sheets)
    {
        var problems = new List<ImportProblem>();
        var blocks = SheetBlockScanner.Scan(sheets, problems);
        var cells = new BlockCells(problems);
        string firstSheet = sheets.Count > 0 ? sheets[0].Name : "csv";
        foreach (string required in L.RequiredBlocks.Where(b => blocks.All(x => x.Name != b)))
            problems.Add(new ImportProblem(firstSheet, 1, 1, $"No '{required}' block was found; a section needs one (see the template)."));

        List<SheetBlock> Of(string name) => blocks.Where(b => b.Name == name).ToList();
        var doc = new SectionDocument();
        cells.Blocks = blocks;
        if (Of(L.Section).Count == 0) cells.Factors = HeaderUnits.Factors(blocks, doc, problems);
        foreach (var b in Of(L.Section)) doc = ReadSection(doc, b, cells);
        doc = doc with
        {
            Soils = Any(Of(L.Soils), bs => bs.SelectMany(b => b.DataRows.Select(r => (b, r))).Select((x, i) => Soil(x.b, x.r, i, cells)).ToList()),
            Zones = Any(Of(L.Zones), bs => Zones(bs, cells)),
            Structures = Any(Of(L.Structures), bs => Lines(bs, "name", cells).Select((g, i) => new StructureDocument
            {
                Name = g.Key, Base = cells.Vertices(g.Block, g.Rows, $"/structures/{i}/base"),
            }).ToList()),
            Cutoffs = Any(Of(L.Cutoffs), bs => bs.SelectMany(b => b.DataRows.Select(r => (b, r))).Select((x, i) => Cutoff(x.b, x.r, i, cells)).ToList()),
            Heads = Any(Of(L.Heads), bs => Lines(bs, "name", cells).Select((g, i) => new HeadDocument
            {
                Name = g.Key,
                Along = cells.Vertices(g.Block, g.Rows, $"/heads/{i}/along"),
                Total = (double?)cells.Shared(g.Block, g.Rows, "total", $"/heads/{i}/total", r => cells.Number(g.Block, r, "total")),
            }).ToList()),
            Drains = Any(Of(L.Drains), bs => Lines(bs, "name", cells).Select((g, i) => new DrainDocument
            {
                Name = g.Key, Along = cells.Vertices(g.Block, g.Rows, $"/drains/{i}/along"),
            }).ToList()),
            SeepageFaces = Any(Of(L.SeepageFaces), bs => Lines(bs, "name", cells).Select((g, i) => new SeepageFaceDocument
            {
                Name = g.Key, Along = cells.Vertices(g.Block, g.Rows, $"/seepageFaces/{i}/along"),
            }).ToList()),
            Gauges = Any(Of(L.Gauges), bs => Lines(bs, "name", cells).Select((g, i) => new GaugeDocument
            {
                Name = g.Key, Along = cells.Vertices(g.Block, g.Rows, $"/gauges/{i}/along"),
            }).ToList()),
        };
        foreach (var b in Of(L.Checks)) doc = ReadChecks(doc, b, cells);
        foreach (var b in Of(L.Mesh))
            foreach (int r in OneRow(b, problems))
                doc = doc with
                {
                    Mesh = new MeshDocument
                    {
                        Size = cells.Number(b, r, "size", "/mesh/size"),
                        MinAngle = cells.Number(b, r, "minAngle", "/mesh/minAngle"),
                        Order = cells.Number(b, r, "order", "/mesh/order") is { } o ? (int)Math.Round(o) : null,
                        ConvergenceCheck = cells.Flag(b, r, "convergenceCheck", "/mesh/convergenceCheck"),
                    },
                };
        return new SheetImport(problems.Count == 0 ? doc : null, problems, cells.Map);
    }

    private static List<T>? Any<T>(List<SheetBlock> blocks, Func<List<SheetBlock>, List<T>> read) => blocks.Count == 0 ? null : read(blocks);

    // The section's units are read first: the units in the column headers are converted to them.
    private static SectionDocument ReadSection(SectionDocument doc, SheetBlock b, BlockCells cells)
    {
        foreach (int r in OneRow(b, cells.Problems))
        {
            doc = doc with
            {
                Title = cells.Text(b, r, "title", "/title"),
                Description = cells.Text(b, r, "description", "/description"),
                ConductivityUnit = cells.Text(b, r, "conductivityUnit", "/conductivityUnit"),
                LengthUnit = cells.Text(b, r, "lengthUnit", "/lengthUnit"),
                UnitWeightUnit = cells.Text(b, r, "unitWeightUnit", "/unitWeightUnit"),
            };
            cells.Factors = HeaderUnits.Factors(cells.Blocks, doc, cells.Problems);
            doc = doc with
            {
                WaterUnitWeight = cells.Number(b, r, "waterUnitWeight", "/waterUnitWeight"),
                StructureLength = cells.Number(b, r, "structureLength", "/structureLength"),
                TruncationCheck = cells.Flag(b, r, "truncationCheck", "/truncationCheck"),
                Unconfined = cells.Flag(b, r, "unconfined", "/unconfined"),
            };
        }
        return doc;
    }

    private static SoilDocument Soil(SheetBlock b, int r, int i, BlockCells cells)
    {
        string p = $"/soils/{i}";
        cells.Mark(p, b, r, "id");
        return new SoilDocument
        {
            Id = cells.Text(b, r, "id", p + "/id"),
            Kx = cells.Number(b, r, "kx", p + "/kx", required: true),
            Ky = cells.Number(b, r, "ky", p + "/ky"),
            BeddingAngle = cells.Number(b, r, "beddingAngle", p + "/beddingAngle"),
            SpecificGravity = cells.Number(b, r, "specificGravity", p + "/specificGravity"),
            VoidRatio = cells.Number(b, r, "voidRatio", p + "/voidRatio"),
            SaturatedUnitWeight = cells.Number(b, r, "saturatedUnitWeight", p + "/saturatedUnitWeight"),
            CreepClass = cells.Text(b, r, "creepClass", p + "/creepClass"),
        };
    }

    private static List<ZoneDocument> Zones(List<SheetBlock> blocks, BlockCells cells) =>
        Lines(blocks, "zone", cells).Select((g, i) =>
        {
            string p = $"/zones/{i}";
            cells.Mark(p, g.Block, g.Rows[0], "zone");
            return new ZoneDocument
            {
                Soil = (string?)cells.Shared(g.Block, g.Rows, "soil", p + "/soil", r => cells.Text(g.Block, r, "soil")),
                Outline = cells.Vertices(g.Block, g.Rows, p + "/outline"),
                Size = (double?)cells.Shared(g.Block, g.Rows, "size", p + "/size", r => cells.Number(g.Block, r, "size")),
            };
        }).ToList();

    private static CutoffDocument Cutoff(SheetBlock b, int r, int i, BlockCells cells)
    {
        string p = $"/cutoffs/{i}";
        cells.Mark(p, b, r, "name");
        cells.Mark(p + "/top", b, r, "topX");
        cells.Mark(p + "/tip", b, r, "tipX");
        double? tx = cells.Number(b, r, "topX", p + "/top/0", true), ty = cells.Number(b, r, "topY", p + "/top/1", true);
        double? px = cells.Number(b, r, "tipX", p + "/tip/0", true), py = cells.Number(b, r, "tipY", p + "/tip/1", true);
        return new CutoffDocument
        {
            Name = cells.Text(b, r, "name", p + "/name"),
            Top = tx is { } a && ty is { } c ? [a, c] : null,
            Tip = px is { } e && py is { } f ? [e, f] : null,
            Thickness = cells.Number(b, r, "thickness", p + "/thickness"),
            Kx = cells.Number(b, r, "kx", p + "/kx"),
        };
    }

    private static SectionDocument ReadChecks(SectionDocument doc, SheetBlock b, BlockCells cells)
    {
        foreach (var (kind, rows) in cells.Group(b, "check"))
        {
            switch (SectionSheetLayout.Normalise(kind))
            {
                case "exit":
                    var along = rows.Where(r => !SheetGrid.IsBlankCell(b.Value(r, "x")) || !SheetGrid.IsBlankCell(b.Value(r, "y"))).ToList();
                    doc = doc with
                    {
                        ExitCheck = new ExitCheckDocument
                        {
                            Along = along.Count == 0 ? null : cells.Vertices(b, along, "/exitCheck/along"),
                            Depth = (double?)cells.Shared(b, rows, "depth", "/exitCheck/depth", r => cells.Number(b, r, "depth")),
                            RequiredFactor = (double?)cells.Shared(b, rows, "requiredFactor", "/exitCheck/requiredFactor",
                                r => cells.Number(b, r, "requiredFactor")),
                        },
                    };
                    cells.Mark("/exitCheck", b, rows[0], "check");
                    break;
                case "heave":
                    doc = doc with
                    {
                        HeaveCheck = new HeaveCheckDocument
                        {
                            RequiredFactor = (double?)cells.Shared(b, rows, "requiredFactor", "/heaveCheck/requiredFactor",
                                r => cells.Number(b, r, "requiredFactor")),
                        },
                    };
                    cells.Mark("/heaveCheck", b, rows[0], "check");
                    break;
                default:
                    cells.Problems.Add(new ImportProblem(b.At(rows[0], "check"), $"'{SafeText.Of(kind)}' is not a check; use 'exit' or 'heave'."));
                    break;
            }
        }
        return doc;
    }

    // Rows of one item per key (zone number, name), across every block of that kind.
    private static List<(string Key, SheetBlock Block, List<int> Rows)> Lines(List<SheetBlock> blocks, string key, BlockCells cells) =>
        blocks.SelectMany(b => cells.Group(b, key).Select(g => (g.Key, b, g.Rows))).ToList();

    private static IEnumerable<int> OneRow(SheetBlock b, List<ImportProblem> problems)
    {
        foreach (int extra in b.DataRows.Skip(1))
            problems.Add(new ImportProblem(b.At(extra, b.Columns.Keys.FirstOrDefault() ?? ""), $"The '{b.Name}' block takes one row of values; this row is extra."));
        return b.DataRows.Take(1);
    }
}
