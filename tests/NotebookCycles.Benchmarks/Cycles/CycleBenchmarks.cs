using BenchmarkDotNet.Attributes;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Properties;
using NotebookCycles.Units.Literals;
using UnitsNet;

namespace NotebookCycles.Benchmarks.Cycles;

/// <summary>Solving whole cycles through the chain, with and without the calculation record.</summary>
[MemoryDiagnoser]
public class CycleBenchmarks
{
    private static readonly CycleOptions NoRecord = new() { Record = false };
    private readonly IPropertyModel _cold = ColdAirStandard.Air;
    private readonly IPropertyModel _air = IdealGas.DryAir;
    private readonly Temperature _t1 = 300.Kelvins();
    private readonly Pressure _p1 = 100.Kilopascals();
    private readonly SpecificEnergy _q = 1.8.MegajoulesPerKilogram();

    [Benchmark]
    public CycleResult OttoVariableCpWithRecord() => AirStandardCycles.Otto(_air, _t1, _p1, 10, heatAdded: _q);

    [Benchmark]
    public CycleResult OttoVariableCpNoRecord() => AirStandardCycles.Otto(_air, _t1, _p1, 10, heatAdded: _q, options: NoRecord);

    [Benchmark]
    public CycleResult OttoColdAirWithRecord() => AirStandardCycles.Otto(_cold, _t1, _p1, 10, heatAdded: _q);

    [Benchmark]
    public CycleResult OttoColdAirNoRecord() => AirStandardCycles.Otto(_cold, _t1, _p1, 10, heatAdded: _q, options: NoRecord);

    /// <summary>Reheat-regenerative Rankine with two feedwater heaters (one open, one closed), record kept.</summary>
    [Benchmark]
    public CycleResult RankineReheatTwoHeaters() => SteamPlantCycles.Rankine(NotebookCycles.Water.IapwsIf97.Default, Pressure.FromMegapascals(15), Pressure.FromKilopascals(10), RankineDesign);

    /// <summary>The same plant with the record off.</summary>
    [Benchmark]
    public CycleResult RankineReheatTwoHeatersNoRecord() => SteamPlantCycles.Rankine(NotebookCycles.Water.IapwsIf97.Default, Pressure.FromMegapascals(15), Pressure.FromKilopascals(10), RankineDesign, options: NoRecord);

    internal static readonly RankineOptions RankineDesign = new()
    {
        TurbineInletTemperature = Temperature.FromDegreesCelsius(600),
        ReheatPressure = Pressure.FromMegapascals(4),
        ReheatTemperature = Temperature.FromDegreesCelsius(600),
        TurbineEfficiency = 0.88,
        PumpEfficiency = 0.85,
        FeedwaterHeaters = [FeedwaterHeater.ClosedAt(Pressure.FromMegapascals(4)), FeedwaterHeater.OpenAt(Pressure.FromKilopascals(500))],
    };

    [Benchmark]
    public CycleResult BraytonRegenerativeNoRecord() => GasTurbineCycles.Brayton(_cold, _t1, _p1, 8, 1300.Kelvins(), new BraytonOptions { RegeneratorEffectiveness = 0.8, CompressorEfficiency = 0.85, TurbineEfficiency = 0.88 }, options: NoRecord);
}
