using System.Globalization;
using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>A feedwater heater of a regenerative Rankine cycle, fed by steam bled from the turbine at <see cref="BleedPressure"/>.</summary>
/// <param name="BleedPressure">The turbine extraction pressure.</param>
/// <param name="Open">True for an open (direct-contact) heater, false for a closed (shell-and-tube) heater.</param>
/// <param name="Drain">For a closed heater: drain pumped forward (default) or cascaded back to the next lower-pressure heater or the condenser.</param>
/// <param name="TerminalTemperatureDifference">For a closed heater: T_sat(p_bleed) − T_feedwater,out (default 0).</param>
public sealed record FeedwaterHeater(Pressure BleedPressure, bool Open = true, DrainRouting Drain = DrainRouting.PumpedForward, TemperatureDelta? TerminalTemperatureDifference = null)
{
    /// <summary>An open feedwater heater at the bleed pressure.</summary>
    public static FeedwaterHeater OpenAt(Pressure bleedPressure) => new(bleedPressure);

    /// <summary>A closed feedwater heater at the bleed pressure.</summary>
    public static FeedwaterHeater ClosedAt(Pressure bleedPressure, DrainRouting drain = DrainRouting.PumpedForward, TemperatureDelta? terminalTemperatureDifference = null) =>
        new(bleedPressure, false, drain, terminalTemperatureDifference);
}

/// <summary>Design choices of a Rankine cycle beyond its boiler and condenser pressures.</summary>
public sealed record RankineOptions
{
    /// <summary>Turbine inlet (superheat) temperature; null for saturated vapour at the boiler pressure.</summary>
    public Temperature? TurbineInletTemperature { get; init; }

    /// <summary>Pump isentropic efficiency, (0, 1]; default 1.</summary>
    public double PumpEfficiency { get; init; } = 1.0;

    /// <summary>Turbine isentropic efficiency of every stage, (0, 1]; default 1.</summary>
    public double TurbineEfficiency { get; init; } = 1.0;

    /// <summary>Reheat pressure; null for no reheat.</summary>
    public Pressure? ReheatPressure { get; init; }

    /// <summary>Reheat temperature (default: the turbine inlet temperature).</summary>
    public Temperature? ReheatTemperature { get; init; }

    /// <summary>Feedwater heaters, in any order; each bleeds steam at its pressure.</summary>
    public IReadOnlyList<FeedwaterHeater> FeedwaterHeaters { get; init; } = [];
}

