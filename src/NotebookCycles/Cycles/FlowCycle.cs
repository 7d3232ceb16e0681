using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>
/// A steady-flow cycle under construction: devices in a loop, per unit mass of the reference flow (the flow through
/// the first heat addition, normally the boiler or combustor). Immutable; the closing call solves the cycle.
/// Devices that couple two points of the loop (regenerators, feedwater heaters with bleeds) may refer to states
/// computed later in the chain; the chain is then solved by repeated passes until every coupled value agrees to
/// 1e-13 relative.
/// </summary>
public sealed class FlowCycle
{
    internal FlowCycle(Chain chain) => Chain = chain;

    internal Chain Chain { get; }

    /// <summary>The cycle's title.</summary>
    public string Title => Chain.Title;

    /// <summary>Starts the chain at a state fixed by exactly two of the properties.</summary>
    public FlowCycle Start(string label, Temperature? T = null, Pressure? p = null, SpecificVolume? v = null, SpecificEnergy? u = null, SpecificEnergy? h = null, SpecificEntropy? s = null, double? x = null) =>
        new(Chain.WithStart(label, T, p, v, u, h, s, x));

    /// <summary>Starts the chain at a state computed beforehand with the same model.</summary>
    public FlowCycle Start(State state) => new(Chain.WithStart(state));

    /// <summary>A compressor with isentropic efficiency η (1 = isentropic): to a pressure, by a pressure ratio p2/p1 &gt; 1, or to an earlier state's pressure.</summary>
    public FlowCycle Compress(string label, double? pressureRatio = null, Pressure? toPressure = null, string? toPressureOf = null, double efficiency = 1.0) =>
        Machine(label, "Compressor", true, pressureRatio, toPressure, toPressureOf, efficiency);

    /// <summary>A pump with isentropic efficiency η.</summary>
    public FlowCycle Pump(string label, Pressure? toPressure = null, double? pressureRatio = null, string? toPressureOf = null, double efficiency = 1.0) =>
        Machine(label, "Pump", true, pressureRatio, toPressure, toPressureOf, efficiency);

    /// <summary>A turbine with isentropic efficiency η: to a pressure, by an expansion ratio p1/p2 &gt; 1, or to an earlier state's pressure.</summary>
    public FlowCycle Expand(string label, Pressure? toPressure = null, double? pressureRatio = null, string? toPressureOf = null, double efficiency = 1.0) =>
        Machine(label, "Turbine", false, pressureRatio, toPressure, toPressureOf, efficiency);

    /// <summary>Internally reversible isothermal compression in flow (the Ericsson cycle).</summary>
    public FlowCycle CompressIsothermal(string label, double? pressureRatio = null, Pressure? toPressure = null, string? toPressureOf = null, Temperature? boundaryTemperature = null) =>
        new(Chain.Then(new IsothermalSpec(label, true, Chain.Target("isothermal compression", pressureRatio, null, toPressure, null, toPressureOf, null), boundaryTemperature?.Kelvins)));

    /// <summary>Internally reversible isothermal expansion in flow (the Ericsson cycle).</summary>
    public FlowCycle ExpandIsothermal(string label, double? pressureRatio = null, Pressure? toPressure = null, string? toPressureOf = null, Temperature? boundaryTemperature = null) =>
        new(Chain.Then(new IsothermalSpec(label, false, Chain.Target("isothermal expansion", pressureRatio, null, toPressure, null, toPressureOf, null), boundaryTemperature?.Kelvins)));

    /// <summary>Isothermal compression back to the start state, closing and solving the cycle.</summary>
    public CycleResult CompressIsothermal(string backTo) => Chain.Close(new IsothermalCloseSpec(true, backTo, null));

    /// <summary>A heater (combustor, heat-source exchanger) by heat q, to a temperature or to a quality, with a fractional pressure loss.</summary>
    public FlowCycle Heat(string label, Temperature? toTemperature = null, SpecificEnergy? q = null, double? toQuality = null, double pressureLoss = 0, Temperature? boundaryTemperature = null) =>
        HeatExchanger(label, "Heater", true, toTemperature, q, toQuality, pressureLoss, boundaryTemperature);

    /// <summary>A boiler (with superheater) by heat q, to a temperature or to a quality, with a fractional pressure loss.</summary>
    public FlowCycle Boil(string label, Temperature? toTemperature = null, SpecificEnergy? q = null, double? toQuality = null, double pressureLoss = 0, Temperature? boundaryTemperature = null) =>
        HeatExchanger(label, "Boiler", true, toTemperature, q, toQuality, pressureLoss, boundaryTemperature);

    /// <summary>A reheater between turbine stages.</summary>
    public FlowCycle Reheat(string label, Temperature? toTemperature = null, SpecificEnergy? q = null, double pressureLoss = 0, Temperature? boundaryTemperature = null) =>
        HeatExchanger(label, "Reheater", true, toTemperature, q, null, pressureLoss, boundaryTemperature);

    /// <summary>A cooler by heat q (a positive amount rejected), to a temperature or to a quality.</summary>
    public FlowCycle Cool(string label, Temperature? toTemperature = null, SpecificEnergy? q = null, double? toQuality = null, double pressureLoss = 0, Temperature? boundaryTemperature = null) =>
        HeatExchanger(label, "Cooler", false, toTemperature, q, toQuality, pressureLoss, boundaryTemperature);

