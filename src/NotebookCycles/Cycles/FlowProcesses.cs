using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>A compressor, pump or turbine with an isentropic efficiency: adiabatic steady flow, w = h1 − h2.</summary>
internal sealed class MachineSpec(string label, string device, bool compression, Target target, double efficiency) : ProcessSpec(label)
{
    private string? _process;

    public override string Describe => device.ToLowerInvariant();

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        if (!(efficiency > 0 && efficiency <= 1))
        {
            throw c.Error(to, $"the isentropic efficiency η = {Units.SiText.Number(efficiency)} must lie in (0, 1].");
        }

        if (!target.ByPressure)
        {
            throw c.Error(to, "a flow machine's end point is a pressure, a pressure ratio or an earlier state's pressure.");
        }

        double p2 = target.Resolve(c, to, compression, compression ? "pressure ratio" : "expansion pressure ratio");
        var ideal = c.Compute(to + "s", StateProperty.Pressure, p2, StateProperty.Entropy, a.S);
        double h2 = compression ? a.H + (ideal.H - a.H) / efficiency : a.H - efficiency * (a.H - ideal.H);
        var b = efficiency == 1 ? ideal : c.Compute(to, StateProperty.Pressure, p2, StateProperty.Enthalpy, h2);
        double w = a.H - b.H;
        ImmutableArray<RecordLine> lines = default;
        string s2 = to + "s";
        if (c.Record)
        {
            var l = ImmutableArray.CreateBuilder<RecordLine>(6);
            l.Add(Rec.Line("s" + s2, "s" + from, "", Rec.S(a.S)));
            IsentropicSpec.AddIsentropeCheck(c, l, from, s2, a, ideal, true);
            l.Add(Rec.Lookup(c, s2, "h", Rec.E(ideal.H), "p", Rec.P(p2), "s", Rec.S(ideal.S)));
            if (efficiency < 1)
            {
                l.Add(compression
                    ? Rec.Line("h" + to, $"h{from} + (h{s2} − h{from})/η", "{0} + ({1} − {0}) / {2}", Rec.E(b.H), Rec.E(a.H), Rec.E(ideal.H), Rec.N(efficiency))
                    : Rec.Line("h" + to, $"h{from} − η·(h{from} − h{s2})", "{0} − {2} × ({0} − {1})", Rec.E(b.H), Rec.E(a.H), Rec.E(ideal.H), Rec.N(efficiency)));
                l.Add(Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "h", Rec.E(b.H)));
            }

            l.Add(Rec.Line(Rec.Pair("w", from, to), $"h{from} − h{to}", "{0} − {1}", Rec.E(w), Rec.E(a.H), Rec.E(b.H)));
            lines = l.ToImmutable();
        }

        var state = c.NewState(to, b);
        ImmutableArray<State> aux = efficiency < 1 ? [new State(s2, c.Model, ideal)] : [];
        string process = _process ??= efficiency < 1 ? $"{device}, η = {Units.SiText.Number(efficiency)}" : $"{device}, isentropic";
        c.AddStep(process, efficiency < 1 ? PathLaw.Undefined : PathLaw.Isentropic, state, 0, w, lines: lines, assumptions: Rec.FlowAdiabatic, auxiliary: aux);
    }
}

/// <summary>Throttling valve: adiabatic, no work, h2 = h1.</summary>
internal sealed class ThrottleSpec(string label, Target target) : ProcessSpec(label)
{
    public override string Describe => "throttling";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        double p2 = target.Resolve(c, to, false, "pressure ratio");
        var b = c.Compute(to, StateProperty.Pressure, p2, StateProperty.Enthalpy, a.H);
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            lines = [Rec.Line("h" + to, "h" + from, "", Rec.E(b.H)), Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "h", Rec.E(b.H))];
        }

        c.AddStep("Throttling (isenthalpic)", PathLaw.Isenthalpic, c.NewState(to, b), 0, 0, lines: lines, assumptions: ["adiabatic", "no work", "kinetic and potential energy neglected"]);
    }
}

