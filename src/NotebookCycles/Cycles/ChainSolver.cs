using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>One process of a chain, as the engineer specified it; applied to the current state when the cycle is solved.</summary>
internal abstract class ProcessSpec
{
    protected ProcessSpec(string? label) => Label = label;

    /// <summary>The label of the state the process produces (null for a step that closes the cycle).</summary>
    public string? Label { get; }

    /// <summary>True when the step returns to the start state.</summary>
    public virtual bool Closes => false;

    /// <summary>The process in words, lower case ("isentropic compression").</summary>
    public abstract string Describe { get; }

    /// <summary>True when the step refers to states later in the chain, so the chain is solved in several passes.</summary>
    public virtual bool Couples => false;

    public abstract void Apply(SolveContext c);
}

/// <summary>The start state, given as two properties.</summary>
internal sealed class StartSpec(string label, StateProperty first, double firstValue, StateProperty second, double secondValue, State? given = null)
{
    public string Label { get; } = label;

    public State Compute(string title, IPropertyModel model)
    {
        if (given is not null)
        {
            if (!ReferenceEquals(given.Model, model))
            {
                throw new CycleDefinitionException(title, "start", Label, $"the start state was computed with {given.Model.Name}, but the cycle uses {model.Name}.");
            }

            return given.Label == Label ? given : given.WithLabel(Label);
        }

        try
        {
            return new State(Label, model, model.Solve(first, firstValue, second, secondValue));
        }
        catch (PropertyModelException e)
        {
            throw new CycleDefinitionException(title, "start", Label, e.Message, e);
        }
    }
}

/// <summary>Solves a chain: one pass for a plain chain, repeated passes until forward references (regenerators, bleeds) agree.</summary>
internal static class ChainSolver
{
    private const int MaximumPasses = 200;
    private const double PassTolerance = 1e-13;

    public static CycleResult Solve(string title, SystemKind kind, IPropertyModel model, CycleOptions options, StartSpec? startSpec, ImmutableArray<ProcessSpec> specs)
    {
        if (startSpec is null)
        {
            throw new CycleDefinitionException(title, "start", null, "the chain has no start state; begin it with Start(...).");
        }

        if (specs.IsEmpty || !specs[^1].Closes)
        {
            throw new CycleDefinitionException(title, "end", null, $"the chain does not return to its start state '{startSpec.Label}'; end it with a process that goes back to it (for example backTo: \"{startSpec.Label}\").");
        }

        State start = startSpec.Compute(title, model);
        bool coupled = false;
        foreach (var spec in specs)
        {
            coupled |= spec.Couples;
        }

        // Coupled chains repeat most property calls exactly from pass to pass: remember them (the models are pure).
        var memo = coupled ? new Dictionary<(StateProperty, double, StateProperty, double), StatePoint>(64) : null;
        Dictionary<string, double>? unknowns = null;
        Dictionary<string, State>? previous = null;
        double startFlow = 1.0;
        for (int pass = 0; pass < MaximumPasses; pass++)
        {
            var c = new SolveContext(title, kind, model, options, unknowns, previous, startFlow) { Memo = memo };
            c.SetStart(start);
            for (int i = 0; i < specs.Length; i++)
            {
                var spec = specs[i];
                c.BeginStep(i, spec);
                spec.Apply(c);
            }

            if (!c.UsedForwardReference && c.Unknowns is null)
            {
                return Finish(c, start, startFlow, pass + 1);
            }

            double maxFlow = 0;
            foreach (var step in c.Steps)
            {
                maxFlow = Math.Max(maxFlow, step.MassFraction);
            }

            bool converged = pass > 0 && SameUnknowns(unknowns, c.Unknowns) && SameStates(previous, c.States) && Math.Abs(maxFlow - 1.0) <= PassTolerance * 10;
            if (converged)
            {
                return Finish(c, start, startFlow, pass + 1);
            }

            // Flows (bleeds, drains) scale with the start flow: store them as they will be after normalising, so a
            // pass whose only difference is the scale is recognised as converged.
            if (c.Unknowns is { } found && maxFlow != 1.0)
            {
                foreach (var key in found.Keys.ToArray())
                {
                    if (key.StartsWith("bleed:", StringComparison.Ordinal) || key.StartsWith("inj:", StringComparison.Ordinal))
                    {
                        found[key] /= maxFlow;
                    }
                }
            }

            unknowns = c.Unknowns;
            previous = new Dictionary<string, State>(c.States.Count);
            foreach (var s in c.States)
            {
                previous[s.Label] = s;
            }

            startFlow /= maxFlow;
        }

        throw new CycleDefinitionException(title, "solve", null, $"the coupled steps (regenerators, feedwater heaters) did not settle within {MaximumPasses} passes.");
    }

    private static bool SameUnknowns(Dictionary<string, double>? a, Dictionary<string, double>? b)
    {
        if (a is null || b is null)
        {
            return a is null && b is null;
        }

        if (a.Count != b.Count)
        {
            return false;
        }

        foreach (var (key, value) in a)
        {
            if (!b.TryGetValue(key, out double other) || Math.Abs(value - other) > PassTolerance * Math.Max(1.0, Math.Abs(value)))
            {
                return false;
            }
        }

        return true;
    }

    private static bool SameStates(Dictionary<string, State>? previous, IReadOnlyList<State> states)
    {
        if (previous is null)
        {
            return false;
        }

        foreach (var s in states)
        {
            if (!previous.TryGetValue(s.Label, out var p))
            {
                return false;
            }

            double scale = Math.Max(Math.Abs(s.Point.H), 1000.0);
            if (Math.Abs(p.Point.H - s.Point.H) > PassTolerance * scale * 10 || Math.Abs(p.Point.T - s.Point.T) > PassTolerance * s.Point.T * 10)
            {
                return false;
            }
        }

        return true;
    }

