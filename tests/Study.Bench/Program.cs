// Kernel benchmarks of the sparse solver on generated networks: dotnet run -c Release --project tests/Study.Bench -- --filter *
using BenchmarkDotNet.Running;

BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
