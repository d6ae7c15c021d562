namespace Seepage.Core.Unconfined;

/// <summary>
/// The potential seepage-face switch: nodes of seepage faces and drains where water may leave at atmospheric pressure.
/// An active node is fixed at h = y; it is released when its reaction shows water entering the soil there (a seepage
/// face or drain only takes water out). A released node is fixed again when its head rises above its elevation (the
/// pressure would be positive at an open face). The switch is iterated with the conductivities until neither changes.
/// </summary>
internal sealed class PotentialSeepageFaces
{
    private readonly int[] _nodes;
    private readonly bool[] _active;

    public PotentialSeepageFaces(IEnumerable<int> nodes)
    {
        _nodes = nodes.Distinct().Order().ToArray();
        _active = Enumerable.Repeat(true, _nodes.Length).ToArray();
    }

    public IReadOnlyList<int> Nodes => _nodes;

    /// <summary>Fixed heads for the next solve: the head boundaries plus h = y at every active node.</summary>
    public Fem.FixedHeads Apply(Fem.FixedHeads heads, double[] y)
    {
        var isFixed = (bool[])heads.IsFixed.Clone();
        var value = (double[])heads.Value.Clone();
        for (int k = 0; k < _nodes.Length; k++)
            if (_active[k]) { isFixed[_nodes[k]] = true; value[_nodes[k]] = y[_nodes[k]]; }
        return new Fem.FixedHeads(isFixed, value);
    }

    /// <summary>Updates the switch from a solve's heads (m) and reactions (m³/s per m, positive into the soil); returns
    /// how many nodes changed state. <paramref name="flowScale"/> and <paramref name="headScale"/> set the dead bands.</summary>
    public int Update(double[] heads, double[] reactions, double[] y, double flowScale, double headScale)
    {
        int changed = 0;
        for (int k = 0; k < _nodes.Length; k++)
        {
            int n = _nodes[k];
            bool next = _active[k] ? reactions[n] <= 1e-9 * flowScale : heads[n] > y[n] + 1e-9 * headScale;
            if (next != _active[k]) { _active[k] = next; changed++; }
        }
        return changed;
    }
}
