using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>
/// Ready-made closed air-standard cycles (Otto, Diesel, dual, Atkinson, Miller, Stirling, Carnot), each built from
/// the same chain and returning the same <see cref="CycleResult"/>. Works with any property model: pass the
/// cold-air-standard model or a variable-cp gas to compare the two on identical inputs.
/// </summary>
public static class AirStandardCycles
{
    /// <summary>
    /// Otto: 1→2 isentropic compression by the compression ratio r, 2→3 heat at constant volume (by heat q or to a
    /// peak temperature), 3→4 isentropic expansion to v1, 4→1 heat rejection at constant volume.
    /// </summary>
    public static CycleResult Otto(IPropertyModel model, Temperature T1, Pressure p1, double compressionRatio, SpecificEnergy? heatAdded = null, Temperature? peakTemperature = null, string title = "Otto cycle", CycleOptions? options = null) =>
        Cycle.Closed(title, model, options)
            .Start("1", T: T1, p: p1)
            .CompressIsentropic("2", volumeRatio: compressionRatio)
            .HeatAtConstantVolume("3", q: heatAdded, toTemperature: peakTemperature)
            .ExpandIsentropic("4", toVolumeOf: "1")
            .CoolAtConstantVolume(backTo: "1");

    /// <summary>
    /// Diesel: 1→2 isentropic compression by r, 2→3 heat at constant pressure (by the cutoff ratio rc = v3/v2, heat q
    /// or a peak temperature), 3→4 isentropic expansion to v1, 4→1 heat rejection at constant volume.
    /// </summary>
    public static CycleResult Diesel(IPropertyModel model, Temperature T1, Pressure p1, double compressionRatio, double? cutoffRatio = null, SpecificEnergy? heatAdded = null, Temperature? peakTemperature = null, string title = "Diesel cycle", CycleOptions? options = null) =>
        Cycle.Closed(title, model, options)
            .Start("1", T: T1, p: p1)
            .CompressIsentropic("2", volumeRatio: compressionRatio)
            .HeatAtConstantPressure("3", q: heatAdded, toTemperature: peakTemperature, cutoffRatio: cutoffRatio)
            .ExpandIsentropic("4", toVolumeOf: "1")
            .CoolAtConstantVolume(backTo: "1");

    /// <summary>
    /// Dual (limited pressure): 1→2 isentropic compression by r, 2→3 heat at constant volume up to the pressure limit,
    /// 3→4 heat at constant pressure (the rest of the heat q, or by the cutoff ratio), 4→5 isentropic expansion to v1,
    /// 5→1 heat rejection at constant volume. When q is reached before the pressure limit the cycle is an Otto cycle
    /// and the result says so in its title.
    /// </summary>
    public static CycleResult Dual(IPropertyModel model, Temperature T1, Pressure p1, double compressionRatio, Pressure pressureLimit, SpecificEnergy? heatAdded = null, double? cutoffRatio = null, string title = "Dual cycle (limited pressure)", CycleOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        var chain = Cycle.Closed(title, model, options)
            .Start("1", T: T1, p: p1)
            .CompressIsentropic("2", volumeRatio: compressionRatio);
        if (heatAdded is { } q && cutoffRatio is null)
        {
            // Where does the constant-volume heating reach the limit? Decide before the chain so each part has its own state.
            var s1 = model.FromTP(T1.Kelvins, p1.Pascals);
            var s2 = model.FromVS(s1.V / compressionRatio, s1.S);
            if (pressureLimit.Pascals <= s2.P)
            {
                throw new CycleDefinitionException(title, "step 2, heat addition at constant volume", "3", $"the pressure limit {Units.SiText.Pressure(pressureLimit.Pascals)} is not above the end-of-compression pressure {Units.SiText.Pressure(s2.P)}.");
            }

            var full = model.FromVU(s2.V, s2.U + q.JoulesPerKilogram);
            if (full.P <= pressureLimit.Pascals)
            {
                return Otto(model, T1, p1, compressionRatio, heatAdded: q, title: title + " — pressure limit not reached: Otto", options: options);
            }

            var limit = model.FromPV(pressureLimit.Pascals, s2.V);
            double rest = q.JoulesPerKilogram - (limit.U - s2.U);
            return chain
                .HeatAtConstantVolume("3", toPressure: pressureLimit)
                .HeatAtConstantPressure("4", q: SpecificEnergy.FromJoulesPerKilogram(rest))
                .ExpandIsentropic("5", toVolumeOf: "1")
                .CoolAtConstantVolume(backTo: "1");
        }

        return chain
            .HeatAtConstantVolume("3", toPressure: pressureLimit)
            .HeatAtConstantPressure("4", cutoffRatio: cutoffRatio ?? throw new CycleDefinitionException(title, "step 3, heat addition at constant pressure", "4", "give the total heat added or the cutoff ratio."))
            .ExpandIsentropic("5", toVolumeOf: "1")
            .CoolAtConstantVolume(backTo: "1");
    }