/// <summary>Ready-made vapour power cycles: Rankine (simple, superheat, reheat, regenerative with open or closed feedwater heaters).</summary>
public static class SteamPlantCycles
{
    /// <summary>
    /// Rankine: state 1 is saturated liquid at the condenser pressure; pumps and feedwater heaters in order of rising
    /// pressure; the boiler to the turbine inlet temperature (or saturated vapour); the turbine in stages to each
    /// bleed pressure, with the reheat between, down to the condenser pressure; the condenser back to 1. Per unit
    /// mass through the boiler; bleed fractions solved from the heaters' energy balances.
    /// </summary>
    public static CycleResult Rankine(IPropertyModel water, Pressure boilerPressure, Pressure condenserPressure, RankineOptions? design = null, string title = "Rankine cycle", CycleOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(water);
        design ??= new RankineOptions();
        double pb = boilerPressure.Pascals, pc = condenserPressure.Pascals;
        if (!(pb > pc))
        {
            throw new CycleDefinitionException(title, "design", null, $"the boiler pressure {Units.SiText.Pressure(pb)} must exceed the condenser pressure {Units.SiText.Pressure(pc)}.");
        }

        var heaters = design.FeedwaterHeaters.OrderBy(h => h.BleedPressure.Pascals).ToList();
        foreach (var h in heaters)
        {
            double p = h.BleedPressure.Pascals;
            if (!(p > pc && p < pb))
            {
                throw new CycleDefinitionException(title, "design", null, $"a feedwater heater's bleed pressure {Units.SiText.Pressure(p)} must lie between the condenser ({Units.SiText.Pressure(pc)}) and the boiler ({Units.SiText.Pressure(pb)}).");
            }
        }

        if (design.ReheatPressure is { } rp && !(rp.Pascals > pc && rp.Pascals < pb))
        {
            throw new CycleDefinitionException(title, "design", null, $"the reheat pressure {Units.SiText.Pressure(rp.Pascals)} must lie between the condenser and the boiler pressures.");
        }

        // Feed train, in flow order: a pump before each open heater (to its pressure) and before the boiler; closed
        // heaters sit on the line after the pump that feeds the next open heater (or the boiler).
        var feed = new List<(FeedwaterHeater? Heater, double PumpTo)>();
        var pending = new List<FeedwaterHeater>();
        foreach (var h in heaters)
        {
            if (h.Open)
            {
                feed.Add((null, h.BleedPressure.Pascals));
                feed.AddRange(pending.Select(c => ((FeedwaterHeater?)c, double.NaN)));
                pending.Clear();
                feed.Add((h, double.NaN));
            }
            else
            {
                pending.Add(h);
            }
        }

        feed.Add((null, pb));
        feed.AddRange(pending.Select(c => ((FeedwaterHeater?)c, double.NaN)));

        // Turbine stops, in flow order: each bleed pressure and the reheat pressure, then the condenser.
        var stops = heaters.Select(h => h.BleedPressure.Pascals).Concat(design.ReheatPressure is { } r ? [r.Pascals] : []).Distinct().OrderByDescending(p => p).ToList();

        static string L(int i) => i.ToString(CultureInfo.InvariantCulture);
        int boilerLabel = 1 + feed.Count + 1;
        var stopLabel = new Dictionary<double, string>();
        int next = boilerLabel;
        foreach (double p in stops)
        {
            stopLabel[p] = L(++next);
            if (design.ReheatPressure is { } rh && rh.Pascals == p)
            {
                ++next;
            }
        }

        var heaterOutlet = new Dictionary<FeedwaterHeater, string>(ReferenceEqualityComparer.Instance);
        for (int i = 0; i < feed.Count; i++)
        {
            if (feed[i].Heater is { } h)
            {
                heaterOutlet[h] = L(2 + i);
            }
        }

        var chain = Cycle.SteadyFlow(title, water, options).Start("1", p: condenserPressure, x: 0);
        for (int i = 0; i < feed.Count; i++)
        {
            string label = L(2 + i);
            var (heater, pumpTo) = feed[i];
            if (heater is null)
            {
                chain = chain.Pump(label, toPressure: Pressure.FromPascals(pumpTo), efficiency: design.PumpEfficiency);
            }
            else if (heater.Open)
            {
                chain = chain.OpenFeedwaterHeater(label, bleedFrom: stopLabel[heater.BleedPressure.Pascals]);
            }
            else
            {
                string? drainTo = null;
                if (heater.Drain == DrainRouting.CascadedBack)
                {
                    int index = heaters.IndexOf(heater);
                    drainTo = index == 0 ? "1" : heaterOutlet[heaters[index - 1]];
                }

                chain = chain.ClosedFeedwaterHeater(label, bleedFrom: stopLabel[heater.BleedPressure.Pascals], heater.TerminalTemperatureDifference, heater.Drain, drainTo, design.PumpEfficiency);
            }
        }

        chain = design.TurbineInletTemperature is { } tit
            ? chain.Boil(L(boilerLabel), toTemperature: tit)
            : chain.Boil(L(boilerLabel), toQuality: 1);
        foreach (double p in stops)
        {
            chain = chain.Expand(stopLabel[p], toPressure: Pressure.FromPascals(p), efficiency: design.TurbineEfficiency);
            if (design.ReheatPressure is { } rh && rh.Pascals == p)
            {
                string reheatLabel = L(int.Parse(stopLabel[p], CultureInfo.InvariantCulture) + 1);
                chain = chain.Reheat(reheatLabel, toTemperature: design.ReheatTemperature ?? design.TurbineInletTemperature ?? throw new CycleDefinitionException(title, "design", reheatLabel, "give the reheat temperature (there is no turbine inlet temperature to default to)."));
            }
        }

        chain = chain.Expand(L(next + 1), toPressure: condenserPressure, efficiency: design.TurbineEfficiency);
        return chain.Condense(backTo: "1");
    }
}
