using BenchmarkDotNet.Running;

BenchmarkSwitcher.FromAssembly(typeof(Winding.Benchmarks.EvaluateBenchmarks).Assembly).Run(args);
