using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>How a heat-transfer process ends.</summary>
internal enum HeatEnd
{
    Heat,
    Temperature,
    Pressure,
    Volume,
    CutoffRatio,
    Quality,
    BackToStart,
}

/// <summary>
/// Heat transfer at constant volume (closed) or constant pressure (closed, or a flow heat exchanger with an optional
/// fractional pressure loss). Ends at a heat, a temperature, a pressure (constant volume), a volume or cutoff ratio
/// (constant pressure), a quality, or back at the start state (closing the cycle).
/// </summary>
internal sealed class HeatSpec(string? label, string device, PathLaw law, bool heating, HeatEnd end, double value, double? boundaryTemperature, bool regenerated, double pressureLoss, string? backTo) : ProcessSpec(label)
{
    private string? _process;

    public override bool Closes => end == HeatEnd.BackToStart;

    public override string Describe => (heating ? "heat addition" : "heat rejection") + (law == PathLaw.ConstantVolume ? " at constant volume" : " at constant pressure");

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label;
        string to = Label ?? c.States[0].Label;
        bool closed = c.Kind == SystemKind.Closed;
        bool constantV = law == PathLaw.ConstantVolume;
        if (!(pressureLoss >= 0 && pressureLoss < 1))
        {
            throw c.Error(to, $"the pressure loss {Units.SiText.Number(pressureLoss)} must be a fraction in [0, 1).");
        }

        double p2 = constantV ? double.NaN : a.P * (1 - pressureLoss);
        double injectedFlow = Closes ? c.PreviousUnknown("inj:" + to + ":m", 0) : 0;
        double inletH = closed ? a.U : a.H;
        if (injectedFlow > 0)
        {
            inletH = (c.Flow * a.H + c.PreviousUnknown("inj:" + to + ":mh", 0)) / (c.Flow + injectedFlow);
        }

        StatePoint b;
        State state;
        switch (end)
        {
            case HeatEnd.Heat:
                if (!(heating ? value > 0 : value < 0) || !double.IsFinite(value))
                {
                    throw c.Error(to, heating
                        ? $"heat added q = {Units.SiText.Number(value / 1000)} kJ/kg must be a positive finite number; to take heat out use a cooling process."
                        : $"heat rejected must be given as a positive amount; got {Units.SiText.Number(-value / 1000)} kJ/kg.");
                }

                b = constantV ? c.Compute(to, StateProperty.SpecificVolume, a.V, StateProperty.InternalEnergy, a.U + value) : c.Compute(to, StateProperty.Pressure, p2, StateProperty.Enthalpy, a.H + value);
                break;
            case HeatEnd.Temperature:
                if (!double.IsFinite(value) || (heating ? value <= a.T : value >= a.T))
                {
                    throw c.Error(to, $"the target temperature {Units.SiText.Number(value)} K must be {(heating ? "above" : "below")} the current {Units.SiText.Number(a.T)} K at state {from} for {(heating ? "heat addition" : "heat rejection")}.");
                }

                b = constantV ? c.Compute(to, StateProperty.Temperature, value, StateProperty.SpecificVolume, a.V) : c.Compute(to, StateProperty.Temperature, value, StateProperty.Pressure, p2);
                break;
            case HeatEnd.Pressure:
                if (!double.IsFinite(value) || (heating ? value <= a.P : value >= a.P))
                {
                    throw c.Error(to, $"the pressure limit {Units.SiText.Pressure(value)} must be {(heating ? "above" : "below")} the current {Units.SiText.Pressure(a.P)} at state {from}.");
                }

                b = c.Compute(to, StateProperty.Pressure, value, StateProperty.SpecificVolume, a.V);
                break;
            case HeatEnd.Volume:
            case HeatEnd.CutoffRatio:
                double v2 = end == HeatEnd.CutoffRatio ? a.V * value : value;
                if (end == HeatEnd.CutoffRatio && !(value > 1 && double.IsFinite(value)))
                {
                    throw c.Error(to, $"the cutoff ratio rc = {Units.SiText.Number(value)} must be a finite number greater than 1.");
                }

                if (!double.IsFinite(v2) || (heating ? v2 <= a.V : v2 >= a.V))
                {
                    throw c.Error(to, $"at constant pressure, {(heating ? "heating" : "cooling")} must {(heating ? "increase" : "decrease")} the volume: v = {Units.SiText.Number(v2)} m³/kg against {Units.SiText.Number(a.V)} m³/kg at state {from}.");
                }

                b = c.Compute(to, StateProperty.Pressure, a.P, StateProperty.SpecificVolume, v2);
                break;
            case HeatEnd.Quality:
                if (!(value >= 0 && value <= 1))
                {
                    throw c.Error(to, $"the quality x = {Units.SiText.Number(value)} is outside the valid range 0 to 1.");
                }

                if (constantV)
                {
                    throw c.Error(to, "a constant-volume process cannot end at a quality alone; give its temperature or pressure.");
                }

                b = c.Compute(to, StateProperty.Pressure, p2, StateProperty.Quality, value);
                break;
            default:
                if (backTo is not null && backTo != c.States[0].Label)
                {
                    throw c.Error(backTo, $"a cycle closes on its start state '{c.States[0].Label}', not on '{backTo}'.");
                }

                b = c.States[0].Point;
                double mismatch = constantV ? Math.Abs(b.V - a.V) / b.V : Math.Abs(b.P - p2) / b.P;
                if (mismatch > 1e-9)
                {
                    throw c.Error(to, constantV
                        ? $"the cycle cannot close at constant volume: v{from} = {Units.SiText.Number(a.V)} m³/kg but v{to} = {Units.SiText.Number(b.V)} m³/kg."
                        : $"the cycle cannot close at constant pressure: p{from} = {Units.SiText.Pressure(p2)}{(pressureLoss > 0 ? " after the pressure loss" : "")} but p{to} = {Units.SiText.Pressure(b.P)}.");
                }

                break;
        }

