using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Sweeps;
using NotebookCycles.Units.Literals;
using UnitsNet;

namespace NotebookCycles.Benchmarks.Sweeps;

/// <summary>Whole sweeps: 10^5 variable-cp Otto cycles with the record off, on all cores, cycles not kept.</summary>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Monitoring, warmupCount: 1, iterationCount: 5)]
public class SweepBenchmarks
{
    private static readonly CycleOptions NoRecord = new() { Record = false };
    private readonly double[] _ratios = ParameterRange.Linear(6, 16, 100_000);
    private readonly Temperature _t1 = 300.Kelvins();
    private readonly Pressure _p1 = 100.Kilopascals();
    private readonly SpecificEnergy _q = 1.8.MegajoulesPerKilogram();

    private readonly double[] _reheat = ParameterRange.Linear(2, 6, 10_000);

    /// <summary>10^4 reheat-regenerative Rankine cycles (two feedwater heaters), sweeping the reheat pressure in MPa.</summary>
    [Benchmark]
    public SweepResult RankineReheatRegenerative10k() =>
        Sweep.Over("reheat pressure (MPa)", _reheat, p => SteamPlantCycles.Rankine(NotebookCycles.Water.IapwsIf97.Default, Pressure.FromMegapascals(15), Pressure.FromKilopascals(10),
            NotebookCycles.Benchmarks.Cycles.CycleBenchmarks.RankineDesign with { ReheatPressure = Pressure.FromMegapascals(p) }, options: NoRecord));

    [Benchmark]
    public SweepResult OttoVariableCp100k() =>
        Sweep.Over("compression ratio", _ratios, r => AirStandardCycles.Otto(IdealGas.DryAir, _t1, _p1, r, heatAdded: _q, options: NoRecord));
}
