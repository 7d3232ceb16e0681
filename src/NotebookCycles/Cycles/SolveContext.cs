using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>Options of a cycle solve.</summary>
public sealed record CycleOptions
{
    /// <summary>Default options: record kept, standard dead state.</summary>
    public static CycleOptions Default { get; } = new();

    /// <summary>Keep the calculation record (relation lines). Off makes sweeps faster; figures and checks are the same.</summary>
    public bool Record { get; init; } = true;

    /// <summary>The dead state for exergy (default 298.15 K, 101.325 kPa).</summary>
    public DeadState DeadState { get; init; } = DeadState.Standard;
}

/// <summary>The working state of one pass over a cycle's steps.</summary>
internal sealed class SolveContext
{
    private readonly List<State> _states = new(8);
    private readonly List<double> _stateFlows = new(8);
    private readonly List<Step> _steps = new(8);
    private List<string>? _warnings;
    private readonly Dictionary<string, double>? _previousUnknowns;
    private Dictionary<string, double>? _unknowns;
    private List<(string Label, double Fraction)>? _bleeds;

    public SolveContext(string title, SystemKind kind, IPropertyModel model, CycleOptions options, Dictionary<string, double>? previousUnknowns, Dictionary<string, State>? previousStates, double startFlow)
    {
        Title = title;
        Kind = kind;
        Model = model;
        Options = options;
        _previousUnknowns = previousUnknowns;
        PreviousStates = previousStates;
        Flow = startFlow;
    }

    public string Title { get; }

    public SystemKind Kind { get; }

    public IPropertyModel Model { get; }

    public CycleOptions Options { get; }

    public bool Record => Options.Record;

    public State Current { get; private set; } = null!;

    private int _stepIndex = -1;
    private ProcessSpec? _spec;
    private string? _description;

    /// <summary>What the solver is doing, for error messages: "step 3, heat addition at constant volume 2→3". Composed only when an error needs it.</summary>
    public string CurrentStepDescription
    {
        get => _description ?? (_spec is null ? "start" : $"step {_stepIndex + 1}, {_spec.Describe} {Current.Label}→{_spec.Label ?? _states[0].Label}");
        set => _description = value;
    }

    /// <summary>Marks the step being applied.</summary>
    public void BeginStep(int index, ProcessSpec spec)
    {
        _stepIndex = index;
        _spec = spec;
        _description = null;
    }

    /// <summary>Mass fraction of the stream leaving the current state.</summary>
    public double Flow { get; private set; }

    /// <summary>States of the previous pass, for references to states computed later in the chain.</summary>
    public Dictionary<string, State>? PreviousStates { get; }

    /// <summary>True when a step used a value of the previous pass (or a first guess): another pass is needed until they agree.</summary>
    public bool UsedForwardReference { get; private set; }

    public IReadOnlyList<State> States => _states;

    public IReadOnlyList<double> StateFlows => _stateFlows;

    public IReadOnlyList<Step> Steps => _steps;

    public IReadOnlyList<string> Warnings => (IReadOnlyList<string>?)_warnings ?? [];

    public Dictionary<string, double>? Unknowns => _unknowns;

    /// <summary>Property calls remembered across the passes of a coupled chain (null for a plain chain).</summary>
    public Dictionary<(StateProperty, double, StateProperty, double), StatePoint>? Memo { get; init; }

    public int StepCount => _steps.Count;

    public void SetStart(State start)
    {
        _states.Add(start);
        _stateFlows.Add(Flow);
        Current = start;
        AddWarnings(start);
    }

    /// <summary>A state of this pass by label, or null.</summary>
    public State? Find(string label)
    {
        foreach (var s in _states)
        {
            if (s.Label == label)
            {
                return s;
            }
        }

        return null;
    }

    /// <summary>A state computed earlier in the chain; a label not (yet) known is an error naming the step.</summary>
    public State Earlier(string label, string? producing)
    {
        return Find(label) ?? throw Error(producing, $"no earlier state is labelled '{label}'; known states are {string.Join(", ", _states.Select(s => s.Label))}.");
    }

    /// <summary>
    /// A state that may be computed later in the chain (a regenerator's hot inlet, a feedwater heater's bleed):
    /// this pass's value when known, else the previous pass's, else null (the caller uses a first guess).
    /// </summary>
    public State? Anywhere(string label)
    {
        var here = Find(label);
        if (here is not null)
        {
            return here;
        }

        UsedForwardReference = true;
        return PreviousStates is not null && PreviousStates.TryGetValue(label, out var previous) ? previous : null;
    }

    /// <summary>An unknown solved by iteration over passes (a bleed fraction), remembered for the next pass.</summary>
    public void SetUnknown(string key, double value)
    {
        (_unknowns ??= [])[key] = value;
    }

