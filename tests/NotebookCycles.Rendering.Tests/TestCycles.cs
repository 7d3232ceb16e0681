using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Properties;
using NotebookCycles.Sweeps;
using NotebookCycles.Units.Literals;

namespace NotebookCycles.Rendering.Tests;

/// <summary>The cycles the rendering tests draw. Inputs are design-study examples, not reference data.</summary>
internal static class TestCycles
{
    public static CycleResult Otto() =>
        AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram());

    public static CycleResult Diesel() =>
        AirStandardCycles.Diesel(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 18, cutoffRatio: 2);

    /// <summary>Regenerative Brayton with component efficiencies below 1: irreversible steps have undefined paths (dashed).</summary>
    public static CycleResult RegenerativeBrayton() =>
        GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, 1300.Kelvins(), new BraytonOptions { CompressorEfficiency = 0.85, TurbineEfficiency = 0.88, RegeneratorEffectiveness = 0.8 });

    /// <summary>A Brayton cycle on the two-phase test double, so the diagrams carry a saturation dome.</summary>
    public static CycleResult OnSaturationModel() =>
        GasTurbineCycles.Brayton(new TwoPhaseTestFluid(), 300.Kelvins(), 100.Kilopascals(), 6, 900.Kelvins(), title: "Brayton on the two-phase test fluid");
}

/// <summary>
/// A test double for the rendering of saturation domes: single-phase states come from the cold-air-standard model and
/// the saturation line from simple invented closed forms (p_sat = pc·exp(B·(1 − Tc/T)), h_fg = L·(1 − T/Tc)^0.38).
/// It is not a model of any real fluid; tests assert only what the drawing contains.
/// </summary>
internal sealed class TwoPhaseTestFluid : ISaturationModel
{
    private const double Tc = 647.0, Pc = 22.0e6, B = 7.3, L = 2.9e6, Cl = 4180.0, T0 = 273.16;
    private readonly ColdAirStandard _gas = new();

    public string Name => "Two-phase test fluid (invented closed forms)";

    public string Citation => "Test double; invented closed forms, not property data.";

    public ValidityRange TemperatureRange => _gas.TemperatureRange;

    public ValidityRange PressureRange => _gas.PressureRange;

    public bool HasSaturation => true;

    public StatePoint CriticalPoint => Saturated(Tc, 0);

    public double SaturationTemperatureMinimum => T0;

    public double SaturationPressure(double temperature) => Pc * Math.Exp(B * (1 - Tc / temperature));

    public double SaturationTemperature(double pressure) => Tc / (1 - Math.Log(pressure / Pc) / B);

    public StatePoint FromTP(double temperature, double pressure) => _gas.FromTP(temperature, pressure);

    public StatePoint FromTV(double temperature, double specificVolume) => _gas.FromTV(temperature, specificVolume);

    public StatePoint FromPV(double pressure, double specificVolume) => _gas.FromPV(pressure, specificVolume);

    public StatePoint FromPH(double pressure, double enthalpy) => _gas.FromPH(pressure, enthalpy);

    public StatePoint FromPS(double pressure, double entropy) => _gas.FromPS(pressure, entropy);

    public StatePoint FromVU(double specificVolume, double internalEnergy) => _gas.FromVU(specificVolume, internalEnergy);

    public StatePoint FromVS(double specificVolume, double entropy) => _gas.FromVS(specificVolume, entropy);

    public StatePoint FromTS(double temperature, double entropy) => _gas.FromTS(temperature, entropy);

    public StatePoint FromTX(double temperature, double quality) => Saturated(temperature, quality);

    public StatePoint FromPX(double pressure, double quality) => Saturated(SaturationTemperature(pressure), quality);

    private StatePoint Saturated(double t, double x)
    {
        double p = SaturationPressure(t);
        double hf = Cl * (t - T0), sf = Cl * Math.Log(t / T0);
        double hfg = L * Math.Pow(Math.Max(0, 1 - t / Tc), 0.38);
        double vf = 0.001, vg = Math.Max(vf, 461.5 * t / p);
        double h = hf + x * hfg, v = vf + x * (vg - vf);
        return new StatePoint(t, p, v, h - p * v, h, sf + x * hfg / t, double.NaN, double.NaN, double.NaN, x, Phase.TwoPhase);
    }
}

/// <summary>The sweeps, optima and comparisons the rendering tests draw. Design-study inputs, not reference data.</summary>
internal static class TestSweeps
{
    /// <summary>Brayton efficiency over the pressure ratio at 1300 K turbine inlet; the first point (ratio 1) fails.</summary>
    public static SweepResult BraytonOverPressureRatio(string parameter = "pressure ratio") =>
        Sweep.Over(parameter, [1, 2, 4, 8, 12, 16, 24], rp => Brayton(rp, 1300), title: "Brayton cycle over the pressure ratio");

    /// <summary>Pressure ratio × turbine inlet temperature: three curves.</summary>
    public static SweepResult BraytonOverRatioAndTemperature() =>
        Sweep.Over("pressure ratio", ParameterRange.Linear(2, 20, 10), "turbine inlet temperature, K", [1100, 1300, 1500], Brayton, title: "Brayton cycle, two parameters");

    /// <summary>Otto cycles over 200 compression ratios (a large sweep: the table shows a subset).</summary>
    public static SweepResult OttoOverManyRatios() =>
        Sweep.Over("compression ratio", ParameterRange.Linear(4, 16, 200), r => AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), r, heatAdded: 1800.KilojoulesPerKilogram()));

    /// <summary>The Brayton pressure ratio of greatest net work at 1300 K, between 2 and 30.</summary>
    public static OptimumResult BraytonBestNetWork() => Optimum.MaximumNetWork("pressure ratio", 2, 30, rp => Brayton(rp, 1300), relativeTolerance: 1e-6);

    /// <summary>Three named variants: an ideal Brayton, one with component losses and one with a regenerator.</summary>
    public static CycleComparison BraytonVariants() => CycleComparison.Of(
        "Brayton variants",
        ("ideal", Brayton(8, 1300)),
        ("losses <85 % & 88 %>", GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, 1300.Kelvins(), new BraytonOptions { CompressorEfficiency = 0.85, TurbineEfficiency = 0.88 })),
        ("regenerated", TestCycles.RegenerativeBrayton()));

    public static CycleResult Brayton(double pressureRatio, double turbineInletKelvin) =>
        GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), pressureRatio, turbineInletKelvin.Kelvins());
}
