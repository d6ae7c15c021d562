using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Heave at each cutoff by Terzaghi's prism (Terzaghi, "Theoretical Soil Mechanics", 1943): a soil prism beside
/// the wall on its downstream side, depth D from the downstream soil surface to the tip and width D/2. Its
/// submerged weight W′ = γ′·D·D/2 resists the uplift U = γw·h_a·D/2, h_a the average excess head at the prism base
/// over the head at its top, so the factor is W′/U = γ′·D / (γw·h_a). The downstream side is the face with the lower
/// heads, which for a double-wall cofferdam is the excavation side of each wall. The surface is found by walking up
/// from the tip beside the face, so an excavation lower than the wall's top is measured from its own level.
/// </summary>
public static class HeaveCalculator
{
    private const int Samples = 40;

    public static List<HeaveResult> Compute(SectionModel section, FieldSampler sampler, List<string> warnings)
    {
        var results = new List<HeaveResult>();
        double eps = 1e-5 * section.Extent;
        foreach (var c in section.Cutoffs)
        {
            if (c.Top.Y - c.Tip.Y <= 0) { warnings.Add($"Heave: cutoff '{c.Name}' does not point downwards; no prism check."); continue; }
            var mid = 0.5 * (c.Top + c.Tip);
            double? left = sampler.Head(new Point2(mid.X - eps, mid.Y)), right = sampler.Head(new Point2(mid.X + eps, mid.Y));
            if (left is null || right is null) continue;
            int side = right < left ? 1 : -1;
            double x0 = c.Tip.X + side * 2 * eps;
            double? surface = SurfaceAbove(sampler, x0, c.Tip.Y, c.Top.Y - c.Tip.Y, section.Extent);
            if (surface is not { } top) continue;
            double depth = top - c.Tip.Y;
            double width = depth / 2;
            double baseHead = Average(x => sampler.Head(new Point2(x, c.Tip.Y)), c.Tip.X, side, width, eps);
            double topHead = Average(x => sampler.Head(new Point2(x, top - eps)), c.Tip.X, side, width, eps);
            if (double.IsNaN(baseHead) || double.IsNaN(topHead))
            {
                warnings.Add($"Heave: the prism beside cutoff '{c.Name}' leaves the soil; no prism check.");
                continue;
            }
            double excess = baseHead - topHead;
            int t = sampler.Locate(new Point2(c.Tip.X + side * width / 2, 0.5 * (top + c.Tip.Y)));
            var soil = section.Soils[section.Zones[sampler.Field.Mesh.Zones[Math.Max(t, 0)]].Soil];
            double gw = section.WaterUnitWeight;
            double? ic = ExitGradientCalculator.CriticalGradient(soil, gw);
            double? weight = ic * gw * depth * width; // γ′ = i_c·γw
            double uplift = gw * excess * width;
            double? factor = weight is { } w && uplift > 0 ? w / uplift : null;
            if (ic is null) warnings.Add($"Heave: soil '{soil.Id}' beside cutoff '{c.Name}' lacks specificGravity and voidRatio (or saturatedUnitWeight); no factor.");
            // A prism topped by a structure's base is not at an exit: the uplift check governs there. Its factor is shown
            // for information and kept out of the verdict (common practice).
            var under = section.Structures.FirstOrDefault(s =>
                PolygonMath.DistanceToPolyline(new Point2(c.Tip.X + side * width / 2, top), s.Base)
                < section.MatchTolerance);
            string? skipped = under is null ? null
                : $"the prism beside cutoff '{c.Name}' lies under structure '{under.Name}', not at an exit; the factor (structure's weight not counted) is for information and not counted in pass.";
            if (skipped is not null) warnings.Add("Heave: " + skipped);
            bool? pass = factor is { } f && skipped is null ? f >= section.HeaveRequiredFactor : null;
            double from = c.Tip.X, to = c.Tip.X + side * width;
            results.Add(new HeaveResult(c.Name, depth, excess, factor, section.HeaveRequiredFactor, pass, Math.Min(from, to), Math.Max(from, to),
                weight, uplift, top) { Skipped = skipped });
        }
        return results;
    }

    // The soil surface above (x, y): march up in steps of a hundredth of the wall length, then bisect the exit.
    private static double? SurfaceAbove(FieldSampler sampler, double x, double y, double wall, double extent)
    {
        double step = wall / 100, inside = y;
        if (sampler.Locate(new Point2(x, y + 1e-9 * extent)) < 0) return null;
        while (sampler.Locate(new Point2(x, inside + step)) >= 0)
        {
            inside += step;
            if (inside - y > 2 * extent) return null;
        }
        double outside = inside + step;
        for (int k = 0; k < 50 && outside - inside > 1e-9 * extent; k++)
        {
            double m = 0.5 * (inside + outside);
            if (sampler.Locate(new Point2(x, m)) >= 0) inside = m; else outside = m;
        }
        return inside;
    }

    // Mean over the prism width by the midpoint rule, starting just off the wall face.
    private static double Average(Func<double, double?> head, double x0, int side, double width, double eps)
    {
        double sum = 0;
        for (int k = 0; k < Samples; k++)
        {
            double x = x0 + side * (eps + (k + 0.5) / Samples * (width - eps));
            if (head(x) is not { } h) return double.NaN;
            sum += h;
        }
        return sum / Samples;
    }
}
