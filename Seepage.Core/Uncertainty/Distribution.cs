using MathNet.Numerics.Distributions;

namespace Seepage.Core.Uncertainty;

/// <summary>The kinds of distribution a random variable may follow.</summary>
public enum DistributionKind { Lognormal, Normal, Uniform }

/// <summary>
/// The distribution of one random variable, in the unit of the member it varies (conductivity in the section's
/// <c>conductivityUnit</c>, heads in m of total head). Lognormal: ln X is normal with mean ln(median) and standard deviation
/// σ_ln = √ln(1 + cov²), so mean = median·exp(σ_ln²/2) and sd = cov·mean (Baecher &amp; Christian, "Reliability and Statistics
/// in Geotechnical Engineering", 2003, ch. 3). Normal: mean and sd. Uniform: from Low to High.
/// </summary>
/// <param name="Kind">Which family.</param>
/// <param name="Location">Lognormal: ln(median); normal: mean; uniform: lower bound.</param>
/// <param name="Scale">Lognormal: σ_ln; normal: standard deviation; uniform: upper bound.</param>
public sealed record Distribution(DistributionKind Kind, double Location, double Scale)
{
    /// <summary>Φ⁻¹(0.95) = 1.6448536…, the standard normal 95 % point.</summary>
    public static readonly double Z95 = Normal.InvCDF(0, 1, 0.95);

    /// <summary>Lognormal from its median and coefficient of variation (sd / mean).</summary>
    public static Distribution LognormalOfMedian(double median, double cov) =>
        new(DistributionKind.Lognormal, Math.Log(median), Math.Sqrt(Math.Log(1 + cov * cov)));

    /// <summary>Lognormal whose 5 % and 95 % points are <paramref name="p05"/> and <paramref name="p95"/>.</summary>
    public static Distribution LognormalOfRange(double p05, double p95) =>
        new(DistributionKind.Lognormal, 0.5 * (Math.Log(p05) + Math.Log(p95)), (Math.Log(p95) - Math.Log(p05)) / (2 * Z95));

    /// <summary>Normal with the given mean and standard deviation.</summary>
    public static Distribution NormalOf(double mean, double sd) => new(DistributionKind.Normal, mean, sd);

    /// <summary>Normal whose 5 % and 95 % points are the given values.</summary>
    public static Distribution NormalOfRange(double p05, double p95) => new(DistributionKind.Normal, 0.5 * (p05 + p95), (p95 - p05) / (2 * Z95));

    /// <summary>Uniform between the two values.</summary>
    public static Distribution UniformOf(double low, double high) => new(DistributionKind.Uniform, low, high);

    /// <summary>The value with non-exceedance probability <paramref name="u"/> in (0, 1).</summary>
    public double Quantile(double u) => Kind switch
    {
        DistributionKind.Lognormal => Math.Exp(Location + Scale * Normal.InvCDF(0, 1, u)),
        DistributionKind.Normal => Location + Scale * Normal.InvCDF(0, 1, u),
        _ => Location + u * (Scale - Location),
    };

    /// <summary>The mean of the variable.</summary>
    public double Mean => Kind switch
    {
        DistributionKind.Lognormal => Math.Exp(Location + 0.5 * Scale * Scale),
        DistributionKind.Normal => Location,
        _ => 0.5 * (Location + Scale),
    };

    /// <summary>The standard deviation of the variable.</summary>
    public double StandardDeviation => Kind switch
    {
        DistributionKind.Lognormal => Mean * Math.Sqrt(Math.Exp(Scale * Scale) - 1),
        DistributionKind.Normal => Scale,
        _ => (Scale - Location) / Math.Sqrt(12),
    };

    /// <summary>The median of the variable.</summary>
    public double Median => Quantile(0.5);

    /// <summary>One line for memos: the family and its parameters.</summary>
    public string Describe() => Kind switch
    {
        DistributionKind.Lognormal => FormattableString.Invariant(
            $"lognormal, median {Median:G4}, cov {Math.Sqrt(Math.Exp(Scale * Scale) - 1):G3} (5–95 %: {Quantile(0.05):G4} … {Quantile(0.95):G4})"),
        DistributionKind.Normal => FormattableString.Invariant($"normal, mean {Location:G4}, sd {Scale:G3}"),
        _ => FormattableString.Invariant($"uniform, {Location:G4} … {Scale:G4}"),
    };
}
