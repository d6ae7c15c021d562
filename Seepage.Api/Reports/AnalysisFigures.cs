using Seepage.Api.Contracts;
using Seepage.Core.Sections;

namespace Seepage.Api.Reports;

/// <summary>The figures of an analysis report, built from the stored section, result document and field data.</summary>
public static class AnalysisFigures
{
    private static readonly string[] ZoneFills = ["#f3e7c9", "#dfe8d0", "#e4dcef", "#d8e6ee", "#f0d9d2", "#e8e8e8"];
    public const string Equipotential = "#1f5fbf", FlowLine = "#333333", Wall = "#000000", Head = "#1f8fbf", Drain = "#2a9d4a";
    public const string Phreatic = "#0a3d8f", SeepageFace = "#c2410c";

    /// <summary>The section: zones shaded by soil, structures and cutoffs in black, head boundaries in blue, drains in green.</summary>
    public static Figure Geometry(SectionDocument section, PresentationUnits u)
    {
        var items = Zones(section, shaded: true);
        items.AddRange(Walls(section));
        foreach (var h in section.Heads ?? [])
        {
            items.Add(new FigureItem(Line(h.Along), Head, 3));
            if (h.Along is { Count: > 0 } a)
                items.Add(new FigureItem([new(a.Average(p => p[0]), a.Max(p => p[1]))], Head,
                    Label: $"{h.Name}: h = {ReportFormat.N(u.Length(h.Total))} {u.LengthUnit}"));
        }
        foreach (var d in section.Drains ?? []) items.Add(new FigureItem(Line(d.Along), Drain, 3));
        var legend = new List<LegendEntry> { new(Wall, "structure, cutoff"), new(Head, "fixed total head") };
        if (section.Drains is { Count: > 0 }) legend.Add(new(Drain, "drain"));
        // Soil legend: the fill of each soil that a zone uses.
        var soils = (section.Soils ?? []).Select(s => s.Id).ToList();
        foreach (var id in (section.Zones ?? []).Select(z => z.Soil).Distinct())
            legend.Add(new(ZoneFills[Math.Max(0, soils.IndexOf(id)) % ZoneFills.Length], $"soil {id}"));
        return Scaled(new Figure("x", "elevation y", true, items, legend), u.LengthFactor, u.LengthFactor, u.LengthUnit, u.LengthUnit);
    }

    /// <summary>The flow net: equipotentials at equal head drops and flow lines bounding equal-flow channels.</summary>
    public static Figure FlowNet(SectionDocument section, FieldDto field, PresentationUnits u)
    {
        var items = Zones(section, shaded: false);
        foreach (var e in field.Equipotentials)
            foreach (var path in e.Paths) items.Add(new FigureItem(Points(path), Equipotential, 0.8));
        foreach (var l in field.FlowLines) items.Add(new FigureItem(Points(l.Points), FlowLine, 0.8));
        foreach (var w in field.Walls) items.Add(new FigureItem(Points(w), Wall, 2.5));
        List<LegendEntry> legend = [new(Equipotential, "equipotential"), new(FlowLine, "flow line"), new(Wall, "structure, cutoff")];
        if (field.Unconfined is { } uf) legend.AddRange(UnconfinedMemo.FigureItems(section, uf, items));
        return Scaled(new Figure("x", "elevation y", true, items, legend), u.LengthFactor, u.LengthFactor, u.LengthUnit, u.LengthUnit);
    }

    /// <summary>Pore pressure along each structure base (kPa against x), shaded down to zero.</summary>
    public static Figure Uplift(AnalysisResultDto result, PresentationUnits un)
    {
        var items = new List<FigureItem>();
        var legend = new List<LegendEntry>();
        string[] colors = ["#c0392b", "#8e44ad", "#d35400", "#16a085"];
        for (int i = 0; i < result.Uplift.Count; i++)
        {
            var u = result.Uplift[i];
            string color = colors[i % colors.Length];
            var line = u.Stations.Select(s => new FigurePoint(s.X, s.Pressure)).ToList();
            if (line.Count == 0) continue;
            var area = new List<FigurePoint> { new(line[0].X, 0) };
            area.AddRange(line);
            area.Add(new(line[^1].X, 0));
            items.Add(new FigureItem(area, color, 1.5, Fill: color + "33"));
            legend.Add(new(color, $"{u.Structure}: {ReportFormat.N(un.Force(u.Force))} {un.ForceUnit} at x = " +
                $"{ReportFormat.N(un.Length(u.CentroidX))} {un.LengthUnit}"));
        }
        return Scaled(new Figure("x", "uplift pressure", false, items, legend), un.LengthFactor, un.PressureFactor, un.LengthUnit, un.PressureUnit);
    }

