namespace Seepage.Core.Uncertainty;

/// <summary>One random variable: the section member it varies (a JSON pointer, RFC 6901, e.g. <c>/soils/0/kx</c>) and its
/// distribution in the member's unit. <paramref name="KeepAnisotropy"/>: when the member is a soil's kx, its ky is scaled by
/// the same factor so that ky/kx stays as in the base section (otherwise ky keeps its base value).</summary>
public sealed record UncertainVariable(string Member, Distribution Distribution, bool KeepAnisotropy = true);

/// <summary>A rank (Spearman) correlation between two variables, given by their positions in the variable list.</summary>
public sealed record VariableCorrelation(int First, int Second, double Rank);

/// <summary>How the samples are drawn.</summary>
public enum SamplingMethod
{
    /// <summary>Latin hypercube: each variable's probability range cut into N equal strata, one sample in each, strata
    /// paired at random (McKay, Beckman &amp; Conover, Technometrics 21, 1979). Default.</summary>
    LatinHypercube,

    /// <summary>Plain Monte Carlo: independent uniform draws.</summary>
    Random,
}
