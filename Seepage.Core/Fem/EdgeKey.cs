namespace Seepage.Core.Fem;

/// <summary>
/// An undirected mesh edge as one 64-bit key (lower node in the high half) and a hash for it. The default hash of a
/// long folds its halves by exclusive or, which for two nearby node numbers (nodes are numbered along a Hilbert curve,
/// so edges join nearby numbers) lands in a few small values: dictionaries keyed that way degrade to linear search
/// (a 17,876-triangle mesh took 0.9 s to number its edges). <see cref="Comparer"/> multiplies by a 64-bit odd constant
/// (Fibonacci hashing, Knuth, "The Art of Computer Programming" vol. 3, 6.4) and keeps the high bits.
/// </summary>
public static class EdgeKey
{
    public static long Of(int a, int b) => ((long)Math.Min(a, b) << 32) | (uint)Math.Max(a, b);

    /// <summary>Equality of keys with a hash that spreads nearby node pairs over all buckets.</summary>
    public static IEqualityComparer<long> Comparer { get; } = new Mixing();

    private sealed class Mixing : IEqualityComparer<long>
    {
        public bool Equals(long x, long y) => x == y;

        public int GetHashCode(long key) => (int)(((ulong)key * 0x9E3779B97F4A7C15UL) >> 32);
    }
}
