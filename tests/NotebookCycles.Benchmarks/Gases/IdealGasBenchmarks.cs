using BenchmarkDotNet.Attributes;
using NotebookCycles.Gases;
using NotebookCycles.Properties;

namespace NotebookCycles.Benchmarks.Gases;

/// <summary>
/// Dry air (NASA Glenn, variable cp): h(T), u(T), T from h and from u, and a full state from (T, p).
/// Each benchmark evaluates a fixed set of 16 temperatures spread over 250 K to 5800 K (both intervals), so the
/// per-call time is the reported mean divided by 16 (OperationsPerInvoke does that division).
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
public class IdealGasBenchmarks
{
    private const int N = 16;
    private readonly double[] _t = new double[N];
    private readonly double[] _h = new double[N];
    private readonly double[] _u = new double[N];
    private readonly double[] _p = new double[N];
    private IdealGasMixture _air = null!;

    /// <summary>Builds the model and the inputs.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _air = IdealGas.DryAir;
        for (int i = 0; i < N; i++)
        {
            _t[i] = 250 + (5800 - 250) * i / (N - 1.0);
            _h[i] = _air.Enthalpy(_t[i]);
            _u[i] = _air.InternalEnergy(_t[i]);
            _p[i] = 1e4 * (1 + i);
        }
    }

    /// <summary>h(T).</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public double EnthalpyFromT()
    {
        double sum = 0;
        for (int i = 0; i < N; i++)
        {
            sum += _air.Enthalpy(_t[i]);
        }

        return sum;
    }

    /// <summary>u(T).</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public double InternalEnergyFromT()
    {
        double sum = 0;
        for (int i = 0; i < N; i++)
        {
            sum += _air.InternalEnergy(_t[i]);
        }

        return sum;
    }

    /// <summary>T from h.</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public double TemperatureFromH()
    {
        double sum = 0;
        for (int i = 0; i < N; i++)
        {
            sum += _air.TemperatureFromEnthalpy(_h[i]);
        }

        return sum;
    }

    /// <summary>T from u.</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public double TemperatureFromU()
    {
        double sum = 0;
        for (int i = 0; i < N; i++)
        {
            sum += _air.TemperatureFromInternalEnergy(_u[i]);
        }

        return sum;
    }

    /// <summary>Full state from (T, p).</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public double StateFromTP()
    {
        double sum = 0;
        for (int i = 0; i < N; i++)
        {
            StatePoint s = _air.FromTP(_t[i], _p[i]);
            sum += s.S + s.H + s.W;
        }

        return sum;
    }

    /// <summary>Full state from (p, h).</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public double StateFromPH()
    {
        double sum = 0;
        for (int i = 0; i < N; i++)
        {
            StatePoint s = _air.FromPH(_p[i], _h[i]);
            sum += s.T + s.S;
        }

        return sum;
    }
}
