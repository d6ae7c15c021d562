using System.Globalization;

namespace Seepage.Api.Storage;

/// <summary>Doubles stored as the decimal they print as (the shortest text that reads back to the same double: mantissa
/// and power of ten), so values rounded to a few decimals or significant figures take a few bytes and come back bit for
/// bit. A column is written either in fixed point (one exponent, mantissa differences from the previous value: smooth
/// data such as coordinates) or as residuals from a prediction both sides can make (<see cref="FieldPredictors"/>).</summary>
public static class DecimalColumn
{
    private const long NegativeZeroExponent = 100_000;   // no double has this decimal exponent
    private const long Limit = 1L << 53;

    /// <summary>Fixed point when every value fits one exponent, else residuals from zero.</summary>
    public static void WriteSmooth(VarintWriter w, double[] values)
    {
        var parts = values.Select(Decompose).ToArray();
        int e = parts.Length == 0 ? 0 : parts.Min(p => p.Exponent);
        bool fixedPoint = parts.All(p => p.Exponent != NegativeZeroExponent && Scaled(p, e) is not null);
        w.Write(fixedPoint ? 1 : 0);
        if (!fixedPoint) { WritePredicted(w, values, new double[values.Length]); return; }
        w.Write(values.Length);
        w.Write(e);
        long previous = 0;
        foreach (var p in parts) { long m = Scaled(p, e)!.Value; w.Write(m - previous); previous = m; }
    }

    public static double[] ReadSmooth(VarintReader r, int max)
    {
        if (r.Read() == 0) return ReadPredicted(r, i => 0, max);
        var values = new double[r.ReadCount(max)];
        int e = (int)r.Read();
        long m = 0;
        for (int i = 0; i < values.Length; i++) { m += r.Read(); values[i] = Compose(m, e); }
        return values;
    }

    /// <summary>Each value as (mantissa − predicted mantissa at the value's exponent, exponent).</summary>
    public static void WritePredicted(VarintWriter w, double[] values, double[] predictions)
    {
        w.Write(values.Length);
        var parts = values.Select(Decompose).ToArray();
        for (int i = 0; i < parts.Length; i++)                  // exponents first, then residuals: each run compresses well
            w.Write(parts[i].Exponent - Magnitude(predictions[i]));
        for (int i = 0; i < values.Length; i++)
            w.Write(parts[i].Exponent == NegativeZeroExponent ? 0 : parts[i].Mantissa - Predicted(predictions[i], parts[i].Exponent));
    }

    /// <summary>Reads a predicted column; <paramref name="prediction"/> is asked for value i after values 0 … i − 1 are known.</summary>
    public static double[] ReadPredicted(VarintReader r, Func<int, double> prediction, int max, double[]? into = null)
    {
        int n = r.ReadCount(max);
        var values = into ?? new double[n];
        var exponents = new long[n];
        for (int i = 0; i < n; i++) exponents[i] = r.Read();
        for (int i = 0; i < n; i++)
        {
            long e = exponents[i] + Magnitude(prediction(i));
            long residual = r.Read();
            if (e == NegativeZeroExponent) { values[i] = -0.0; continue; }
            if (e < -400 || e > 400) throw new InvalidDataException("Stored field data has an impossible exponent.");
            values[i] = Compose(residual + Predicted(prediction(i), (int)e), (int)e);
        }
        return values;
    }

    /// <summary>The shortest decimal m·10^e that reads back as <paramref name="v"/> (m without trailing zeros).</summary>
    public static (long Mantissa, int Exponent) Decompose(double v)
    {
        if (!double.IsFinite(v)) throw new ArgumentException("Field data must be finite.", nameof(v));
        if (v == 0) return double.IsNegative(v) ? (0, (int)NegativeZeroExponent) : (0, 0);
        string s = v.ToString("R", CultureInfo.InvariantCulture);
        int exp = 0, ePos = s.IndexOfAny(['E', 'e']);
        if (ePos >= 0) { exp = int.Parse(s.AsSpan(ePos + 1), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture); s = s[..ePos]; }
        int dot = s.IndexOf('.');
        if (dot >= 0) { exp -= s.Length - dot - 1; s = s.Remove(dot, 1); }
        long m = long.Parse(s, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
        while (m != 0 && m % 10 == 0) { m /= 10; exp++; }
        return (m, exp);
    }

    /// <summary>The double nearest to m·10^e (what the text would read as).</summary>
    public static double Compose(long m, int e)
    {
        if (m == 0) return 0;
        if (Math.Abs(m) < Limit && e is >= -22 and <= 22)
            return e >= 0 ? m * Exact[e] : m / Exact[-e];      // one correctly rounded operation on exact operands
        return Parse(m, e);
    }

    private static double Parse(long m, int e) =>
        double.Parse(m.ToString(CultureInfo.InvariantCulture) + "E" + e.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static long? Scaled((long Mantissa, int Exponent) p, int e)
    {
        long m = p.Mantissa;
        for (int k = e; k < p.Exponent; k++)
        {
            if (Math.Abs(m) > Limit / 10) return null;
            m *= 10;
        }
        return m;
    }

    // floor(log10 |p|) found by comparison with exact powers of ten (0 outside ±22 or for 0): identical everywhere.
    private static int Magnitude(double p)
    {
        p = Math.Abs(p);
        if (!double.IsFinite(p) || p == 0 || p >= 1e23 || p < 1e-22) return 0;
        int k = 0;
        if (p >= 1) { while (k < 22 && p >= Exact[k + 1]) k++; return k; }
        for (k = 1; k <= 22; k++) if (p * Exact[k] >= 1) return -k;
        return 0;
    }

    // A prediction's mantissa at exponent e; the same arithmetic (exact powers, IEEE operations) on every machine.
    private static long Predicted(double prediction, int e)
    {
        if (!double.IsFinite(prediction) || prediction == 0 || e is < -22 or > 22) return 0;
        double scaled = e >= 0 ? prediction / Exact[e] : prediction * Exact[-e];
        return Math.Abs(scaled) < Limit ? (long)Math.Round(scaled) : 0;
    }

    private static readonly double[] Exact = Enumerable.Range(0, 23).Select(k => double.Parse("1E" + k, CultureInfo.InvariantCulture)).ToArray();
}
