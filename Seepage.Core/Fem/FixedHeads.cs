namespace Seepage.Core.Fem;

/// <summary>Dirichlet data: for each node, whether its total head is fixed and its value (m).</summary>
public sealed class FixedHeads(bool[] isFixed, double[] value)
{
    public bool[] IsFixed { get; } = isFixed;
    public double[] Value { get; } = value;
    public int Count => IsFixed.Count(f => f);
}
