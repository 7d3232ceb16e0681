using System.Globalization;
using NotebookCycles.Cycles;
using NotebookCycles.Units.Literals;
using NotebookCycles.Water;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>
/// Rankine cycles against an independent computation: ReferenceData/rankine_crosscheck.csv, produced by
/// make_rankine_crosscheck.py with Debian's python3-iapws 1.5.3 (forward IF97 equations and bisection; see its header).
/// Two implementations of the same equations agree to about 1e-9 in properties; the cycle figures are compared to 1e-7.
/// </summary>
public sealed class SteamPlantCyclesTests
{
    private static readonly IapwsIf97 Steam = IapwsIf97.Default;

    private static (double Efficiency, double NetWork, double Third) Reference(string prefix)
    {
        foreach (var line in File.ReadLines(Path.Combine(AppContext.BaseDirectory, "ReferenceData", "rankine_crosscheck.csv")))
        {
            if (line.StartsWith('#') || !line.Contains(prefix, StringComparison.Ordinal))
            {
                continue;
            }

            var f = NotebookCycles.Tests.Water.ReferenceCsv.Split(line);
            if (f[0].StartsWith(prefix, StringComparison.Ordinal))
            {
                return (double.Parse(f[1], CultureInfo.InvariantCulture), double.Parse(f[2], CultureInfo.InvariantCulture) * 1000, double.Parse(f[3], CultureInfo.InvariantCulture));
            }
        }

        throw new InvalidOperationException("no reference row " + prefix);
    }

    [Fact]
    public void Ideal_saturated_cycle_matches_python3_iapws()
    {
        var (eta, w, x) = Reference("ideal saturated 8 MPa");
        var r = SteamPlantCycles.Rankine(Steam, 8.Megapascals(), 10.Kilopascals());
        Assert.Equal(eta, r.Figures.ThermalEfficiency, 1e-7);
        Assert.Equal(w, r.Figures.NetWork, 1e-7 * w);
        Assert.Equal(x, r["4"].Quality!.Value, 1e-7);
    }

    [Fact]
    public void Superheated_cycle_with_efficiencies_matches_python3_iapws()
    {
        var (eta, w, x) = Reference("superheat 10 MPa");
        var r = SteamPlantCycles.Rankine(Steam, 10.Megapascals(), 8.Kilopascals(), new RankineOptions { TurbineInletTemperature = 823.15.Kelvins(), PumpEfficiency = 0.85, TurbineEfficiency = 0.87 });
        Assert.Equal(eta, r.Figures.ThermalEfficiency, 1e-7);
        Assert.Equal(w, r.Figures.NetWork, 1e-7 * w);
        Assert.Equal(x, r["4"].Quality!.Value, 1e-7);
        Assert.Equal(3.6e6 / w, r.Figures.SpecificConsumption * 3.6e6, 1e-6);
    }

    [Fact]
    public void Reheat_regenerative_cycle_matches_python3_iapws()
    {
        var (eta, w, y) = Reference("reheat 15 MPa");
        var r = SteamPlantCycles.Rankine(Steam, 15.Megapascals(), 10.Kilopascals(), new RankineOptions
        {
            TurbineInletTemperature = 873.15.Kelvins(),
            ReheatPressure = 3.Megapascals(),
            ReheatTemperature = 873.15.Kelvins(),
            FeedwaterHeaters = [FeedwaterHeater.OpenAt(0.5.Megapascals())],
            PumpEfficiency = 0.9,
            TurbineEfficiency = 0.9,
        });
        Assert.Equal(9, r.States.Length);
        Assert.Equal(eta, r.Figures.ThermalEfficiency, 1e-7);
        Assert.Equal(w, r.Figures.NetWork, 1e-7 * w);
        var heater = r.Steps.Single(s => s.Process.StartsWith("Open feedwater heater", StringComparison.Ordinal));
        Assert.Equal(1 - y, heater.From.Label == "2" ? r.StateMassFractions[1] : double.NaN, 1e-7);
        Assert.Contains(heater.Lines, l => l.Target == "y8");
    }

    [Fact]
    public void Closed_heaters_pumped_forward_and_cascaded_back_balance()
    {
        foreach (var drain in new[] { DrainRouting.PumpedForward, DrainRouting.CascadedBack })
        {
            var r = SteamPlantCycles.Rankine(Steam, 12.Megapascals(), 10.Kilopascals(), new RankineOptions
            {
                TurbineInletTemperature = 813.15.Kelvins(),
                TurbineEfficiency = 0.88,
                PumpEfficiency = 0.85,
                FeedwaterHeaters = [FeedwaterHeater.ClosedAt(2.Megapascals(), drain), FeedwaterHeater.OpenAt(0.4.Megapascals()), FeedwaterHeater.ClosedAt(0.1.Megapascals(), drain)],
            });
            Assert.All(r.Checks, c => Assert.True(c.Passed, c.ToString()));
            Assert.All(r.Steps, s => Assert.True(s.EntropyGenerated >= -Steam.ConsistencyTolerance * Math.Max(Math.Abs(s.DeltaS), 1), s.Name + " " + drain));
            Assert.InRange(r.Figures.ThermalEfficiency, 0.35, 0.45);

            // Heaters help: more efficient than the same plant without them.
            var plain = SteamPlantCycles.Rankine(Steam, 12.Megapascals(), 10.Kilopascals(), new RankineOptions { TurbineInletTemperature = 813.15.Kelvins(), TurbineEfficiency = 0.88, PumpEfficiency = 0.85 });
            Assert.True(r.Figures.ThermalEfficiency > plain.Figures.ThermalEfficiency);
        }
    }

    [Fact]
    public void Combined_cycle_balances_the_heat_recovery_steam_generator()
    {
        var gas = GasTurbineCycles.Brayton(NotebookCycles.Gases.IdealGas.DryAir, 288.15.Kelvins(), 101.325.Kilopascals(), 14, 1500.Kelvins(), new BraytonOptions { CompressorEfficiency = 0.87, TurbineEfficiency = 0.9 });
        var cc = CombinedCycles.GasTurbineWithSteamBottoming(gas, Steam, 8.Megapascals(), 773.15.Kelvins(), 8.Kilopascals(), 10.KelvinsDifference(), 0.85, 0.88);
        double hGasIn = cc.Exhaust.Point.H;
        double hPinch = gas.Model.FromTP(cc.PinchGasTemperature, cc.Exhaust.Point.P).H;
        var boiler = cc.SteamCycle.Steps.Single(s => s.Process.StartsWith("Boiler", StringComparison.Ordinal));
        double hf = Steam.FromPX(8e6, 0).H;

        // HRSG balance, gas inlet to pinch: m_gas·(h_in − h_pinch) = m_steam·(h_out − h_f).
        Assert.Equal((boiler.To.Point.H - hf) / (hGasIn - hPinch), cc.GasToSteamMassRatio, 1e-12);
        Assert.Equal(cc.PinchGasTemperature, Steam.SaturationTemperature(8e6) + 10, 1e-9);
        Assert.True(cc.StackTemperature > boiler.From.Point.T);
        Assert.True(cc.ThermalEfficiency > gas.Figures.ThermalEfficiency);
        Assert.All(cc.Checks, c => Assert.True(c.Passed));
    }
}
