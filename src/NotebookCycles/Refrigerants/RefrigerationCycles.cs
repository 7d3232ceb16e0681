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
        chain = chain.Compress("2", toPressure: pc, efficiency: design.CompressorEfficiency);
        chain = sc > 0 ? chain.Condense("3", toTemperature: Temperature.FromKelvins(tc - sc)) : chain.Condense("3", toQuality: 0);
        return chain.Throttle("4", toPressure: pe).Heat(backTo: "1");
    }
}

/// <summary>
/// Figures of a single-stage vapour-compression cycle (states 1 to 4 as <see cref="RefrigerationCycles.VapourCompression"/>
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
/// <param name="CondensingTemperature">Saturation temperature at p2, K.</param>
/// <param name="CarnotCop">T_evap / (T_cond − T_evap), cooling.</param>
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
    double CarnotCop)
{
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
        double qL = s1.H - s4.H, w = s2.H - s1.H;
        double te = model.SaturationTemperature(s1.P), tc = model.SaturationTemperature(s2.P);
        return new VapourCompressionFigures(qL, w, qL / w, (s2.H - s3.H) / w, s2.T, s2.P / s1.P, qL / s1.V, te, tc, te / (tc - te));
    }
}
