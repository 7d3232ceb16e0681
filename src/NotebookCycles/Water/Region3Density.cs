using NotebookCycles.Numerics;

namespace NotebookCycles.Water;

/// <summary>
/// Density of region 3 from (p, T) by bracketed Newton iteration on the forward Helmholtz equation. Below the critical
/// temperature the equation has a van der Waals loop, so the caller names the branch (liquid or vapour) and the
/// bracket is cut at the spinodal when the loop could hold a second root.
/// </summary>
internal static class Region3Density
{
    /// <summary>Lowest density searched, kg/m³ (below every region-3 state).</summary>
    public const double RhoLow = 40.0;

    /// <summary>Highest density searched, kg/m³: above every region-3 state (p3 exceeds 140 MPa there) and below the density where eq. 28 turns over.</summary>
    public const double RhoHigh = 800.0;

    /// <summary>Which root of p3(ρ,T) = p to take.</summary>
    public enum Branch
    {
        /// <summary>T ≥ Tc: the isotherm is monotonic, one root.</summary>
        Single,

        /// <summary>The dense root (liquid side of the loop).</summary>
        Liquid,

        /// <summary>The light root (vapour side of the loop).</summary>
        Vapour,
    }

    private struct PressureGap : IDifferentiableFunction
    {
        public double T;
        public double P;

        public readonly double Evaluate(double rho, out double derivative) => Region3.Pressure(rho, T, out derivative) - P;
    }

    private struct Slope : IScalarFunction
    {
        public double T;

        public readonly double Evaluate(double rho)
        {
            Region3.Pressure(rho, T, out double d);
            return d;
        }
    }

    /// <summary>
    /// Plain Newton iteration on p3(ρ, T) = p from a backward start (SR5-05 v(p,T)), accepted only when the root is
    /// provably the one the bracketed search would find: a positive slope ∂p/∂ρ, and below Tc the critical density
    /// inside the van der Waals loop (∂p/∂ρ &lt; 0 there) with every iterate on the branch's side of it. Above ρc the
    /// isotherm falls to the liquid spinodal and then rises, below ρc it rises to the vapour spinodal and then falls,
    /// so each side holds one root of positive slope. False (the caller then brackets) on any doubt.
    /// </summary>
    private static bool TryPolish(double p, double t, Branch branch, double start, out double rho)
    {
        rho = double.NaN;
        bool loop = t < Region3.Tc;
        if (loop)
        {
            if (branch == Branch.Single)
            {
                return false;
            }

            Region3.Pressure(Region3.RhoC, t, out double slopeC);
            if (!(slopeC < 0))
            {
                return false;
            }
        }

        bool liquid = branch == Branch.Liquid;
        double x = start;
        for (int i = 0; i < 8; i++)
        {
            double r = Region3.Pressure(x, t, out double d) - p;
            if (!(d > 0))
            {
                return false;
            }

            double next = x - r / d;
            if (!(next > RhoLow && next < RhoHigh) || (loop && (liquid ? next <= Region3.RhoC : next >= Region3.RhoC)))
            {
                return false;
            }

            double step = Math.Abs(next - x);
            x = next;
            if (step <= 1e-13 * x)
            {
                rho = x;
                return true;
            }
        }

        return false;
    }

    /// <summary>
    /// Density (kg/m³) at (p MPa, T K) on the given branch; <paramref name="start"/> is a starting density (NaN: none),
    /// the seam for a backward equation v(p,T). Returns NaN if the branch has no root at (p, T).
    /// </summary>
    public static double Solve(double p, double t, Branch branch, double start = double.NaN)
    {
        if (start > RhoLow && start < RhoHigh && TryPolish(p, t, branch, start, out double polished))
        {
            return polished;
        }

        var f = new PressureGap { T = t, P = p };
        double lo = RhoLow, hi = RhoHigh;
        if (branch != Branch.Single && t < Region3.Tc)
        {
            double fc = f.Evaluate(Region3.RhoC, out double slopeC);
            if (slopeC < 0)
            {
                var slope = new Slope { T = t };
                if (branch == Branch.Liquid)
                {
                    lo = Region3.RhoC;
                    if (fc >= 0 && Brent.TrySolve(ref slope, Region3.RhoC, RhoHigh, out double spinodal, 1e-10))
                    {
                        lo = spinodal;
                    }
                }
                else
                {
                    hi = Region3.RhoC;
                    if (fc <= 0 && Brent.TrySolve(ref slope, RhoLow, Region3.RhoC, out double spinodal, 1e-10))
                    {
                        hi = spinodal;
                    }
                }
            }
        }

        double guess = start > lo && start < hi ? start : double.NaN;
        if (double.IsNaN(guess))
        {
            guess = 0.5 * (lo + hi);
        }

        if (NewtonBisection.TrySolve(ref f, lo, hi, guess, out double rho, 1e-13, 200))
        {
            return rho;
        }

        // Within about 0.01 K of Tc the loop is lower than the tiny disagreement between eq. 30 and eq. 28, so the
        // branch may hold no root at psat; the one root of the whole isotherm is then taken for it.
        return branch != Branch.Single && t > Region3.Tc - 0.01 ? Solve(p, t, Branch.Single, start) : double.NaN;
    }
}
