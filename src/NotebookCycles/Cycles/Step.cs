using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>The law a process follows between its end states, used to draw its real path on a diagram.</summary>
public enum PathLaw
{
    /// <summary>s constant (reversible adiabatic).</summary>
    Isentropic,

    /// <summary>p·vⁿ constant.</summary>
    Polytropic,

    /// <summary>T constant.</summary>
    Isothermal,

    /// <summary>v constant.</summary>
    ConstantVolume,

    /// <summary>p constant (also a heat exchanger with a pressure loss, drawn as a linear pressure change with h).</summary>
    ConstantPressure,

    /// <summary>h constant (throttling).</summary>
    Isenthalpic,

    /// <summary>An irreversible process whose intermediate states are not defined (a compressor, pump or turbine with an efficiency below 1, mixing): drawn as a dashed line between its end states.</summary>
    Undefined,
}

/// <summary>
/// One process from one state to the next, with its energy and entropy accounts and the record of how each number
/// was obtained. A step explains itself: the calculation record of a cycle is its list of steps.
/// </summary>
/// <remarks>
/// Sign convention: heat <see cref="Q"/> is positive into the fluid, work <see cref="W"/> positive out of it, both per
/// unit mass of the stream through the step (J/kg). Closed steps obey q − w = Δu, steady-flow steps q − w = Δh.
/// </remarks>
public sealed class Step
{
    internal Step(
        int index,
        string process,
        PathLaw law,
        State from,
        State to,
        double q,
        double w,
        double boundaryTemperature,
        bool boundaryTemperatureAssumed,
        bool heatIsInternal,
        double massFraction,
        double polytropicExponent,
        ImmutableArray<RecordLine> lines,
        ImmutableArray<string> assumptions,
        ImmutableArray<string> warnings,
        ImmutableArray<State> auxiliaryStates,
        double entropyGenerated = double.NaN)
    {
        Index = index;
        Process = process;
        Law = law;
        From = from;
        To = to;
        Q = q;
        W = w;
        BoundaryTemperature = boundaryTemperature;
        BoundaryTemperatureAssumed = boundaryTemperatureAssumed;
        HeatIsInternal = heatIsInternal;
        MassFraction = massFraction;
        PolytropicExponent = polytropicExponent;
        Lines = lines;
        Assumptions = assumptions;
        Warnings = warnings;
        AuxiliaryStates = auxiliaryStates;
        DeltaS = to.Point.S - from.Point.S;
        EntropyGenerated = !double.IsNaN(entropyGenerated) ? entropyGenerated
            : q == 0 ? DeltaS
            : DeltaS - q / boundaryTemperature;
    }

    /// <summary>Position in the cycle, from 1.</summary>
    public int Index { get; }

    /// <summary>The process in words ("Isentropic compression", "Heat addition at constant volume").</summary>
    public string Process { get; }

    /// <summary>The law the path follows.</summary>
    public PathLaw Law { get; }

    /// <summary>The state the step starts from.</summary>
    public State From { get; }

    /// <summary>The state the step ends at.</summary>
    public State To { get; }

    /// <summary>"1→2".</summary>
    public string Name => From.Label + "→" + To.Label;

    /// <summary>Heat into the fluid, J/kg of the stream.</summary>
    public double Q { get; }

    /// <summary>Work out of the fluid, J/kg of the stream (boundary work for closed systems, shaft work for flow).</summary>
    public double W { get; }

    /// <summary>s(To) − s(From), J/(kg·K).</summary>
    public double DeltaS { get; }

    /// <summary>Entropy generated, Δs − q/T_boundary, J/(kg·K); zero for a reversible step.</summary>
    public double EntropyGenerated { get; }

    /// <summary>
    /// The temperature of the boundary the heat crosses, K. When not given it is assumed to be the hottest
    /// temperature of the process for heat in and the coldest for heat out (a reservoir that just suffices), see
    /// <see cref="BoundaryTemperatureAssumed"/>. NaN for adiabatic steps.
    /// </summary>
    public double BoundaryTemperature { get; }

    /// <summary>True when <see cref="BoundaryTemperature"/> was assumed rather than given.</summary>
    public bool BoundaryTemperatureAssumed { get; }

    /// <summary>True when the step's heat is exchanged inside the cycle (a regenerator), so it counts in neither heat in nor heat out.</summary>
    public bool HeatIsInternal { get; }

    /// <summary>The mass fraction of the stream through the step, relative to the cycle's reference flow (1 for unbranched cycles).</summary>
    public double MassFraction { get; }

    /// <summary>The polytropic exponent for polytropic steps; NaN otherwise.</summary>
    public double PolytropicExponent { get; }

    /// <summary>The calculation record of the step: each relation with its numbers.</summary>
    public ImmutableArray<RecordLine> Lines { get; }

    /// <summary>The assumptions the step rests on ("adiabatic", "reversible", "kinetic and potential energy neglected").</summary>
    public ImmutableArray<string> Assumptions { get; }

    /// <summary>Warnings raised while solving the step.</summary>
    public ImmutableArray<string> Warnings { get; }

    /// <summary>States computed on the way that are not cycle states (for example the isentropic end state 2s of a compressor).</summary>
    public ImmutableArray<State> AuxiliaryStates { get; }

    /// <summary>
    /// Intermediate states along the real path for drawing, <paramref name="count"/> points including both ends,
    /// computed from the property model (an isentrope at constant s, a constant-volume heating at constant v).
    /// Irreversible steps with no defined path return only their two end states.
    /// </summary>
    public IReadOnlyList<StatePoint> SamplePath(int count = 24)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 2);
        return PathSampler.Sample(this, count);
    }

    /// <inheritdoc />
    public override string ToString() => $"{Name} {Process}: q = {Units.SiText.Number(Q / 1000)} kJ/kg, w = {Units.SiText.Number(W / 1000)} kJ/kg";
}
