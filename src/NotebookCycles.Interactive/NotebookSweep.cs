using System.Diagnostics;
using System.Globalization;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Cycles;
using NotebookCycles.Rendering;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Interactive;

/// <summary>
/// Sweeps run from notebook code with progress shown in the cell: the same as <see cref="Sweep.Over(string, IReadOnlyList{double}, Func{double, CycleResult}, SweepOptions?, string?)"/>,
/// plus a progress line that appears once the sweep has run about a second (<see cref="NotebookSweepProgress.DefaultDelay"/>)
/// and updates in place until it is done. Outside a notebook submission no progress is shown. A
/// <see cref="SweepOptions.Progress"/> given in the options is replaced by the notebook's.
/// </summary>
public static class NotebookSweep
{
    /// <summary>Sweeps one parameter, showing progress in the notebook.</summary>
    public static SweepResult Over(string parameter, IReadOnlyList<double> values, Func<double, CycleResult> build, SweepOptions? options = null, string? title = null)
    {
        ArgumentNullException.ThrowIfNull(values);
        using var progress = new NotebookSweepProgress(title ?? $"Sweep of {parameter}");
        return Sweep.Over(parameter, values, build, (options ?? SweepOptions.Default) with { Progress = progress }, title);
    }

    /// <summary>Sweeps two parameters over their grid (the first varies slowest), showing progress in the notebook.</summary>
    public static SweepResult Over(string first, IReadOnlyList<double> firstValues, string second, IReadOnlyList<double> secondValues, Func<double, double, CycleResult> build, SweepOptions? options = null, string? title = null)
    {
        using var progress = new NotebookSweepProgress(title ?? $"Sweep of {first} and {second}");
        return Sweep.Over(first, firstValues, second, secondValues, build, (options ?? SweepOptions.Default) with { Progress = progress }, title);
    }
}

/// <summary>
/// Progress of a sweep shown in the notebook cell that runs it: nothing for the first <see cref="Delay"/>, then one
/// displayed line (points done of total, elapsed time) updated in place at most about five times a second, and a final
/// line when the sweep ends. Pass it as <see cref="SweepOptions.Progress"/>; dispose it when the sweep is over.
/// Thread-safe (parallel sweeps report from several threads).
/// </summary>
public sealed class NotebookSweepProgress : IProgress<SweepProgress>, IDisposable
{
    /// <summary>How long a sweep runs before its progress is shown: 1 s.</summary>
    public static readonly TimeSpan DefaultDelay = TimeSpan.FromSeconds(1);

    private readonly object _gate = new();
    private readonly KernelInvocationContext? _context;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private DisplayedValue? _shown;
    private SweepProgress _last;
    private long _lastUpdateMs = long.MinValue;
    private bool _finished;

    /// <summary>Progress for the sweep named <paramref name="title"/>, in the current notebook submission (if any).</summary>
    public NotebookSweepProgress(string title, TimeSpan? delay = null)
    {
        Title = title ?? "";
        Delay = delay ?? DefaultDelay;
        _context = KernelInvocationContext.Current;
    }

    /// <summary>The sweep's title as shown.</summary>
    public string Title { get; }

    /// <summary>How long the sweep runs before the progress line appears.</summary>
    public TimeSpan Delay { get; }

    /// <summary>True once the progress line has been displayed.</summary>
    public bool Shown
    {
        get
        {
            lock (_gate)
            {
                return _shown is not null;
            }
        }
    }

    /// <inheritdoc />
    public void Report(SweepProgress value)
    {
        if (_context is null)
        {
            return;
        }

        lock (_gate)
        {
            if (_finished || value.Done < _last.Done)
            {
                return;
            }

            _last = value;
            long now = _clock.ElapsedMilliseconds;
            if (now < Delay.TotalMilliseconds && value.Done < value.Total)
            {
                return;
            }

            if (_shown is null)
            {
                if (now < Delay.TotalMilliseconds)
                {
                    return; // finished before the delay: never shown
                }

                _shown = _context.Display(View(), "text/html", "text/plain");
                _lastUpdateMs = now;
                return;
            }

            if (now - _lastUpdateMs >= 200 || value.Done == value.Total)
            {
                _shown.Update(View());
                _lastUpdateMs = now;
            }
        }
    }

    /// <summary>Shows the final line (if the progress was shown) and stops further updates.</summary>
    public void Dispose()
    {
        lock (_gate)
        {
            if (_finished)
            {
                return;
            }

            _finished = true;
            _shown?.Update(View());
        }
    }

    private SweepProgressView View() => new(Title, _last.Done, _last.Total, _clock.Elapsed.TotalSeconds, _finished || (_last.Total > 0 && _last.Done == _last.Total));
}

/// <summary>What a progress line shows.</summary>
/// <param name="Title">The sweep's title.</param>
/// <param name="Done">Points evaluated.</param>
/// <param name="Total">Points in all.</param>
/// <param name="Seconds">Elapsed time, s.</param>
/// <param name="Finished">True when the sweep has ended.</param>
public sealed record SweepProgressView(string Title, int Done, int Total, double Seconds, bool Finished)
{
    /// <summary>The line as plain text ("Sweep of r: 1200 of 5000 points, 2.4 s").</summary>
    public override string ToString() =>
        Title + ": " + Done.ToString(CultureInfo.InvariantCulture) + " of " + Total.ToString(CultureInfo.InvariantCulture) + " points, " +
        Seconds.ToString("F1", CultureInfo.InvariantCulture) + " s" + (Finished ? ", done" : "");

    /// <summary>The line as HTML with a progress bar.</summary>
    public string ToHtml() =>
        "<div class=\"nbc-progress\" style=\"font-size:.92em\"><progress max=\"" + Math.Max(Total, 1).ToString(CultureInfo.InvariantCulture) + "\" value=\"" +
        Done.ToString(CultureInfo.InvariantCulture) + "\" style=\"vertical-align:middle;width:16em\"></progress> " + HtmlText.Encode(ToString()) + "</div>";
}
