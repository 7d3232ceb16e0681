using System.Collections.Immutable;
using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>Design choices of a single-stage vapour-compression cycle beyond its saturation temperatures.</summary>
public sealed record VapourCompressionOptions
{
    /// <summary>Superheat of the vapour leaving the evaporator, K (default 0: saturated vapour).</summary>
    public TemperatureDelta Superheat { get; init; } = TemperatureDelta.Zero;

    /// <summary>Subcooling of the liquid leaving the condenser, K (default 0: saturated liquid).</summary>
    public TemperatureDelta Subcooling { get; init; } = TemperatureDelta.Zero;

    /// <summary>Compressor isentropic efficiency, (0, 1]; default 1.</summary>
    public double CompressorEfficiency { get; init; } = 1.0;

    /// <summary>
    /// Effectiveness of a suction-line heat exchanger in [0, 1], or null for none: the suction vapour (state 1) is
    /// heated towards the condenser outlet temperature (state 3) to state 1a, and the liquid cools from 3 to 3a before
    /// the valve.
    /// </summary>
    public double? SuctionLineEffectiveness { get; init; }
}

/// <summary>Ready-made vapour-compression refrigeration and heat-pump cycles, solved through the steady-flow chain.</summary>
public static class RefrigerationCycles
{
    /// <summary>
    /// Single-stage vapour compression: 1 = evaporator outlet (saturated vapour at the evaporating temperature plus the
    /// superheat) → compressor (isentropic efficiency η) → 2 → condenser to 3 (saturated liquid at the condensing
    /// temperature minus the subcooling) → expansion valve (isenthalpic) → 4 → evaporator back to 1. Per unit mass of
    /// refrigerant. Throws <see cref="CycleDefinitionException"/> when the evaporating temperature is not below the
    /// condensing temperature, or the condensing temperature is not below the fluid's critical temperature (a
    /// subcritical condenser needs a saturation line; a transcritical cycle is a different design).
    /// </summary>
    public static CycleResult VapourCompression(ISaturationModel refrigerant, Temperature evaporating, Temperature condensing, VapourCompressionOptions? design = null, string title = "Vapour-compression cycle", CycleOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(refrigerant);
        design ??= new VapourCompressionOptions();
        double te = evaporating.Kelvins, tc = condensing.Kelvins, tcrit = refrigerant.CriticalPoint.T;
        if (!(te < tc))
        {
            throw new CycleDefinitionException(title, "design", null, $"the evaporating temperature {Units.SiText.Format(StateProperty.Temperature, te)} must be below the condensing temperature {Units.SiText.Format(StateProperty.Temperature, tc)}.");
        }

        if (!(tc < tcrit))
        {
            throw new CycleDefinitionException(title, "design", null, $"the condensing temperature {Units.SiText.Format(StateProperty.Temperature, tc)} is not below the critical temperature of {refrigerant.Name} ({Units.SiText.Format(StateProperty.Temperature, tcrit)}): there is no condensation; a transcritical cycle with a gas cooler is needed.");
        }

        if (!(te >= refrigerant.SaturationTemperatureMinimum))
        {
            throw new CycleDefinitionException(title, "design", null, $"the evaporating temperature {Units.SiText.Format(StateProperty.Temperature, te)} is below the lowest saturation temperature of {refrigerant.Name} ({Units.SiText.Format(StateProperty.Temperature, refrigerant.SaturationTemperatureMinimum)}).");
        }

        double sh = design.Superheat.Kelvins, sc = design.Subcooling.Kelvins;
        if (!(sh >= 0) || !(sc >= 0) || !double.IsFinite(sh) || !double.IsFinite(sc))
        {
            throw new CycleDefinitionException(title, "design", null, $"superheat ({Units.SiText.Number(sh)} K) and subcooling ({Units.SiText.Number(sc)} K) must be finite and not negative.");
        }

        if (!(tc - sc >= refrigerant.SaturationTemperatureMinimum))
        {
            throw new CycleDefinitionException(title, "design", "3", $"a subcooling of {Units.SiText.Number(sc)} K takes the liquid below the triple point.");
        }

        var pe = Pressure.FromPascals(refrigerant.SaturationPressure(te));
        var pc = Pressure.FromPascals(refrigerant.SaturationPressure(tc));
        var chain = Cycle.SteadyFlow(title, refrigerant, options);
        chain = sh > 0 ? chain.Start("1", T: Temperature.FromKelvins(te + sh), p: pe) : chain.Start("1", p: pe, x: 1);
        bool slhx = design.SuctionLineEffectiveness is not null;
        if (slhx)
        {
            chain = chain.HeatInRegenerator("1a", hotInlet: "3", effectiveness: design.SuctionLineEffectiveness!.Value);
        }

        chain = chain.Compress("2", toPressure: pc, efficiency: design.CompressorEfficiency);
        chain = sc > 0 ? chain.Condense("3", toTemperature: Temperature.FromKelvins(tc - sc)) : chain.Condense("3", toQuality: 0);
        if (slhx)
        {
            chain = chain.CoolInRegenerator("3a", coldOutlet: "1a");
        }

        return chain.Throttle("4", toPressure: pe).Heat(backTo: "1");
    }

