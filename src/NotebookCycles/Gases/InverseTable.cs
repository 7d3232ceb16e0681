using NotebookCycles.Numerics;

namespace NotebookCycles.Gases;

/// <summary>A monotonically increasing function of temperature whose root f(T) − Target = 0 is sought.</summary>
internal interface ITemperatureFunction : IDifferentiableFunction
{
    /// <summary>The value the function is solved for.</summary>
    double Target { get; set; }
}

/// <summary>
/// Starting guesses for inverting an increasing property function of temperature: the temperatures at which the
/// property takes equally spaced values between its values at the range ends. A lookup is one multiplication and one
/// index; the cell found brackets the root, so Newton-bisection starts inside a bracket about 10 K to 25 K wide with a
/// linear-interpolation guess and needs two or three steps.
/// </summary>
internal sealed class InverseTable
{
    private const int Cells = 256;
    private const double Tolerance = 1e-14;
    private readonly double[] _t;
    private readonly double _tMin;
    private readonly double _tMax;
    private readonly double _invStep;

    private InverseTable(double[] t, double tMin, double tMax, double valueMin, double valueMax)
    {
        _t = t;
        _tMin = tMin;
        _tMax = tMax;
        ValueMin = valueMin;
        ValueMax = valueMax;
        _invStep = Cells / (valueMax - valueMin);
    }

    /// <summary>The property at the lowest temperature.</summary>
    public double ValueMin { get; }

    /// <summary>The property at the highest temperature.</summary>
    public double ValueMax { get; }

    /// <summary>Builds the table; <paramref name="f"/> must increase strictly on [tMin, tMax].</summary>
    public static InverseTable Create<TFunction>(TFunction f, double tMin, double tMax)
        where TFunction : struct, ITemperatureFunction
    {
        f.Target = 0;
        double vMin = f.Evaluate(tMin, out _);
        double vMax = f.Evaluate(tMax, out _);
        if (!(vMax > vMin))
        {
            throw new InvalidOperationException("Inverse table: the property does not increase with temperature.");
        }

        var t = new double[Cells + 1];
        t[0] = tMin;
        t[Cells] = tMax;
        double step = (vMax - vMin) / Cells;
        for (int j = 1; j < Cells; j++)
        {
            f.Target = vMin + j * step;
            double guess = j == 1 ? tMin + (tMax - tMin) / Cells : Math.Min(tMax, 2 * t[j - 1] - t[j - 2]);
            t[j] = NewtonBisection.Solve(ref f, t[j - 1], tMax, guess, "the temperature of an inverse-table node", 1e-15, 200);
        }

        return new InverseTable(t, tMin, tMax, vMin, vMax);
    }

    /// <summary>
    /// The temperature where the function equals <c>f.Target</c>, which the caller has checked lies in
    /// [<see cref="ValueMin"/>, <see cref="ValueMax"/>]. Converged to a Newton step below 1e-14 relative.
    /// </summary>
    public double Solve<TFunction>(ref TFunction f)
        where TFunction : struct, ITemperatureFunction
    {
        double position = (f.Target - ValueMin) * _invStep;
        int i = (int)position;
        if (i >= Cells)
        {
            i = Cells - 1;
        }
        else if (i < 0)
        {
            i = 0;
        }

        double[] t = _t;
        double lo = t[i];
        double hi = t[i + 1];
        double guess = lo + (position - i) * (hi - lo);

        // The nodes are exact to rounding; widen the cell by a hair so rounding cannot put the root just outside it.
        lo = Math.Max(_tMin, lo * (1 - 1e-9));
        hi = Math.Min(_tMax, hi * (1 + 1e-9));
        if (NewtonBisection.TrySolve(ref f, lo, hi, guess, out double root, Tolerance))
        {
            return root;
        }

        return NewtonBisection.Solve(ref f, _tMin, _tMax, guess, "a temperature from a property value", Tolerance, 200);
    }
}
