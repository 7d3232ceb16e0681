using NotebookCycles.Properties;
using NotebookCycles.Tests.Water.Backward;
using NotebookCycles.Water;
using Xunit;
using Xunit.Abstractions;

namespace NotebookCycles.Tests.Water;

/// <summary>
/// The seams of the IAPWS-IF97 solvers: a backward equation supplies the start, Newton polishing on the forward equation
/// does the rest. The states found with a start must be those found by the bracketed solvers alone, and the (h, s)
/// verification inputs of SR2-01 and SR4-04 must give states that satisfy the forward equations.
/// </summary>
public sealed class If97CoreTests(ITestOutputHelper output)
{
    private static readonly IapwsIf97 Steam = IapwsIf97.Default;

    /// <summary>
    /// The (h, s) inputs of the p(h,s) rows of SR2-01(2014) Tables 3 and 9 and SR4-04(2014) Table 5, and of the Tsat(h,s)
    /// rows of SR4-04(2014) Table 29 (ReferenceData/iapws_if97_supplementary_verification.csv).
    /// </summary>
    public static IEnumerable<object[]> HsRows()
    {
        foreach (var row in SupplementaryVerificationData.Rows)
        {
            if (row.Quantity.StartsWith("p = p", StringComparison.Ordinal) && row.Quantity.Contains("(h,s)", StringComparison.Ordinal)
                || row.Quantity.StartsWith("T = Tsat(h,s)", StringComparison.Ordinal))
            {
                yield return [row.Release, row.Table, row.Inputs, row.Quantity, row.ValueText];
            }
        }
    }

    [Fact]
    public void The_hs_verification_rows_cover_regions_1_2_3_and_the_dome()
    {
        var quantities = HsRows().Select(r => (string)r[3]).ToList();
        Assert.Contains(quantities, q => q.Contains("region 1", StringComparison.Ordinal));
        Assert.Contains(quantities, q => q.Contains("subregion 2", StringComparison.Ordinal));
        Assert.Contains(quantities, q => q.Contains("subregion 3", StringComparison.Ordinal));
        Assert.Contains(quantities, q => q.Contains("region 4", StringComparison.Ordinal));
        Assert.True(quantities.Count >= 21, $"{quantities.Count} rows");
    }

    [Theory]
    [MemberData(nameof(HsRows))]
    public void An_hs_verification_input_gives_a_state_consistent_with_the_forward_equations(string release, string table, string inputs, string quantity, string value)
    {
        var x = new ParsedInputs(inputs);
        double h = x["h"], s = x["s"];
        double printed = double.Parse(value, System.Globalization.CultureInfo.InvariantCulture);
        var st = Steam.FromHS(h * 1e3, s * 1e3);
        output.WriteLine($"{release} {table} {inputs}: p = {st.P * 1e-6:R} MPa, T = {st.T:R} K, x = {st.X}");

        // The 1e-9 consistency contract of the model.
        Assert.InRange(Rel(st.H, h * 1e3, 1e3), 0, 1e-9);
        Assert.InRange(Rel(st.S, s * 1e3, 10), 0, 1e-9);

        if (quantity.StartsWith("T = Tsat", StringComparison.Ordinal))
        {
            // The dome: (p, T) on the forward saturation line (eq. 31), and the lever rule at that p reproduces h and s.
            Assert.Equal(Phase.TwoPhase, st.Phase);
            Assert.InRange(Rel(st.T, Region4.SaturationTemperature(st.P * 1e-6)), 0, 1e-12);
            var wet = Steam.FromPX(st.P, st.X);
            Assert.InRange(Rel(wet.H, h * 1e3, 1e3), 0, 1e-9);
            Assert.InRange(Rel(wet.S, s * 1e3, 10), 0, 1e-9);

            // The backward Tsat(h,s) lies within 0.1 % of the polished one (loose bound, common practice, no source).
            Assert.InRange(Rel(st.T, printed), 0, 1e-3);
            return;
        }

        // Single phase: the forward equation at the polished (T, p) reproduces h and s, in the region the release names.
        int region = quantity.Contains("region 1", StringComparison.Ordinal) ? 1 : quantity.Contains("subregion 2", StringComparison.Ordinal) ? 2 : 3;
        Assert.Equal(region, Steam.Region(st));
        var forward = Steam.FromTP(st.T, st.P);
        Assert.InRange(Rel(forward.H, h * 1e3, 1e3), 0, 1e-9);
        Assert.InRange(Rel(forward.S, s * 1e3, 10), 0, 1e-9);

        // The backward p(h,s) is consistent with the forward equation: s(p_backward, h) is within 1e-4 kJ/(kg K) of s
        // (loose bound, common practice, no source; p itself is poorly fixed by (h, s) in cold liquid, where ∂s/∂p at
        // constant h = −v/T is tiny).
        Assert.InRange(Math.Abs(Steam.FromPH(printed * 1e6, h * 1e3).S * 1e-3 - s), 0, 1e-4);
    }

