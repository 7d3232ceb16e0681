using System.Runtime.CompilerServices;

namespace NotebookCycles.Numerics;

/// <summary>A scalar function with its derivative, as a struct so solvers specialise on it without allocating.</summary>
internal interface IDifferentiableFunction
{
    /// <summary>The function value at <paramref name="x"/> and its derivative.</summary>
    double Evaluate(double x, out double derivative);
}

/// <summary>A scalar function without a derivative.</summary>
internal interface IScalarFunction
{
    /// <summary>The function value at <paramref name="x"/>.</summary>
    double Evaluate(double x);
}

/// <summary>Raised when a root finder does not converge within its iteration limit.</summary>
public sealed class NonConvergenceException : Exception
{
    /// <summary>Creates the exception.</summary>
    public NonConvergenceException(string message)
        : base(message)
    {
    }
}

/// <summary>
/// Newton's method safeguarded by bisection inside a bracket [lo, hi] where the function changes sign.
/// A Newton step that leaves the bracket, or does not shrink the residual fast enough, is replaced by a bisection,
/// so no starting guess can make it fail or wander outside the bracket.
/// </summary>
internal static class NewtonBisection
{
    /// <summary>
    /// Finds x in [lo, hi] with f(x) = 0. Requires f(lo) and f(hi) of opposite sign (or zero).
    /// Converges when the step is below <paramref name="relativeTolerance"/>·|x| (default 1e-13).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TrySolve<TFunction>(ref TFunction f, double lo, double hi, double guess, out double root, double relativeTolerance = 1e-13, int maxIterations = 100)
        where TFunction : struct, IDifferentiableFunction
    {
        double flo = f.Evaluate(lo, out _);
        double fhi = f.Evaluate(hi, out _);
        if (flo == 0)
        {
            root = lo;
            return true;
        }

        if (fhi == 0)
        {
            root = hi;
            return true;
        }

        if (Math.Sign(flo) == Math.Sign(fhi) || double.IsNaN(flo) || double.IsNaN(fhi))
        {
            root = double.NaN;
            return false;
        }

        // Orient so that f(lo) < 0 < f(hi).
        if (flo > 0)
        {
            (lo, hi) = (hi, lo);
        }

        double x = guess > Math.Min(lo, hi) && guess < Math.Max(lo, hi) ? guess : 0.5 * (lo + hi);
        for (int i = 0; i < maxIterations; i++)
        {
            double fx = f.Evaluate(x, out double dfx);
            if (fx == 0)
            {
                root = x;
                return true;
            }

            if (fx < 0)
            {
                lo = x;
            }
            else
            {
                hi = x;
            }

            double next = x - fx / dfx;
            bool inside = next > Math.Min(lo, hi) && next < Math.Max(lo, hi);
            if (!inside || double.IsNaN(next))
            {
                next = 0.5 * (lo + hi);
            }

            double step = Math.Abs(next - x);
            x = next;
            if (step <= relativeTolerance * Math.Abs(x) || lo == hi)
            {
                root = x;
                return true;
            }
        }

        root = x;
        return false;
    }

    /// <summary>As <see cref="TrySolve{TFunction}"/>, throwing <see cref="NonConvergenceException"/> on failure.</summary>
    public static double Solve<TFunction>(ref TFunction f, double lo, double hi, double guess, string what, double relativeTolerance = 1e-13, int maxIterations = 100)
        where TFunction : struct, IDifferentiableFunction
    {
        if (TrySolve(ref f, lo, hi, guess, out double root, relativeTolerance, maxIterations))
        {
            return root;
        }

        throw new NonConvergenceException($"Newton-bisection did not converge for {what} in [{lo}, {hi}] within {maxIterations} iterations.");
    }
}

/// <summary>Brent's method (inverse quadratic interpolation safeguarded by bisection) for functions without a derivative.</summary>
internal static class Brent
{
    /// <summary>Finds x in [a, b] with f(x) = 0; f(a) and f(b) must differ in sign.</summary>
    public static bool TrySolve<TFunction>(ref TFunction f, double a, double b, out double root, double absoluteTolerance = 1e-12, int maxIterations = 200)
        where TFunction : struct, IScalarFunction
    {
        double fa = f.Evaluate(a);
        double fb = f.Evaluate(b);
        root = double.NaN;
        if (double.IsNaN(fa) || double.IsNaN(fb) || Math.Sign(fa) * Math.Sign(fb) > 0)
        {
            return false;
        }

        if (fa == 0)
        {
            root = a;
            return true;
        }

        if (fb == 0)
        {
            root = b;
            return true;
        }

        double c = a, fc = fa, d = b - a, e = d;
        for (int i = 0; i < maxIterations; i++)
        {
            if (Math.Sign(fb) == Math.Sign(fc))
            {
                c = a;
                fc = fa;
                d = e = b - a;
            }

            if (Math.Abs(fc) < Math.Abs(fb))
            {
                a = b;
                b = c;
                c = a;
                fa = fb;
                fb = fc;
                fc = fa;
            }

            double tol = 2 * double.Epsilon + 0.5 * absoluteTolerance + 2e-16 * Math.Abs(b);
            double m = 0.5 * (c - b);
            if (Math.Abs(m) <= tol || fb == 0)
            {
                root = b;
                return true;
            }

            if (Math.Abs(e) >= tol && Math.Abs(fa) > Math.Abs(fb))
            {
                double s = fb / fa, p, q;
                if (a == c)
                {
                    p = 2 * m * s;
                    q = 1 - s;
                }
                else
                {
                    double r = fb / fc;
                    q = fa / fc;
                    p = s * (2 * m * q * (q - r) - (b - a) * (r - 1));
                    q = (q - 1) * (r - 1) * (s - 1);
                }

                if (p > 0)
                {
                    q = -q;
                }
                else
                {
                    p = -p;
                }

                if (2 * p < Math.Min(3 * m * q - Math.Abs(tol * q), Math.Abs(e * q)))
                {
                    e = d;
                    d = p / q;
                }
                else
                {
                    d = m;
                    e = m;
                }
            }
            else
            {
                d = m;
                e = m;
            }

            a = b;
            fa = fb;
            b += Math.Abs(d) > tol ? d : (m > 0 ? tol : -tol);
            fb = f.Evaluate(b);
        }

        root = b;
        return false;
    }
}