    /// <summary>
    /// As <see cref="VapourCompression(ISaturationModel, Temperature, Temperature, VapourCompressionOptions?, string, CycleOptions?)"/>,
    /// with the evaporator and condenser given by their pressures (the saturation temperatures follow from the model).
    /// </summary>
    public static CycleResult VapourCompression(ISaturationModel refrigerant, Pressure evaporatorPressure, Pressure condenserPressure, VapourCompressionOptions? design = null, string title = "Vapour-compression cycle", CycleOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(refrigerant);
        double pe = evaporatorPressure.Pascals, pc = condenserPressure.Pascals;
        if (!(pe < pc))
        {
            throw new CycleDefinitionException(title, "design", null, $"the evaporator pressure {Units.SiText.Pressure(pe)} must be below the condenser pressure {Units.SiText.Pressure(pc)}.");
        }

        if (!(pc < refrigerant.CriticalPoint.P))
        {
            throw new CycleDefinitionException(title, "design", null, $"the condenser pressure {Units.SiText.Pressure(pc)} is not below the critical pressure of {refrigerant.Name} ({Units.SiText.Pressure(refrigerant.CriticalPoint.P)}): there is no condensation; a transcritical cycle with a gas cooler is needed.");
        }

        return VapourCompression(refrigerant, Temperature.FromKelvins(refrigerant.SaturationTemperature(pe)), Temperature.FromKelvins(refrigerant.SaturationTemperature(pc)), design, title, options);
    }

    /// <summary>
    /// Transcritical vapour compression (typically CO₂): 1 = evaporator outlet (saturated vapour plus the superheat
    /// of <paramref name="design"/>) → compressor to the high-side pressure → 2 → gas cooler at that pressure to the
    /// outlet temperature → 3 → expansion valve → 4 → evaporator back to 1. The high-side pressure must exceed the
    /// critical pressure, and the gas-cooler outlet temperature must not be below the critical temperature (below it
    /// the fluid condenses: use <see cref="VapourCompression(ISaturationModel, Temperature, Temperature, VapourCompressionOptions?, string, CycleOptions?)"/>).
    /// The subcooling of <paramref name="design"/> does not apply.
    /// </summary>
    public static CycleResult Transcritical(ISaturationModel refrigerant, Temperature evaporating, Temperature gasCoolerOutlet, Pressure highSidePressure, VapourCompressionOptions? design = null, string title = "Transcritical vapour-compression cycle", CycleOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(refrigerant);
        design ??= new VapourCompressionOptions();
        var critical = refrigerant.CriticalPoint;
        double te = evaporating.Kelvins, tout = gasCoolerOutlet.Kelvins, ph = highSidePressure.Pascals;
        if (!(ph > critical.P))
        {
            throw new CycleDefinitionException(title, "design", null, $"the high-side pressure {Units.SiText.Pressure(ph)} is not above the critical pressure of {refrigerant.Name} ({Units.SiText.Pressure(critical.P)}): the cycle is subcritical; use a condenser.");
        }

        if (!(tout >= critical.T))
        {
            throw new CycleDefinitionException(title, "design", null, $"the critical temperature of {refrigerant.Name} ({Units.SiText.Format(StateProperty.Temperature, critical.T)}) is above the gas-cooler outlet temperature {Units.SiText.Format(StateProperty.Temperature, tout)}: the fluid condenses there, so a transcritical cycle is refused; use a subcritical cycle with a condenser.");
        }

        if (!(te >= refrigerant.SaturationTemperatureMinimum && te < critical.T))
        {
            throw new CycleDefinitionException(title, "design", null, $"the evaporating temperature {Units.SiText.Format(StateProperty.Temperature, te)} must lie between the lowest saturation temperature ({Units.SiText.Format(StateProperty.Temperature, refrigerant.SaturationTemperatureMinimum)}) and the critical temperature ({Units.SiText.Format(StateProperty.Temperature, critical.T)}).");
        }

        double sh = design.Superheat.Kelvins;
        if (!(sh >= 0) || !double.IsFinite(sh))
        {
            throw new CycleDefinitionException(title, "design", null, $"the superheat ({Units.SiText.Number(sh)} K) must be finite and not negative.");
        }

        var pe = Pressure.FromPascals(refrigerant.SaturationPressure(te));
        var chain = Cycle.SteadyFlow(title, refrigerant, options);
        chain = sh > 0 ? chain.Start("1", T: Temperature.FromKelvins(te + sh), p: pe) : chain.Start("1", p: pe, x: 1);
        return chain.Compress("2", toPressure: highSidePressure, efficiency: design.CompressorEfficiency)
            .Cool("3", toTemperature: gasCoolerOutlet)
            .Throttle("4", toPressure: pe)
            .Heat(backTo: "1");
    }
    /// <summary>
    /// The high-side pressure that maximises the cooling COP of a transcritical cycle (<see cref="Transcritical"/>),
    /// searched between <paramref name="lowest"/> and <paramref name="highest"/> with the sweep machinery's optimum
    /// search (a scan, then golden section; it never leaves the interval). Below the optimum the gas-cooler outlet
    /// enthalpy rises steeply and the refrigerating effect falls; above it the compressor work grows faster than the effect.
    /// </summary>
    public static NotebookCycles.Sweeps.OptimumResult OptimumHighSidePressure(ISaturationModel refrigerant, Temperature evaporating, Temperature gasCoolerOutlet, Pressure lowest, Pressure highest, VapourCompressionOptions? design = null, double relativeTolerance = 1e-7)
    {
        ArgumentNullException.ThrowIfNull(refrigerant);
        var record = new CycleOptions { Record = false };
        return NotebookCycles.Sweeps.Optimum.Maximize(
            "high-side pressure (Pa)",
            lowest.Pascals,
            highest.Pascals,
            p => Transcritical(refrigerant, evaporating, gasCoolerOutlet, Pressure.FromPascals(p), design, options: record),
            r => r.Figures.CopCooling,
            relativeTolerance: relativeTolerance);
    }

