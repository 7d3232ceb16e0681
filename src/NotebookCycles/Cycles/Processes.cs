using System.Collections.Immutable;
using NotebookCycles.Gases;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>How a compression or expansion end point is given.</summary>
internal enum TargetKind
{
    PressureRatio,
    VolumeRatio,
    Pressure,
    Volume,
    PressureOf,
    VolumeOf,
    Temperature,
}

/// <summary>The end point of a compression or expansion: a ratio (always ≥ 1, in the process's own sense), a value, or an earlier state's value.</summary>
internal readonly record struct Target(TargetKind Kind, double Value, string? Of)
{
    public static Target From(string cycle, string step, double? pressureRatio, double? volumeRatio, double? pressure, double? volume, string? toPressureOf, string? toVolumeOf, double? temperature = null)
    {
        if (temperature is { } t)
        {
            if (pressureRatio.HasValue || volumeRatio.HasValue || pressure.HasValue || volume.HasValue || toPressureOf is not null || toVolumeOf is not null)
            {
                throw new CycleDefinitionException(cycle, step, null, "give exactly one end point; a temperature and another end point were given.");
            }

            return new(TargetKind.Temperature, t, null);
        }

        int given = (pressureRatio.HasValue ? 1 : 0) + (volumeRatio.HasValue ? 1 : 0) + (pressure.HasValue ? 1 : 0) + (volume.HasValue ? 1 : 0) + (toPressureOf is null ? 0 : 1) + (toVolumeOf is null ? 0 : 1);
        if (given != 1)
        {
            throw new CycleDefinitionException(cycle, step, null, $"give exactly one end point (pressureRatio, volumeRatio, toPressure, toVolume, toPressureOf, toVolumeOf or toTemperature); {given} were given.");
        }

        return pressureRatio is { } pr ? new(TargetKind.PressureRatio, pr, null)
            : volumeRatio is { } vr ? new(TargetKind.VolumeRatio, vr, null)
            : pressure is { } p ? new(TargetKind.Pressure, p, null)
            : volume is { } v ? new(TargetKind.Volume, v, null)
            : toPressureOf is not null ? new(TargetKind.PressureOf, double.NaN, toPressureOf)
            : new(TargetKind.VolumeOf, double.NaN, toVolumeOf);
    }

    public bool ByPressure => Kind is TargetKind.PressureRatio or TargetKind.Pressure or TargetKind.PressureOf;

    /// <summary>The end pressure (when <see cref="ByPressure"/>) or end volume, validated against the direction of the process.</summary>
    public double Resolve(SolveContext c, string label, bool compression, string ratioName)
    {
        var from = c.Current.Point;
        double value;
        switch (Kind)
        {
            case TargetKind.PressureRatio:
            case TargetKind.VolumeRatio:
                if (!(Value > 1 && double.IsFinite(Value)))
                {
                    throw c.Error(label, $"the {ratioName} {(Kind == TargetKind.PressureRatio ? "(pressure ratio)" : "(volume ratio)")} = {Units.SiText.Number(Value)} must be a finite number greater than 1.");
                }

                value = Kind == TargetKind.PressureRatio
                    ? (compression ? from.P * Value : from.P / Value)
                    : (compression ? from.V / Value : from.V * Value);
                return value;
            case TargetKind.Pressure:
            case TargetKind.Volume:
                value = Value;
                break;
            default:
                var of = c.Earlier(Of!, label);
                value = Kind == TargetKind.PressureOf ? of.Point.P : of.Point.V;
                break;
        }

        bool byP = ByPressure;
        double current = byP ? from.P : from.V;
        bool rises = value > current;
        if (!(value > 0 && double.IsFinite(value)) || (compression ? (byP ? !rises : rises) : (byP ? rises : !rises)))
        {
            string what = byP ? "pressure" : "volume";
            string need = compression ? (byP ? "above" : "below") : (byP ? "below" : "above");
            throw c.Error(label, $"a {(compression ? "compression" : "expansion")} must end at a {what} {need} the start's: {(byP ? "p" : "v")} = {(byP ? Units.SiText.Pressure(value) : Units.SiText.Number(value) + " m³/kg")} against {(byP ? Units.SiText.Pressure(current) : Units.SiText.Number(current) + " m³/kg")} at state {c.Current.Label}.");
        }

        return value;
    }
}

