namespace Seepage.Benchmarks;

/// <summary>Solver benchmark (not written yet).</summary>
public static class SolveBenchmark
{
    public static void Run(string[] args) => throw new NotImplementedException("solve benchmark not written yet");
}