    /// <summary>
    /// Two-stage vapour compression with a flash tank (open flash intercooler): 1 = evaporator outlet (saturated vapour
    /// plus the superheat) → low-stage compressor to the intermediate pressure → 2 → mixing with the flash tank's
    /// saturated vapour → 3 → high-stage compressor → 4 → condenser → 5 (saturated liquid minus the subcooling) →
    /// valve to the intermediate pressure → 6 → flash tank: the vapour goes to the mixer, the saturated liquid on →
    /// 7 → valve → 8 → evaporator back to 1. The vapour fraction is solved by repeated passes of the chain; figures are
    /// per unit mass through the condenser (the evaporator carries 1 − x6). The intermediate pressure defaults to
    /// the geometric mean √(p_evap·p_cond).
    /// </summary>
    public static CycleResult TwoStageFlashTank(ISaturationModel refrigerant, Temperature evaporating, Temperature condensing, Pressure? intermediatePressure = null, VapourCompressionOptions? design = null, string title = "Two-stage vapour-compression cycle with flash tank", CycleOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(refrigerant);
        design ??= new VapourCompressionOptions();
        // The same design checks as the single-stage cycle.
        double te = evaporating.Kelvins, tc = condensing.Kelvins, tcrit = refrigerant.CriticalPoint.T;
        if (!(te < tc))
        {
            throw new CycleDefinitionException(title, "design", null, $"the evaporating temperature {Units.SiText.Format(StateProperty.Temperature, te)} must be below the condensing temperature {Units.SiText.Format(StateProperty.Temperature, tc)}.");
        }

        if (!(tc < tcrit))
        {
            throw new CycleDefinitionException(title, "design", null, $"the condensing temperature {Units.SiText.Format(StateProperty.Temperature, tc)} is not below the critical temperature of {refrigerant.Name} ({Units.SiText.Format(StateProperty.Temperature, tcrit)}): there is no condensation; a transcritical cycle with a gas cooler is needed.");
        }

        double pe = refrigerant.SaturationPressure(te), pc = refrigerant.SaturationPressure(tc);
        double pi = intermediatePressure?.Pascals ?? Math.Sqrt(pe * pc);
        if (!(pi > pe && pi < pc))
        {
            throw new CycleDefinitionException(title, "design", null, $"the intermediate pressure {Units.SiText.Pressure(pi)} must lie between the evaporator ({Units.SiText.Pressure(pe)}) and the condenser ({Units.SiText.Pressure(pc)}).");
        }

        double sh = design.Superheat.Kelvins, sc = design.Subcooling.Kelvins;
        if (!(sh >= 0) || !(sc >= 0) || !double.IsFinite(sh) || !double.IsFinite(sc))
        {
            throw new CycleDefinitionException(title, "design", null, $"superheat ({Units.SiText.Number(sh)} K) and subcooling ({Units.SiText.Number(sc)} K) must be finite and not negative.");
        }

        var pEvap = Pressure.FromPascals(pe);
        var pMid = Pressure.FromPascals(pi);
        var chain = Cycle.SteadyFlow(title, refrigerant, options);
        chain = sh > 0 ? chain.Start("1", T: Temperature.FromKelvins(te + sh), p: pEvap) : chain.Start("1", p: pEvap, x: 1);
        chain = chain.Compress("2", toPressure: pMid, efficiency: design.CompressorEfficiency);
        chain = new FlowCycle(chain.Chain.Then(new FlashVapourMixingSpec("3", "6")));
        chain = chain.Compress("4", toPressure: Pressure.FromPascals(pc), efficiency: design.CompressorEfficiency);
        chain = sc > 0 ? chain.Condense("5", toTemperature: Temperature.FromKelvins(tc - sc)) : chain.Condense("5", toQuality: 0);
        chain = chain.Throttle("6", toPressure: pMid);
        chain = new FlowCycle(chain.Chain.Then(new FlashTankLiquidSpec("7")));
        return chain.Throttle("8", toPressure: pEvap).Heat(backTo: "1");
    }
}

