namespace Seepage.Core.Solvers;

/// <summary>Runs a row-range body on two threads with a fixed split, so every result is the same whichever
/// thread computes which half (sums are always combined as first half + second half). Below
/// <see cref="MinRows"/> rows the body runs on the calling thread over the whole range.</summary>
internal static class TwoWay
{
    /// <summary>Smallest row count worth a second thread (a task hand-off costs a few microseconds).</summary>
    public const int MinRows = 16_384;

    public static bool Worthwhile(int n) => n >= MinRows && Environment.ProcessorCount > 1;

    public static void For(int n, int split, Action<int, int> body)
    {
        if (!Worthwhile(n)) { body(0, n); return; }
        Parallel.Invoke(() => body(0, split), () => body(split, n));
    }

    /// <summary>Sum of body over the two halves, combined in a fixed order (deterministic).</summary>
    public static double Sum(int n, int split, Func<int, int, double> body)
    {
        if (!Worthwhile(n)) return body(0, n);
        double first = 0, second = 0;
        Parallel.Invoke(() => first = body(0, split), () => second = body(split, n));
        return first + second;
    }

    /// <summary>A split for plain vectors: the middle, rounded to a multiple of 64 entries.</summary>
    public static int Middle(int n) => (n / 2) & ~63;
}