    /// <summary>(T K, p Pa) states of every region and wet states over the whole dome.</summary>
    private static IEnumerable<StatePoint> DenseStates()
    {
        foreach (int region in new[] { 1, 2, 3 })
        {
            foreach (var (t, p) in IapwsIf97RoundTripTests.Grid(region))
            {
                yield return Steam.FromTP(t, p);
            }
        }

        for (int i = 0; i <= 40; i++)
        {
            double p = 700.0 * Math.Pow(21.9e6 / 700.0, i / 40.0);
            foreach (double q in new[] { 0.02, 0.3, 0.7, 0.98 })
            {
                yield return Steam.FromPX(p, q);
            }
        }
    }

    [Fact]
    public void The_backward_start_leaves_the_hs_state_unchanged_on_a_dense_grid()
    {
        int started = 0, total = 0, bracketMisses = 0;
        double worstT = 0, worstV = 0, worstP = 0;
        foreach (var st in DenseStates())
        {
            double h = st.H * 1e-3, s = st.S * 1e-3;
            double start = If97Core.BackwardPressureHS(h, s);
            bool solved = If97Core.SolveHS(h, s, double.NaN, out var bracketed);
            Assert.True(If97Core.SolveHS(h, s, start, out var direct), $"direct ({h}, {s}) from p0 = {start}");
            total++;
            if (!double.IsNaN(start))
            {
                started++;
            }

            if (!solved)
            {
                // The bracketed solver alone misses a few cold, highly compressed liquid states (s near zero); the
                // direct path must still meet the consistency contract there.
                bracketMisses++;
                Assert.InRange(Rel(direct.H, h * 1e3, 1e3), 0, 1e-9);
                Assert.InRange(Rel(direct.S, s * 1e3, 10), 0, 1e-9);
                continue;
            }

            worstT = Math.Max(worstT, Rel(direct.T, bracketed.T));
            worstV = Math.Max(worstV, Rel(direct.V, bracketed.V));
            worstP = Math.Max(worstP, Rel(direct.P, bracketed.P));
            Assert.Equal(bracketed.Phase, direct.Phase);
            Assert.InRange(Rel(direct.H, h * 1e3, 1e3), 0, 1e-9);
            Assert.InRange(Rel(direct.S, s * 1e3, 10), 0, 1e-9);

            // (h, s) fixes p only as well as s(p, h) fixes it: ∂s/∂ln p at constant h = −p·v/T is small in compressed
            // liquid, and s(p, h) carries the (p, h) polishing residual (about 2e-13 relative here). p agrees to that
            // conditioning, T and v to 1e-12 (wet states near the critical point, where v' and v'' change steeply with
            // p, to 1e-11).
            double pTol = Math.Max(1e-12, 2e-13 * Math.Max(Math.Abs(s), 1.0) / (st.P * st.V / st.T * 1e-3));
            double vTol = st.Phase == Phase.TwoPhase && st.P > 20e6 ? 1e-11 : 1e-12;
            Assert.True(Rel(direct.P, bracketed.P) <= pTol, $"p at T = {st.T} K, p = {st.P} Pa: {direct.P:R} vs {bracketed.P:R}");
            Assert.True(Rel(direct.T, bracketed.T) <= 1e-12, $"T at T = {st.T} K, p = {st.P} Pa: {direct.T:R} vs {bracketed.T:R}");
            Assert.True(Rel(direct.V, bracketed.V) <= vTol, $"v at T = {st.T} K, p = {st.P} Pa: {direct.V:R} vs {bracketed.V:R}");
        }

        output.WriteLine($"{started} of {total} states had a backward start, {bracketMisses} missed by the bracketed solver; worst relative differences: T {worstT:E2}, v {worstV:E2}, p {worstP:E2}");
        Assert.True(bracketMisses < 0.02 * total, $"{bracketMisses} of {total}");
        Assert.Equal(total, started);
    }

