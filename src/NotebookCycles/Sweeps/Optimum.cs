using NotebookCycles.Cycles;
using NotebookCycles.Properties;

namespace NotebookCycles.Sweeps;

/// <summary>A constraint on a cycle: a value of the result that must stay at or below (or at or above) a limit.</summary>
/// <param name="Name">What is limited, in words ("peak temperature", "turbine exhaust quality").</param>
/// <param name="Value">Reads the constrained value from a solved cycle.</param>
/// <param name="Limit">The limit, in the same units as <paramref name="Value"/>.</param>
/// <param name="AtMost">True for value ≤ limit, false for value ≥ limit.</param>
public sealed record CycleConstraint(string Name, Func<CycleResult, double> Value, double Limit, bool AtMost)
{
    /// <summary>value ≤ limit.</summary>
    public static CycleConstraint Maximum(string name, Func<CycleResult, double> value, double limit) => new(name, value, limit, true);

    /// <summary>value ≥ limit.</summary>
    public static CycleConstraint Minimum(string name, Func<CycleResult, double> value, double limit) => new(name, value, limit, false);

    /// <summary>True when the cycle satisfies the constraint (NaN never does).</summary>
    public bool IsSatisfiedBy(CycleResult cycle)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        double v = Value(cycle);
        return AtMost ? v <= Limit : v >= Limit;
    }
}

/// <summary>The best point found along a parameter.</summary>
/// <param name="Parameter">The parameter's name.</param>
/// <param name="Value">The parameter value at the optimum.</param>
/// <param name="Tolerance">Half the width of the final bracket: the optimum lies within Value ± Tolerance.</param>
/// <param name="Objective">The objective's value there.</param>
/// <param name="Cycle">The cycle at the optimum.</param>
/// <param name="ConstraintActive">True when the optimum sits on a constraint's limit rather than at a free maximum.</param>
/// <param name="Evaluations">How many cycles were solved.</param>
/// <param name="Scan">The coarse scan that bracketed the optimum (failed and infeasible points included).</param>
public sealed record OptimumResult(string Parameter, double Value, double Tolerance, double Objective, CycleResult Cycle, bool ConstraintActive, int Evaluations, SweepResult Scan);

/// <summary>
/// Optimum search along one parameter in a closed interval: a coarse scan first (so a multimodal or partly failing
/// objective cannot mislead it, and it never leaves the interval), then golden-section refinement inside the bracket
/// around the best feasible scan point. Infeasible and failed points count as worse than any feasible point.
/// </summary>
public static class Optimum
{
    /// <summary>Maximises the thermal efficiency.</summary>
    public static OptimumResult MaximumEfficiency(string parameter, double lower, double upper, Func<double, CycleResult> build, CycleConstraint? constraint = null, double relativeTolerance = 1e-9) =>
        Maximize(parameter, lower, upper, build, r => r.Figures.ThermalEfficiency, constraint, relativeTolerance);

    /// <summary>Maximises the specific net work.</summary>
    public static OptimumResult MaximumNetWork(string parameter, double lower, double upper, Func<double, CycleResult> build, CycleConstraint? constraint = null, double relativeTolerance = 1e-9) =>
        Maximize(parameter, lower, upper, build, r => r.Figures.NetWork, constraint, relativeTolerance);

