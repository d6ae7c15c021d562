namespace Seepage.Benchmarks;

/// <summary>Mesher benchmark (not written yet).</summary>
public static class MeshBenchmark
{
    public static void Run(string[] args) => throw new NotImplementedException("mesh benchmark not written yet");
}
