using System.Collections.Immutable;
using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>
/// A gas turbine with a steam bottoming cycle: the gas turbine's exhaust raises steam in a single-pressure
/// heat-recovery steam generator (HRSG). The gas-to-steam mass ratio follows from the HRSG balance between the gas
/// inlet and the pinch point (gas at T_sat + ΔT_pinch where the water starts to boil).
/// </summary>
public sealed class CombinedCycleResult
{
    internal CombinedCycleResult(CycleResult gas, CycleResult steam, State exhaust, double ratio, double pinchGasTemperature, double stackTemperature, double stackEnthalpy, ImmutableArray<RecordLine> lines, ImmutableArray<CycleCheck> checks)
    {
        GasTurbine = gas;
        SteamCycle = steam;
        Exhaust = exhaust;
        GasToSteamMassRatio = ratio;
        PinchGasTemperature = pinchGasTemperature;
        StackTemperature = stackTemperature;
        StackEnthalpy = stackEnthalpy;
        Lines = lines;
        Checks = checks;
    }

    /// <summary>The topping gas-turbine cycle (per kg of gas).</summary>
    public CycleResult GasTurbine { get; }

    /// <summary>The bottoming steam cycle (per kg of steam).</summary>
    public CycleResult SteamCycle { get; }

    /// <summary>The gas state entering the HRSG.</summary>
    public State Exhaust { get; }

    /// <summary>kg of gas per kg of steam.</summary>
    public double GasToSteamMassRatio { get; }

    /// <summary>Gas temperature at the pinch point, K.</summary>
    public double PinchGasTemperature { get; }

    /// <summary>Gas temperature leaving the HRSG (stack), K.</summary>
    public double StackTemperature { get; }

    /// <summary>Gas enthalpy leaving the HRSG, J/kg (the gas model's datum).</summary>
    public double StackEnthalpy { get; }

    /// <summary>Net work per kg of gas: gas turbine plus the steam cycle's share, J/kg.</summary>
    public double NetWork => GasTurbine.Figures.NetWork + SteamCycle.Figures.NetWork / GasToSteamMassRatio;

    /// <summary>Combined thermal efficiency: net work over the gas turbine's heat in.</summary>
    public double ThermalEfficiency => NetWork / GasTurbine.Figures.HeatIn;

    /// <summary>Heat passed from gas to steam per kg of gas, J/kg.</summary>
    public double RecoveredHeat => SteamCycle.Figures.HeatIn / GasToSteamMassRatio;

    /// <summary>The record of the HRSG balance.</summary>
    public ImmutableArray<RecordLine> Lines { get; }

    /// <summary>The HRSG's checks (energy balance, no temperature cross), besides each cycle's own.</summary>
    public ImmutableArray<CycleCheck> Checks { get; }

    /// <inheritdoc />
    public override string ToString() => $"Combined cycle: w_net = {Units.SiText.Number(NetWork / 1000)} kJ/kg gas, η = {Units.SiText.Number(ThermalEfficiency)}, m_gas/m_steam = {Units.SiText.Number(GasToSteamMassRatio)}";
}

