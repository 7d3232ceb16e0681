using BenchmarkDotNet.Running;

namespace NotebookCycles.Benchmarks;

/// <summary>Entry point: <c>dotnet run -c Release --project tests/NotebookCycles.Benchmarks -- --filter '*'</c>.</summary>
public static class Program
{
    /// <summary>Runs the benchmarks chosen on the command line.</summary>
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
