// Benchmark harness: `dotnet run -c Release --project tests/Seepage.Benchmarks -- <mode> [options]`; the modes are listed
// in the switch below and in the usage line.
// Each mode prints one fixed-format line per size (see MeshBenchmark and SolveBenchmark).
using Seepage.Benchmarks;

string mode = args.Length > 0 ? args[0] : "";
string[] rest = args.Skip(1).ToArray();
switch (mode)
{
    case "mesh": MeshBenchmark.Run(rest); return 0;
    case "solve": SolveBenchmark.Run(rest); return 0;
    case "stages": StageBenchmark.Run(rest); return 0;
    case "service": ServiceBenchmark.Run(rest); return 0;
    case "coldstart": ColdStartBenchmark.Run(rest); return 0;
    case "order2": Order2Benchmark.Run(rest); return 0;
    case "uncertainty": UncertaintyBenchmark.Run(rest); return 0;
    case "unconfined": UnconfinedBenchmark.Run(rest); return 0;
    default:
        Console.Error.WriteLine("usage: Seepage.Benchmarks <mesh|solve|stages|service|coldstart|order2|uncertainty|unconfined> [options]");
        return 1;
}