/// <summary>Record-line helpers: symbols and values.</summary>
internal static class Rec
{
    public static RecordValue E(double v) => new(v, QuantityKind.SpecificEnergy);

    public static RecordValue S(double v) => new(v, QuantityKind.SpecificEntropy);

    public static RecordValue T(double v) => new(v, QuantityKind.Temperature);

    public static RecordValue P(double v) => new(v, QuantityKind.Pressure);

    public static RecordValue V(double v) => new(v, QuantityKind.SpecificVolume);

    public static RecordValue N(double v) => new(v, QuantityKind.Dimensionless);

    public static string Pair(string symbol, string a, string b) =>
        a.Length == 1 && b.Length == 1 && char.IsDigit(a[0]) && char.IsDigit(b[0]) ? symbol + a + b : $"{symbol}[{a}→{b}]";

    public static RecordLine Line(string target, string relation, string substitution, RecordValue result, params RecordValue[] values) =>
        new(target, relation, substitution, [.. values], result);

    /// <summary>The look-up of a state's remaining properties from its two known ones.</summary>
    public static RecordLine Lookup(SolveContext c, string label, string unknown, RecordValue result, string a, RecordValue va, string b, RecordValue vb) =>
        new(unknown + label, $"{unknown}({a}{label}, {b}{label})", $"{unknown}({{0}}, {{1}})", [va, vb], result, $"by {c.Model.Name}");

    public static readonly ImmutableArray<string> Adiabatic = ["adiabatic", "reversible (internally)"];
    public static readonly ImmutableArray<string> Reversible = ["internally reversible"];
    public static readonly ImmutableArray<string> FlowAdiabatic = ["adiabatic", "steady flow", "kinetic and potential energy neglected"];
    public static readonly ImmutableArray<string> FlowHeat = ["steady flow", "no shaft work", "kinetic and potential energy neglected"];
    public static readonly ImmutableArray<string> PerfectRegeneratorClosed = ["internally reversible", "heat exchanged with a perfect regenerator inside the cycle (reversible)"];
    public static readonly ImmutableArray<string> PerfectRegeneratorFlow = ["steady flow", "no shaft work", "heat exchanged with a perfect regenerator inside the cycle (reversible)"];
}

/// <summary>Isentropic compression or expansion, closed (w = u1 − u2) or flow (w = h1 − h2).</summary>
internal sealed class IsentropicSpec(string label, bool compression, Target target) : ProcessSpec(label)
{
    public override string Describe => compression ? "isentropic compression" : "isentropic expansion";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        StatePoint b;
        if (target.Kind == TargetKind.Temperature)
        {
            double t2 = target.Value;
            if (!double.IsFinite(t2) || (compression ? t2 <= a.T : t2 >= a.T))
            {
                throw c.Error(to, $"an isentropic {(compression ? "compression" : "expansion")} must end {(compression ? "above" : "below")} the start temperature: T = {Units.SiText.Number(t2)} K against {Units.SiText.Number(a.T)} K at state {from}.");
            }

            b = c.Compute(to, StateProperty.Temperature, t2, StateProperty.Entropy, a.S);
        }
        else
        {
            double end = target.Resolve(c, to, compression, compression ? "compression ratio" : "expansion ratio");
            b = target.ByPressure ? c.Compute(to, StateProperty.Pressure, end, StateProperty.Entropy, a.S) : c.Compute(to, StateProperty.SpecificVolume, end, StateProperty.Entropy, a.S);
        }

        bool closed = c.Kind == SystemKind.Closed;
        double w = closed ? a.U - b.U : a.H - b.H;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            var l = ImmutableArray.CreateBuilder<RecordLine>(6);
            l.Add(Rec.Line("s" + to, "s" + from, "", Rec.S(b.S)));
            AddIsentropeCheck(c, l, from, to, a, b, target.ByPressure);
            if (target.Kind == TargetKind.Temperature)
            {
                l.Add(Rec.Lookup(c, to, "p", Rec.P(b.P), "T", Rec.T(b.T), "s", Rec.S(b.S)));
            }
            else
            {
                l.Add(Rec.Lookup(c, to, "T", Rec.T(b.T), target.ByPressure ? "p" : "v", target.ByPressure ? Rec.P(b.P) : Rec.V(b.V), "s", Rec.S(b.S)));
            }

