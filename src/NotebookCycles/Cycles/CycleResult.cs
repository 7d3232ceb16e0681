using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>Closed (piston-cylinder, per unit mass, boundary work, q − w = Δu) or steady flow (per unit mass flow, shaft work, q − w = Δh).</summary>
public enum SystemKind
{
    /// <summary>A closed system: a fixed mass in a piston-cylinder.</summary>
    Closed,

    /// <summary>Steady flow through devices; kinetic and potential energy neglected.</summary>
    SteadyFlow,
}

/// <summary>The environment exergy is measured against.</summary>
/// <param name="Temperature">T0, K (default 298.15 K).</param>
/// <param name="Pressure">p0, Pa (default 101.325 kPa).</param>
public sealed record DeadState(double Temperature = 298.15, double Pressure = 101_325.0)
{
    /// <summary>298.15 K and 101.325 kPa.</summary>
    public static DeadState Standard { get; } = new();
}

/// <summary>Which balance a check tests.</summary>
public enum CheckKind
{
    /// <summary>Net heat equals net work (to 1e-9 relative).</summary>
    FirstLaw,

    /// <summary>The cycle returns to its start state and the mass fractions balance.</summary>
    Closure,

    /// <summary>A step's entropy generation is not negative (within round-off).</summary>
    SecondLaw,
}

/// <summary>One balance check a cycle carries, with what was compared. Its texts are composed when read.</summary>
public sealed class CycleCheck
{
    internal CycleCheck(CheckKind kind, bool passed, double residual, double tolerance, double value, double reference, Step? step, string? startLabel)
    {
        Kind = kind;
        Passed = passed;
        Residual = residual;
        Tolerance = tolerance;
        Value = value;
        Reference = reference;
        Step = step;
        _startLabel = startLabel;
    }

    private readonly string? _startLabel;

    /// <summary>Which balance.</summary>
    public CheckKind Kind { get; }

    /// <summary>Whether it held within <see cref="Tolerance"/>.</summary>
    public bool Passed { get; }

    /// <summary>The residual compared against the tolerance (SI).</summary>
    public double Residual { get; }

    /// <summary>The tolerance used (SI).</summary>
    public double Tolerance { get; }

    /// <summary>The value checked: Σq (first law, J/kg), the returning mass fraction (closure), s_gen (second law, J/(kg·K)).</summary>
    public double Value { get; }

    /// <summary>What it is compared with: Σw, the leaving mass fraction, or 0.</summary>
    public double Reference { get; }

    /// <summary>The step a second-law check is about; null otherwise.</summary>
    public Step? Step { get; }

    /// <summary>"First law", "Cycle closes", "Second law, step 2→3".</summary>
    public string Name => Kind switch
    {
        CheckKind.FirstLaw => "First law",
        CheckKind.Closure => "Cycle closes",
        _ => "Second law, step " + Step!.Name,
    };

    /// <summary>What was compared, in words and numbers.</summary>
    public string Detail => Kind switch
    {
        CheckKind.FirstLaw => $"Σq = {Units.SiText.Number(Value / 1000)} kJ/kg equals Σw = {Units.SiText.Number(Reference / 1000)} kJ/kg",
        CheckKind.Closure => $"the last step returns to state {_startLabel}; mass fractions balance",
        _ => $"s_gen = {Units.SiText.Number(Value / 1000)} kJ/(kg·K) ≥ 0",
    };

    /// <inheritdoc />
    public override string ToString() => $"{(Passed ? "passed" : "FAILED")}: {Name} — {Detail}";
}

/// <summary>
/// The figures of merit of a cycle, per unit mass of the reference stream (SI: J/kg, K, Pa). A figure that does not
/// apply to the cycle (MEP for a flow cycle, COP for an engine) is NaN.
/// </summary>
public sealed record FiguresOfMerit
{
    /// <summary>Heat supplied from outside, J/kg (internal regenerator heat excluded).</summary>
    public required double HeatIn { get; init; }

    /// <summary>Heat rejected to outside, J/kg, a positive number.</summary>
    public required double HeatOut { get; init; }

    /// <summary>Net work out, J/kg (negative for a refrigerator or heat pump).</summary>
    public required double NetWork { get; init; }

    /// <summary>Work out of expansion steps, J/kg.</summary>
    public required double ExpansionWork { get; init; }

    /// <summary>Work into compression steps, J/kg, a positive number.</summary>
    public required double CompressionWork { get; init; }

    /// <summary>Net work over heat in (engines); NaN when the net work is not positive.</summary>
    public required double ThermalEfficiency { get; init; }

    /// <summary>1 − Tmin/Tmax over the cycle's states.</summary>
    public required double CarnotEfficiency { get; init; }

    /// <summary>Lowest state temperature, K.</summary>
    public required double MinimumTemperature { get; init; }