        double q = (closed ? (constantV ? b.U - a.U : b.H - a.H) : b.H - inletH);
        double w = closed && !constantV ? a.P * (b.V - a.V) : 0.0;
        if (end is not HeatEnd.Heat and not HeatEnd.BackToStart && (heating ? q <= 0 : q >= 0))
        {
            throw c.Error(to, $"the process was stated as {(heating ? "heat addition" : "heat rejection")} but q = {Units.SiText.Number(q / 1000)} kJ/kg.");
        }

        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            lines = Lines(c, from, to, a, b, q, w, closed, constantV);
        }

        state = end == HeatEnd.BackToStart ? c.States[0] : c.NewState(to, b);
        string process = _process ??= (device.Length > 0 ? device + ": " : "") + (heating ? "Heat addition" : "Heat rejection") + (constantV ? " at constant volume" : pressureLoss > 0 ? $" with {Units.SiText.Number(pressureLoss * 100)} % pressure loss" : " at constant pressure");
        double entropyGenerated = double.NaN;
        double? flowAfter = null;
        double stepFlow = c.Flow;
        if (injectedFlow > 0)
        {
            // Drains cascaded into this step mix with the main stream before it.
            double mOut = c.Flow + injectedFlow;
            double tb = boundaryTemperature ?? (q > 0 ? Math.Max(a.T, b.T) : Math.Min(a.T, b.T));
            entropyGenerated = (mOut * b.S - c.Flow * a.S - c.PreviousUnknown("inj:" + to + ":ms", 0)) / mOut - q / tb;
            flowAfter = mOut;
            stepFlow = mOut;
        }

        if (regenerated)
        {
            // A perfect regenerator exchanges heat across a vanishing temperature difference: reversible.
            entropyGenerated = 0;
        }

        var assumptions = regenerated ? (closed ? Rec.PerfectRegeneratorClosed : Rec.PerfectRegeneratorFlow) : closed ? Rec.Reversible : Rec.FlowHeat;
        c.AddStep(process, law, state, q, w, boundaryTemperature ?? double.NaN, regenerated, lines: lines, assumptions: assumptions, entropyGenerated: entropyGenerated, flowAfter: flowAfter, stepFlow: stepFlow);
    }

    private ImmutableArray<RecordLine> Lines(SolveContext c, string from, string to, StatePoint a, StatePoint b, double q, double w, bool closed, bool constantV)
    {
        var l = ImmutableArray.CreateBuilder<RecordLine>(5);
        string qPair = Rec.Pair("q", from, to);
        string e = closed && constantV ? "u" : "h";
        double ea = closed && constantV ? a.U : a.H, eb = closed && constantV ? b.U : b.H;
        switch (end)
        {
            case HeatEnd.Heat:
                l.Add(Rec.Line(e + to, $"{e}{from} + {qPair}", "{0} + {1}", Rec.E(eb), Rec.E(ea), Rec.E(q)));
                l.Add(constantV ? Rec.Lookup(c, to, "T", Rec.T(b.T), "v", Rec.V(b.V), "u", Rec.E(b.U)) : Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "h", Rec.E(b.H)));
                l.Add(constantV ? Rec.Lookup(c, to, "p", Rec.P(b.P), "v", Rec.V(b.V), "u", Rec.E(b.U)) : Rec.Lookup(c, to, "v", Rec.V(b.V), "p", Rec.P(b.P), "h", Rec.E(b.H)));
                break;
            case HeatEnd.BackToStart:
                l.Add(Rec.Line(qPair, $"{e}{to} − {e}{from}", "{0} − {1}", Rec.E(q), Rec.E(eb), Rec.E(ea)));
                break;
            default:
                if (end == HeatEnd.Quality)
                {
                    l.Add(Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "x", Rec.N(b.X)));
                }
                else if (constantV)
                {
                    l.Add(end == HeatEnd.Pressure ? Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "v", Rec.V(b.V)) : Rec.Lookup(c, to, "p", Rec.P(b.P), "T", Rec.T(b.T), "v", Rec.V(b.V)));
                }
                else
                {
                    l.Add(end == HeatEnd.Temperature ? Rec.Lookup(c, to, "v", Rec.V(b.V), "T", Rec.T(b.T), "p", Rec.P(b.P)) : Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "v", Rec.V(b.V)));
                }

                l.Add(Rec.Lookup(c, to, e, Rec.E(eb), "T", Rec.T(b.T), constantV ? "v" : "p", constantV ? Rec.V(b.V) : Rec.P(b.P)));
                l.Add(Rec.Line(qPair, $"{e}{to} − {e}{from}", "{0} − {1}", Rec.E(q), Rec.E(eb), Rec.E(ea)));
                break;
        }

        if (closed && !constantV)
        {
            l.Add(Rec.Line(Rec.Pair("w", from, to), $"p{from}·(v{to} − v{from})", "{0} × ({1} − {2})", Rec.E(w), Rec.P(a.P), Rec.V(b.V), Rec.V(a.V)));
        }

        return l.ToImmutable();
    }
}
