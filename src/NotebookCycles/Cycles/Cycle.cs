using System.Collections.Immutable;
using NotebookCycles.Properties;
using UnitsNet;

namespace NotebookCycles.Cycles;

/// <summary>
/// The front door of the chain: a cycle is stated the way an engineer says it — start here, compress, heat, expand,
/// reject heat back to the start.
/// </summary>
/// <example>
/// <code>
/// var engine = Cycle.Closed("Concept engine, part load", IdealGas.DryAir)
///     .Start("1", T: 310.Kelvins(), p: 0.98.Bars())
///     .CompressIsentropic("2", volumeRatio: 11.0)
///     .HeatAtConstantVolume("3", q: 1.45.MegajoulesPerKilogram())
///     .ExpandIsentropic("4", toVolumeOf: "1")
///     .CoolAtConstantVolume(backTo: "1");
/// </code>
/// </example>
public static class Cycle
{
    /// <summary>A closed system (piston-cylinder): per unit mass, boundary work, q − w = Δu.</summary>
    public static ClosedCycle Closed(string title, IPropertyModel model, CycleOptions? options = null) => new(Chain.New(title, SystemKind.Closed, model, options));

    /// <summary>A steady-flow system (devices in a loop): per unit mass flow, shaft work, q − w = Δh.</summary>
    public static FlowCycle SteadyFlow(string title, IPropertyModel model, CycleOptions? options = null) => new(Chain.New(title, SystemKind.SteadyFlow, model, options));
}

