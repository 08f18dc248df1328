using BenchmarkDotNet.Running;

if (args is ["cpu-time"])
{
    PackDesigner.Benchmarks.CpuTime.Run();
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(PackDesigner.Benchmarks.EvaluateBenchmarks).Assembly).Run(args);
