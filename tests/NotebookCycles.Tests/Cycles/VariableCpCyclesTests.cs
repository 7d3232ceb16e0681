using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>
/// Variable-cp cycles through the chain against a hand calculation written here the way one is done with a gas
/// table: along an isentrope v2/v1 = vr2/vr1 (or p2/p1 = pr2/pr1), heat from u or h differences
/// (ideal-gas relations; the air property functions are those of the NASA Glenn model, evaluated directly).
/// </summary>
public sealed class VariableCpCyclesTests
{
    private static readonly IdealGasMixture Air = IdealGas.DryAir;

    [Theory]
    [InlineData(8.0, 1200.0)]
    [InlineData(12.0, 1800.0)]
    public void Otto_matches_the_gas_table_hand_calculation(double r, double qkJ)
    {
        double t1 = 300, q = qkJ * 1000;
        double t2 = Air.TemperatureFromRelativeVolume(Air.RelativeVolume(t1) / r);
        double u3 = Air.InternalEnergy(t2) + q;
        double t3 = Air.TemperatureFromInternalEnergy(u3);
        double t4 = Air.TemperatureFromRelativeVolume(Air.RelativeVolume(t3) * r);
        double qOut = Air.InternalEnergy(t4) - Air.InternalEnergy(t1);

        var result = AirStandardCycles.Otto(Air, t1.Kelvins(), 100.Kilopascals(), r, heatAdded: qkJ.KilojoulesPerKilogram());
        Assert.Equal(t2, result["2"].Point.T, 1e-9 * t2);
        Assert.Equal(t3, result["3"].Point.T, 1e-9 * t3);
        Assert.Equal(t4, result["4"].Point.T, 1e-9 * t4);
        Assert.Equal(1 - qOut / q, result.Figures.ThermalEfficiency, 1e-10);

        // With variable cp the efficiency falls below the cold-air closed form 1 − r^(1−k) at k = 1.4.
        Assert.True(result.Figures.ThermalEfficiency < 1 - Math.Pow(r, -0.4));
    }

    [Fact]
    public void Brayton_matches_the_gas_table_hand_calculation()
    {
        double t1 = 300, rp = 10, t3 = 1400, etaC = 0.86, etaT = 0.89;
        double t2s = Air.TemperatureFromRelativePressure(Air.RelativePressure(t1) * rp);
        double h2 = Air.Enthalpy(t1) + (Air.Enthalpy(t2s) - Air.Enthalpy(t1)) / etaC;
        double t4s = Air.TemperatureFromRelativePressure(Air.RelativePressure(t3) / rp);
        double h4 = Air.Enthalpy(t3) - etaT * (Air.Enthalpy(t3) - Air.Enthalpy(t4s));
        double wnet = (Air.Enthalpy(t3) - h4) - (h2 - Air.Enthalpy(t1));
        double qin = Air.Enthalpy(t3) - h2;

        var result = GasTurbineCycles.Brayton(Air, t1.Kelvins(), 100.Kilopascals(), rp, t3.Kelvins(), new BraytonOptions { CompressorEfficiency = etaC, TurbineEfficiency = etaT });
        Assert.Equal(wnet, result.Figures.NetWork, 1e-9 * wnet);
        Assert.Equal(wnet / qin, result.Figures.ThermalEfficiency, 1e-10);
        Assert.Equal((h2 - Air.Enthalpy(t1)) / (Air.Enthalpy(t3) - h4), result.Figures.BackWorkRatio, 1e-10);
    }

    [Fact]
    public void Isentrope_record_shows_the_relative_volume_ratio()
    {
        var result = AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), 9, heatAdded: 1.MegajoulesPerKilogram());
        var lines = result.Steps[0].Lines.Select(l => l.ToString()).ToList();
        Assert.Contains(lines, l => l.StartsWith("vr2 = vr1·v2/v1 = ", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("T2 = T(vr2) = ", StringComparison.Ordinal));
    }
}
