using BenchmarkDotNet.Running;

BenchmarkSwitcher.FromAssembly(typeof(PackDesigner.Benchmarks.EvaluateBenchmarks).Assembly).Run(args);
