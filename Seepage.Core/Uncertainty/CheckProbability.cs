using MathNet.Numerics.Distributions;

namespace Seepage.Core.Uncertainty;

/// <summary>
/// The probability that a check fails, from the samples: p_f = n_f / n, its standard error √(p_f (1 − p_f)/n) (binomial;
/// for Latin hypercube samples an upper bound of the error for responses monotone in the variables, McKay, Beckman &amp;
/// Conover 1979), and the reliability index β = −Φ⁻¹(p_f) (Baecher &amp; Christian, "Reliability and Statistics in Geotechnical
/// Engineering", 2003). β is null when no sample or every sample failed; then <see cref="UpperBound"/> gives p_f &lt; 3/n
/// (the "rule of three", 95 % confidence; Hanley &amp; Lippman-Hand, JAMA 249, 1983) for the no-failure case.
/// </summary>
public sealed record CheckProbability(int Samples, int Failures, double ProbabilityOfFailure, double StandardError, double? Beta,
    double RequiredFactor)
{
    /// <summary>With no failure: 3/n, the 95 % upper confidence bound of p_f; otherwise null.</summary>
    public double? UpperBound => Failures == 0 ? 3.0 / Samples : null;

    public static CheckProbability Of(int failures, int samples, double requiredFactor)
    {
        double p = (double)failures / samples;
        double? beta = failures == 0 || failures == samples ? null : -Normal.InvCDF(0, 1, p);
        return new CheckProbability(samples, failures, p, Math.Sqrt(p * (1 - p) / samples), beta, requiredFactor);
    }
}