/// <summary>Gas turbine plus steam bottoming cycle with a single-pressure heat-recovery steam generator.</summary>
public static class CombinedCycles
{
    /// <summary>
    /// Couples a solved gas-turbine cycle with a Rankine bottoming cycle. The HRSG gas inlet is the state entering the
    /// gas cycle's last (heat-rejection) step. The steam cycle is solved by <see cref="SteamPlantCycles.Rankine"/>
    /// with the given design; its turbine inlet temperature must not exceed the exhaust temperature.
    /// </summary>
    public static CombinedCycleResult GasTurbineWithSteamBottoming(CycleResult gasTurbine, IPropertyModel water, Pressure steamPressure, Temperature steamTemperature, Pressure condenserPressure, TemperatureDelta pinchPointDifference, double pumpEfficiency = 1.0, double steamTurbineEfficiency = 1.0, string title = "Steam bottoming cycle")
    {
        ArgumentNullException.ThrowIfNull(gasTurbine);
        ArgumentNullException.ThrowIfNull(water);
        if (water is not ISaturationModel sat)
        {
            throw new CycleDefinitionException(title, "HRSG", null, $"the bottoming cycle needs a model with a liquid-vapour region; {water.Name} has none.");
        }

        if (gasTurbine.Kind != SystemKind.SteadyFlow)
        {
            throw new CycleDefinitionException(title, "HRSG", null, "the topping cycle must be a steady-flow gas turbine.");
        }

        var exhaust = gasTurbine.Steps[^1].From;
        double tGasIn = exhaust.Point.T;
        double pinch = pinchPointDifference.Kelvins;
        if (!(pinch > 0 && double.IsFinite(pinch)))
        {
            throw new CycleDefinitionException(title, "HRSG", null, $"the pinch-point temperature difference {Units.SiText.Number(pinch)} K must be positive.");
        }

        if (steamTemperature.Kelvins >= tGasIn)
        {
            throw new CycleDefinitionException(title, "HRSG", exhaust.Label, $"the steam temperature {Units.SiText.Number(steamTemperature.Kelvins)} K must be below the gas entering the HRSG ({Units.SiText.Number(tGasIn)} K at state {exhaust.Label}).");
        }

        var steam = SteamPlantCycles.Rankine(water, steamPressure, condenserPressure, new RankineOptions { TurbineInletTemperature = steamTemperature, PumpEfficiency = pumpEfficiency, TurbineEfficiency = steamTurbineEfficiency }, title);
        var feed = steam.Steps.First(s => s.Process.StartsWith("Boiler", StringComparison.Ordinal));
        double hFeed = feed.From.Point.H, hOut = feed.To.Point.H;
        double tSat = sat.SaturationTemperature(steamPressure.Pascals);
        double hSatLiquid = water.FromPX(steamPressure.Pascals, 0).H;
        double tPinchGas = tSat + pinch;
        if (tPinchGas >= tGasIn)
        {
            throw new CycleDefinitionException(title, "HRSG", exhaust.Label, $"the pinch-point gas temperature T_sat + ΔT = {Units.SiText.Number(tPinchGas)} K is not below the gas inlet {Units.SiText.Number(tGasIn)} K: no steam can be raised at {Units.SiText.Pressure(steamPressure.Pascals)}.");
        }

        var gasModel = gasTurbine.Model;
        double pGas = exhaust.Point.P;
        double hGasPinch = gasModel.FromTP(tPinchGas, pGas).H;
        double ratio = (hOut - hSatLiquid) / (exhaust.Point.H - hGasPinch);
        double hStack = hGasPinch - (hSatLiquid - hFeed) / ratio;
        var stack = gasModel.FromPH(pGas, hStack);
        if (stack.T <= feed.From.Point.T)
        {
            throw new CycleDefinitionException(title, "HRSG", null, $"the stack gas ({Units.SiText.Number(stack.T)} K) would be colder than the feedwater ({Units.SiText.Number(feed.From.Point.T)} K): the economiser crosses temperatures.");
        }

        var R = ImmutableArray.CreateBuilder<RecordLine>();
        R.Add(new RecordLine("T_pinch,gas", "T_sat(p_steam) + ΔT_pinch", "{0} + {1}", [new(tSat, QuantityKind.Temperature), new(pinch, QuantityKind.Temperature)], new(tPinchGas, QuantityKind.Temperature)));
        R.Add(new RecordLine("m_gas/m_steam", "(h_steam,out − h_f)/(h_gas,in − h_gas,pinch)", "({0} − {1}) / ({2} − {3})", [new(hOut, QuantityKind.SpecificEnergy), new(hSatLiquid, QuantityKind.SpecificEnergy), new(exhaust.Point.H, QuantityKind.SpecificEnergy), new(hGasPinch, QuantityKind.SpecificEnergy)], new(ratio, QuantityKind.Dimensionless), "(HRSG balance from the gas inlet to the pinch point)"));
        R.Add(new RecordLine("h_stack", "h_gas,pinch − (h_f − h_feed)·m_steam/m_gas", "{0} − ({1} − {2}) / {3}", [new(hGasPinch, QuantityKind.SpecificEnergy), new(hSatLiquid, QuantityKind.SpecificEnergy), new(hFeed, QuantityKind.SpecificEnergy), new(ratio, QuantityKind.Dimensionless)], new(hStack, QuantityKind.SpecificEnergy)));
        R.Add(new RecordLine("T_stack", "T(p, h_stack)", "T({0}, {1})", [new(pGas, QuantityKind.Pressure), new(hStack, QuantityKind.SpecificEnergy)], new(stack.T, QuantityKind.Temperature), $"by {gasModel.Name}"));

        double gasSide = exhaust.Point.H - hStack, steamSide = (hOut - hFeed) / ratio;
        double residual = Math.Abs(gasSide - steamSide);
        var checks = ImmutableArray.Create(new CycleCheck(CheckKind.FirstLaw, residual <= 1e-9 * gasSide, residual, 1e-9 * gasSide, gasSide, steamSide, null, null));
        return new CombinedCycleResult(gasTurbine, steam, exhaust, ratio, tPinchGas, stack.T, hStack, R.ToImmutable(), checks);
    }
}