    private static CycleResult Finish(SolveContext c, State start, double startFlow, int passes)
    {
        var steps = c.Steps;
        double heatIn = 0, heatOut = 0, sumQ = 0, expansion = 0, compression = 0, sgenTotal = 0;
        double tMin = double.MaxValue, tMax = 0, vMin = double.MaxValue, vMax = 0, pMax = 0;
        foreach (var s in c.States)
        {
            tMin = Math.Min(tMin, s.Point.T);
            tMax = Math.Max(tMax, s.Point.T);
            vMin = Math.Min(vMin, s.Point.V);
            vMax = Math.Max(vMax, s.Point.V);
            pMax = Math.Max(pMax, s.Point.P);
        }

        var checks = ImmutableArray.CreateBuilder<CycleCheck>(steps.Count + 2);
        foreach (var step in steps)
        {
            double m = step.MassFraction;
            double mq = m * step.Q, mw = m * step.W;
            sumQ += mq;
            if (!step.HeatIsInternal)
            {
                if (mq > 0)
                {
                    heatIn += mq;
                }
                else
                {
                    heatOut -= mq;
                }
            }

            if (mw > 0)
            {
                expansion += mw;
            }
            else
            {
                compression -= mw;
            }

            sgenTotal += m * step.EntropyGenerated;
            double scale = Math.Max(Math.Max(Math.Abs(step.DeltaS), step.Q == 0 ? 0 : Math.Abs(step.Q / step.BoundaryTemperature)), 1.0);
            double tolerance = Math.Max(1e-9, c.Model.ConsistencyTolerance) * scale;
            if (step.EntropyGenerated < -tolerance)
            {
                c.CurrentStepDescription = $"step {step.Index}, {step.Process.ToLowerInvariant()} {step.Name}";
                throw c.Error(step.To.Label, $"the step would destroy entropy: s_gen = Δs − q/T_b = {Units.SiText.Number(step.DeltaS / 1000)} − ({Units.SiText.Number(step.Q / 1000)} / {Units.SiText.Number(step.BoundaryTemperature)}) = {Units.SiText.Number(step.EntropyGenerated / 1000)} kJ/(kg·K) < 0, which the second law forbids. Check the efficiency, the effectiveness or the boundary temperature given.");
            }

            checks.Add(new CycleCheck(CheckKind.SecondLaw, true, Math.Min(step.EntropyGenerated, 0), tolerance, step.EntropyGenerated, 0, step, null));
        }

        double netWork = expansion - compression;
        double firstLawResidual = Math.Abs(sumQ - netWork);
        double firstLawTolerance = 1e-9 * Math.Max(Math.Max(heatIn, Math.Abs(netWork)), 1.0);
        if (firstLawResidual > firstLawTolerance)
        {
            throw new CycleDefinitionException(c.Title, "first-law check", null, $"net heat {Units.SiText.Number(sumQ / 1000)} kJ/kg differs from net work {Units.SiText.Number(netWork / 1000)} kJ/kg by {Units.SiText.Number(firstLawResidual / 1000)} kJ/kg.");
        }

        checks.Insert(0, new CycleCheck(CheckKind.FirstLaw, true, firstLawResidual, firstLawTolerance, sumQ, netWork, null, null));
        double flowResidual = Math.Abs(c.Flow - startFlow);
        if (flowResidual > 1e-9)
        {
            throw new CycleDefinitionException(c.Title, "mass balance", start.Label, $"the flow returning to the start is {Units.SiText.Number(c.Flow)} of the reference flow but {Units.SiText.Number(startFlow)} left it.");
        }

        checks.Insert(1, new CycleCheck(CheckKind.Closure, true, flowResidual, 1e-9, c.Flow, startFlow, null, start.Label));

        bool engine = netWork > 0 && heatIn > 0;
        double efficiency = engine ? netWork / heatIn : double.NaN;
        if (engine && efficiency > 1 + 1e-12)
        {
            throw new CycleDefinitionException(c.Title, "efficiency", null, $"the thermal efficiency {efficiency} exceeds 1, which is impossible.");
        }

        var figures = new FiguresOfMerit
        {
            HeatIn = heatIn,
            HeatOut = heatOut,
            NetWork = netWork,
            ExpansionWork = expansion,
            CompressionWork = compression,
            ThermalEfficiency = efficiency,
            CarnotEfficiency = 1 - tMin / tMax,
            MinimumTemperature = tMin,
            MaximumTemperature = tMax,
            MaximumPressure = pMax,
            MeanEffectivePressure = c.Kind == SystemKind.Closed ? netWork / (vMax - vMin) : double.NaN,
            BackWorkRatio = c.Kind == SystemKind.SteadyFlow && expansion > 0 ? compression / expansion : double.NaN,
            HeatRate = engine ? heatIn / netWork : double.NaN,
            SpecificConsumption = c.Kind == SystemKind.SteadyFlow && netWork > 0 ? 1.0 / netWork : double.NaN,
            CopCooling = netWork < 0 ? heatIn / -netWork : double.NaN,
            CopHeating = netWork < 0 ? heatOut / -netWork : double.NaN,
            ExergyDestroyed = c.Options.DeadState.Temperature * sgenTotal,
        };

        ImmutableArray<string> warnings = c.Warnings.Count == 0 ? [] : [.. c.Warnings];
        return new CycleResult(c.Title, c.Kind, c.Model, [.. c.States], [.. steps], figures, checks.MoveToImmutable(), warnings, c.Options.DeadState, [.. c.StateFlows], c.Record) { Passes = passes };
    }
}
