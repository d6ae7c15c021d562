using Seepage.Core.Geometry;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// The hand methods a reviewer uses for a homogeneous embankment on an impervious base, beside the FE discharge:
/// Dupuit's discharge q = k(h1² − h2²)/(2L) for a rectangular section (Dupuit 1863; exact for the discharge: Charny
/// 1951, Polubarinova-Kochina 1962); Kozeny's parabola q = k·y0, y0 = √(d² + h²) − d, with Casagrande's entry point
/// 0.3Δ upstream of where the reservoir meets the upstream face, for a horizontal drain whose upstream end is the focus
/// (Kozeny 1931; Casagrande 1937); and Casagrande's exit point on a downstream slope of angle α ≤ 30° without a drain,
/// a = d/cos α − √(d²/cos²α − h²/sin²α), q = k·a·sin α·tan α (Casagrande, "Seepage through dams", J. New England Water
/// Works Assoc., 1937). h is the reservoir depth above the base, Δ the horizontal projection of the wetted upstream
/// slope, d the horizontal distance from the entry point to the focus (or the toe). An anisotropic soil is taken on
/// the transformed section (x scaled by √(ky/kx), k′ = √(kx·ky)). Each estimate says whether it applies and why not.
/// </summary>
public sealed record EmbankmentHandMethods(double ReservoirDepth, IReadOnlyList<HandEstimate> Estimates)
{
    private const string DupuitSource = "Dupuit 1863; exact for the discharge: Charny 1951, Polubarinova-Kochina, "
        + "Theory of Ground Water Movement, 1962";
    private const string KozenySource = "Kozeny 1931; entry correction 0.3Δ: Casagrande, \"Seepage through dams\", "
        + "J. New England Water Works Assoc., 1937";
    private const string CasagrandeSource = "Casagrande, \"Seepage through dams\", J. New England Water Works Assoc., 1937";

    public static EmbankmentHandMethods For(SectionModel section, double feFlow)
    {
        var g = EmbankmentGeometry.Of(section);
        if (g.Problem is { } why)
            return new(g.Depth, [None("Dupuit", DupuitSource, why), None("Kozeny parabola with toe drain", KozenySource, why),
                None("Casagrande exit point", CasagrandeSource, why)]);
        return new(g.Depth, [Dupuit(g, feFlow), Kozeny(g, feFlow), Casagrande(g, feFlow)]);
    }

    private static HandEstimate None(string method, string source, string why) => new(method, source, false, why, null, null, null);

    private static double? Difference(double q, double fe) => fe > 0 ? q / fe - 1 : null;

    private static HandEstimate Dupuit(EmbankmentGeometry g, double fe)
    {
        if (!g.Rectangular || g.Drain is not null)
            return None("Dupuit", DupuitSource, "applies to a rectangular section (vertical faces) without a drain only.");
        double length = g.ToeX - g.HeelX, h1 = g.Depth, h2 = g.TailwaterDepth;
        double q = g.K * (h1 * h1 - h2 * h2) / (2 * length);
        return new("Dupuit", DupuitSource, true,
            "exact for the discharge of a rectangular dam; its free surface is not exact (it has no seepage face).",
            q, null, Difference(q, fe));
    }

    private static HandEstimate Kozeny(EmbankmentGeometry g, double fe)
    {
        if (g.Drain is not { } focus)
            return None("Kozeny parabola with toe drain", KozenySource, "needs a drain on the base (its upstream end is the focus).");
        if (g.TailwaterDepth > 0)
            return None("Kozeny parabola with toe drain", KozenySource, "does not apply with a tailwater above the base.");
        double d = focus - g.EntryX, h = g.Depth;
        double y0 = Math.Sqrt(d * d + h * h) - d, q = g.K * y0;
        return new("Kozeny parabola with toe drain", KozenySource, true,
            FormattableString.Invariant($"d = {d / g.Scale:F2} m, y0 = {y0:F3} m; the parabola meets the drain y0/2 downstream of its upstream end."),
            q, g.ToSection(focus + y0 / 2, 0), Difference(q, fe));
    }

    private static HandEstimate Casagrande(EmbankmentGeometry g, double fe)
    {
        const string method = "Casagrande exit point";
        if (g.Drain is not null) return None(method, CasagrandeSource, "applies to a downstream slope without a drain.");
        if (g.TailwaterDepth > 0) return None(method, CasagrandeSource, "does not apply with a tailwater above the base.");
        if (g.ToeAngle is not { } alpha) return None(method, CasagrandeSource, "needs a seepage face that reaches the base at the toe.");
        if (alpha > Math.PI / 6 + 1e-9)
            return None(method, CasagrandeSource, FormattableString.Invariant(
                $"the downstream slope is {alpha * 180 / Math.PI:F1}°; the closed form holds for slopes up to 30° (steeper slopes need Casagrande's Δa/(a + Δa) chart)."));
        double d = g.ToeX - g.EntryX, h = g.Depth, c = Math.Cos(alpha), s = Math.Sin(alpha);
        double root = d * d / (c * c) - h * h / (s * s);
        if (root < 0) return None(method, CasagrandeSource, "the slope is too flat for the reservoir depth (no real exit point).");
        double a = d / c - Math.Sqrt(root), q = g.K * a * s * Math.Tan(alpha);
        return new(method, CasagrandeSource, true,
            FormattableString.Invariant($"α = {alpha * 180 / Math.PI:F1}°, d = {d / g.Scale:F2} m, a = {a:F3} m along the slope (transformed section)."),
            q, g.ToSection(g.ToeX - a * c, a * s), Difference(q, fe));
    }
}
