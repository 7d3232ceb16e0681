using NotebookCycles.Refrigerants;
using Xunit;

namespace NotebookCycles.Tests.Refrigerants;

/// <summary>Analytic derivatives of every term family against fourth-order central finite differences.</summary>
public sealed class HelmholtzEquationTests
{
    public static TheoryData<string> TermKinds() => ["power", "power-exp", "gaussian", "associating", "nonanalytic", "ideal"];

    private static HelmholtzEquation One(string kind)
    {
        var set = new HelmholtzTermSet();
        switch (kind)
        {
            case "power":
                set.Residual.Add(new ResidualTerm(0, 0.7, 2, 1.25, 0, 0, 0, 0, 0, 0));
                break;
            case "power-exp":
                set.Residual.Add(new ResidualTerm(1, -0.4, 3, 2.5, 2, 0, 0, 0, 0, 0));
                break;
            case "gaussian":
                set.Residual.Add(new ResidualTerm(2, 0.9, 1, 1.4, 0, 1.02, 0.712, 1.42, 1.13, 0));
                break;
            case "associating": // the first Gao et al. (2023) associating term's exponents
                set.Residual.Add(new ResidualTerm(3, -1.6909858, 1, 4.3315, 0, 2.8452, 0.4478, 0.3696, 1.108, 1.244));
                break;
            case "nonanalytic": // the first Span-Wagner (1996) non-analytic term
                set.NonAnalytic.Add(new NonAnalyticTerm(-0.66642276540751, 3.5, 0.875, 0.3, 0.7, 0.3, 10, 275));
                break;
            default:
                set.A1 = 1.3;
                set.A2 = -0.7;
                set.LogTau = 2.5;
                set.IdealPowerN.Add(-3.9);
                set.IdealPowerT.Add(-0.75);
                set.PlanckN.Add(1.99);
                set.PlanckTheta.Add(3.15);
                break;
        }

        return new HelmholtzEquation(set);
    }

    private static double D1(Func<double, double> f, double x, double h) => (f(x - 2 * h) - 8 * f(x - h) + 8 * f(x + h) - f(x + 2 * h)) / (12 * h);

    [Theory]
    [MemberData(nameof(TermKinds))]
    public void Analytic_derivatives_match_finite_differences(string kind)
    {
        var eq = One(kind);
        foreach (var (delta, tau) in new[] { (0.3, 0.8), (0.9, 1.1), (1.4, 1.05), (2.2, 1.6), (1.08, 0.97) })
        {
            const double h = 1e-4;
            if (kind == "ideal")
            {
                var id = eq.Ideal(delta, tau);
                double at = D1(t => eq.Ideal(delta, t).A, tau, h);
                double att = D1(t => eq.Ideal(delta, t).T / t, tau, h);
                Assert.Equal(at * tau, id.T, 1e-8 * Math.Max(1, Math.Abs(id.T)));
                Assert.Equal(att * tau * tau, id.TT, 1e-7 * Math.Max(1, Math.Abs(id.TT)));
                continue;
            }

            var r = eq.Residual(delta, tau);
            double scale = Math.Max(1e-3, Math.Abs(r.A) + Math.Abs(r.D) + Math.Abs(r.T) + Math.Abs(r.DD) + Math.Abs(r.TT));
            double ad = D1(d => eq.Residual(d, tau).A, delta, h) * delta;
            double add = D1(d => eq.Residual(d, tau).D / d, delta, h) * delta * delta;
            double at2 = D1(t => eq.Residual(delta, t).A, tau, h) * tau;
            double att2 = D1(t => eq.Residual(delta, t).T / t, tau, h) * tau * tau;
            double adt = D1(t => eq.Residual(delta, t).D, tau, h) * tau;
            Assert.True(Math.Abs(ad - r.D) < 1e-7 * scale, $"{kind} δαʳ_δ at ({delta}, {tau}): {r.D} vs {ad}");
            Assert.True(Math.Abs(add - r.DD) < 1e-6 * scale, $"{kind} δ²αʳ_δδ at ({delta}, {tau}): {r.DD} vs {add}");
            Assert.True(Math.Abs(at2 - r.T) < 1e-7 * scale, $"{kind} ταʳ_τ at ({delta}, {tau}): {r.T} vs {at2}");
            Assert.True(Math.Abs(att2 - r.TT) < 1e-6 * scale, $"{kind} τ²αʳ_ττ at ({delta}, {tau}): {r.TT} vs {att2}");
            Assert.True(Math.Abs(adt - r.DT) < 1e-6 * scale, $"{kind} δταʳ_δτ at ({delta}, {tau}): {r.DT} vs {adt}");
            Assert.True(r.A != 0, "the term must contribute at the test point");
        }
    }

    [Theory]
    [InlineData("R744")]
    [InlineData("R717")]
    [InlineData("R1234yf")]
    public void Whole_equations_are_consistent(string fluid)
    {
        var m = Refrigerant.Get(fluid);
        var f = m.Core;
        // cp − cv from the Helmholtz energy against T·v·β²/κ from finite differences of the pressure.
        double t = 1.2 * f.Tc, rho = 0.8 * f.RhoC;
        var s = f.Evaluate(t, rho);
        double dpdt = D1(x => f.Pressure(x, rho), t, 1e-3);
        double dpdrho = D1(x => f.Pressure(t, x), rho, 1e-3);
        double expected = t * dpdt * dpdt / (rho * rho * dpdrho);
        Assert.Equal(expected, s.Cp - s.Cv, 1e-6 * expected);
        // s = −(∂a/∂T)_ρ with a = h − p/ρ − T·s … checked as (∂u/∂T)_ρ = cv.
        double cv = D1(x => f.Evaluate(x, rho).U, t, 1e-3);
        Assert.Equal(cv, s.Cv, 1e-6 * cv);
    }
}