    [Fact]
    public void The_backward_start_leaves_region_3_ph_and_ps_states_unchanged_on_a_dense_grid()
    {
        int started = 0, total = 0;
        double worst = 0;
        foreach (var (t, pa) in IapwsIf97RoundTripTests.Grid(3))
        {
            var st = Steam.FromTP(t, pa);
            double p = pa * 1e-6;
            foreach (bool entropy in new[] { false, true })
            {
                double y = (entropy ? st.S : st.H) * 1e-3;
                double start = If97Core.Region3StartT(p, y, entropy);
                total++;
                if (!double.IsNaN(start))
                {
                    started++;
                }

                Assert.Equal(Fit.Ok, If97Core.Region3PY(p, y, entropy, double.NaN, out var bracketed));
                Assert.Equal(Fit.Ok, If97Core.Region3PY(p, y, entropy, start, out var direct));
                foreach (var (a, b) in new[] { (direct.T, bracketed.T), (direct.V, bracketed.V), (direct.H, bracketed.H), (direct.S, bracketed.S), (direct.U, bracketed.U), (direct.W, bracketed.W) })
                {
                    worst = Math.Max(worst, Rel(a, b));
                    Assert.True(Rel(a, b) <= 1e-12, $"T = {t} K, p = {p} MPa, entropy = {entropy}: {a:R} vs {b:R}");
                }

                Assert.Equal(bracketed.Phase, direct.Phase);
                Assert.InRange(Rel((entropy ? direct.S : direct.H) * 1e-3, y), 0, 1e-11);
            }
        }

        output.WriteLine($"{started} of {total} had a backward start; worst relative difference {worst:E2}");
        Assert.Equal(total, started);
    }

    [Fact]
    public void The_backward_start_leaves_region_3_densities_unchanged_on_a_dense_grid()
    {
        double worst = 0;
        for (double t = 623.2; t <= 860.0; t += 1.7)
        {
            double pLow = Math.Max(Region3.PressureB23(t) * 1.0005, 16.53);
            for (int k = 0; k <= 40; k++)
            {
                double p = pLow + (100.0 - pLow) * k / 40.0;
                bool liquid = t < Region3.Tc && p > Region4.SaturationPressure(t);
                double start = If97Core.Region3StartRho(t, p);
                Assert.False(double.IsNaN(start));
                var bracketed = If97Core.Region3TP(t, p, liquid, double.NaN);
                var direct = If97Core.Region3TP(t, p, liquid, start);
                worst = Math.Max(worst, Rel(direct.V, bracketed.V));
                Assert.InRange(Rel(direct.V, bracketed.V), 0, 1e-12);
                Assert.InRange(Rel(direct.H, bracketed.H), 0, 1e-12);
                Assert.Equal(bracketed.Phase, direct.Phase);
            }
        }

        output.WriteLine($"worst relative difference in v {worst:E2}");
    }

    [Theory]
    [InlineData(650.0, 25.0, true, 0.5)]
    [InlineData(640.0, 19.0, false, 1.6)]
    [InlineData(640.0, 21.0, true, 0.7)]
    public void A_poor_region_3_start_cannot_change_the_density_found(double t, double p, bool liquid, double factor)
    {
        var bracketed = If97Core.Region3TP(t, p, liquid, double.NaN);
        var poor = If97Core.Region3TP(t, p, liquid, factor / bracketed.V);
        Assert.InRange(Rel(poor.V, bracketed.V), 0, 1e-12);
    }

    [Theory]
    [InlineData(2000.0, 4.3, 0.2)]
    [InlineData(3000.0, 7.0, 50.0)]
    [InlineData(500.0, 1.4, 90.0)]
    public void A_poor_hs_start_cannot_change_the_state_found(double h, double s, double poorStart)
    {
        Assert.True(If97Core.SolveHS(h, s, double.NaN, out var bracketed));
        Assert.True(If97Core.SolveHS(h, s, poorStart, out var poor));
        Assert.InRange(Rel(poor.T, bracketed.T), 0, 1e-10);
        Assert.InRange(Rel(poor.S, bracketed.S), 0, 1e-10);
    }

    private static double Rel(double a, double b, double floor = 0) => Math.Abs(a - b) / Math.Max(Math.Abs(b), floor);
}