            l.Add(target.ByPressure
                ? Rec.Lookup(c, to, "v", Rec.V(b.V), "p", Rec.P(b.P), "s", Rec.S(b.S))
                : Rec.Lookup(c, to, "p", Rec.P(b.P), "v", Rec.V(b.V), "s", Rec.S(b.S)));
            string e = closed ? "u" : "h";
            l.Add(Rec.Line(Rec.Pair("w", from, to), $"{e}{from} − {e}{to}", "{0} − {1}", Rec.E(w), Rec.E(closed ? a.U : a.H), Rec.E(closed ? b.U : b.H)));
            lines = l.ToImmutable();
        }

        var state = c.NewState(to, b);
        c.AddStep(compression ? "Isentropic compression" : "Isentropic expansion", PathLaw.Isentropic, state, 0, w, lines: lines, assumptions: closed ? Rec.Adiabatic : Rec.FlowAdiabatic);
    }

    /// <summary>The relation a reader can check against a printed table: pr/vr ratios for variable cp, the closed form for constant cp.</summary>
    internal static void AddIsentropeCheck(SolveContext c, ImmutableArray<RecordLine>.Builder l, string from, string to, StatePoint a, StatePoint b, bool byPressure)
    {
        if (c.Model is ColdAirStandard cold)
        {
            double k = cold.K;
            if (byPressure)
            {
                l.Add(Rec.Line("T" + to, $"T{from}·(p{to}/p{from})^((k−1)/k)", "{0} × ({1} / {2})^(({3} − 1)/{3})", Rec.T(b.T), Rec.T(a.T), Rec.P(b.P), Rec.P(a.P), Rec.N(k)));
            }
            else
            {
                l.Add(Rec.Line("T" + to, $"T{from}·(v{from}/v{to})^(k−1)", "{0} × ({1} / {2})^({3} − 1)", Rec.T(b.T), Rec.T(a.T), Rec.V(a.V), Rec.V(b.V), Rec.N(k)));
            }
        }
        else if (c.Model is IRelativePressureModel rel)
        {
            if (byPressure)
            {
                double pr1 = rel.RelativePressure(a.T);
                l.Add(Rec.Line("pr" + to, $"pr{from}·p{to}/p{from}", "{0} × {1} / {2}", Rec.N(pr1 * b.P / a.P), Rec.N(pr1), Rec.P(b.P), Rec.P(a.P)));
                l.Add(new RecordLine("T" + to, $"T(pr{to})", "T({0})", [Rec.N(pr1 * b.P / a.P)], Rec.T(b.T), "from the relative pressure, as in a gas table"));
            }
            else
            {
                double vr1 = rel.RelativeVolume(a.T);
                l.Add(Rec.Line("vr" + to, $"vr{from}·v{to}/v{from}", "{0} × {1} / {2}", Rec.N(vr1 * b.V / a.V), Rec.N(vr1), Rec.V(b.V), Rec.V(a.V)));
                l.Add(new RecordLine("T" + to, $"T(vr{to})", "T({0})", [Rec.N(vr1 * b.V / a.V)], Rec.T(b.T), "from the relative volume, as in a gas table"));
            }
        }
    }
}

/// <summary>Polytropic process p·vⁿ = constant, closed: w = (p2v2 − p1v1)/(1 − n), q = Δu + w.</summary>
internal sealed class PolytropicSpec(string label, bool compression, double n, Target target) : ProcessSpec(label)
{
    public override string Describe => compression ? "polytropic compression" : "polytropic expansion";

