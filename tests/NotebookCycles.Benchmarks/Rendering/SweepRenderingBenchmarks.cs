using BenchmarkDotNet.Attributes;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Rendering;
using NotebookCycles.Sweeps;
using NotebookCycles.Units.Literals;

namespace NotebookCycles.Benchmarks.Rendering;

/// <summary>
/// Rendering solved sweeps (cold-air-standard Brayton at 1300 K, 300 K and 100 kPa inlet): a 1000-point sweep's HTML
/// (two charts over every point, a 40-row table) and one chart alone, and the overlaid T-s of a three-variant comparison.
/// Run: <c>dotnet run -c Release --project tests/NotebookCycles.Benchmarks -- --filter '*SweepRenderingBenchmarks*'</c>.
/// </summary>
[MemoryDiagnoser]
public class SweepRenderingBenchmarks
{
    private SweepResult _large = null!;
    private CycleComparison _variants = null!;

    /// <summary>Solves the sweep and the variants once; only rendering is measured.</summary>
    [GlobalSetup]
    public void Setup()
    {
        static CycleResult Brayton(double rp) => GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), rp, 1300.Kelvins());
        _large = Sweep.Over("pressure ratio", ParameterRange.Linear(2, 40, 1000), Brayton);
        _variants = CycleComparison.Of("Brayton variants", ("r = 6", Brayton(6)), ("r = 10", Brayton(10)), ("r = 14", Brayton(14)));
    }

    /// <summary>The 1000-point sweep's HTML: heading, two SVG charts, a 40-row table.</summary>
    [Benchmark(Baseline = true)]
    public string SweepHtml1000() => SweepHtml.Sweep(_large);

    /// <summary>One SVG chart of the 1000-point sweep.</summary>
    [Benchmark]
    public string SweepChart1000() => SweepSvg.Chart(_large, SweepFigure.NetWork);

    /// <summary>The overlaid T-s of three variants.</summary>
    [Benchmark]
    public string OverlaidTemperatureEntropy() => CycleSvg.Overlay(_variants);
}