/// <summary>
/// The cold side of a regenerator (recuperator) of effectiveness ε: h_out = h_in + ε·(h(T_hot,in, p_out) − h_in).
/// The hot inlet may be a state computed later in the chain; the chain is then solved by repeated passes.
/// </summary>
internal sealed class RegeneratorColdSpec(string label, string hotInlet, double effectiveness, double pressureLoss) : ProcessSpec(label)
{
    private string? _process;

    public override bool Couples => true;

    public override string Describe => "regenerator, cold side";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        if (!(effectiveness >= 0 && effectiveness <= 1))
        {
            throw c.Error(to, $"the regenerator effectiveness ε = {Units.SiText.Number(effectiveness)} must lie in [0, 1].");
        }

        if (!(pressureLoss >= 0 && pressureLoss < 1))
        {
            throw c.Error(to, $"the pressure loss {Units.SiText.Number(pressureLoss)} must be a fraction in [0, 1).");
        }

        double p2 = a.P * (1 - pressureLoss);
        var hot = c.Anywhere(hotInlet);
        double tHot = hot?.Point.T ?? a.T;
        if (hot is not null && tHot < a.T && c.PreviousStates is not null)
        {
            throw c.Error(to, $"the regenerator's hot inlet (state {hotInlet}, T = {Units.SiText.Number(tHot)} K) is colder than its cold inlet (state {from}, T = {Units.SiText.Number(a.T)} K): no heat can be recovered.");
        }

        double hIdeal = tHot > a.T ? c.Compute(to, StateProperty.Temperature, tHot, StateProperty.Pressure, p2).H : a.H;
        double h2 = a.H + effectiveness * (hIdeal - a.H);
        var b = c.Compute(to, StateProperty.Pressure, p2, StateProperty.Enthalpy, h2);
        double q = b.H - a.H;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            lines =
            [
                new RecordLine("h*", $"h(T{hotInlet}, p{to})", "h({0}, {1})", [Rec.T(tHot), Rec.P(p2)], Rec.E(hIdeal), $"by {c.Model.Name}: the cold stream heated to the hot inlet temperature"),
                Rec.Line("h" + to, $"h{from} + ε·(h* − h{from})", "{0} + {2} × ({1} − {0})", Rec.E(b.H), Rec.E(a.H), Rec.E(hIdeal), Rec.N(effectiveness)),
                Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "h", Rec.E(b.H)),
                Rec.Line(Rec.Pair("q", from, to), $"h{to} − h{from}", "{0} − {1}", Rec.E(q), Rec.E(b.H), Rec.E(a.H)),
            ];
        }

        c.SetUnknown("regen:" + to, b.H);

        // The regenerator's entropy generation is booked on its hot side, where both streams are known.
        c.AddStep(_process ??= $"Regenerator, cold side, ε = {Units.SiText.Number(effectiveness)}", PathLaw.ConstantPressure, c.NewState(to, b), q, 0, tHot, heatIsInternal: true, lines: lines, assumptions: Rec.FlowHeat, entropyGenerated: 0);
    }
}

/// <summary>The hot side of a regenerator: its outlet from the energy balance with the cold side.</summary>
internal sealed class RegeneratorHotSpec(string label, string coldOutlet, double pressureLoss) : ProcessSpec(label)
{
    public override string Describe => "regenerator, hot side";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        if (!(pressureLoss >= 0 && pressureLoss < 1))
        {
            throw c.Error(to, $"the pressure loss {Units.SiText.Number(pressureLoss)} must be a fraction in [0, 1).");
        }

        Step? cold = null;
        foreach (var s in c.Steps)
        {
            if (s.To.Label == coldOutlet && s.HeatIsInternal)
            {
                cold = s;
            }
        }

        if (cold is null)
        {
            throw c.Error(to, $"no regenerator cold side ending at state '{coldOutlet}' comes earlier in the chain.");
        }

        double coldDuty = cold.MassFraction * cold.Q;
        double h2 = a.H - coldDuty / c.Flow;
        var b = c.Compute(to, StateProperty.Pressure, a.P * (1 - pressureLoss), StateProperty.Enthalpy, h2);
        if (b.T < cold.From.Point.T - 1e-9 * b.T)
        {
            throw c.Error(to, $"the regenerator's hot outlet ({Units.SiText.Number(b.T)} K) would be colder than its cold inlet (state {cold.From.Label}, {Units.SiText.Number(cold.From.Point.T)} K): the effectiveness is too high for these streams.");
        }