    public override void Apply(SolveContext c)
    {
        string from = c.Current.Label, to = Label!;
        if (!(n > 0 && double.IsFinite(n)) || Math.Abs(n - 1) < 1e-12)
        {
            throw c.Error(to, $"the polytropic exponent n = {Units.SiText.Number(n)} must be a positive finite number other than 1 (use the isothermal process for n = 1).");
        }

        var a = c.Current.Point;
        double end = target.Resolve(c, to, compression, compression ? "compression ratio" : "expansion ratio");
        double p2 = target.ByPressure ? end : a.P * Math.Pow(a.V / end, n);
        double v2 = target.ByPressure ? a.V * Math.Pow(a.P / end, 1.0 / n) : end;
        var b = c.Compute(to, StateProperty.Pressure, p2, StateProperty.SpecificVolume, v2);
        bool closed = c.Kind == SystemKind.Closed;
        double w = closed ? (b.P * b.V - a.P * a.V) / (1 - n) : n * (b.P * b.V - a.P * a.V) / (1 - n);
        double q = (closed ? b.U - a.U : b.H - a.H) + w;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            var l = ImmutableArray.CreateBuilder<RecordLine>(5);
            l.Add(target.ByPressure
                ? Rec.Line("v" + to, $"v{from}·(p{from}/p{to})^(1/n)", "{0} × ({1} / {2})^(1/{3})", Rec.V(v2), Rec.V(a.V), Rec.P(a.P), Rec.P(p2), Rec.N(n))
                : Rec.Line("p" + to, $"p{from}·(v{from}/v{to})^n", "{0} × ({1} / {2})^{3}", Rec.P(p2), Rec.P(a.P), Rec.V(a.V), Rec.V(v2), Rec.N(n)));
            l.Add(Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "v", Rec.V(b.V)));
            string wPair = Rec.Pair("w", from, to), qPair = Rec.Pair("q", from, to);
            l.Add(closed
                ? Rec.Line(wPair, $"(p{to}v{to} − p{from}v{from})/(1 − n)", "({0} × {1} − {2} × {3}) / (1 − {4})", Rec.E(w), Rec.P(b.P), Rec.V(b.V), Rec.P(a.P), Rec.V(a.V), Rec.N(n))
                : Rec.Line(wPair, $"n(p{to}v{to} − p{from}v{from})/(1 − n)", "{4} × ({0} × {1} − {2} × {3}) / (1 − {4})", Rec.E(w), Rec.P(b.P), Rec.V(b.V), Rec.P(a.P), Rec.V(a.V), Rec.N(n)));
            string e = closed ? "u" : "h";
            l.Add(Rec.Line(qPair, $"{e}{to} − {e}{from} + {wPair}", "{0} − {1} + {2}", Rec.E(q), Rec.E(closed ? b.U : b.H), Rec.E(closed ? a.U : a.H), Rec.E(w)));
            lines = l.ToImmutable();
        }

        var state = c.NewState(to, b);
        c.AddStep(compression ? "Polytropic compression" : "Polytropic expansion", PathLaw.Polytropic, state, q, w, polytropicExponent: n, lines: lines, assumptions: Rec.Reversible);
    }
}

/// <summary>Isothermal compression or expansion, internally reversible: q = T·(s2 − s1), w = q − Δu (closed) or q − Δh (flow).</summary>
internal sealed class IsothermalSpec(string label, bool compression, Target target, double? boundaryTemperature) : ProcessSpec(label)
{
    public override string Describe => compression ? "isothermal compression" : "isothermal expansion";

    public override void Apply(SolveContext c)
    {
        string from = c.Current.Label, to = Label!;
        var a = c.Current.Point;
        double end = target.Resolve(c, to, compression, compression ? "compression ratio" : "expansion ratio");
        var b = target.ByPressure ? c.Compute(to, StateProperty.Temperature, a.T, StateProperty.Pressure, end) : c.Compute(to, StateProperty.Temperature, a.T, StateProperty.SpecificVolume, end);
        bool closed = c.Kind == SystemKind.Closed;
        double q = a.T * (b.S - a.S);
        double w = q - (closed ? b.U - a.U : b.H - a.H);
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            string qPair = Rec.Pair("q", from, to), wPair = Rec.Pair("w", from, to), e = closed ? "u" : "h";
            lines =
            [
                Rec.Line("T" + to, "T" + from, "", Rec.T(b.T)),
                target.ByPressure ? Rec.Lookup(c, to, "s", Rec.S(b.S), "T", Rec.T(b.T), "p", Rec.P(b.P)) : Rec.Lookup(c, to, "s", Rec.S(b.S), "T", Rec.T(b.T), "v", Rec.V(b.V)),
                Rec.Line(qPair, $"T{from}·(s{to} − s{from})", "{0} × ({1} − {2})", Rec.E(q), Rec.T(a.T), Rec.S(b.S), Rec.S(a.S)),
                Rec.Line(wPair, $"{qPair} − ({e}{to} − {e}{from})", "{0} − ({1} − {2})", Rec.E(w), Rec.E(q), Rec.E(closed ? b.U : b.H), Rec.E(closed ? a.U : a.H)),
            ];
        }

        var state = c.NewState(to, b);
        c.AddStep(compression ? "Isothermal compression" : "Isothermal expansion", PathLaw.Isothermal, state, q, w, boundaryTemperature ?? a.T, lines: lines, assumptions: Rec.Reversible);
    }
}
