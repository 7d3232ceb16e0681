using CsCheck;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>Properties that hold for every valid cycle: first-law closure, no step destroys entropy, results independent of the input units.</summary>
public sealed class CyclePropertyTests
{
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    private static void AssertBalances(CycleResult r)
    {
        var f = r.Figures;
        double sumQ = r.Steps.Sum(s => s.MassFraction * s.Q);
        Assert.True(Math.Abs(sumQ - f.NetWork) <= 1e-9 * Math.Max(f.HeatIn, 1), $"first law: Σq = {sumQ}, w = {f.NetWork}");
        foreach (var s in r.Steps)
        {
            Assert.True(s.EntropyGenerated >= -1e-9 * Math.Max(Math.Abs(s.DeltaS), 1), $"{s.Name}: s_gen = {s.EntropyGenerated}");
        }

        Assert.True(f.ThermalEfficiency < f.CarnotEfficiency + 1e-12, "efficiency above Carnot's");
    }

    [Fact]
    public void Random_closed_cycles_balance()
    {
        Gen.Select(Gen.Double[4, 22], Gen.Double[200, 2500], Gen.Double[1.05, 3.0], Gen.Double[1.1, 1.45])
            .Sample((r, qkJ, rc, n) =>
            {
                AssertBalances(AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), r, heatAdded: qkJ.KilojoulesPerKilogram()));
                AssertBalances(AirStandardCycles.Diesel(Air, 300.Kelvins(), 100.Kilopascals(), r, cutoffRatio: rc));
                AssertBalances(Cycle.Closed("Polytropic engine", Air)
                    .Start("1", T: 300.Kelvins(), p: 100.Kilopascals())
                    .CompressPolytropic("2", n, volumeRatio: r)
                    .HeatAtConstantVolume("3", q: qkJ.KilojoulesPerKilogram())
                    .ExpandPolytropic("4", n, toVolumeOf: "1")
                    .CoolAtConstantVolume(backTo: "1"));
            }, iter: 200);
    }

    [Fact]
    public void Random_gas_turbines_balance()
    {
        Gen.Select(Gen.Double[2, 30], Gen.Double[900, 1700], Gen.Double[0.7, 1.0], Gen.Double[0.7, 1.0], Gen.Double[0, 0.9])
            .Sample((rp, tit, etaC, etaT, eps) =>
            {
                CycleResult r;
                try
                {
                    r = GasTurbineCycles.Brayton(Air, 300.Kelvins(), 100.Kilopascals(), rp, tit.Kelvins(), new BraytonOptions { CompressorEfficiency = etaC, TurbineEfficiency = etaT, RegeneratorEffectiveness = eps, CompressionStages = 2, ExpansionStages = 2 });
                }
                catch (CycleDefinitionException e) when (e.Message.Contains("regenerator", StringComparison.Ordinal))
                {
                    // A regenerator whose hot side is colder than its cold side is refused, which is right.
                    return;
                }

                AssertBalances(r);
            }, iter: 200);
    }

    [Fact]
    public void Results_do_not_depend_on_the_input_units()
    {
        Gen.Select(Gen.Double[250, 350], Gen.Double[80, 120], Gen.Double[5, 20], Gen.Double[500, 2000]).Sample((tK, pkPa, r, qkJ) =>
        {
            var si = AirStandardCycles.Otto(Air, tK.Kelvins(), pkPa.Kilopascals(), r, heatAdded: qkJ.KilojoulesPerKilogram());
            var other = AirStandardCycles.Otto(Air, (tK - 273.15).DegreesCelsius(), (pkPa / 100).Bars(), r, heatAdded: UnitsNet.SpecificEnergy.FromKilojoulesPerKilogram(qkJ).As(UnitsNet.Units.SpecificEnergyUnit.BtuPerPound).BtuPerPound());
            Assert.Equal(si.Figures.ThermalEfficiency, other.Figures.ThermalEfficiency, 1e-12);
            Assert.Equal(si.Figures.NetWork, other.Figures.NetWork, 1e-9 * si.Figures.NetWork);
            for (int i = 0; i < si.States.Length; i++)
            {
                Assert.Equal(si.States[i].Point.T, other.States[i].Point.T, 1e-9 * si.States[i].Point.T);
                Assert.Equal(si.States[i].Point.P, other.States[i].Point.P, 1e-9 * si.States[i].Point.P);
            }
        }, iter: 100);
    }
}
