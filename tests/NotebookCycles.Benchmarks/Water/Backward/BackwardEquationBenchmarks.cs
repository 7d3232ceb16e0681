using BenchmarkDotNet.Attributes;
using NotebookCycles.Water.Backward;

namespace NotebookCycles.Benchmarks.Water.Backward;

/// <summary>Cost of one call of the supplementary backward equations, including the subregion choice and range checks.</summary>
[MemoryDiagnoser]
public class BackwardEquationBenchmarks
{
    /// <summary>Region 2 p(h,s), subregion 2b.</summary>
    [Benchmark]
    public double P2HS() => Sr201.P2HS(3600, 7);

    /// <summary>Region 3 T(p,h), subregion 3b.</summary>
    [Benchmark]
    public double T3PH() => Sr303.T3PH(50, 2400);

    /// <summary>Region 3 p(h,s), subregion 3a.</summary>
    [Benchmark]
    public double P3HS() => Sr404.P3HS(2000, 4.2);

    /// <summary>Region 3 v(p,T) far from the critical point, subregion 3a.</summary>
    [Benchmark]
    public double V3PTSubregionA() => Sr505.V3PT(50, 630);

    /// <summary>Region 3 v(p,T) near the critical point, subregion 3z (saturation-temperature test included).</summary>
    [Benchmark]
    public double V3PTNearCritical() => Sr505.V3PT(22.064, 647.15);
}