        double q = b.H - a.H;
        double sgen = (c.Flow * (b.S - a.S) + cold.MassFraction * cold.DeltaS) / c.Flow;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            lines =
            [
                Rec.Line("h" + to, $"h{from} − (m{cold.To.Label}/m{from})·(h{cold.To.Label} − h{cold.From.Label})", "{0} − ({1} / {2}) × ({3} − {4})", Rec.E(b.H), Rec.E(a.H), Rec.N(cold.MassFraction), Rec.N(c.Flow), Rec.E(cold.To.Point.H), Rec.E(cold.From.Point.H)),
                Rec.Lookup(c, to, "T", Rec.T(b.T), "p", Rec.P(b.P), "h", Rec.E(b.H)),
                Rec.Line("s_gen", $"Δs(hot) + (m{cold.To.Label}/m{from})·Δs(cold)", "{0} + ({1} / {2}) × {3}", Rec.S(sgen), Rec.S(b.S - a.S), Rec.N(cold.MassFraction), Rec.N(c.Flow), Rec.S(cold.DeltaS)),
            ];
        }

        c.AddStep("Regenerator, hot side", PathLaw.ConstantPressure, c.NewState(to, b), q, 0, cold.From.Point.T, heatIsInternal: true, lines: lines, assumptions: Rec.FlowHeat, entropyGenerated: sgen);
    }
}

/// <summary>
/// An open (direct-contact) feedwater heater: the feedwater mixes with steam bled from the turbine and leaves as
/// saturated liquid at the heater pressure. The bleed fraction y follows from the heater's energy balance.
/// </summary>
internal sealed class OpenFeedwaterHeaterSpec(string label, string bleedFrom) : ProcessSpec(label)
{
    public override bool Couples => true;

    public override string Describe => "open feedwater heater";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        if (!c.Model.HasSaturation)
        {
            throw c.Error(to, $"an open feedwater heater needs a model with a liquid-vapour region; {c.Model.Name} has none.");
        }

        var b = c.Compute(to, StateProperty.Pressure, a.P, StateProperty.Quality, 0);
        var bleed = c.Anywhere(bleedFrom);
        double m = c.Flow;
        double mInj = c.PreviousUnknown("inj:" + to + ":m", 0), mhInj = c.PreviousUnknown("inj:" + to + ":mh", 0), msInj = c.PreviousUnknown("inj:" + to + ":ms", 0);
        double y = 0;
        if (bleed is not null)
        {
            if (bleed.Point.P < a.P * (1 - 1e-9))
            {
                throw c.Error(to, $"the bleed (state {bleedFrom}, p = {Units.SiText.Pressure(bleed.Point.P)}) is below the heater pressure {Units.SiText.Pressure(a.P)}: it cannot flow into the heater.");
            }

            if (bleed.Point.H <= b.H)
            {
                throw c.Error(to, $"the bleed (state {bleedFrom}, h = {Units.SiText.Number(bleed.Point.H / 1000)} kJ/kg) is not hotter than the heater outlet (h = {Units.SiText.Number(b.H / 1000)} kJ/kg).");
            }

            y = ((m + mInj) * b.H - m * a.H - mhInj) / (bleed.Point.H - b.H);
            if (y < 0)
            {
                throw c.Error(to, $"the feedwater arriving (h = {Units.SiText.Number(a.H / 1000)} kJ/kg) is already hotter than saturated liquid at the heater pressure; no bleed is needed and the heater cannot work as stated.");
            }
        }

