using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>
/// The closed air-standard templates against independent computations written here from the published ideal-gas
/// relations for constant specific heats (the cold-air-standard closed forms of any engineering thermodynamics text).
/// </summary>
public sealed class AirStandardCyclesTests
{
    private const double K = 1.4;
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    [Theory]
    [InlineData(16.0, 2.0)]
    [InlineData(20.0, 2.5)]
    public void Diesel_matches_the_closed_form(double r, double rc)
    {
        var result = AirStandardCycles.Diesel(Air, 300.Kelvins(), 100.Kilopascals(), r, cutoffRatio: rc);

        // η = 1 − r^(1−k)·(rc^k − 1)/(k·(rc − 1)).
        double expected = 1 - Math.Pow(r, 1 - K) * (Math.Pow(rc, K) - 1) / (K * (rc - 1));
        Assert.Equal(expected, result.Figures.ThermalEfficiency, 1e-12);
    }

    [Fact]
    public void Dual_matches_the_closed_form()
    {
        double r = 14, t1 = 300, p1 = 100e3, pmax = 7e6, q = 1500e3;
        double cv = Air.Cv, cp = Air.Cp;
        double t2 = t1 * Math.Pow(r, K - 1), p2 = p1 * Math.Pow(r, K);
        double alpha = pmax / p2;                      // pressure ratio of the constant-volume part
        double t3 = t2 * alpha;
        double qv = cv * (t3 - t2);
        double t4 = t3 + (q - qv) / cp;
        double rc = t4 / t3;

        // η = 1 − r^(1−k)·(α·rc^k − 1)/((α − 1) + k·α·(rc − 1)).
        double expected = 1 - Math.Pow(r, 1 - K) * (alpha * Math.Pow(rc, K) - 1) / ((alpha - 1) + K * alpha * (rc - 1));
        var result = AirStandardCycles.Dual(Air, t1.Kelvins(), p1.Pascals(), r, pmax.Pascals(), heatAdded: q.JoulesPerKilogram());
        Assert.Equal(5, result.States.Length);
        Assert.Equal(expected, result.Figures.ThermalEfficiency, 1e-12);
        Assert.Equal(pmax, result.Figures.MaximumPressure, 1e-6);
    }

    [Fact]
    public void Atkinson_matches_an_independent_computation()
    {
        double r = 9, t1 = 300, p1 = 100e3, q = 1200e3;
        double t2 = t1 * Math.Pow(r, K - 1), p2 = p1 * Math.Pow(r, K);
        double t3 = t2 + q / Air.Cv, p3 = p2 * t3 / t2;
        double t4 = t3 * Math.Pow(p1 / p3, (K - 1) / K);
        double expected = 1 - K * (t4 - t1) / (t3 - t2);
        var result = AirStandardCycles.Atkinson(Air, t1.Kelvins(), p1.Pascals(), r, heatAdded: q.JoulesPerKilogram());
        Assert.Equal(expected, result.Figures.ThermalEfficiency, 1e-12);
    }

    [Fact]
    public void Miller_matches_an_independent_computation()
    {
        double rc = 8, re = 11, t1 = 300, p1 = 100e3, q = 1200e3;
        double t2 = t1 * Math.Pow(rc, K - 1);
        double t3 = t2 + q / Air.Cv;
        double t4 = t3 * Math.Pow(1 / re, K - 1);
        double v1 = Air.R * t1 / p1, v4 = v1 / rc * re;
        double t5 = p1 * v4 / Air.R;
        double qOut = Air.Cv * (t4 - t5) + Air.Cp * (t5 - t1);
        var result = AirStandardCycles.Miller(Air, t1.Kelvins(), p1.Pascals(), rc, re, heatAdded: q.JoulesPerKilogram());
        Assert.Equal(1 - qOut / q, result.Figures.ThermalEfficiency, 1e-12);
    }

    [Theory]
    [InlineData(300.0, 1200.0)]
    [InlineData(350.0, 900.0)]
    public void Stirling_and_Carnot_reach_the_Carnot_efficiency(double tl, double th)
    {
        // Carnot: η = 1 − T_L/T_H (second law).
        double carnot = 1 - tl / th;
        var stirling = AirStandardCycles.Stirling(Air, tl.Kelvins(), th.Kelvins(), 100.Kilopascals(), 6);
        var carnotCycle = AirStandardCycles.Carnot(Air, tl.Kelvins(), th.Kelvins(), 100.Kilopascals(), 3);
        Assert.Equal(carnot, stirling.Figures.ThermalEfficiency, 1e-12);
        Assert.Equal(carnot, carnotCycle.Figures.ThermalEfficiency, 1e-12);
        Assert.All(carnotCycle.Steps, s => Assert.Equal(0, s.EntropyGenerated, 1e-9));
    }

    [Fact]
    public void Otto_mean_effective_pressure_is_net_work_over_displacement()
    {
        var result = AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), 10, heatAdded: 1500.KilojoulesPerKilogram());
        double v1 = result["1"].Point.V, v2 = result["2"].Point.V;
        Assert.Equal(result.Figures.NetWork / (v1 - v2), result.Figures.MeanEffectivePressure, 1e-9);
        Assert.True(double.IsNaN(result.Figures.BackWorkRatio));
    }
}
