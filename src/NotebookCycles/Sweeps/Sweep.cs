using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;

namespace NotebookCycles.Sweeps;

/// <summary>Options of a sweep.</summary>
public sealed record SweepOptions
{
    /// <summary>Defaults: cycles not kept, parallel above 2000 points, no progress reports.</summary>
    public static SweepOptions Default { get; } = new();

    /// <summary>Keep each point's full <see cref="CycleResult"/> (memory grows with the point count).</summary>
    public bool KeepCycles { get; init; }

    /// <summary>Evaluate on all cores when the sweep has at least this many points (results identical to serial, order kept).</summary>
    public int ParallelThreshold { get; init; } = 2000;

    /// <summary>Reports the number of points done, at most about 20 times a second.</summary>
    public IProgress<SweepProgress>? Progress { get; init; }

    /// <summary>Cancels the sweep.</summary>
    public CancellationToken Cancellation { get; init; }
}

/// <summary>Progress of a running sweep.</summary>
/// <param name="Done">Points evaluated.</param>
/// <param name="Total">Points in all.</param>
public readonly record struct SweepProgress(int Done, int Total);

/// <summary>One point of a sweep: its parameter values and either its figures of merit or the reason it failed.</summary>
public sealed class SweepPoint
{
    internal SweepPoint(double x, double y, FiguresOfMerit? figures, CycleResult? cycle, string? failure)
    {
        X = x;
        Y = y;
        Figures = figures;
        Cycle = cycle;
        FailureReason = failure;
    }

    /// <summary>The first parameter's value.</summary>
    public double X { get; }

    /// <summary>The second parameter's value (NaN for a one-parameter sweep).</summary>
    public double Y { get; }

    /// <summary>The figures of merit; null when the point failed.</summary>
    public FiguresOfMerit? Figures { get; }

    /// <summary>The full cycle when the sweep kept cycles.</summary>
    public CycleResult? Cycle { get; }

    /// <summary>Why the point failed (a state out of range, an impossible process); null when it succeeded.</summary>
    public string? FailureReason { get; }

    /// <summary>True when the point's cycle was solved.</summary>
    public bool Succeeded => FailureReason is null;
}

/// <summary>The result of a sweep: every point in parameter order, failed points kept with their reasons.</summary>
public sealed class SweepResult
{
    internal SweepResult(string title, string xName, string? yName, ImmutableArray<SweepPoint> points)
    {
        Title = title;
        XName = xName;
        YName = yName;
        Points = points;
    }

    /// <summary>What was swept, in words.</summary>
    public string Title { get; }

    /// <summary>The first parameter's name (with its unit, as the user wrote it).</summary>
    public string XName { get; }

    /// <summary>The second parameter's name, or null for a one-parameter sweep.</summary>
    public string? YName { get; }

    /// <summary>The points: for two parameters, X varies slowest.</summary>
    public ImmutableArray<SweepPoint> Points { get; }

    /// <summary>The points that failed.</summary>
    public IEnumerable<SweepPoint> Failed => Points.Where(p => !p.Succeeded);

    /// <summary>The successful point with the greatest value of <paramref name="figure"/>, or null when none succeeded.</summary>
    public SweepPoint? Best(Func<FiguresOfMerit, double> figure)
    {
        ArgumentNullException.ThrowIfNull(figure);
        SweepPoint? best = null;
        double value = double.NegativeInfinity;
        foreach (var p in Points)
        {
            if (p.Figures is { } f && figure(f) > value)
            {
                value = figure(f);
                best = p;
            }
        }

        return best;
    }

    /// <summary>
    /// Writes the sweep as CSV (RFC 4180: comma separated, fields with commas, quotes or line breaks quoted, quotes
    /// doubled; invariant culture; SI units named in the header; failed points keep their row with the reason).
    /// </summary>
    public void WriteCsv(TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        var header = new List<string> { XName };
        if (YName is not null)
        {
            header.Add(YName);
        }

        header.AddRange(FigureColumns.Select(c => c.Name));
        header.Add("failure");
        writer.Write(string.Join(",", header.Select(Quote)));
        writer.Write("\r\n");
        foreach (var p in Points)
        {
            var row = new List<string> { Number(p.X) };
            if (YName is not null)
            {
                row.Add(Number(p.Y));
            }

            foreach (var (_, get) in FigureColumns)
            {
                row.Add(p.Figures is { } f ? Number(get(f)) : "");
            }

            row.Add(Quote(p.FailureReason ?? ""));
            writer.Write(string.Join(",", row));
            writer.Write("\r\n");
        }
    }

    /// <summary>The sweep as a CSV string (see <see cref="WriteCsv"/>).</summary>
    public string ToCsv()
    {
        using var w = new StringWriter(CultureInfo.InvariantCulture);
        WriteCsv(w);
        return w.ToString();
    }

