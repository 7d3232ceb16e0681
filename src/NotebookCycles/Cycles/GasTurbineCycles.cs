using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>Design choices of a Brayton gas-turbine cycle beyond its pressure ratio and turbine inlet temperature.</summary>
public sealed record BraytonOptions
{
    /// <summary>Isentropic efficiency of each compressor stage, (0, 1]; default 1.</summary>
    public double CompressorEfficiency { get; init; } = 1.0;

    /// <summary>Isentropic efficiency of each turbine stage, (0, 1]; default 1.</summary>
    public double TurbineEfficiency { get; init; } = 1.0;

    /// <summary>Regenerator (recuperator) effectiveness in [0, 1]; null for no regenerator.</summary>
    public double? RegeneratorEffectiveness { get; init; }

    /// <summary>Compressor stages with equal pressure ratios, intercooled back to T1 between them; default 1.</summary>
    public int CompressionStages { get; init; } = 1;

    /// <summary>Turbine stages with equal expansion ratios, reheated to the turbine inlet temperature between them; default 1.</summary>
    public int ExpansionStages { get; init; } = 1;

    /// <summary>Fractional pressure loss in the combustor (heater), [0, 1); default 0.</summary>
    public double CombustorPressureLoss { get; init; }
}

/// <summary>Ready-made steady-flow gas cycles: Brayton (simple, regenerative, intercooled, reheat and combinations) and the ideal Ericsson cycle.</summary>
public static class GasTurbineCycles
{
    /// <summary>
    /// Brayton: compression by the overall pressure ratio (in equal intercooled stages), optional regenerator, heat
    /// addition to the turbine inlet temperature, expansion (in equal reheated stages) back to p1, heat rejection to
    /// the start state. States are numbered in flow order from 1.
    /// </summary>
    public static CycleResult Brayton(IPropertyModel model, Temperature T1, Pressure p1, double pressureRatio, Temperature turbineInletTemperature, BraytonOptions? design = null, string title = "Brayton cycle", CycleOptions? options = null)
    {
        design ??= new BraytonOptions();
        if (!(pressureRatio > 1 && double.IsFinite(pressureRatio)))
        {
            throw new CycleDefinitionException(title, "step 1, compressor", "2", $"the pressure ratio {Units.SiText.Number(pressureRatio)} must be a finite number greater than 1.");
        }

        if (design.CompressionStages < 1 || design.ExpansionStages < 1)
        {
            throw new CycleDefinitionException(title, "design", null, $"the numbers of compression and expansion stages ({design.CompressionStages}, {design.ExpansionStages}) must be at least 1.");
        }

        int nc = design.CompressionStages, nt = design.ExpansionStages;
        bool regen = design.RegeneratorEffectiveness is not null;
        int n = 1;
        string Next() => (++n).ToString(System.Globalization.CultureInfo.InvariantCulture);

        // The regenerator's hot inlet is the last turbine exit: its label follows from the counts.
        int turbineExit = 1 + (2 * nc - 1) + (regen ? 1 : 0) + 1 + (2 * nt - 1);
        string turbineExitLabel = turbineExit.ToString(System.Globalization.CultureInfo.InvariantCulture);

        var chain = Cycle.SteadyFlow(title, model, options).Start("1", T: T1, p: p1);
        double stageRatio = Math.Pow(pressureRatio, 1.0 / nc);
        for (int i = 1; i <= nc; i++)
        {
            chain = chain.Compress(Next(), pressureRatio: stageRatio, efficiency: design.CompressorEfficiency);
            if (i < nc)
            {
                chain = chain.Intercool(Next(), toTemperature: T1);
            }
        }

        string? coldOutlet = null;
        if (regen)
        {
            coldOutlet = Next();
            chain = chain.HeatInRegenerator(coldOutlet, hotInlet: turbineExitLabel, effectiveness: design.RegeneratorEffectiveness!.Value);
        }

        chain = chain.Heat(Next(), toTemperature: turbineInletTemperature, pressureLoss: design.CombustorPressureLoss);
        double expansionRatio = pressureRatio * (1 - design.CombustorPressureLoss);
        double turbineStageRatio = Math.Pow(expansionRatio, 1.0 / nt);
        for (int j = 1; j <= nt; j++)
        {
            chain = j == nt
                ? chain.Expand(Next(), toPressureOf: "1", efficiency: design.TurbineEfficiency)
                : chain.Expand(Next(), pressureRatio: turbineStageRatio, efficiency: design.TurbineEfficiency);
            if (j < nt)
            {
                chain = chain.Reheat(Next(), toTemperature: turbineInletTemperature);
            }
        }

        if (regen)
        {
            chain = chain.CoolInRegenerator(Next(), coldOutlet: coldOutlet!);
        }

        return chain.Cool(backTo: "1");
    }

    /// <summary>
    /// Ideal Ericsson: 1→2 isothermal compression at T_low by the pressure ratio, 2→3 heating at constant pressure to
    /// T_high, 3→4 isothermal expansion at T_high back to p1, 4→1 cooling at constant pressure. With a perfect
    /// regenerator (default) the constant-pressure heats stay inside the cycle and the efficiency is Carnot's.
    /// </summary>
    public static CycleResult Ericsson(IPropertyModel model, Temperature lowTemperature, Temperature highTemperature, Pressure p1, double pressureRatio, bool perfectRegenerator = true, string title = "Ericsson cycle (ideal)", CycleOptions? options = null)
    {
        var chain = Cycle.SteadyFlow(title, model, options)
            .Start("1", T: lowTemperature, p: p1)
            .CompressIsothermal("2", pressureRatio: pressureRatio);
        var c = new FlowCycle(chain.Chain.Then(new HeatSpec("3", "Heater", PathLaw.ConstantPressure, true, HeatEnd.Temperature, highTemperature.Kelvins, null, perfectRegenerator, 0, null)))
            .ExpandIsothermal("4", toPressureOf: "1");
        return c.Chain.Close(new HeatSpec(null, "Cooler", PathLaw.ConstantPressure, false, HeatEnd.BackToStart, double.NaN, perfectRegenerator ? null : lowTemperature.Kelvins, perfectRegenerator, 0, "1"));
    }
}