    /// <summary>An intercooler between compressor stages.</summary>
    public FlowCycle Intercool(string label, Temperature? toTemperature = null, SpecificEnergy? q = null, double pressureLoss = 0, Temperature? boundaryTemperature = null) =>
        HeatExchanger(label, "Intercooler", false, toTemperature, q, null, pressureLoss, boundaryTemperature);

    /// <summary>A condenser by heat, to a temperature or to a quality.</summary>
    public FlowCycle Condense(string label, Temperature? toTemperature = null, SpecificEnergy? q = null, double? toQuality = null, double pressureLoss = 0, Temperature? boundaryTemperature = null) =>
        HeatExchanger(label, "Condenser", false, toTemperature, q, toQuality, pressureLoss, boundaryTemperature);

    /// <summary>A cooler back to the start state, closing and solving the cycle.</summary>
    public CycleResult Cool(string backTo) => Close("Cooler", false, backTo, null, 0);

    /// <summary>A cooler back to the start state, with the sink temperature or a pressure loss given.</summary>
    public CycleResult Cool(string backTo, Temperature? boundaryTemperature = null, double pressureLoss = 0) => Close("Cooler", false, backTo, boundaryTemperature, pressureLoss);

    /// <summary>A condenser back to the start state, closing and solving the cycle.</summary>
    public CycleResult Condense(string backTo) => Close("Condenser", false, backTo, null, 0);

    /// <summary>A condenser back to the start state, with the sink temperature or a pressure loss given.</summary>
    public CycleResult Condense(string backTo, Temperature? boundaryTemperature = null, double pressureLoss = 0) => Close("Condenser", false, backTo, boundaryTemperature, pressureLoss);

    /// <summary>A heat source back to the start state (closing a reversed cycle, for example an evaporator).</summary>
    public CycleResult Heat(string backTo) => Close("Heater", true, backTo, null, 0);

    /// <summary>A throttling valve (isenthalpic).</summary>
    public FlowCycle Throttle(string label, Pressure? toPressure = null, double? pressureRatio = null, string? toPressureOf = null) =>
        new(Chain.Then(new ThrottleSpec(label, Chain.Target("throttling", pressureRatio, null, toPressure, null, toPressureOf, null))));

    /// <summary>
    /// The cold side of a regenerator (recuperator) of effectiveness ε: the stream is heated towards the temperature of
    /// the hot inlet state <paramref name="hotInlet"/>, which may come later in the chain.
    /// </summary>
    public FlowCycle HeatInRegenerator(string label, string hotInlet, double effectiveness, double pressureLoss = 0) =>
        new(Chain.Then(new RegeneratorColdSpec(label, hotInlet, effectiveness, pressureLoss)));

    /// <summary>The hot side of the regenerator whose cold side ends at <paramref name="coldOutlet"/>: the outlet from the energy balance.</summary>
    public FlowCycle CoolInRegenerator(string label, string coldOutlet, double pressureLoss = 0) =>
        new(Chain.Then(new RegeneratorHotSpec(label, coldOutlet, pressureLoss)));

    /// <summary>
    /// An open feedwater heater at the current pressure, fed by steam bled from state <paramref name="bleedFrom"/>
    /// (a turbine state later in the chain). The outlet is saturated liquid; the bleed fraction is solved from the
    /// heater's energy balance and leaves the turbine flow after that state.
    /// </summary>
    public FlowCycle OpenFeedwaterHeater(string label, string bleedFrom) =>
        new(Chain.Then(new OpenFeedwaterHeaterSpec(label, bleedFrom)));

    /// <summary>
    /// A closed feedwater heater fed by steam bled from <paramref name="bleedFrom"/>: the feedwater leaves at
    /// T_sat(p_bleed) − TTD at its own pressure. The drain is pumped forward into the feedwater (pump efficiency
    /// given), or cascaded back to the heater or condenser whose outlet state is <paramref name="drainTo"/>.
    /// </summary>
    public FlowCycle ClosedFeedwaterHeater(string label, string bleedFrom, TemperatureDelta? terminalTemperatureDifference = null, DrainRouting drain = DrainRouting.PumpedForward, string? drainTo = null, double drainPumpEfficiency = 1.0) =>
        new(Chain.Then(new ClosedFeedwaterHeaterSpec(label, bleedFrom, terminalTemperatureDifference?.Kelvins ?? 0, drain, drainTo, drainPumpEfficiency)));

    private FlowCycle Machine(string label, string device, bool compression, double? pressureRatio, Pressure? toPressure, string? toPressureOf, double efficiency) =>
        new(Chain.Then(new MachineSpec(label, device, compression, Chain.Target(device.ToLowerInvariant(), pressureRatio, null, toPressure, null, toPressureOf, null), efficiency)));

    private FlowCycle HeatExchanger(string label, string device, bool heating, Temperature? toTemperature, SpecificEnergy? q, double? toQuality, double pressureLoss, Temperature? boundaryTemperature)
    {
        var (end, value) = Chain.HeatEndOf(device.ToLowerInvariant(), heating, q, toTemperature, null, null, null, toQuality);
        return new(Chain.Then(new HeatSpec(label, device, PathLaw.ConstantPressure, heating, end, value, boundaryTemperature?.Kelvins, false, pressureLoss, null)));
    }

    private CycleResult Close(string device, bool heating, string backTo, Temperature? boundaryTemperature, double pressureLoss) =>
        Chain.Close(new HeatSpec(null, device, PathLaw.ConstantPressure, heating, HeatEnd.BackToStart, double.NaN, boundaryTemperature?.Kelvins, false, pressureLoss, backTo));
}