        c.AddBleed(bleedFrom, y);
        double mOut = m + mInj + y;
        double sgen = bleed is null ? 0 : (mOut * b.S - m * a.S - y * bleed.Point.S - msInj) / mOut;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            var hb = bleed?.Point.H ?? double.NaN;
            lines =
            [
                Rec.Lookup(c, to, "h", Rec.E(b.H), "p", Rec.P(b.P), "x", Rec.N(0)),
                mInj > 0
                    ? Rec.Line("y" + bleedFrom, $"((m{from} + m_drain)·h{to} − m{from}·h{from} − (m·h)_drain)/(h{bleedFrom} − h{to})", "(({0} + {1}) × {2} − {0} × {3} − {4}) / ({5} − {2})", Rec.N(y), Rec.N(m), Rec.N(mInj), Rec.E(b.H), Rec.E(a.H), Rec.E(mhInj), Rec.E(hb))
                    : Rec.Line("y" + bleedFrom, $"m{from}·(h{to} − h{from})/(h{bleedFrom} − h{to})", "{0} × ({1} − {2}) / ({3} − {1})", Rec.N(y), Rec.N(m), Rec.E(b.H), Rec.E(a.H), Rec.E(hb)),
                Rec.Line("m" + to, $"m{from} + y{bleedFrom}" + (mInj > 0 ? " + m_drain" : ""), mInj > 0 ? "{0} + {1} + {2}" : "{0} + {1}", Rec.N(mOut), Rec.N(m), Rec.N(y), Rec.N(mInj)),
            ];
        }

        c.AddStep("Open feedwater heater (mixing)", PathLaw.Undefined, c.NewState(to, b), 0, 0, lines: lines, assumptions: ["adiabatic mixing", "outlet saturated liquid at the heater pressure", "steady flow"], entropyGenerated: sgen, flowAfter: mOut, stepFlow: mOut);
    }
}

/// <summary>Where a closed feedwater heater's drain goes.</summary>
public enum DrainRouting
{
    /// <summary>The drain is pumped up to the feedwater pressure and mixed into the feedwater after the heater.</summary>
    PumpedForward,

    /// <summary>The drain is throttled back into a lower-pressure heater or the condenser (named by its outlet state).</summary>
    CascadedBack,
}

/// <summary>
/// A closed (shell-and-tube) feedwater heater: the feedwater is heated to T_sat(p_bleed) − TTD at its own pressure;
/// the bleed condenses to saturated liquid. The drain is pumped forward or cascaded back.
/// </summary>
internal sealed class ClosedFeedwaterHeaterSpec(string label, string bleedFrom, double terminalDifference, DrainRouting drain, string? drainTo, double drainPumpEfficiency) : ProcessSpec(label)
{
    public override bool Couples => true;

    public override string Describe => "closed feedwater heater";