    /// <summary>The figures written per point, with their CSV column names (SI units).</summary>
    public static IReadOnlyList<(string Name, Func<FiguresOfMerit, double> Get)> FigureColumns { get; } =
    [
        ("heat_in_J_per_kg", f => f.HeatIn),
        ("heat_out_J_per_kg", f => f.HeatOut),
        ("net_work_J_per_kg", f => f.NetWork),
        ("thermal_efficiency", f => f.ThermalEfficiency),
        ("carnot_efficiency", f => f.CarnotEfficiency),
        ("mean_effective_pressure_Pa", f => f.MeanEffectivePressure),
        ("back_work_ratio", f => f.BackWorkRatio),
        ("heat_rate_J_per_J", f => f.HeatRate),
        ("specific_consumption_kg_per_J", f => f.SpecificConsumption),
        ("cop_cooling", f => f.CopCooling),
        ("cop_heating", f => f.CopHeating),
        ("exergy_destroyed_J_per_kg", f => f.ExergyDestroyed),
        ("max_temperature_K", f => f.MaximumTemperature),
        ("max_pressure_Pa", f => f.MaximumPressure),
    ];

    private static string Number(double v) => double.IsFinite(v) ? v.ToString("R", CultureInfo.InvariantCulture) : "";

    private static string Quote(string field)
    {
        if (field.AsSpan().IndexOfAny(",\"\r\n") < 0)
        {
            return field;
        }

        var sb = new StringBuilder(field.Length + 2).Append('"');
        foreach (char ch in field)
        {
            sb.Append(ch == '"' ? "\"\"" : ch.ToString());
        }

        return sb.Append('"').ToString();
    }
}

/// <summary>
/// Sweeps over one or two design parameters of any function that builds a cycle. Points that fail are kept with
/// their reason, never dropped. Large sweeps run on all cores with results identical to the serial run, in order.
/// </summary>
public static class Sweep
{
    /// <summary>Sweeps one parameter.</summary>
    public static SweepResult Over(string parameter, IReadOnlyList<double> values, Func<double, CycleResult> build, SweepOptions? options = null, string? title = null)
    {
        ArgumentNullException.ThrowIfNull(values);
        ArgumentNullException.ThrowIfNull(build);
        return Run(title ?? $"Sweep of {parameter}", parameter, null, values.Count, i => (values[i], double.NaN), (x, _) => build(x), options ?? SweepOptions.Default);
    }

    /// <summary>Sweeps two parameters over the grid of their values (the first varies slowest).</summary>
    public static SweepResult Over(string first, IReadOnlyList<double> firstValues, string second, IReadOnlyList<double> secondValues, Func<double, double, CycleResult> build, SweepOptions? options = null, string? title = null)
    {
        ArgumentNullException.ThrowIfNull(firstValues);
        ArgumentNullException.ThrowIfNull(secondValues);
        ArgumentNullException.ThrowIfNull(build);
        int n2 = secondValues.Count;
        return Run(title ?? $"Sweep of {first} and {second}", first, second, firstValues.Count * n2, i => (firstValues[i / n2], secondValues[i % n2]), build, options ?? SweepOptions.Default);
    }

    private static SweepResult Run(string title, string xName, string? yName, int count, Func<int, (double X, double Y)> at, Func<double, double, CycleResult> build, SweepOptions options)
    {
        var points = new SweepPoint[count];
        int done = 0;
        long lastReport = 0;
        void Evaluate(int i)
        {
            var (x, y) = at(i);
            try
            {
                var cycle = build(x, y);
                points[i] = new SweepPoint(x, y, cycle.Figures, options.KeepCycles ? cycle : null, null);
            }
            catch (Exception e) when (e is CycleDefinitionException or PropertyModelException or ArgumentException or ArithmeticException or Numerics.NonConvergenceException)
            {
                points[i] = new SweepPoint(x, y, null, null, e.Message);
            }

            if (options.Progress is { } progress)
            {
                int d = Interlocked.Increment(ref done);
                long now = Environment.TickCount64;
                long last = Interlocked.Read(ref lastReport);
                if (d == count || (now - last >= 50 && Interlocked.CompareExchange(ref lastReport, now, last) == last))
                {
                    progress.Report(new SweepProgress(d, count));
                }
            }
        }

        if (count >= options.ParallelThreshold && Environment.ProcessorCount > 1)
        {
            Parallel.For(0, count, new ParallelOptions { CancellationToken = options.Cancellation }, Evaluate);
        }
        else
        {
            for (int i = 0; i < count; i++)
            {
                options.Cancellation.ThrowIfCancellationRequested();
                Evaluate(i);
            }
        }

        return new SweepResult(title, xName, yName, [.. points]);
    }
}
