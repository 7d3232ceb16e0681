using System.Collections.Immutable;
using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>Checks that a closing step names the start state.</summary>
internal static class Closing
{
    public static State StartOf(SolveContext c, string backTo)
    {
        var start = c.States[0];
        if (backTo != start.Label)
        {
            throw c.Error(backTo, $"a cycle closes on its start state '{start.Label}', not on '{backTo}'.");
        }

        return start;
    }
}

/// <summary>An internally reversible isothermal step back to the start state (the Carnot cycle's heat rejection).</summary>
internal sealed class IsothermalCloseSpec(bool compression, string backTo, double? boundaryTemperature) : ProcessSpec(null)
{
    public override bool Closes => true;

    public override string Describe => compression ? "isothermal compression" : "isothermal expansion";

    public override void Apply(SolveContext c)
    {
        var start = Closing.StartOf(c, backTo);
        var a = c.Current.Point;
        var b = start.Point;
        if (Math.Abs(a.T - b.T) > 1e-9 * b.T)
        {
            throw c.Error(start.Label, $"the cycle cannot close isothermally: T{c.Current.Label} = {Units.SiText.Number(a.T)} K but T{start.Label} = {Units.SiText.Number(b.T)} K.");
        }

        bool closed = c.Kind == SystemKind.Closed;
        double q = a.T * (b.S - a.S);
        double w = q - (closed ? b.U - a.U : b.H - a.H);
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            string from = c.Current.Label, to = start.Label, e = closed ? "u" : "h";
            string qPair = Rec.Pair("q", from, to);
            lines =
            [
                Rec.Line(qPair, $"T{from}·(s{to} − s{from})", "{0} × ({1} − {2})", Rec.E(q), Rec.T(a.T), Rec.S(b.S), Rec.S(a.S)),
                Rec.Line(Rec.Pair("w", from, to), $"{qPair} − ({e}{to} − {e}{from})", "{0} − ({1} − {2})", Rec.E(w), Rec.E(q), Rec.E(closed ? b.U : b.H), Rec.E(closed ? a.U : a.H)),
            ];
        }

        c.AddStep(compression ? "Isothermal compression" : "Isothermal expansion", PathLaw.Isothermal, start, q, w, boundaryTemperature ?? a.T, lines: lines, assumptions: Rec.Reversible);
    }
}

/// <summary>An isentropic step back to the start state.</summary>
internal sealed class IsentropicCloseSpec(bool compression, string backTo) : ProcessSpec(null)
{
    public override bool Closes => true;

    public override string Describe => compression ? "isentropic compression" : "isentropic expansion";

    public override void Apply(SolveContext c)
    {
        var start = Closing.StartOf(c, backTo);
        var a = c.Current.Point;
        var b = start.Point;
        if (Math.Abs(a.S - b.S) > 1e-9 * Math.Max(Math.Abs(b.S), 1000))
        {
            throw c.Error(start.Label, $"the cycle cannot close isentropically: s{c.Current.Label} = {Units.SiText.Number(a.S / 1000)} kJ/(kg·K) but s{start.Label} = {Units.SiText.Number(b.S / 1000)} kJ/(kg·K).");
        }

        bool closed = c.Kind == SystemKind.Closed;
        double w = closed ? a.U - b.U : a.H - b.H;
        ImmutableArray<RecordLine> lines = default;
        if (c.Record)
        {
            string from = c.Current.Label, to = start.Label, e = closed ? "u" : "h";
            lines = [Rec.Line(Rec.Pair("w", from, to), $"{e}{from} − {e}{to}", "{0} − {1}", Rec.E(w), Rec.E(closed ? a.U : a.H), Rec.E(closed ? b.U : b.H))];
        }

        c.AddStep(compression ? "Isentropic compression" : "Isentropic expansion", PathLaw.Isentropic, start, 0, w, lines: lines, assumptions: closed ? Rec.Adiabatic : Rec.FlowAdiabatic);
    }
}