    /// <summary>Maximises a user-given objective, optionally under a constraint.</summary>
    /// <param name="parameter">The parameter's name.</param>
    /// <param name="lower">Lower end of the interval searched (inclusive).</param>
    /// <param name="upper">Upper end of the interval searched (inclusive).</param>
    /// <param name="build">Builds the cycle at a parameter value.</param>
    /// <param name="objective">The value to maximise (minimise by negating it).</param>
    /// <param name="constraint">An optional constraint every candidate must satisfy.</param>
    /// <param name="relativeTolerance">Final bracket half-width relative to the interval (default 1e-9).</param>
    /// <param name="scanPoints">Points of the coarse scan (default 41).</param>
    public static OptimumResult Maximize(string parameter, double lower, double upper, Func<double, CycleResult> build, Func<CycleResult, double> objective, CycleConstraint? constraint = null, double relativeTolerance = 1e-9, int scanPoints = 41)
    {
        ArgumentNullException.ThrowIfNull(build);
        ArgumentNullException.ThrowIfNull(objective);
        if (!(double.IsFinite(lower) && double.IsFinite(upper) && upper > lower))
        {
            throw new ArgumentOutOfRangeException(nameof(upper), $"The search interval for {parameter} must be finite and non-empty; got [{lower}, {upper}].");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(scanPoints, 3);
        int evaluations = 0;
        double Score(double x, out CycleResult? cycle)
        {
            evaluations++;
            try
            {
                cycle = build(x);
            }
            catch (Exception e) when (e is CycleDefinitionException or PropertyModelException or ArgumentException)
            {
                cycle = null;
                return double.NegativeInfinity;
            }

            if (constraint is not null && !constraint.IsSatisfiedBy(cycle))
            {
                return double.NegativeInfinity;
            }

            double v = objective(cycle);
            return double.IsNaN(v) ? double.NegativeInfinity : v;
        }

        var grid = ParameterRange.Linear(lower, upper, scanPoints);
        var scan = Sweep.Over(parameter, grid, build, new SweepOptions { KeepCycles = true, ParallelThreshold = int.MaxValue });
        evaluations += grid.Length;
        int best = -1;
        double bestScore = double.NegativeInfinity;
        for (int i = 0; i < scan.Points.Length; i++)
        {
            var p = scan.Points[i];
            if (p.Cycle is { } c && (constraint is null || constraint.IsSatisfiedBy(c)))
            {
                double v = objective(c);
                if (v > bestScore)
                {
                    bestScore = v;
                    best = i;
                }
            }
        }

        if (best < 0)
        {
            throw new InvalidOperationException($"No point of {parameter} in [{lower}, {upper}] gives a feasible cycle{(constraint is null ? "" : $" under the constraint on {constraint.Name}")}; widen the interval or relax the constraint.");
        }

        double a = grid[Math.Max(best - 1, 0)], b = grid[Math.Min(best + 1, grid.Length - 1)];
        double tolerance = relativeTolerance * (upper - lower);
        const double g = 0.6180339887498949;
        double x1 = b - g * (b - a), x2 = a + g * (b - a);
        double f1 = Score(x1, out _), f2 = Score(x2, out _);
        while (b - a > 2 * tolerance)
        {
            if (f1 >= f2)
            {
                b = x2;
                x2 = x1;
                f2 = f1;
                x1 = b - g * (b - a);
                f1 = Score(x1, out _);
            }
            else
            {
                a = x1;
                x1 = x2;
                f1 = f2;
                x2 = a + g * (b - a);
                f2 = Score(x2, out _);
            }
        }

        double xBest = 0.5 * (a + b);
        double fBest = Score(xBest, out var cycleBest);
        if (cycleBest is null || double.IsNegativeInfinity(fBest) || fBest < bestScore)
        {
            // The refined point fell just outside the feasible set (an active constraint) or below the scan's best: keep the best feasible.
            foreach (double x in (double[])[a, b, grid[best]])
            {
                double f = Score(x, out var c);
                if (c is not null && f >= bestScore && !double.IsNegativeInfinity(f))
                {
                    xBest = x;
                    fBest = f;
                    cycleBest = c;
                    break;
                }
            }
        }

        if (cycleBest is null || double.IsNegativeInfinity(fBest))
        {
            xBest = grid[best];
            fBest = bestScore;
            cycleBest = scan.Points[best].Cycle!;
        }

        bool active = false;
        if (constraint is not null && cycleBest is not null)
        {
            double probeLo = Score(Math.Max(lower, xBest - 4 * tolerance), out _), probeHi = Score(Math.Min(upper, xBest + 4 * tolerance), out _);
            active = double.IsNegativeInfinity(probeLo) || double.IsNegativeInfinity(probeHi);
        }

        return new OptimumResult(parameter, xBest, Math.Max(0.5 * (b - a), tolerance), fBest, cycleBest!, active, evaluations, scan);
    }
}
