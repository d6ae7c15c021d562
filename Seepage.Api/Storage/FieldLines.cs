using Seepage.Api.Contracts;

namespace Seepage.Api.Storage;

/// <summary>The equipotentials and flow lines of stored field data: counts, then every point's x and y as decimal columns
/// (<see cref="DecimalColumn"/>), so polylines of rounded coordinates take a few bytes a point.</summary>
public static class FieldLines
{
    public static void Write(VarintWriter w, IReadOnlyList<EquipotentialDto> equipotentials, IReadOnlyList<FlowLineDto> flowLines)
    {
        var lines = equipotentials.SelectMany(e => e.Paths).Concat(flowLines.Select(f => f.Points)).ToList();
        w.Write(equipotentials.Count);
        foreach (var e in equipotentials) w.Write(e.Paths.Count);
        DecimalColumn.WriteSmooth(w, equipotentials.Select(e => e.Head).ToArray());
        DecimalColumn.WriteSmooth(w, flowLines.Select(f => f.Fraction).ToArray());
        foreach (var line in lines) w.Write(line.Length);
        var points = lines.SelectMany(l => l).ToList();
        if (points.Any(p => p.Length != 2)) throw new ArgumentException("Line points must be [x, y].", nameof(equipotentials));
        DecimalColumn.WriteSmooth(w, points.Select(p => p[0]).ToArray());
        DecimalColumn.WriteSmooth(w, points.Select(p => p[1]).ToArray());
    }

    public static (List<EquipotentialDto>, List<FlowLineDto>) Read(VarintReader r, int max)
    {
        var pathCounts = new int[r.ReadCount(max)];
        for (int i = 0; i < pathCounts.Length; i++) pathCounts[i] = r.ReadCount(max);
        var heads = DecimalColumn.ReadSmooth(r, max);
        var fractions = DecimalColumn.ReadSmooth(r, max);
        if (heads.Length != pathCounts.Length) throw new InvalidDataException("Stored field data has unequal line columns.");
        var lengths = new int[pathCounts.Sum() + fractions.Length];
        for (int i = 0; i < lengths.Length; i++) lengths[i] = r.ReadCount(max);
        var x = DecimalColumn.ReadSmooth(r, max);
        var y = DecimalColumn.ReadSmooth(r, max);
        if (x.Length != y.Length || x.Length != lengths.Sum()) throw new InvalidDataException("Stored field data has unequal line columns.");
        int at = 0, line = 0;
        double[][] Next()
        {
            var points = new double[lengths[line++]][];
            for (int k = 0; k < points.Length; k++, at++) points[k] = [x[at], y[at]];
            return points;
        }
        var equipotentials = new List<EquipotentialDto>();
        for (int i = 0; i < heads.Length; i++)
            equipotentials.Add(new EquipotentialDto(heads[i], Enumerable.Range(0, pathCounts[i]).Select(_ => Next()).ToList()));
        var flowLines = fractions.Select(f => new FlowLineDto(f, Next())).ToList();
        return (equipotentials, flowLines);
    }
}