    public override void Apply(SolveContext c)
    {
        var a = c.Current.Point;
        string from = c.Current.Label, to = Label!;
        if (c.Model is not ISaturationModel sat)
        {
            throw c.Error(to, $"a closed feedwater heater needs a model with a liquid-vapour region; {c.Model.Name} has none.");
        }

        if (!(terminalDifference >= 0 && double.IsFinite(terminalDifference)))
        {
            throw c.Error(to, $"the terminal temperature difference {Units.SiText.Number(terminalDifference)} K must be zero or positive.");
        }

        if (drain == DrainRouting.PumpedForward && !(drainPumpEfficiency > 0 && drainPumpEfficiency <= 1))
        {
            throw c.Error(to, $"the drain pump efficiency η = {Units.SiText.Number(drainPumpEfficiency)} must lie in (0, 1].");
        }

        var bleed = c.Anywhere(bleedFrom);
        double m = c.Flow;
        double pBleed = bleed?.Point.P ?? a.P;
        double tOut = bleed is null ? a.T : sat.SaturationTemperature(pBleed) - terminalDifference;
        if (bleed is not null && tOut <= a.T)
        {
            throw c.Error(to, $"the feedwater outlet temperature T_sat(p{bleedFrom}) − TTD = {Units.SiText.Number(tOut)} K is not above the feedwater inlet {Units.SiText.Number(a.T)} K.");
        }

        var fo = bleed is null ? a : c.Compute(to, StateProperty.Temperature, tOut, StateProperty.Pressure, a.P);
        var d = bleed is null ? a : c.Compute(to + "d", StateProperty.Pressure, pBleed, StateProperty.Quality, 0);
        double mInj = c.PreviousUnknown("inj:" + to + ":m", 0), mhInj = c.PreviousUnknown("inj:" + to + ":mh", 0), msInj = c.PreviousUnknown("inj:" + to + ":ms", 0);
        double y = bleed is null ? 0 : (m * (fo.H - a.H) - (mhInj - mInj * d.H)) / (bleed.Point.H - d.H);
        if (y < 0)
        {
            throw c.Error(to, "the drains cascaded into this heater already supply more heat than the feedwater takes; the heater cannot work as stated.");
        }

        c.AddBleed(bleedFrom, y);
        double drainFlow = y + mInj;
        StatePoint outlet;
        double w = 0, mOut;
        var aux = ImmutableArray.CreateBuilder<State>(3);
        if (bleed is not null)
        {
            aux.Add(new State(to + "d", c.Model, d));
        }

        if (drain == DrainRouting.PumpedForward)
        {
            var dps = bleed is null ? a : c.Compute(to + "p", StateProperty.Pressure, a.P, StateProperty.Entropy, d.S);
            double hdp = d.H + (dps.H - d.H) / drainPumpEfficiency;
            var dp = bleed is null ? a : c.Compute(to + "p", StateProperty.Pressure, a.P, StateProperty.Enthalpy, hdp);
            mOut = m + drainFlow;
            double hMix = (m * fo.H + drainFlow * dp.H) / mOut;
            outlet = bleed is null ? a : c.Compute(to, StateProperty.Pressure, a.P, StateProperty.Enthalpy, hMix);
            w = -drainFlow * (dp.H - d.H) / mOut;
            if (bleed is not null)
            {
                aux.Add(new State(to + "p", c.Model, dp));
                aux.Add(new State(to + "f", c.Model, fo));
            }
        }
        else
        {
            if (drainTo is null)
            {
                throw c.Error(to, "a cascaded drain needs the outlet state of the heater or condenser it drains to.");
            }

            outlet = fo;
            mOut = m;
            string key = "inj:" + drainTo + ":";
            c.AddToUnknown(key + "m", drainFlow);
            c.AddToUnknown(key + "mh", drainFlow * d.H);
            c.AddToUnknown(key + "ms", drainFlow * d.S);
        }

        double sgen = bleed is null ? 0 : (mOut * outlet.S - m * a.S - y * bleed.Point.S - msInj + (drain == DrainRouting.CascadedBack ? drainFlow * d.S : 0)) / mOut;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record && bleed is not null)
        {
            var l = ImmutableArray.CreateBuilder<RecordLine>(6);
            l.Add(Rec.Line("T" + to + "f", $"T_sat(p{bleedFrom}) − TTD", "{0} − {1}", Rec.T(tOut), Rec.T(tOut + terminalDifference), Rec.T(terminalDifference)));
            l.Add(Rec.Lookup(c, to + "d", "h", Rec.E(d.H), "p", Rec.P(pBleed), "x", Rec.N(0)));
            l.Add(Rec.Line("y" + bleedFrom, $"(m{from}·(h{to}f − h{from}) − drains in)/(h{bleedFrom} − h{to}d)", "({0} × ({1} − {2}) − {3}) / ({4} − {5})", Rec.N(y), Rec.N(m), Rec.E(fo.H), Rec.E(a.H), Rec.E(mhInj - mInj * d.H), Rec.E(bleed.Point.H), Rec.E(d.H)));
            if (drain == DrainRouting.PumpedForward)
            {
                l.Add(Rec.Line("h" + to, $"(m{from}·h{to}f + m_drain·h{to}p)/m{to}", "({0} × {1} + {2} × {3}) / {4}", Rec.E(outlet.H), Rec.N(m), Rec.E(fo.H), Rec.N(drainFlow), Rec.E(aux[1].Point.H), Rec.N(mOut)));
            }

            lines = l.ToImmutable();
        }

        string process = drain == DrainRouting.PumpedForward ? "Closed feedwater heater, drain pumped forward" : $"Closed feedwater heater, drain cascaded to {drainTo}";
        c.AddStep(process, PathLaw.Undefined, c.NewState(to, outlet), 0, w, lines: lines, assumptions: ["adiabatic shell", "drain leaves as saturated liquid at the bleed pressure", "steady flow"], auxiliary: aux.ToImmutable(), entropyGenerated: sgen, flowAfter: mOut, stepFlow: mOut);
    }
}
