using BenchmarkDotNet.Attributes;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;
using NotebookCycles.Refrigerants;
using UnitsNet;

namespace NotebookCycles.Benchmarks.Refrigerants;

/// <summary>Refrigerant states from the Helmholtz-energy equations and a whole vapour-compression cycle.</summary>
[MemoryDiagnoser]
[MedianColumn]
public class RefrigerantBenchmarks
{
    private static readonly CycleOptions NoRecord = new() { Record = false };
    private readonly Refrigerant _r134a = Refrigerant.R134a;
    private readonly Refrigerant _co2 = Refrigerant.R744;
    private readonly Temperature _te = Temperature.FromDegreesCelsius(-10);
    private readonly Temperature _tc = Temperature.FromDegreesCelsius(40);
    private readonly VapourCompressionOptions _design = new() { Superheat = TemperatureDelta.FromKelvins(5), Subcooling = TemperatureDelta.FromKelvins(3), CompressorEfficiency = 0.75 };
    private double _hTwoPhase;

    /// <summary>Warms the fluids (their saturation tables are built on first use).</summary>
    [GlobalSetup]
    public void Setup()
    {
        _hTwoPhase = _r134a.FromPX(3e5, 0.4).H;
        _ = _co2.FromTP(300, 5e6);
    }

    /// <summary>R-134a vapour from (T, ρ): one Helmholtz evaluation (21 terms).</summary>
    [Benchmark]
    public StatePoint R134aFromTRho() => _r134a.FromTRho(300, 20);

    /// <summary>R-744 from (T, ρ): 42 terms including the non-analytic ones.</summary>
    [Benchmark]
    public StatePoint R744FromTRho() => _co2.FromTRho(320, 300);

    /// <summary>R-134a liquid from (T, p).</summary>
    [Benchmark]
    public StatePoint R134aLiquidFromTP() => _r134a.FromTP(280, 1e6);

    /// <summary>R-134a vapour from (T, p).</summary>
    [Benchmark]
    public StatePoint R134aVapourFromTP() => _r134a.FromTP(320, 3e5);

    /// <summary>R-134a saturation pressure at T (phase equilibrium).</summary>
    [Benchmark]
    public double R134aSaturationPressure() => _r134a.SaturationPressure(280);

    /// <summary>R-744 saturation pressure at T.</summary>
    [Benchmark]
    public double R744SaturationPressure() => _co2.SaturationPressure(270);

    /// <summary>R-134a two-phase state from (p, h).</summary>
    [Benchmark]
    public StatePoint R134aTwoPhaseFromPH() => _r134a.FromPH(3e5, _hTwoPhase);

    /// <summary>R-717 two-stage cycle with flash tank (repeated passes for the flash fraction), no record.</summary>
    [Benchmark]
    public CycleResult R717TwoStageNoRecord() => RefrigerationCycles.TwoStageFlashTank(Refrigerant.R717, _te, _tc, options: NoRecord);

    /// <summary>A single-stage R-134a vapour-compression cycle without the calculation record.</summary>
    [Benchmark]
    public CycleResult R134aCycleNoRecord() => RefrigerationCycles.VapourCompression(_r134a, _te, _tc, _design, options: NoRecord);

    /// <summary>The same cycle with the calculation record.</summary>
    [Benchmark]
    public CycleResult R134aCycleWithRecord() => RefrigerationCycles.VapourCompression(_r134a, _te, _tc, _design);
}
