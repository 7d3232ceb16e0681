using BenchmarkDotNet.Attributes;
using NotebookCycles.Properties;
using NotebookCycles.Water;

namespace NotebookCycles.Benchmarks.Water;

/// <summary>
/// IAPWS-IF97 hot paths: a full forward state from (p, T), the backward equations T(p,h) and T(p,s), and full
/// states from (p, h) and (p, s) including the two-phase case.
/// Run: <c>dotnet run -c Release --project tests/NotebookCycles.Benchmarks -- --filter '*Water*' --job short</c>.
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
[MinColumn]
public class IapwsIf97Benchmarks
{
    private readonly IapwsIf97 _steam = IapwsIf97.Default;

    // Release units for the internal backward equations (MPa, kJ/kg, kJ/(kg·K)).
    private double _p1 = 3.0, _h1 = 500.0, _s1 = 0.5, _p2 = 3.0, _h2 = 3000.0, _s2 = 7.0;

    /// <summary>Region 1: T = 300 K, p = 3 MPa.</summary>
    [Benchmark]
    public StatePoint ForwardRegion1() => _steam.FromTP(300.0, 3e6);

    /// <summary>Region 2: T = 700 K, p = 3 MPa.</summary>
    [Benchmark]
    public StatePoint ForwardRegion2() => _steam.FromTP(700.0, 3e6);

    /// <summary>Backward T(p,h), region 1.</summary>
    [Benchmark]
    public double BackwardT1PH() => Region1.TemperaturePH(_p1, _h1);

    /// <summary>Backward T(p,s), region 1.</summary>
    [Benchmark]
    public double BackwardT1PS() => Region1.TemperaturePS(_p1, _s1);

    /// <summary>Backward T(p,h), region 2 (subregion 2a).</summary>
    [Benchmark]
    public double BackwardT2PH() => Region2.TemperaturePH(_p2, _h2);

    /// <summary>Backward T(p,s), region 2 (subregion 2a).</summary>
    [Benchmark]
    public double BackwardT2PS() => Region2.TemperaturePS(_p2, _s2);

    /// <summary>Full state from (p, h), compressed liquid.</summary>
    [Benchmark]
    public StatePoint FromPHLiquid() => _steam.FromPH(3e6, 500e3);

    /// <summary>Full state from (p, h), superheated steam.</summary>
    [Benchmark]
    public StatePoint FromPHVapour() => _steam.FromPH(3e6, 3000e3);

    /// <summary>Full state from (p, h), wet steam.</summary>
    [Benchmark]
    public StatePoint FromPHTwoPhase() => _steam.FromPH(3e6, 2000e3);

    /// <summary>Full state from (p, s), superheated steam.</summary>
    [Benchmark]
    public StatePoint FromPSVapour() => _steam.FromPS(3e6, 7000.0);

    /// <summary>Full state from (p, s), wet steam.</summary>
    [Benchmark]
    public StatePoint FromPSTwoPhase() => _steam.FromPS(10e3, 6000.0);

    /// <summary>Region 3 from (p, T): T = 650 K, p = 25 MPa (density found by iteration).</summary>
    [Benchmark]
    public StatePoint ForwardRegion3() => _steam.FromTP(650.0, 25e6);

    /// <summary>Full state from (p, h) in region 3: 25 MPa, 2000 kJ/kg.</summary>
    [Benchmark]
    public StatePoint FromPHRegion3() => _steam.FromPH(25e6, 2000e3);

    /// <summary>Full state from (h, s), compressed liquid: 500 kJ/kg, 1.4 kJ/(kg·K).</summary>
    [Benchmark]
    public StatePoint FromHSLiquid() => _steam.FromHS(500e3, 1400.0);

    /// <summary>Full state from (h, s), superheated steam: 3000 kJ/kg, 7 kJ/(kg·K).</summary>
    [Benchmark]
    public StatePoint FromHSVapour() => _steam.FromHS(3000e3, 7000.0);

    /// <summary>Full state from (h, s), wet steam: 2300 kJ/kg, 6.5 kJ/(kg·K).</summary>
    [Benchmark]
    public StatePoint FromHSTwoPhase() => _steam.FromHS(2300e3, 6500.0);
}
