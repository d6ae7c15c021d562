using System.Globalization;

namespace Seepage.Api.Reports;

/// <summary>Number formatting for reports: invariant culture, four significant figures, scientific for small values.</summary>
public static class ReportFormat
{
    public static string N(double? value, int digits = 4)
    {
        if (value is not { } v || !double.IsFinite(v)) return "—";
        if (v == 0) return "0";
        double a = Math.Abs(v);
        if (a < 1e-3 || a >= 1e6) return v.ToString("0.000E+00", CultureInfo.InvariantCulture);
        int decimals = Math.Clamp(digits - 1 - (int)Math.Floor(Math.Log10(a)), 0, 10);
        return Math.Round(v, decimals).ToString("F" + decimals, CultureInfo.InvariantCulture);
    }

    /// <summary>An axis tick label: as short as the value allows, no trailing zeros (5, 2.5, −10, 0.25).</summary>
    public static string Tick(double t)
    {
        if (t == 0) return "0";
        double a = Math.Abs(t);
        if (a < 1e-4 || a >= 1e7) return t.ToString("0.###E+0", CultureInfo.InvariantCulture);
        return Math.Round(t, 6).ToString("0.######", CultureInfo.InvariantCulture).Replace('-', '−');
    }

    public static string Point(double[]? p) => p is { Length: >= 2 } ? $"({N(p[0])}, {N(p[1])})" : "—";

    public static string Verdict(bool? pass) => pass switch { true => "pass", false => "FAIL", null => "not checked" };

    /// <summary>"nice" tick positions covering [lo, hi], about <paramref name="count"/> of them.</summary>
    public static List<double> Ticks(double lo, double hi, int count = 6)
    {
        double span = hi - lo;
        if (!(span > 0)) return [lo];
        double raw = span / count, mag = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double step = new[] { 1.0, 2.0, 2.5, 5.0, 10.0 }.Select(m => m * mag).First(s => s >= raw);
        var ticks = new List<double>();
        for (double t = Math.Ceiling(lo / step) * step; t <= hi + 1e-9 * span; t += step) ticks.Add(Math.Abs(t) < 1e-12 * span ? 0 : t);
        return ticks;
    }
}