/// <summary>The immutable data of a chain under construction.</summary>
internal sealed record Chain(string Title, SystemKind Kind, IPropertyModel Model, CycleOptions Options, StartSpec? Start, ImmutableArray<ProcessSpec> Specs)
{
    public static Chain New(string title, SystemKind kind, IPropertyModel model, CycleOptions? options)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(title);
        ArgumentNullException.ThrowIfNull(model);
        return new Chain(title, kind, model, options ?? CycleOptions.Default, null, []);
    }

    public string NextStep(string what) => $"step {Specs.Length + 1}, {what}";

    public Chain WithStart(string label, Temperature? t, Pressure? p, SpecificVolume? v, SpecificEnergy? u, SpecificEnergy? h, SpecificEntropy? s, double? x)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(label);
        if (Start is not null)
        {
            throw new CycleDefinitionException(Title, "start", label, $"the chain already starts at state '{Start.Label}'.");
        }

        Span<StateProperty> kinds = stackalloc StateProperty[7];
        Span<double> values = stackalloc double[7];
        int count = 0;
        void Add(StateProperty kind, double value, Span<StateProperty> k, Span<double> v)
        {
            k[count] = kind;
            v[count] = value;
            count++;
        }

        if (t is { } tv) Add(StateProperty.Temperature, tv.Kelvins, kinds, values);
        if (p is { } pv) Add(StateProperty.Pressure, pv.Pascals, kinds, values);
        if (v is { } vv) Add(StateProperty.SpecificVolume, vv.CubicMetersPerKilogram, kinds, values);
        if (u is { } uv) Add(StateProperty.InternalEnergy, uv.JoulesPerKilogram, kinds, values);
        if (h is { } hv) Add(StateProperty.Enthalpy, hv.JoulesPerKilogram, kinds, values);
        if (s is { } sv) Add(StateProperty.Entropy, sv.JoulesPerKilogramKelvin, kinds, values);
        if (x is { } xv) Add(StateProperty.Quality, xv, kinds, values);
        if (count != 2)
        {
            throw new CycleDefinitionException(Title, "start", label, $"a state is fixed by exactly two independent properties; {count} were given.");
        }

        return this with { Start = new StartSpec(label, kinds[0], values[0], kinds[1], values[1]) };
    }

    public Chain WithStart(State state)
    {
        ArgumentNullException.ThrowIfNull(state);
        if (Start is not null)
        {
            throw new CycleDefinitionException(Title, "start", state.Label, $"the chain already starts at state '{Start.Label}'.");
        }

        return this with { Start = new StartSpec(state.Label, default, 0, default, 0, state) };
    }

    public Chain Then(ProcessSpec spec)
    {
        if (Start is null)
        {
            throw new CycleDefinitionException(Title, NextStep(spec.Describe), spec.Label, "the chain has no start state; begin it with Start(...).");
        }

        if (spec.Label is { } label)
        {
            if (string.IsNullOrWhiteSpace(label))
            {
                throw new CycleDefinitionException(Title, NextStep(spec.Describe), label, "a state label must not be empty.");
            }

            bool used = label == Start.Label;
            foreach (var s in Specs)
            {
                used |= s.Label == label;
            }

            if (used)
            {
                throw new CycleDefinitionException(Title, NextStep(spec.Describe), label, $"the label '{label}' is already used by an earlier state; give each state its own label.");
            }
        }

        return this with { Specs = Specs.Add(spec) };
    }

    public CycleResult Close(ProcessSpec closing) => Then(closing).Solve();

    public CycleResult Solve() => ChainSolver.Solve(Title, Kind, Model, Options, Start, Specs);

    public Target Target(string what, double? pressureRatio, double? volumeRatio, Pressure? toPressure, SpecificVolume? toVolume, string? toPressureOf, string? toVolumeOf, Temperature? toTemperature = null) =>
        Cycles.Target.From(Title, NextStep(what), pressureRatio, volumeRatio, toPressure?.Pascals, toVolume?.CubicMetersPerKilogram, toPressureOf, toVolumeOf, toTemperature?.Kelvins);

    public (HeatEnd End, double Value) HeatEndOf(string what, bool heating, SpecificEnergy? q, Temperature? toTemperature, Pressure? toPressure, SpecificVolume? toVolume, double? cutoffRatio, double? toQuality)
    {
        int count = 0;
        (HeatEnd, double) end = default;
        if (q is { } qv) { end = (HeatEnd.Heat, heating ? qv.JoulesPerKilogram : -qv.JoulesPerKilogram); count++; }
        if (toTemperature is { } tv) { end = (HeatEnd.Temperature, tv.Kelvins); count++; }
        if (toPressure is { } pv) { end = (HeatEnd.Pressure, pv.Pascals); count++; }
        if (toVolume is { } vv) { end = (HeatEnd.Volume, vv.CubicMetersPerKilogram); count++; }
        if (cutoffRatio is { } rc) { end = (HeatEnd.CutoffRatio, rc); count++; }
        if (toQuality is { } x) { end = (HeatEnd.Quality, x); count++; }
        if (count != 1)
        {
            throw new CycleDefinitionException(Title, NextStep(what), null, $"give exactly one end of the process (q, toTemperature, toPressure, toVolume, cutoffRatio or toQuality); {count} were given.");
        }

        return end;
    }
}

/// <summary>
/// A closed-system cycle under construction (piston-cylinder, per unit mass). Immutable: each call returns a new
/// chain, so variants can branch from a common beginning. The closing call solves the cycle and returns its result.
/// </summary>
public sealed class ClosedCycle
{
    internal ClosedCycle(Chain chain) => Chain = chain;

    internal Chain Chain { get; }

    /// <summary>The cycle's title.</summary>
    public string Title => Chain.Title;

    /// <summary>Starts the chain at a state fixed by exactly two of the properties.</summary>
    public ClosedCycle Start(string label, Temperature? T = null, Pressure? p = null, SpecificVolume? v = null, SpecificEnergy? u = null, SpecificEnergy? h = null, SpecificEntropy? s = null, double? x = null) =>
        new(Chain.WithStart(label, T, p, v, u, h, s, x));

    /// <summary>Starts the chain at a state computed beforehand with the same model.</summary>
    public ClosedCycle Start(State state) => new(Chain.WithStart(state));