/// <summary>
/// Adiabatic mixing of the stream with the saturated vapour a flash tank at the same pressure sends back: the vapour
/// flow y = x·m/(1 − x) follows from the quality x of the flash tank's inlet state (computed later in the chain,
/// taken from the previous pass) and leaves the stream after that state.
/// </summary>
internal sealed class FlashVapourMixingSpec(string label, string flashInlet) : ProcessSpec(label)
{
    public override bool Couples => true;

    public override string Describe => "mixing with flash-tank vapour";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string to = Label!;
        var vapour = c.Compute(to, StateProperty.Pressure, a.P, StateProperty.Quality, 1);
        var flash = c.Anywhere(flashInlet);
        double m = c.Flow, y = 0;
        if (flash is not null)
        {
            if (Math.Abs(flash.Point.P - a.P) > 1e-9 * a.P)
            {
                throw c.Error(to, $"the flash tank (state {flashInlet}, p = {Units.SiText.Pressure(flash.Point.P)}) is not at the mixing pressure {Units.SiText.Pressure(a.P)}.");
            }

            double x = flash.Point.IsTwoPhase ? flash.Point.X : 0;
            y = x * m / (1 - x);
        }

        double h = (m * a.H + y * vapour.H) / (m + y);
        var b = c.Compute(to, StateProperty.Pressure, a.P, StateProperty.Enthalpy, h);
        c.AddBleed(flashInlet, y);
        double mOut = m + y;
        double sgen = (mOut * b.S - m * a.S - y * vapour.S) / mOut;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            lines =
            [
                Rec.Line("y", $"x{flashInlet}·m/(1 − x{flashInlet})", "", Rec.N(y)),
                Rec.Line("h" + to, "(m·h + y·h″)/(m + y)", "({0} × {1} + {2} × {3}) / ({0} + {2})", Rec.E(b.H), Rec.N(m), Rec.E(a.H), Rec.N(y), Rec.E(vapour.H)),
            ];
        }

        c.AddStep("Mixing with flash-tank vapour", PathLaw.Undefined, c.NewState(to, b), 0, 0, lines: lines, assumptions: ["adiabatic mixing at constant pressure", "flash-tank vapour saturated", "steady flow"], entropyGenerated: sgen, flowAfter: mOut, stepFlow: mOut);
    }
}

/// <summary>
/// The liquid outlet of a flash tank: the two-phase inlet separates into saturated vapour (sent back to the mixer; it
/// left the stream after the inlet state) and saturated liquid at the same pressure, which continues.
/// </summary>
internal sealed class FlashTankLiquidSpec(string label) : ProcessSpec(label)
{
    public override bool Couples => true;

    public override string Describe => "flash tank, liquid outlet";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string to = Label!;
        if (!a.IsTwoPhase)
        {
            throw c.Error(to, $"the flash tank's inlet (state {c.Current.Label}) is not a liquid-vapour mixture; raise the condenser pressure or lower the intermediate pressure.");
        }

