namespace Seepage.Core.Results;

/// <summary>Thrown when an analysis produced a figure that is not a finite number (an overflow or a 0/0 somewhere in the
/// chain): such a result is never reported or stored. <see cref="Member"/> is the figure's place in the result document,
/// e.g. <c>/uplift/0/force</c>.</summary>
public sealed class NonFiniteResultException(string member, double value)
    : Exception(FormattableString.Invariant(
        $"The result figure {member} came out as {value}, not a finite number; the section's magnitudes (conductivities, heads, lengths) are beyond what the analysis can represent."))
{
    public string Member { get; } = member;
    public double Value { get; } = value;
}
