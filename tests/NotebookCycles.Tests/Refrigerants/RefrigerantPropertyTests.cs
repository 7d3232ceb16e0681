using CsCheck;
using NotebookCycles.Properties;
using NotebookCycles.Refrigerants;
using Xunit;

namespace NotebookCycles.Tests.Refrigerants;

/// <summary>Random states over each fluid's whole range: every pair solves and returns the same state.</summary>
public sealed class RefrigerantPropertyTests
{
    private static readonly string[] Names = [.. Refrigerant.Names];

    [Fact]
    public void Random_single_phase_states_round_trip()
    {
        Gen.Select(Gen.Int[0, Names.Length - 1], Gen.Double[0, 1], Gen.Double[0, 1]).Sample((k, ft, fp) =>
        {
            var m = Refrigerant.Get(Names[k]);
            double t = m.TemperatureRange.Minimum + ft * (m.TemperatureRange.Maximum - m.TemperatureRange.Minimum);
            double p = Math.Exp(Math.Log(10) + fp * (Math.Log(0.5 * m.PressureRange.Maximum) - Math.Log(10)));
            StatePoint s;
            try
            {
                s = m.FromTP(t, p);
            }
            catch (AmbiguousStateException)
            {
                return;
            }

            // A liquid's pressure is resolved only to ρ·ulp·(∂p/∂ρ)_T, about 1e-4 Pa: hence the absolute part.
            Assert.True(Math.Abs(s.P - p) < 1e-9 * p + 1e-3, $"{m.Name} T={t} p={p}: p back {s.P}");
            var ph = m.FromPH(p, s.H);
            Assert.True(Math.Abs(ph.T - t) < 1e-7 * t, $"{m.Name} (p,h) T={t} p={p}: {ph.T}");
            var ps = m.FromPS(p, s.S);
            Assert.True(Math.Abs(ps.T - t) < 1e-7 * t, $"{m.Name} (p,s) T={t} p={p}: {ps.T}");
            var tv = m.FromTV(t, s.V);
            Assert.True(Math.Abs(tv.P - p) < 1e-8 * p + 1e-3, $"{m.Name} (T,v) T={t} p={p}: {tv.P}");
        }, iter: 400);
    }

    [Fact]
    public void Random_two_phase_states_round_trip()
    {
        Gen.Select(Gen.Int[0, Names.Length - 1], Gen.Double[0, 0.99999], Gen.Double[0, 1]).Sample((k, ft, x) =>
        {
            var m = Refrigerant.Get(Names[k]);
            double tc = m.CriticalPoint.T;
            double t = m.TripleTemperature + ft * (tc - m.TripleTemperature);
            var s = m.FromTX(t, x);
            var ph = m.FromPH(s.P, s.H);
            Assert.True(Math.Abs(ph.X - x) < 1e-6 && Math.Abs(ph.T - t) < 1e-7 * t, $"{m.Name} T={t} x={x}: (p,h) gives T={ph.T} x={ph.X}");
            var ts = m.FromTS(t, s.S);
            Assert.True(Math.Abs(ts.X - x) < 1e-6, $"{m.Name} T={t} x={x}: (T,s) gives x={ts.X}");
        }, iter: 300);
    }

    [Theory]
    [MemberData(nameof(RefrigerantTests.Fluids), MemberType = typeof(RefrigerantTests))]
    public void Saturation_holds_next_to_the_critical_point(string fluid)
    {
        var m = Refrigerant.Get(fluid);
        double tc = m.CriticalPoint.T;
        foreach (double d in new[] { 1e-1, 1e-2, 1e-3, 1e-4 })
        {
            var sat = m.Saturation(tc - d);
            Assert.True(sat.Liquid.Rho > sat.Vapour.Rho, $"{fluid} Tc − {d} K");
            double gl = sat.Liquid.H - sat.T * sat.Liquid.S, gv = sat.Vapour.H - sat.T * sat.Vapour.S;
            Assert.True(Math.Abs(gl - gv) < 1e-6 * Math.Abs(sat.Vapour.H) + 1e-3, $"{fluid} Tc − {d} K: g′ − g″ = {gl - gv}");
            Assert.True(sat.P < m.CriticalPoint.P);
        }
    }
}
