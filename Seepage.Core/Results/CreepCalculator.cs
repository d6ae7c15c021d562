using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Creep checks along the contact path: the structure bases plus both faces of every cutoff. Bligh counts every
/// contact in full; Lane counts contacts steeper than 45° in full and flatter ones one third. Ratio = length / H,
/// H the difference between the highest and lowest fixed heads.
/// </summary>
public static class CreepCalculator
{
    public static CreepResult? Compute(SectionModel section, Soil exitSoil)
    {
        if (section.Heads.Count < 2 || section.Structures.Count == 0 && section.Cutoffs.Count == 0) return null;
        double h = section.Heads.Max(x => x.Total) - section.Heads.Min(x => x.Total);
        if (h <= 0) return null;
        double steep = 0, flat = 0;
        foreach (var s in section.Structures)
            for (int i = 0; i + 1 < s.Base.Count; i++) Add(s.Base[i], s.Base[i + 1], 1);
        foreach (var c in section.Cutoffs) Add(c.Top, c.Tip, 2);
        double bligh = steep + flat, lane = steep + flat / 3;
        string? cls = exitSoil.CreepClass;
        return new CreepResult(Check(lane, h, cls, CreepTables.Lane, CreepTables.LaneSource),
            Check(bligh, h, cls, CreepTables.Bligh, CreepTables.BlighSource));

        void Add(Point2 a, Point2 b, int faces)
        {
            double len = a.DistanceTo(b) * faces;
            if (Math.Abs(b.Y - a.Y) > Math.Abs(b.X - a.X)) steep += len; else flat += len;
        }
    }

    private static CreepCheck Check(double length, double h, string? cls, IReadOnlyDictionary<string, double> table, string source)
    {
        double? required = cls is not null && table.TryGetValue(cls, out var r) ? r : null;
        double ratio = length / h;
        string? skipped = required is not null ? null
            : cls is null ? "the soil at the exit has no creepClass." : $"the table gives no ratio for creepClass '{cls}'.";
        return new CreepCheck(length, ratio, required, required is { } req ? ratio >= req : null, source) { Skipped = skipped };
    }
}
