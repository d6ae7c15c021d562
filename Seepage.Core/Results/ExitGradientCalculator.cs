using Seepage.Core.Fem;
using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Exit gradient along the exit surface: at each station p with inward unit normal n, the gradient averaged over
/// the depth d is i = (h(p + d·n) − h(p)) / d, the upward gradient where the surface is level. The gradient is
/// singular at cutoff faces and floor corners, so the point value there is mesh-dependent; the averaged value is
/// what is compared with the critical gradient i_c = (Gs − 1)/(1 + e) (or (γsat − γw)/γw) (Terzaghi, "Theoretical Soil
/// Mechanics", 1943: the flotation gradient). Beside it each station carries the gradient of the single element row
/// at the exit, ∇h·n of the boundary triangle at the station, so a reviewer sees how much the averaging matters.
/// The default depth d (<see cref="SectionDefaults.ExitDepth"/>) is set by the section validator and stated in
/// <see cref="ExitResult.Method"/>. On a sloping
/// seepage face n is the inward normal of the face, so the gradient is normal to it; only wetted stations count.
/// </summary>
public static class ExitGradientCalculator
{
    public static ExitResult? Compute(SectionModel section, FieldSampler sampler, MeshBoundary boundary, double tolerance,
        List<string> warnings)
    {
        var exit = section.ExitCheck;
        double d = exit.Depth;
        var stationOf = new PolylineStation(exit.Along);
        var points = new List<(double S, ExitProfilePoint P, int Zone)>();
        foreach (var e in boundary.On(exit.Along, tolerance))
        {
            Point2 a = boundary.Node(e.A), b = boundary.Node(e.B);
            double len = a.DistanceTo(b);
            var inward = new Point2(-(b.Y - a.Y) / len, (b.X - a.X) / len);
            foreach (double t in new[] { 1e-6, 0.5, 1 - 1e-6 })
            {
                var p = a + t * (b - a);
                double? top = sampler.Head(p + (1e-6 * d) * inward);
                double? below = sampler.Head(p + d * inward);
                if (top is null || below is null) continue;
                // In an unconfined section only the wetted part of the exit surface counts: above the exit point of a
                // seepage face the pressure is negative and no water leaves there.
                if (section.Unconfined && top.Value - p.Y < -tolerance) continue;
                double gradient = (below.Value - top.Value) / d;
                var (gx, gy) = sampler.Field.GradientAt(e.Triangle, p);
                double row = gx * inward.X + gy * inward.Y;
                points.Add((stationOf.Of(p), new ExitProfilePoint(p.X, p.Y, gradient, row), sampler.Field.Mesh.Zones[e.Triangle]));
            }
        }
        if (points.Count == 0)
        {
            warnings.Add(section.Unconfined
                ? "Exit gradient: no station of the exit surface is wetted (water leaves elsewhere, e.g. into a drain); no exit check made."
                : "Exit gradient: no station of the exit surface has soil over the averaging depth below it; no exit check made.");
            return null;
        }
        points.Sort((u, v) => u.S.CompareTo(v.S));
        var max = points.MaxBy(p => p.P.Gradient);
        var maxRow = points.MaxBy(p => p.P.RowGradient);
        var soil = section.Soils[section.Zones[max.Zone].Soil];
        double? critical = CriticalGradient(soil, section.WaterUnitWeight);
        if (critical is null)
            warnings.Add($"Exit gradient: soil '{soil.Id}' at the exit has neither specificGravity with voidRatio nor saturatedUnitWeight; the factor against piping is not computed.");
        double? factor = critical is { } ic && max.P.Gradient > 0 ? ic / max.P.Gradient : null;
        bool? pass = factor is { } f ? f >= exit.RequiredFactor : null;
        WarnIfSingular(section, new Point2(max.P.X, max.P.Y), d, warnings);
        string method = FormattableString.Invariant(
            $"upward gradient (h(p + d·n) − h(p))/d averaged over d = {d} m below the exit surface (default {SectionDefaults.ExitDepth} m), n the inward normal; rowGradient: ∇h·n of the single element row at the exit (order {sampler.Field.Order} elements)");
        return new ExitResult(max.P.Gradient, max.P.X, max.P.Y, critical, factor, exit.RequiredFactor, pass, d, method,
            points.Select(p => p.P).ToList(), max.P.RowGradient, maxRow.P.RowGradient, maxRow.P.X, maxRow.P.Y);
    }

    /// <summary>Critical (flotation) gradient of a soil, dimensionless; null without the data.</summary>
    public static double? CriticalGradient(Soil soil, double gammaW)
    {
        if (soil.SpecificGravity is { } gs && soil.VoidRatio is { } e) return (gs - 1) / (1 + e);
        if (soil.SaturatedUnitWeight is { } gsat) return (gsat - gammaW) / gammaW;
        return null;
    }

    private static void WarnIfSingular(SectionModel section, Point2 at, double depth, List<string> warnings)
    {
        // A cutoff's face at the ground is not singular (the wall meets the surface at a right angle), but its tip is.
        foreach (var c in section.Cutoffs)
            if (c.Tip.DistanceTo(at) <= depth * 1.5)
                warnings.Add($"Exit gradient: the maximum sits by the tip of cutoff '{c.Name}', a singular point; the value is the average over the stated depth, not a point value.");
        foreach (var s in section.Structures)
            foreach (var end in new[] { s.Base[0], s.Base[^1] })
                if (end.DistanceTo(at) <= Math.Max(depth, 1e-3 * section.Extent) && section.Cutoffs.All(c => c.Top.DistanceTo(end) > section.MatchTolerance))
                    warnings.Add($"Exit gradient: the maximum sits at the toe of '{s.Name}', a singular corner; the value is the average over the stated depth, not a point value.");
    }
}