    /// <summary>Reversible adiabatic compression; give one end point: volumeRatio r = v1/v2 &gt; 1, pressureRatio p2/p1 &gt; 1, toPressure, toVolume, an earlier state's pressure or volume, or toTemperature.</summary>
    public ClosedCycle CompressIsentropic(string label, double? volumeRatio = null, double? pressureRatio = null, Pressure? toPressure = null, SpecificVolume? toVolume = null, string? toPressureOf = null, string? toVolumeOf = null, Temperature? toTemperature = null) =>
        new(Chain.Then(new IsentropicSpec(label, true, Chain.Target("isentropic compression", pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf, toTemperature))));

    /// <summary>Reversible adiabatic expansion; give one end point: volumeRatio v2/v1 &gt; 1, pressureRatio p1/p2 &gt; 1, toPressure, toVolume, an earlier state's pressure or volume, or toTemperature.</summary>
    public ClosedCycle ExpandIsentropic(string label, double? volumeRatio = null, double? pressureRatio = null, Pressure? toPressure = null, SpecificVolume? toVolume = null, string? toPressureOf = null, string? toVolumeOf = null, Temperature? toTemperature = null) =>
        new(Chain.Then(new IsentropicSpec(label, false, Chain.Target("isentropic expansion", pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf, toTemperature))));

    /// <summary>Polytropic compression p·vⁿ = constant with exponent <paramref name="n"/>; end points as for the isentrope.</summary>
    public ClosedCycle CompressPolytropic(string label, double n, double? volumeRatio = null, double? pressureRatio = null, Pressure? toPressure = null, SpecificVolume? toVolume = null, string? toPressureOf = null, string? toVolumeOf = null) =>
        new(Chain.Then(new PolytropicSpec(label, true, n, Chain.Target("polytropic compression", pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf))));

    /// <summary>Polytropic expansion p·vⁿ = constant with exponent <paramref name="n"/>.</summary>
    public ClosedCycle ExpandPolytropic(string label, double n, double? volumeRatio = null, double? pressureRatio = null, Pressure? toPressure = null, SpecificVolume? toVolume = null, string? toPressureOf = null, string? toVolumeOf = null) =>
        new(Chain.Then(new PolytropicSpec(label, false, n, Chain.Target("polytropic expansion", pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf))));

    /// <summary>Internally reversible isothermal compression (heat rejected at the gas temperature unless a boundary temperature is given).</summary>
    public ClosedCycle CompressIsothermal(string label, double? volumeRatio = null, double? pressureRatio = null, Pressure? toPressure = null, SpecificVolume? toVolume = null, string? toPressureOf = null, string? toVolumeOf = null, Temperature? boundaryTemperature = null) =>
        new(Chain.Then(new IsothermalSpec(label, true, Chain.Target("isothermal compression", pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf), boundaryTemperature?.Kelvins)));

    /// <summary>Internally reversible isothermal expansion (heat added at the gas temperature unless a boundary temperature is given).</summary>
    public ClosedCycle ExpandIsothermal(string label, double? volumeRatio = null, double? pressureRatio = null, Pressure? toPressure = null, SpecificVolume? toVolume = null, string? toPressureOf = null, string? toVolumeOf = null, Temperature? boundaryTemperature = null) =>
        new(Chain.Then(new IsothermalSpec(label, false, Chain.Target("isothermal expansion", pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf), boundaryTemperature?.Kelvins)));

    /// <summary>Heat addition at constant volume, by heat q, to a temperature, or until a pressure limit. <paramref name="regenerated"/> marks heat supplied inside the cycle by a regenerator.</summary>
    public ClosedCycle HeatAtConstantVolume(string label, SpecificEnergy? q = null, Temperature? toTemperature = null, Pressure? toPressure = null, Temperature? boundaryTemperature = null, bool regenerated = false) =>
        Heat(label, PathLaw.ConstantVolume, true, Chain.HeatEndOf("heat addition at constant volume", true, q, toTemperature, toPressure, null, null, null), boundaryTemperature, regenerated);

    /// <summary>Heat rejection at constant volume, by heat q (a positive amount), to a temperature or a pressure.</summary>
    public ClosedCycle CoolAtConstantVolume(string label, SpecificEnergy? q = null, Temperature? toTemperature = null, Pressure? toPressure = null, Temperature? boundaryTemperature = null, bool regenerated = false) =>
        Heat(label, PathLaw.ConstantVolume, false, Chain.HeatEndOf("heat rejection at constant volume", false, q, toTemperature, toPressure, null, null, null), boundaryTemperature, regenerated);

