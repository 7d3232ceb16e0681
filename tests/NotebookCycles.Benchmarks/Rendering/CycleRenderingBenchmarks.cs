using BenchmarkDotNet.Attributes;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Rendering;
using NotebookCycles.Units.Literals;

namespace NotebookCycles.Benchmarks.Rendering;

/// <summary>
/// Rendering a solved 4-state cycle (cold-air-standard Otto): the full HTML report with its T-s and p-v diagrams (the
/// target is a median of at most 5 ms and at most 60 KB of output), the diagrams alone, and the plain-text report.
/// Run: <c>dotnet run -c Release --project tests/NotebookCycles.Benchmarks -- --filter '*CycleRenderingBenchmarks*'</c>.
/// </summary>
[MemoryDiagnoser]
public class CycleRenderingBenchmarks
{
    private CycleResult _otto = null!;
    private RenderOptions _us = null!;

    /// <summary>Solves the cycle once; only rendering is measured.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _otto = AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram());
        _us = new RenderOptions { Units = DisplayUnits.UsCustomary };
    }

    /// <summary>The full HTML report in SI units, diagrams included.</summary>
    [Benchmark(Baseline = true)]
    public string HtmlReport() => CycleHtml.Cycle(_otto);

    /// <summary>The full HTML report in US customary units.</summary>
    [Benchmark]
    public string HtmlReportUsCustomary() => CycleHtml.Cycle(_otto, _us);

    /// <summary>The T-s diagram alone.</summary>
    [Benchmark]
    public string TemperatureEntropySvg() => CycleSvg.TemperatureEntropy(_otto);

    /// <summary>The plain-text report.</summary>
    [Benchmark]
    public string TextReport() => CycleText.Cycle(_otto);
}
