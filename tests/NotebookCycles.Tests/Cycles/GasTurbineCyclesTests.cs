using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>Brayton and Ericsson templates against closed forms for constant specific heats (ideal-gas relations).</summary>
public sealed class GasTurbineCyclesTests
{
    private const double K = 1.4;
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    [Theory]
    [InlineData(6.0)]
    [InlineData(15.0)]
    public void Simple_Brayton_matches_the_closed_form(double rp)
    {
        var result = GasTurbineCycles.Brayton(Air, 300.Kelvins(), 100.Kilopascals(), rp, 1400.Kelvins());

        // η = 1 − rp^((1−k)/k).
        Assert.Equal(1 - Math.Pow(rp, (1 - K) / K), result.Figures.ThermalEfficiency, 1e-12);
        double t2 = 300 * Math.Pow(rp, (K - 1) / K), t4 = 1400 / Math.Pow(rp, (K - 1) / K);
        Assert.Equal((t2 - 300) / (1400 - t4), result.Figures.BackWorkRatio, 1e-12);
    }

    [Fact]
    public void Ideal_regenerator_matches_the_closed_form()
    {
        double rp = 5, t1 = 300, t3 = 1200;
        var result = GasTurbineCycles.Brayton(Air, t1.Kelvins(), 100.Kilopascals(), rp, t3.Kelvins(), new BraytonOptions { RegeneratorEffectiveness = 1.0 });

        // With a perfect regenerator: η = 1 − (T1/T3)·rp^((k−1)/k).
        Assert.Equal(1 - t1 / t3 * Math.Pow(rp, (K - 1) / K), result.Figures.ThermalEfficiency, 1e-12);
        Assert.Equal(6, result.States.Length);
    }

    [Fact]
    public void Regenerator_with_efficiencies_matches_an_independent_computation()
    {
        double rp = 8, t1 = 300, t3 = 1300, etaC = 0.85, etaT = 0.88, eps = 0.75;
        double x = Math.Pow(rp, (K - 1) / K);
        double t2 = t1 + (t1 * x - t1) / etaC;
        double t4 = t3 - etaT * (t3 - t3 / x);
        double t5 = t2 + eps * (t4 - t2);
        double wnet = Air.Cp * ((t3 - t4) - (t2 - t1));
        double qin = Air.Cp * (t3 - t5);
        var result = GasTurbineCycles.Brayton(Air, t1.Kelvins(), 100.Kilopascals(), rp, t3.Kelvins(), new BraytonOptions { CompressorEfficiency = etaC, TurbineEfficiency = etaT, RegeneratorEffectiveness = eps });
        Assert.Equal(wnet, result.Figures.NetWork, 1e-6);
        Assert.Equal(wnet / qin, result.Figures.ThermalEfficiency, 1e-12);
        Assert.All(result.Steps, s => Assert.True(s.EntropyGenerated >= -1e-9, s.Name));
        Assert.True(result.Steps.Sum(s => s.EntropyGenerated) > 0);
    }

    [Fact]
    public void Intercooled_reheat_cycle_matches_an_independent_computation()
    {
        double rp = 16, t1 = 300, t3 = 1400;
        double stage = Math.Pow(Math.Pow(rp, 0.5), (K - 1) / K);
        double wc = 2 * Air.Cp * (t1 * stage - t1);
        double wt = 2 * Air.Cp * (t3 - t3 / stage);
        double qin = Air.Cp * (t3 - t1 * stage) + Air.Cp * (t3 - t3 / stage);
        var result = GasTurbineCycles.Brayton(Air, t1.Kelvins(), 100.Kilopascals(), rp, t3.Kelvins(), new BraytonOptions { CompressionStages = 2, ExpansionStages = 2 });
        Assert.Equal(8, result.States.Length);
        Assert.Equal((wt - wc) / qin, result.Figures.ThermalEfficiency, 1e-12);
    }

    [Fact]
    public void Ericsson_reaches_the_Carnot_efficiency()
    {
        var result = GasTurbineCycles.Ericsson(Air, 300.Kelvins(), 1100.Kelvins(), 100.Kilopascals(), 4);
        Assert.Equal(1 - 300.0 / 1100.0, result.Figures.ThermalEfficiency, 1e-12);
    }
}