    /// <summary>
    /// Atkinson (full expansion): 1→2 isentropic compression by r, 2→3 heat at constant volume, 3→4 isentropic
    /// expansion down to p1, 4→1 heat rejection at constant pressure.
    /// </summary>
    public static CycleResult Atkinson(IPropertyModel model, Temperature T1, Pressure p1, double compressionRatio, SpecificEnergy? heatAdded = null, Temperature? peakTemperature = null, string title = "Atkinson cycle", CycleOptions? options = null) =>
        Cycle.Closed(title, model, options)
            .Start("1", T: T1, p: p1)
            .CompressIsentropic("2", volumeRatio: compressionRatio)
            .HeatAtConstantVolume("3", q: heatAdded, toTemperature: peakTemperature)
            .ExpandIsentropic("4", toPressureOf: "1")
            .CoolAtConstantPressure(backTo: "1");

    /// <summary>
    /// Miller (over-expanded): 1→2 isentropic compression by the effective compression ratio, 2→3 heat at constant
    /// volume, 3→4 isentropic expansion by the larger expansion ratio v4/v3, 4→5 heat rejection at constant volume down
    /// to p1, 5→1 heat rejection at constant pressure.
    /// </summary>
    public static CycleResult Miller(IPropertyModel model, Temperature T1, Pressure p1, double compressionRatio, double expansionRatio, SpecificEnergy? heatAdded = null, Temperature? peakTemperature = null, string title = "Miller cycle", CycleOptions? options = null)
    {
        if (!(expansionRatio > compressionRatio))
        {
            throw new CycleDefinitionException(title, "step 3, isentropic expansion", "4", $"the expansion ratio {Units.SiText.Number(expansionRatio)} must exceed the compression ratio {Units.SiText.Number(compressionRatio)} in a Miller cycle (equal ratios give the Otto cycle).");
        }

        return Cycle.Closed(title, model, options)
            .Start("1", T: T1, p: p1)
            .CompressIsentropic("2", volumeRatio: compressionRatio)
            .HeatAtConstantVolume("3", q: heatAdded, toTemperature: peakTemperature)
            .ExpandIsentropic("4", volumeRatio: expansionRatio)
            .CoolAtConstantVolume("5", toPressure: p1)
            .CoolAtConstantPressure(backTo: "1");
    }

    /// <summary>
    /// Ideal Stirling: 1→2 isothermal compression at T_low by the volume ratio, 2→3 heat at constant volume to T_high,
    /// 3→4 isothermal expansion back to v1, 4→1 heat rejection at constant volume. With a perfect regenerator
    /// (default) the two constant-volume heats are exchanged inside the cycle and the efficiency is Carnot's.
    /// </summary>
    public static CycleResult Stirling(IPropertyModel model, Temperature lowTemperature, Temperature highTemperature, Pressure p1, double compressionRatio, bool perfectRegenerator = true, string title = "Stirling cycle (ideal)", CycleOptions? options = null) =>
        Cycle.Closed(title, model, options)
            .Start("1", T: lowTemperature, p: p1)
            .CompressIsothermal("2", volumeRatio: compressionRatio)
            .HeatAtConstantVolume("3", toTemperature: highTemperature, regenerated: perfectRegenerator, boundaryTemperature: perfectRegenerator ? null : highTemperature)
            .ExpandIsothermal("4", toVolumeOf: "1")
            .CoolAtConstantVolume("1", Temperature.FromKelvins(lowTemperature.Kelvins), perfectRegenerator);

    /// <summary>
    /// Carnot (gas, closed): 1→2 isentropic compression from T_low to T_high, 2→3 isothermal expansion by the volume
    /// ratio, 3→4 isentropic expansion back to T_low, 4→1 isothermal compression.
    /// </summary>
    public static CycleResult Carnot(IPropertyModel model, Temperature lowTemperature, Temperature highTemperature, Pressure p1, double isothermalExpansionRatio, string title = "Carnot cycle", CycleOptions? options = null) =>
        Cycle.Closed(title, model, options)
            .Start("1", T: lowTemperature, p: p1)
            .CompressIsentropic("2", toTemperature: highTemperature)
            .ExpandIsothermal("3", volumeRatio: isothermalExpansionRatio)
            .ExpandIsentropic("4", toTemperature: lowTemperature)
            .CompressIsothermal(backTo: "1");
}
