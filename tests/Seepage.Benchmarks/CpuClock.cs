using System.Runtime.InteropServices;

namespace Seepage.Benchmarks;

/// <summary>CPU time of the whole process in seconds from <c>clock_gettime(CLOCK_PROCESS_CPUTIME_ID)</c> (nanosecond
/// resolution; <c>Process.TotalProcessorTime</c> reads /proc in 10 ms ticks, too coarse for one stage).</summary>
internal static partial class CpuClock
{
    private const int ProcessCpuTimeId = 2;

    [StructLayout(LayoutKind.Sequential)]
    private struct TimeSpec { public long Seconds; public long Nanoseconds; }

    [LibraryImport("libc", EntryPoint = "clock_gettime")]
    private static partial int ClockGetTime(int clock, out TimeSpec time);

    public static double Seconds()
    {
        if (ClockGetTime(ProcessCpuTimeId, out var t) != 0) throw new InvalidOperationException("clock_gettime failed");
        return t.Seconds + 1e-9 * t.Nanoseconds;
    }
}