        var b = c.Compute(to, StateProperty.Pressure, a.P, StateProperty.Quality, 0);
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            lines = [Rec.Lookup(c, to, "h", Rec.E(b.H), "p", Rec.P(b.P), "x", Rec.N(0))];
        }

        // Separating the phases of an equilibrium mixture generates no entropy.
        c.AddStep("Flash tank (saturated liquid out)", PathLaw.Undefined, c.NewState(to, b), 0, 0, lines: lines, assumptions: ["adiabatic", "phases separated at equilibrium"], entropyGenerated: 0);
    }
}

/// <summary>
/// Figures of a single-stage vapour-compression cycle (states 1 to 4 as the <see cref="RefrigerationCycles"/> templates
/// labels them), computed from its <see cref="CycleResult"/>. SI units.
/// </summary>
/// <param name="RefrigeratingEffect">q_L = h1 − h4, J/kg.</param>
/// <param name="CompressorWork">w = h2 − h1, J/kg.</param>
/// <param name="CopCooling">q_L / w.</param>
/// <param name="CopHeating">(h2 − h3) / w.</param>
/// <param name="DischargeTemperature">T2, K.</param>
/// <param name="PressureRatio">p2 / p1.</param>
/// <param name="VolumetricCapacity">q_L / v1, refrigerating effect per unit volume drawn into the compressor, J/m³.</param>
/// <param name="EvaporatingTemperature">Saturation temperature at p1, K.</param>
/// <param name="CondensingTemperature">Saturation temperature at p2, K (for a transcritical cycle the gas-cooler outlet temperature T3).</param>
/// <param name="CarnotCop">T_evap / (T_cond − T_evap), cooling.</param>
/// <param name="SuctionSpecificVolume">Specific volume at the compressor inlet, m³/kg.</param>
public sealed record VapourCompressionFigures(
    double RefrigeratingEffect,
    double CompressorWork,
    double CopCooling,
    double CopHeating,
    double DischargeTemperature,
    double PressureRatio,
    double VolumetricCapacity,
    double EvaporatingTemperature,
    double CondensingTemperature,
    double CarnotCop,
    double SuctionSpecificVolume)
{
    /// <summary>
    /// Mass flow (kg/s) drawn by a compressor of swept volume rate <paramref name="displacement"/> (m³/s) at volumetric
    /// efficiency <paramref name="volumetricEfficiency"/> in (0, 1]: η_v·V̇/v_suction.
    /// </summary>
    public double MassFlowFromDisplacement(double displacement, double volumetricEfficiency)
    {
        if (!(volumetricEfficiency > 0 && volumetricEfficiency <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(volumetricEfficiency), volumetricEfficiency, "The volumetric efficiency must lie in (0, 1].");
        }

        if (!(displacement > 0 && double.IsFinite(displacement)))
        {
            throw new ArgumentOutOfRangeException(nameof(displacement), displacement, "The displacement must be a positive finite number of m³/s.");
        }

        return volumetricEfficiency * displacement / SuctionSpecificVolume;
    }

    /// <summary>Refrigerant mass flow (kg/s) that gives the cooling capacity <paramref name="capacity"/>: Q / q_L.</summary>
    public double MassFlowForCooling(UnitsNet.Power capacity) => (double)capacity.Watts / RefrigeratingEffect;

    /// <summary>Refrigerant mass flow (kg/s) that gives the heating capacity <paramref name="capacity"/>: Q / (q_L + w).</summary>
    public double MassFlowForHeating(UnitsNet.Power capacity) => (double)capacity.Watts / (RefrigeratingEffect + CompressorWork);

    /// <summary>The figures of a solved cycle whose model has a saturation line and whose states are labelled 1 to 4.</summary>
    public static VapourCompressionFigures From(CycleResult cycle)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        if (cycle.Model is not ISaturationModel model)
        {
            throw new ArgumentException($"{cycle.Title}: the model {cycle.Model.Name} has no saturation line.", nameof(cycle));
        }

        var s1 = cycle["1"].Point;
        var s2 = cycle["2"].Point;
        var s3 = cycle["3"].Point;
        var s4 = cycle["4"].Point;

        // With a suction-line heat exchanger the compressor draws state 1a; the evaporator still ends at 1.
        var suction = cycle.States.Any(s => s.Label == "1a") ? cycle["1a"].Point : s1;
        double qL = s1.H - s4.H, w = s2.H - suction.H;
        double te = model.SaturationTemperature(s1.P);
        double tc = s2.P < model.CriticalPoint.P ? model.SaturationTemperature(s2.P) : s3.T; // transcritical: the gas-cooler outlet
        return new VapourCompressionFigures(qL, w, qL / w, (s2.H - s3.H) / w, s2.T, s2.P / s1.P, qL / suction.V, te, tc, te / (tc - te), suction.V);
    }
}
