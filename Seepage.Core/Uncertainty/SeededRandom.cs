namespace Seepage.Core.Uncertainty;

/// <summary>A reproducible pseudo-random generator: xoshiro256** (Blackman &amp; Vigna, "Scrambled linear pseudorandom
/// number generators", ACM Trans. Math. Softw. 47, 2021), seeded through SplitMix64 (Steele, Lea &amp; Flood, OOPSLA 2014).
/// Our own code so that the same seed gives the same samples on every machine and runtime version.</summary>
public sealed class SeededRandom
{
    private ulong _s0, _s1, _s2, _s3;

    public SeededRandom(long seed)
    {
        ulong x = unchecked((ulong)seed);
        _s0 = SplitMix(ref x); _s1 = SplitMix(ref x); _s2 = SplitMix(ref x); _s3 = SplitMix(ref x);
    }

    /// <summary>The next 64 random bits.</summary>
    public ulong NextBits()
    {
        ulong result = RotateLeft(_s1 * 5, 7) * 9, t = _s1 << 17;
        _s2 ^= _s0; _s3 ^= _s1; _s1 ^= _s2; _s0 ^= _s3; _s2 ^= t; _s3 = RotateLeft(_s3, 45);
        return result;
    }

    /// <summary>A uniform number in the open interval (0, 1): 53 random bits, offset by half a step.</summary>
    public double NextOpen() => ((NextBits() >> 11) + 0.5) * (1.0 / (1UL << 53));

    /// <summary>A uniform integer in [0, n).</summary>
    public int NextIndex(int n) => (int)((NextBits() >> 11) % (ulong)n);

    /// <summary>Shuffles the array in place (Fisher–Yates; Knuth, TAOCP vol. 2, Algorithm P).</summary>
    public void Shuffle<T>(T[] items)
    {
        for (int i = items.Length - 1; i > 0; i--)
        {
            int j = NextIndex(i + 1);
            (items[i], items[j]) = (items[j], items[i]);
        }
    }

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));

    private static ulong SplitMix(ref ulong x)
    {
        ulong z = x += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }
}
