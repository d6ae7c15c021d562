// Benchmark harness: `dotnet run -c Release --project tests/Seepage.Benchmarks -- <mesh|solve>`.
Console.WriteLine("usage: Seepage.Benchmarks <mesh|solve>");
return args.Length == 0 ? 1 : 0;
