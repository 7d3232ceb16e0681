using NotebookCycles.Properties;
using NotebookCycles.Water;
using Xunit;

namespace NotebookCycles.Tests.Water;

/// <summary>
/// Round trips over dense (T, p) grids of every region and of the dome: forward state, then back through the
/// release's backward equations (within the release's consistency limits) and through every flash path.
/// </summary>
public sealed class IapwsIf97RoundTripTests
{
    private static readonly IapwsIf97 Steam = IapwsIf97.Default;

    /// <summary>Grid points (T K, p Pa) strictly inside one region, away from its boundaries by a small margin.</summary>
    public static IEnumerable<(double T, double P)> Grid(int region)
    {
        switch (region)
        {
            case 1:
                for (double t = 273.16; t <= 623.15; t += 350.0 / 24)
                {
                    double pLow = Region4.SaturationPressure(t) * 1.02;
                    for (int k = 0; k <= 16; k++)
                    {
                        yield return (t, k == 16 ? 100e6 : 1e6 * pLow * Math.Pow(100.0 / pLow, k / 16.0));
                    }
                }

                break;
            case 2:
                for (double t = 273.16; t <= 1073.15; t += 800.0 / 32)
                {
                    double pHigh = t <= 623.15 ? Region4.SaturationPressure(t) * 0.98 : t <= 863.15 ? Region3.PressureB23(t) * 0.99 : 100.0;
                    for (int k = 0; k <= 16; k++)
                    {
                        yield return (t, k == 16 ? 1e6 * pHigh : 1e6 * 1e-4 * Math.Pow(pHigh / 1e-4, k / 16.0));
                    }
                }

                break;
            case 3:
                for (double t = 624.0; t <= 860.0; t += 236.0 / 24)
                {
                    double pLow = Region3.PressureB23(t) * 1.01;
                    for (int k = 0; k <= 16; k++)
                    {
                        double p = k == 16 ? 100.0 : pLow + (100.0 - pLow) * k / 16.0;
                        if (t < Region3.Tc && Math.Abs(p / Region4.SaturationPressure(t) - 1) < 0.01)
                        {
                            continue;
                        }

                        yield return (t, 1e6 * p);
                    }
                }

                break;
            default:
                for (double t = 1080.0; t <= 2273.15; t += 1193.0 / 16)
                {
                    for (int k = 0; k <= 12; k++)
                    {
                        yield return (t, k == 12 ? 50e6 : 1e6 * 1e-3 * Math.Pow(50.0 / 1e-3, k / 12.0));
                    }
                }

                break;
        }
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Grid_points_lie_in_their_region(int region)
    {
        foreach (var (t, p) in Grid(region))
        {
            Assert.Equal(region, Steam.Region(t, p));
        }
    }

    [Fact]
    public void Region_1_backward_equations_agree_with_the_forward_equation_within_25_mK()
    {
        // IAPWS R7-97(2012) eqs. 12 and 14: tolerated inconsistency |ΔT|tol = 25 mK for T(p,h) and T(p,s) of region 1.
        double worst = 0;
        foreach (var (t, p) in Grid(1))
        {
            var st = Steam.FromTP(t, p);
            worst = Math.Max(worst, Math.Abs(Region1.TemperaturePH(p * 1e-6, st.H * 1e-3) - t));
            worst = Math.Max(worst, Math.Abs(Region1.TemperaturePS(p * 1e-6, st.S * 1e-3) - t));
        }

        Assert.True(worst <= 0.025, $"worst |ΔT| = {worst * 1e3:F3} mK");
    }

    [Fact]
    public void Region_2_backward_equations_agree_with_the_forward_equation_within_the_tolerated_limits()
    {
        // IAPWS R7-97(2012), tolerated inconsistency of the region-2 backward equations: |ΔT|tol = 10 mK in
        // subregions 2a and 2b, 25 mK in 2c (from memory). Checked from the triple-point pressure up.
        double worstAb = 0, worstC = 0;
        foreach (var (t, p) in Grid(2))
        {
            if (p < 611.213)
            {
                continue; // the backward equations start at the triple-point pressure (611.213 Pa is psat(273.15 K) by eq. 30)
            }

            var st = Steam.FromTP(t, p);
            double pm = p * 1e-6, h = st.H * 1e-3, s = st.S * 1e-3;
            double dh = Math.Abs(Region2.TemperaturePH(pm, h) - t), ds = Math.Abs(Region2.TemperaturePS(pm, s) - t);
            if (Region2.SubregionPH(pm, h) == 3)
            {
                worstC = Math.Max(worstC, dh);
            }
            else
            {
                worstAb = Math.Max(worstAb, dh);
            }

            if (Region2.SubregionPS(pm, s) == 3)
            {
                worstC = Math.Max(worstC, ds);
            }
            else
            {
                worstAb = Math.Max(worstAb, ds);
            }
        }

        Assert.True(worstAb <= 0.010 && worstC <= 0.025, $"worst |ΔT| = {worstAb * 1e3:F3} mK (2a, 2b), {worstC * 1e3:F3} mK (2c)");
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Flash_from_p_h_and_p_s_reproduces_the_state_to_1e_9(int region)
    {
        double worst = 0;
        string where = "";
        foreach (var (t, p) in Grid(region))
        {
            var st = Steam.FromTP(t, p);
            var a = Steam.FromPH(p, st.H);
            var b = Steam.FromPS(p, st.S);
            double e = Math.Max(Math.Max(Rel(a.T, t), Rel(b.T, t)), Math.Max(Rel(a.H, st.H, 1e3), Rel(b.S, st.S, 10)));
            e = Math.Max(e, Math.Max(Rel(a.V, st.V), Rel(b.V, st.V)));
            if (e > worst)
            {
                worst = e;
                where = $"T = {t} K, p = {p} Pa";
            }

            Assert.Equal(st.Phase, a.Phase);
            Assert.Equal(st.Phase, b.Phase);
        }

        Assert.True(worst <= 1e-9, $"worst relative difference {worst:E2} at {where}");
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Iterative_pairs_reproduce_the_state(int region)
    {
        // (T,s), (T,v), (p,v), (h,s), (v,u), (v,s): T to 1e-9 relative; p to 1e-7 relative (liquid is nearly
        // incompressible, so p is weakly determined by v, s or h at fixed T); h to 1e-9.
        double worstT = 0, worstP = 0;
        string where = "";
        int k = 0;
        foreach (var (t, p) in Grid(region))
        {
            if (k++ % 3 != 0)
            {
                continue; // every third point: the nested solvers are slower
            }

            var st = Steam.FromTP(t, p);

            // Below the density maximum (about 277 K) s rises with p along a liquid isotherm, so (T, s) of a compressed
            // liquid there can equal that of a wet state at psat(T): the two-phase state is returned, so skip (T, s).
            // Likewise v(T) along a liquid isobar has a minimum near 277 K: (p, v) returns the root above it, so skip (p, v) there.
            bool anomaly = t < 277.15 && region == 1;
            var ts = anomaly ? st : Steam.FromTS(t, st.S);
            var pv = anomaly ? st : Steam.FromPV(p, st.V);
            foreach (var back in new[]
            {
                ts, Steam.FromTV(t, st.V), pv, Steam.FromHS(st.H, st.S),
                Steam.FromVU(st.V, st.U), Steam.FromVS(st.V, st.S),
            })
            {
                double et = Rel(back.T, t), ep = Rel(back.P, p);
                if (et / 1e-9 > Math.Max(worstT / 1e-9, worstP / 1e-7) || ep / 1e-7 > Math.Max(worstT / 1e-9, worstP / 1e-7))
                {
                    where = $"T = {t} K, p = {p} Pa -> T = {back.T}, p = {back.P}";
                }

                worstT = Math.Max(worstT, et);
                worstP = Math.Max(worstP, ep);
            }
        }

        Assert.True(worstT <= 1e-9 && worstP <= 1e-7, $"worst T {worstT:E2}, p {worstP:E2} at {where}");
    }

    [Fact]
    public void Dome_states_round_trip_through_every_pair()
    {
        double worst = 0;
        string where = "";
        for (double t = 273.16; t < 647.0; t += 373.84 / 40)
        {
            foreach (double x in new[] { 0.0, 0.05, 0.35, 0.8, 1.0 })
            {
                var st = Steam.FromTX(t, x);
                Assert.Equal(Phase.TwoPhase, st.Phase);
                Assert.Equal(4, Steam.Region(st));
                var fromP = Steam.FromPX(st.P, x);
                double e = Math.Max(Rel(fromP.T, t), Rel(fromP.H, st.H, 1e3));
                if (x > 0 && x < 1)
                {
                    foreach (var back in new[] { Steam.FromPH(st.P, st.H), Steam.FromPS(st.P, st.S), Steam.FromTS(t, st.S), Steam.FromTV(t, st.V), Steam.FromPV(st.P, st.V) })
                    {
                        Assert.Equal(Phase.TwoPhase, back.Phase);
                        e = Math.Max(e, Math.Abs(back.X - x));
                        e = Math.Max(e, Rel(back.T, t));
                    }
                }

                if (e > worst)
                {
                    worst = e;
                    where = $"T = {t} K, x = {x}";
                }
            }
        }

        Assert.True(worst <= 1e-9, $"worst {worst:E2} at {where}");
    }

    [Fact]
    public void Dome_states_round_trip_through_h_s_and_v_u()
    {
        double worst = 0;
        string where = "";
        for (double t = 280.0; t < 645.0; t += 365.0 / 12)
        {
            foreach (double x in new[] { 0.1, 0.5, 0.9 })
            {
                var st = Steam.FromTX(t, x);
                foreach (var back in new[] { Steam.FromHS(st.H, st.S), Steam.FromVU(st.V, st.U), Steam.FromVS(st.V, st.S) })
                {
                    double e = Math.Max(Math.Abs(back.X - x), Rel(back.T, t));
                    if (e > worst)
                    {
                        worst = e;
                        where = $"T = {t} K, x = {x}";
                    }
                }
            }
        }

        Assert.True(worst <= 1e-8, $"worst {worst:E2} at {where}");
    }

    [Fact]
    public void Starting_values_at_the_seams_give_the_same_states()
    {
        // The supplementary backward equations will enter as starting values: a start must not change the answer.
        foreach (var (t, p) in Grid(3))
        {
            var st = Steam.FromTP(t, p);
            double pm = p * 1e-6;
            Assert.Equal(Fit.Ok, If97Core.Region3PY(pm, st.H * 1e-3, false, t * (1 + 1e-4), out var a));
            Assert.Equal(st.T, a.T, 1e-9 * t);
            Assert.Equal(Fit.Ok, If97Core.Region3PY(pm, st.S * 1e-3, true, t * (1 - 1e-4), out var b));
            Assert.Equal(st.T, b.T, 1e-9 * t);
            var c = If97Core.Region3TP(t, pm, st.Phase == Phase.Liquid, 1.0 / st.V * (1 + 1e-3));
            Assert.Equal(st.V, c.V, 1e-12 * st.V);
            Assert.True(If97Core.SolveHS(st.H * 1e-3, st.S * 1e-3, pm * (1 + 1e-5), out var d));
            Assert.Equal(p, d.P, 1e-7 * p);
        }
    }

    [Fact]
    public void Two_phase_states_have_NaN_heat_capacities_and_speed_of_sound()
    {
        var st = Steam.FromPX(1e6, 0.5);
        Assert.True(double.IsNaN(st.Cp) && double.IsNaN(st.Cv) && double.IsNaN(st.W));
        Assert.Equal(0.5, st.X);
    }

    private static double Rel(double a, double b, double floor = 0) => Math.Abs(a - b) / Math.Max(Math.Abs(b), floor);
}