    /// <summary>Adds to an unknown within this pass (drains from several heaters into one).</summary>
    public void AddToUnknown(string key, double delta)
    {
        var unknowns = _unknowns ??= [];
        unknowns[key] = (unknowns.TryGetValue(key, out double v) ? v : 0) + delta;
    }

    public double PreviousUnknown(string key, double fallback) =>
        _previousUnknowns is not null && _previousUnknowns.TryGetValue(key, out double v) ? v : fallback;

    /// <summary>Registers a bleed of <paramref name="fraction"/> of the reference flow leaving the stream after state <paramref name="label"/>.</summary>
    public void AddBleed(string label, double fraction)
    {
        (_bleeds ??= []).Add((label, fraction));
        SetUnknown("bleed:" + label, fraction);
    }

    /// <summary>Bleed fraction leaving after <paramref name="label"/> known from the previous pass (0 when none).</summary>
    public double BleedAfter(string label) => PreviousUnknown("bleed:" + label, 0.0);

    public void AdjustFlow(double delta) => Flow += delta;

    public CycleDefinitionException Error(string? label, string message, Exception? inner = null) =>
        new(Title, CurrentStepDescription, label, message, inner);

    /// <summary>Computes a state with the model from two properties; a model error becomes a cycle error naming the step that drove the state there.</summary>
    public StatePoint Compute(string label, StateProperty first, double firstValue, StateProperty second, double secondValue)
    {
        try
        {
            if (Memo is null)
            {
                return Model.Solve(first, firstValue, second, secondValue);
            }

            var key = (first, firstValue, second, secondValue);
            if (!Memo.TryGetValue(key, out var point))
            {
                point = Model.Solve(first, firstValue, second, secondValue);
                Memo[key] = point;
            }

            return point;
        }
        catch (PropertyModelException e)
        {
            throw Error(label, "the state is outside what the property model allows: " + e.Message, e);
        }
    }

    public State NewState(string label, StatePoint point)
    {
        if (Find(label) is not null)
        {
            throw Error(label, $"the label '{label}' is already used by an earlier state; give each state its own label.");
        }

        return new State(label, Model, point);
    }

    /// <summary>Appends a step ending at <paramref name="to"/> (a new state, or the start state when the cycle closes).</summary>
    public Step AddStep(
        string process,
        PathLaw law,
        State to,
        double q,
        double w,
        double boundaryTemperature = double.NaN,
        bool heatIsInternal = false,
        double polytropicExponent = double.NaN,
        ImmutableArray<RecordLine> lines = default,
        ImmutableArray<string> assumptions = default,
        ImmutableArray<State> auxiliary = default,
        double entropyGenerated = double.NaN,
        double? flowAfter = null,
        double? stepFlow = null)
    {
        bool assumed = false;
        if (q != 0 && double.IsNaN(boundaryTemperature))
        {
            assumed = true;
            boundaryTemperature = q > 0 ? Math.Max(Current.Point.T, to.Point.T) : Math.Min(Current.Point.T, to.Point.T);
        }

        var warnings = ImmutableArray<string>.Empty;
        if (to.Warnings.Count > 0 && !ReferenceEquals(to, _states[0]))
        {
            warnings = [.. to.Warnings];
        }

        var step = new Step(
            _steps.Count + 1,
            process,
            law,
            Current,
            to,
            q,
            w,
            q == 0 ? double.NaN : boundaryTemperature,
            assumed,
            heatIsInternal,
            stepFlow ?? Flow,
            polytropicExponent,
            lines.IsDefault ? [] : lines,
            assumptions.IsDefault ? [] : assumptions,
            warnings,
            auxiliary.IsDefault ? [] : auxiliary,
            entropyGenerated);
        _steps.Add(step);
        if (flowAfter is { } f)
        {
            Flow = f;
        }

        if (!ReferenceEquals(to, _states[0]))
        {
            _states.Add(to);
            _stateFlows.Add(Flow);
            AddWarnings(to);
        }

        // A bleed leaves the stream after this state: this pass's value when its heater came earlier in the chain
        // (so flows and bleeds stay in proportion within one pass), else the previous pass's.
        if (_bleeds is not null || _previousUnknowns is not null)
        {
            string key = "bleed:" + to.Label;
            if ((_unknowns is not null && _unknowns.TryGetValue(key, out double bleed)) || (_previousUnknowns is not null && _previousUnknowns.TryGetValue(key, out bleed)))
            {
                Flow -= bleed;
            }
        }

        Current = to;
        return step;
    }

    private void AddWarnings(State state)
    {
        foreach (var w in state.Warnings)
        {
            (_warnings ??= []).Add($"State {state.Label}: {w}");
        }
    }
}