    /// <summary>The averaged upward exit gradient along the exit surface, with the allowable gradient i_c / F_required.</summary>
    public static Figure? ExitProfile(AnalysisResultDto result, PresentationUnits u)
    {
        if (result.Exit is not { Profile.Count: > 0 } exit) return null;
        var line = exit.Profile.Select(p => new FigurePoint(p.X, p.Gradient)).ToList();
        var items = new List<FigureItem> { new(line, "#1f5fbf", 1.5) };
        var legend = new List<LegendEntry>
        {
            new("#1f5fbf", $"exit gradient (averaged over {ReportFormat.N(u.Length(exit.Depth))} {u.LengthUnit})"),
        };
        if (exit is { CriticalGradient: { } ic, AllowableGradient: { } allowable })
        {
            items.Add(new FigureItem([new(line[0].X, allowable), new(line[^1].X, allowable)], "#c0392b", 1.5, Dashed: true));
            legend.Add(new("#c0392b", $"allowable i_c/F = {ReportFormat.N(ic)}/{ReportFormat.N(exit.RequiredFactor)} = {ReportFormat.N(allowable)}", true));
        }
        items.Add(new FigureItem([new(line[0].X, 0)], "#ffffff", 0));   // keep zero in view
        return Scaled(new Figure("x", "upward exit gradient", false, items, legend), u.LengthFactor, 1, u.LengthUnit, "–");
    }

    /// <summary>The figure with its data scaled to the presentation units and the units added to the axis labels.</summary>
    private static Figure Scaled(Figure f, double sx, double sy, string xUnit, string yUnit) => f with
    {
        XLabel = $"{f.XLabel} ({xUnit})",
        YLabel = $"{f.YLabel} ({yUnit})",
        Items = sx == 1 && sy == 1 ? f.Items
            : f.Items.Select(i => i with { Points = i.Points.Select(p => new FigurePoint(p.X * sx, p.Y * sy)).ToList() }).ToList(),
    };

    internal static List<FigureItem> Zones(SectionDocument section, bool shaded)
    {
        var soils = (section.Soils ?? []).Select(s => s.Id).ToList();
        return (section.Zones ?? []).Where(z => z.Outline is { Count: >= 3 }).Select(z =>
        {
            int i = Math.Max(0, soils.IndexOf(z.Soil));
            return new FigureItem(Line(z.Outline), "#777777", 0.7, Fill: shaded ? ZoneFills[i % ZoneFills.Length] : "none");
        }).ToList();
    }

    private static IEnumerable<FigureItem> Walls(SectionDocument section)
    {
        foreach (var s in section.Structures ?? []) yield return new FigureItem(Line(s.Base), Wall, 3);
        foreach (var c in section.Cutoffs ?? [])
        {
            if (c.Top is not { Length: 2 } || c.Tip is not { Length: 2 }) continue;
            if (c.Thickness is > 0 and var t && c.Kx is not null)
            {
                // A permeable wall: its strip, outlined and dashed (water passes through it).
                var wall = new PermeableWall(c.Name ?? "", new(c.Top[0], c.Top[1]), new(c.Tip[0], c.Tip[1]), t, c.Kx.Value);
                var strip = wall.Strip().Select(p => new FigurePoint(p.X, p.Y)).ToList();
                yield return new FigureItem([.. strip, strip[0]], Wall, 1.2, Dashed: true);
            }
            else yield return new FigureItem([new(c.Top[0], c.Top[1]), new(c.Tip[0], c.Tip[1])], Wall, 3);
        }
    }

    internal static List<FigurePoint> Line(List<double[]>? points) =>
        (points ?? []).Where(p => p.Length >= 2).Select(p => new FigurePoint(p[0], p[1])).ToList();

    internal static List<FigurePoint> Points(double[][] points) => points.Where(p => p.Length >= 2).Select(p => new FigurePoint(p[0], p[1])).ToList();
}
