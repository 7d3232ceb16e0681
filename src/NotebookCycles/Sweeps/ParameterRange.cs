namespace NotebookCycles.Sweeps;

/// <summary>Parameter values for a sweep: a range by count or by step, or a list.</summary>
public static class ParameterRange
{
    /// <summary><paramref name="count"/> evenly spaced values from <paramref name="start"/> to <paramref name="stop"/>, both included.</summary>
    public static double[] Linear(double start, double stop, int count)
    {
        if (!double.IsFinite(start) || !double.IsFinite(stop))
        {
            throw new ArgumentOutOfRangeException(nameof(start), $"A sweep range needs finite ends; got {start} to {stop}.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        if (count == 1)
        {
            return [start];
        }

        var values = new double[count];
        for (int i = 0; i < count; i++)
        {
            values[i] = i == count - 1 ? stop : start + (stop - start) * i / (count - 1);
        }

        return values;
    }

    /// <summary>Values from <paramref name="start"/> by <paramref name="step"/> up to and including <paramref name="stop"/> (within 1e-9 of a step).</summary>
    public static double[] Stepped(double start, double stop, double step)
    {
        if (!double.IsFinite(start) || !double.IsFinite(stop) || !double.IsFinite(step) || step == 0 || Math.Sign(stop - start) * Math.Sign(step) < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(step), $"The step {step} does not lead from {start} to {stop}.");
        }

        int count = (int)Math.Floor((stop - start) / step + 1e-9) + 1;
        if (count > 10_000_000)
        {
            throw new ArgumentOutOfRangeException(nameof(step), $"The range {start} to {stop} by {step} has {count} points; at most 10,000,000 are allowed.");
        }

        var values = new double[count];
        for (int i = 0; i < count; i++)
        {
            values[i] = start + step * i;
        }

        return values;
    }

    /// <summary><paramref name="count"/> values spaced evenly in logarithm (for pressure ratios).</summary>
    public static double[] Geometric(double start, double stop, int count)
    {
        if (!(start > 0 && stop > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(start), $"A geometric range needs positive ends; got {start} to {stop}.");
        }

        var logs = Linear(Math.Log(start), Math.Log(stop), count);
        for (int i = 0; i < logs.Length; i++)
        {
            logs[i] = i == 0 ? start : i == logs.Length - 1 ? stop : Math.Exp(logs[i]);
        }

        return logs;
    }
}
