using Seepage.Core.Sections;
using L = Seepage.Core.Imports.SectionSheetLayout;

namespace Seepage.Core.Imports;

/// <summary>Writes a section document in the blocks of <see cref="SectionSheetLayout"/>: one (block name, rows) pair per
/// block present in the document, the first row being the column names with their units.</summary>
public static class SectionSheetWriter
{
    public static List<(string Block, List<object?[]> Rows)> Blocks(SectionDocument d)
    {
        var blocks = new List<(string, List<object?[]>)>();
        void Add(string block, IEnumerable<object?[]> rows) => blocks.Add((block, [Header(block, d), .. rows]));

        Add(L.Section, [[d.Title, d.Description, d.ConductivityUnit, d.LengthUnit, d.UnitWeightUnit, d.WaterUnitWeight, d.StructureLength,
            d.TruncationCheck, d.Unconfined]]);
        if (d.Soils is { } soils)
            Add(L.Soils, soils.Select(s => new object?[] { s.Id, s.Kx, s.Ky, s.BeddingAngle, s.SpecificGravity, s.VoidRatio, s.SaturatedUnitWeight, s.CreepClass }));
        if (d.Zones is { } zones)
            Add(L.Zones, zones.SelectMany((z, i) => (z.Outline ?? []).Select((p, v) => new object?[]
                { (double)(i + 1), v == 0 ? z.Soil : null, X(p), Y(p), v == 0 ? z.Size : null })));
        if (d.Structures is { } structures)
            Add(L.Structures, structures.SelectMany(s => (s.Base ?? []).Select(p => new object?[] { s.Name, X(p), Y(p) })));
        if (d.Cutoffs is { } cutoffs)
            Add(L.Cutoffs, cutoffs.Select(c => new object?[] { c.Name, X(c.Top), Y(c.Top), X(c.Tip), Y(c.Tip), c.Thickness, c.Kx }));
        if (d.Heads is { } heads)
            Add(L.Heads, heads.SelectMany(h => (h.Along ?? []).Select((p, v) => new object?[] { h.Name, v == 0 ? h.Total : null, X(p), Y(p) })));
        if (d.Drains is { } drains)
            Add(L.Drains, drains.SelectMany(h => (h.Along ?? []).Select(p => new object?[] { h.Name, X(p), Y(p) })));
        if (d.SeepageFaces is { } faces)
            Add(L.SeepageFaces, faces.SelectMany(f => (f.Along ?? []).Select(p => new object?[] { f.Name, X(p), Y(p) })));
        if (d.ExitCheck is not null || d.HeaveCheck is not null)
        {
            var rows = new List<object?[]>();
            if (d.ExitCheck is { } e)
            {
                var along = e.Along is { Count: > 0 } a ? a : [null!];
                rows.AddRange(along.Select((p, v) => new object?[]
                    { "exit", X(p), Y(p), v == 0 ? e.Depth : null, v == 0 ? e.RequiredFactor : null }));
            }
            if (d.HeaveCheck is { } h) rows.Add(["heave", null, null, null, h.RequiredFactor]);
            Add(L.Checks, rows);
        }
        if (d.Mesh is { } m) Add(L.Mesh, [[m.Size, m.MinAngle, m.Order is { } o ? (double)o : null, m.ConvergenceCheck]]);
        if (d.Gauges is { } gauges)
            Add(L.Gauges, gauges.SelectMany(g => (g.Along ?? []).Select(p => new object?[] { g.Name, X(p), Y(p) })));
        return blocks;
    }

    /// <summary>The column names of a block, each followed by its unit in parentheses where it has one (in the units the
    /// section declares).</summary>
    public static object?[] Header(string block, SectionDocument d)
    {
        string length = d.LengthUnit ?? "m", weight = d.UnitWeightUnit ?? "kN/m³";
        return L.Columns[block].Select(c => (object?)(L.Unit(c) switch
        {
            null => c,
            "k" => $"{c} ({d.ConductivityUnit ?? "m/s"})",
            "m" => $"{c} ({length})",
            "m total head" => $"{c} ({length} total head)",
            "kN/m³" => $"{c} ({weight})",
            string unit => $"{c} ({unit})",
        })).ToArray();
    }

    private static object? X(double[]? p) => p is { Length: > 0 } ? p[0] : null;
    private static object? Y(double[]? p) => p is { Length: > 1 } ? p[1] : null;
}