    /// <summary>Heat rejection at constant volume back to the start state, closing and solving the cycle.</summary>
    public CycleResult CoolAtConstantVolume(string backTo) => Close(PathLaw.ConstantVolume, false, backTo, null, false);

    /// <summary>Heat rejection at constant volume back to the start state, with the boundary temperature given.</summary>
    public CycleResult CoolAtConstantVolume(string backTo, Temperature boundaryTemperature, bool regenerated = false) => Close(PathLaw.ConstantVolume, false, backTo, boundaryTemperature, regenerated);

    /// <summary>Heat addition at constant volume back to the start state, closing the cycle (a reversed cycle).</summary>
    public CycleResult HeatAtConstantVolume(string backTo) => Close(PathLaw.ConstantVolume, true, backTo, null, false);

    /// <summary>Heat addition at constant pressure, by heat q, to a temperature, to a volume or by the cutoff ratio rc = v3/v2.</summary>
    public ClosedCycle HeatAtConstantPressure(string label, SpecificEnergy? q = null, Temperature? toTemperature = null, SpecificVolume? toVolume = null, double? cutoffRatio = null, Temperature? boundaryTemperature = null, bool regenerated = false) =>
        Heat(label, PathLaw.ConstantPressure, true, Chain.HeatEndOf("heat addition at constant pressure", true, q, toTemperature, null, toVolume, cutoffRatio, null), boundaryTemperature, regenerated);

    /// <summary>Heat rejection at constant pressure, by heat q (a positive amount), to a temperature or a volume.</summary>
    public ClosedCycle CoolAtConstantPressure(string label, SpecificEnergy? q = null, Temperature? toTemperature = null, SpecificVolume? toVolume = null, Temperature? boundaryTemperature = null, bool regenerated = false) =>
        Heat(label, PathLaw.ConstantPressure, false, Chain.HeatEndOf("heat rejection at constant pressure", false, q, toTemperature, null, toVolume, null, null), boundaryTemperature, regenerated);

    /// <summary>Heat rejection at constant pressure back to the start state, closing and solving the cycle.</summary>
    public CycleResult CoolAtConstantPressure(string backTo) => Close(PathLaw.ConstantPressure, false, backTo, null, false);

    /// <summary>Heat rejection at constant pressure back to the start state, with the boundary temperature given.</summary>
    public CycleResult CoolAtConstantPressure(string backTo, Temperature boundaryTemperature, bool regenerated = false) => Close(PathLaw.ConstantPressure, false, backTo, boundaryTemperature, regenerated);

    /// <summary>Isothermal compression back to the start state, closing and solving the cycle.</summary>
    public CycleResult CompressIsothermal(string backTo) =>
        Chain.Close(new IsothermalCloseSpec(true, backTo, null));

    /// <summary>Isentropic compression back to the start state, closing and solving the cycle.</summary>
    public CycleResult CompressIsentropic(string backTo) =>
        Chain.Close(new IsentropicCloseSpec(true, backTo));

    /// <summary>Isentropic expansion back to the start state, closing and solving the cycle.</summary>
    public CycleResult ExpandIsentropic(string backTo) =>
        Chain.Close(new IsentropicCloseSpec(false, backTo));

    private ClosedCycle Heat(string label, PathLaw law, bool heating, (HeatEnd End, double Value) end, Temperature? boundaryTemperature, bool regenerated) =>
        new(Chain.Then(new HeatSpec(label, "", law, heating, end.End, end.Value, boundaryTemperature?.Kelvins, regenerated, 0, null)));

    private CycleResult Close(PathLaw law, bool heating, string backTo, Temperature? boundaryTemperature, bool regenerated) =>
        Chain.Close(new HeatSpec(null, "", law, heating, HeatEnd.BackToStart, double.NaN, boundaryTemperature?.Kelvins, regenerated, 0, backTo));
}