    /// <summary>Highest state temperature, K.</summary>
    public required double MaximumTemperature { get; init; }

    /// <summary>Highest state pressure, Pa.</summary>
    public required double MaximumPressure { get; init; }

    /// <summary>Mean effective pressure, net work over displacement (vmax − vmin), Pa; closed cycles only.</summary>
    public required double MeanEffectivePressure { get; init; }

    /// <summary>Compression work over expansion work; flow cycles only.</summary>
    public required double BackWorkRatio { get; init; }

    /// <summary>Heat in per net work, J/J (1/η); shown as kJ/kWh (×3600) or Btu/kWh by renderers.</summary>
    public required double HeatRate { get; init; }

    /// <summary>Mass of working fluid per net work, kg/J (flow cycles); shown as kg/kWh (×3.6e6).</summary>
    public required double SpecificConsumption { get; init; }

    /// <summary>Refrigerating effect over work in, when the net work is negative; NaN otherwise.</summary>
    public required double CopCooling { get; init; }

    /// <summary>Heat delivered over work in, when the net work is negative; NaN otherwise.</summary>
    public required double CopHeating { get; init; }

    /// <summary>Exergy destroyed in all steps, T0·Σ m·s_gen, J/kg.</summary>
    public required double ExergyDestroyed { get; init; }
}

/// <summary>
/// A solved cycle: its states, its steps with their records, the figures of merit and the checks it passed.
/// Immutable. Renderers (HTML, SVG, Markdown) and exports read only this type.
/// </summary>
public sealed class CycleResult
{
    internal CycleResult(string title, SystemKind kind, IPropertyModel model, ImmutableArray<State> states, ImmutableArray<Step> steps, FiguresOfMerit figures, ImmutableArray<CycleCheck> checks, ImmutableArray<string> warnings, DeadState deadState, ImmutableArray<double> stateMassFractions, bool recorded)
    {
        Title = title;
        Kind = kind;
        Model = model;
        States = states;
        Steps = steps;
        Figures = figures;
        Checks = checks;
        Warnings = warnings;
        DeadState = deadState;
        StateMassFractions = stateMassFractions;
        Recorded = recorded;
    }

    /// <summary>The cycle's title, as the engineer gave it.</summary>
    public string Title { get; }

    /// <summary>Closed or steady flow.</summary>
    public SystemKind Kind { get; }

    /// <summary>The property model of the working fluid.</summary>
    public IPropertyModel Model { get; }

    /// <summary>The cycle's states in the order they were first reached.</summary>
    public ImmutableArray<State> States { get; }

    /// <summary>The steps in order.</summary>
    public ImmutableArray<Step> Steps { get; }

    /// <summary>The figures of merit.</summary>
    public FiguresOfMerit Figures { get; }

    /// <summary>The balance checks: first law, closure, second law per step. All passed, or the cycle would have thrown.</summary>
    public ImmutableArray<CycleCheck> Checks { get; }

    /// <summary>Warnings from the steps and states, in order.</summary>
    public ImmutableArray<string> Warnings { get; }

    /// <summary>The dead state exergy is measured against.</summary>
    public DeadState DeadState { get; }

    /// <summary>The mass fraction of the reference flow at each state (parallel to <see cref="States"/>).</summary>
    public ImmutableArray<double> StateMassFractions { get; }

    /// <summary>True when the calculation record (the relation lines) was kept.</summary>
    public bool Recorded { get; }

    /// <summary>How many passes over the chain the solve took: 1 for an unbranched chain, more when regenerators or feedwater heaters couple later states back.</summary>
    public int Passes { get; internal init; } = 1;

    /// <summary>The caution every output of a cycle carries.</summary>
    public const string Caution = "Idealised models for design studies: verify against the applicable codes and licensed engineering practice before sizing equipment.";

    /// <summary>A state by its label.</summary>
    public State this[string label]
    {
        get
        {
            foreach (var state in States)
            {
                if (state.Label == label)
                {
                    return state;
                }
            }

            throw new KeyNotFoundException($"The cycle '{Title}' has no state labelled '{label}'; its states are {string.Join(", ", States.Select(s => s.Label))}.");
        }
    }

    /// <summary>Exergy destroyed in one step, T0·m·s_gen, J/kg of reference flow.</summary>
    public double ExergyDestroyed(Step step)
    {
        ArgumentNullException.ThrowIfNull(step);
        return DeadState.Temperature * step.MassFraction * step.EntropyGenerated;
    }

    /// <summary>The calculation record as Markdown.</summary>
    public string ToMarkdown() => RecordExport.ToMarkdown(this);

    /// <summary>The cycle as JSON (SI units; keys documented in docs/record.md).</summary>
    public string ToJson() => RecordExport.ToJson(this);

    /// <inheritdoc />
    public override string ToString() => RecordExport.Summary(this);
}
