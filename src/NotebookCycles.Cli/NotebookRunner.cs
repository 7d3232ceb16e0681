using System.Diagnostics;
using System.Text.Json.Nodes;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Cycles;
using NotebookCycles.Interactive;
using NotebookCycles.Rendering;

namespace NotebookCycles.Cli;

/// <summary>What happened to one code cell in a run.</summary>
/// <param name="Number">The cell's number in the notebook (from 1, counting every cell).</param>
/// <param name="IsPackageCell">True for the package-loading cell, which the runner replaces by loading the extension in-process.</param>
/// <param name="Failed">True when the cell raised an error.</param>
/// <param name="Error">The error message, when it failed.</param>
/// <param name="Outputs">The outputs, as nbformat 4 output objects.</param>
/// <param name="ExecutionCount">The execution count given to the cell.</param>
/// <param name="Elapsed">How long the cell took.</param>
public sealed record CellRun(int Number, bool IsPackageCell, bool Failed, string? Error, JsonArray Outputs, int? ExecutionCount, TimeSpan Elapsed);

/// <summary>A library value a cell displayed or returned (cycle, state, sweep, optimum, comparison, record).</summary>
/// <param name="Cell">The cell's number.</param>
/// <param name="Value">The value object.</param>
public sealed record CapturedValue(int Cell, object Value);

/// <summary>Progress of a run, reported before and after each code cell.</summary>
/// <param name="Index">The code cell's position among the code cells, from 1.</param>
/// <param name="Count">The number of code cells.</param>
/// <param name="Cell">The cell's number in the notebook.</param>
/// <param name="Done">Null while the cell runs; its result once done.</param>
public readonly record struct CellProgress(int Index, int Count, int Cell, CellRun? Done);

/// <summary>The result of executing a notebook.</summary>
public sealed class RunResult
{
    internal RunResult(Notebook notebook, IReadOnlyList<CellRun> cells, IReadOnlyList<CapturedValue> values, DateTimeOffset started, TimeSpan elapsed)
    {
        Notebook = notebook;
        Cells = cells;
        Values = values;
        Started = started;
        Elapsed = elapsed;
    }

    /// <summary>The notebook that was run.</summary>
    public Notebook Notebook { get; }

    /// <summary>The code cells run, in order (stops after the first failing cell).</summary>
    public IReadOnlyList<CellRun> Cells { get; }

    /// <summary>The library values displayed, in order.</summary>
    public IReadOnlyList<CapturedValue> Values { get; }

    /// <summary>When the run started (UTC).</summary>
    public DateTimeOffset Started { get; }

    /// <summary>How long the whole run took.</summary>
    public TimeSpan Elapsed { get; }

    /// <summary>The first failing cell, or null.</summary>
    public CellRun? FirstFailure => Cells.FirstOrDefault(c => c.Failed);

    /// <summary>The executed outputs per code cell number, for <see cref="Notebook.ToIpynb"/>.</summary>
    public IReadOnlyDictionary<int, (JsonArray Outputs, int? ExecutionCount)> Executed =>
        Cells.ToDictionary(c => c.Number, c => (c.Outputs, c.ExecutionCount));
}

/// <summary>
/// Executes every code cell of a notebook in an in-process C# kernel (a composite kernel with a C# kernel) with the
/// NotebookCycles extension loaded through <see cref="NotebookCyclesExtension.Load"/>. The package-loading cell (only
/// <c>#r "nuget:…"</c>/<c>#i "nuget:…"</c> lines, or tagged <see cref="Notebook.PackagesTag"/>) is not sent to the
/// kernel: the runner loads the extension in its place, so the same notebook runs here and in Jupyter.
/// </summary>
public static class NotebookRunner
{
    /// <summary>The code the runner submits in place of the package-loading cell (the same call the package's extension.dib makes).</summary>
    public const string LoadExtensionCode = "NotebookCycles.Interactive.NotebookCyclesExtension.Load(Microsoft.DotNet.Interactive.KernelInvocationContext.Current.HandlingKernel.RootKernel);";

    private static readonly SemaphoreSlim OneAtATime = new(1, 1);

    /// <summary>Runs the notebook's code cells in order, stopping after the first that fails.</summary>
    public static async Task<RunResult> RunAsync(Notebook notebook, IProgress<CellProgress>? progress = null, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(notebook);
        var code = notebook.Cells.Where(c => c.Kind == CellKind.Code).ToList();
        foreach (var cell in code)
        {
            if (cell.Language != "csharp" && !Notebook.IsPackageCell(cell))
            {
                throw new CliException($"{notebook.Path}: cell {cell.Number} is in {cell.Language}; nbcycles runs C# cells only.");
            }
        }

        // The formatter registry is process-wide: one run at a time.
        // The formatter registry and the working directory are process-wide: one run at a time. Cells run in the
        // notebook's folder, as a notebook front end runs them.
        await OneAtATime.WaitAsync(cancellation).ConfigureAwait(false);
        string previous = Environment.CurrentDirectory;
        try
        {
            string folder = Path.GetDirectoryName(Path.GetFullPath(notebook.Path)) ?? previous;
            Environment.CurrentDirectory = folder;
            return await RunCoreAsync(notebook, code, progress, cancellation).ConfigureAwait(false);
        }
        finally
        {
            Environment.CurrentDirectory = previous;
            OneAtATime.Release();
        }
    }

    private static async Task<RunResult> RunCoreAsync(Notebook notebook, List<NotebookCell> code, IProgress<CellProgress>? progress, CancellationToken cancellation)
    {
        var started = DateTimeOffset.UtcNow;
        var clock = Stopwatch.StartNew();
        Formatter.ResetToDefault();
        NotebookCyclesDisplay.Reset();
        using var kernel = CreateKernel();
        bool hasPackageCell = code.Any(Notebook.IsPackageCell);
        if (!hasPackageCell)
        {
            NotebookCyclesExtension.Load(kernel);
        }

        var runs = new List<CellRun>();
        var values = new List<CapturedValue>();
        int count = 0;

        // A long sweep shown with NotebookSweep.Over updates its progress line while the cell runs: echo it live.
        using var live = kernel.KernelEvents.Subscribe(new SweepProgressEcho());
        for (int i = 0; i < code.Count; i++)
        {
            cancellation.ThrowIfCancellationRequested();
            var cell = code[i];
            progress?.Report(new CellProgress(i + 1, code.Count, cell.Number, null));
            bool package = Notebook.IsPackageCell(cell);
            string submission = package ? LoadExtensionCode : cell.Source;
            var cellClock = Stopwatch.StartNew();
            var outputs = new JsonArray();
            var displayIds = new Dictionary<string, int>(StringComparer.Ordinal);
            int executionCount = ++count;
            string? error = null;
            if (!string.IsNullOrWhiteSpace(submission))
            {
                var result = await kernel.SendAsync(new SubmitCode(submission, "csharp"), cancellation).ConfigureAwait(false);
                foreach (var e in result.Events)
                {
                    switch (e)
                    {
                        case ReturnValueProduced r:
                            Capture(values, cell.Number, r.Value);
                            outputs.Add(DisplayOutput(r, executionCount));
                            break;
                        case DisplayedValueUpdated u:
                            Replace(outputs, displayIds, u);
                            break;
                        case StandardOutputValueProduced o:
                            AppendStream(outputs, "stdout", Text(o));
                            break;
                        case StandardErrorValueProduced o:
                            AppendStream(outputs, "stderr", Text(o));
                            break;
                        case DisplayedValueProduced d:
                            Capture(values, cell.Number, d.Value);
                            if (d.ValueId is { Length: > 0 } id)
                            {
                                displayIds[id] = outputs.Count;
                            }

                            outputs.Add(DisplayOutput(d, null));
                            break;
                        case CommandFailed f:
                            error ??= f.Message;
                            outputs.Add(ErrorOutput(f));
                            break;
                    }
                }
            }

            var run = new CellRun(cell.Number, package, error is not null, error, outputs, executionCount, cellClock.Elapsed);
            runs.Add(run);
            progress?.Report(new CellProgress(i + 1, code.Count, cell.Number, run));
            if (error is not null)
            {
                break;
            }
        }

        return new RunResult(notebook, runs, values, started, clock.Elapsed);
    }

    private static CompositeKernel CreateKernel()
    {
        var csharp = new CSharpKernel().UseKernelHelpers().UseValueSharing();
        csharp.AddAssemblyReferences(
        [
            typeof(CycleResult).Assembly.Location,
            typeof(CycleHtml).Assembly.Location,
            typeof(NotebookCyclesExtension).Assembly.Location,
            typeof(UnitsNet.Temperature).Assembly.Location,
        ]);
        var kernel = new CompositeKernel { csharp };
        kernel.DefaultKernelName = "csharp";
        return kernel;
    }

    private static void Capture(List<CapturedValue> values, int cell, object? value)
    {
        switch (value)
        {
            case CycleResult or Properties.State or Sweeps.SweepResult or Sweeps.OptimumResult or Cycles.CycleComparison or CalculationRecord or CombinedCycleResult:
                values.Add(new CapturedValue(cell, value));
                break;
            case System.Collections.IEnumerable many and not string:
                foreach (var item in many)
                {
                    if (item is CycleResult or Properties.State or Sweeps.SweepResult or Sweeps.OptimumResult)
                    {
                        values.Add(new CapturedValue(cell, item));
                    }
                }

                break;
        }
    }

    private static JsonObject DisplayOutput(DisplayEvent e, int? executionCount)
    {
        var data = new JsonObject();
        foreach (var f in e.FormattedValues)
        {
            if (!f.SuppressDisplay)
            {
                data[f.MimeType] = Notebook.SplitLines(f.Value);
            }
        }

        if (e.Value is not null)
        {
            foreach (string mime in new[] { HtmlFormatter.MimeType, PlainTextFormatter.MimeType })
            {
                if (!data.ContainsKey(mime) && data.Count > 0)
                {
                    data[mime] = Notebook.SplitLines(Formatter.ToDisplayString(e.Value, mime));
                }
            }
        }

        var output = executionCount is { } n
            ? new JsonObject { ["output_type"] = "execute_result", ["data"] = data, ["execution_count"] = n, ["metadata"] = new JsonObject() }
            : new JsonObject { ["output_type"] = "display_data", ["data"] = data, ["metadata"] = new JsonObject() };
        return output;
    }

    private static void Replace(JsonArray outputs, Dictionary<string, int> displayIds, DisplayedValueUpdated update)
    {
        // Display ids are transient (a front end does not store them either): kept beside the outputs during the cell.
        if (update.ValueId is { Length: > 0 } id && displayIds.TryGetValue(id, out int index))
        {
            outputs[index] = DisplayOutput(update, null);
            return;
        }

        outputs.Add(DisplayOutput(update, null));
    }

    private static string Text(DisplayEvent e) => e.FormattedValues.FirstOrDefault(f => f.MimeType == PlainTextFormatter.MimeType)?.Value ?? e.FormattedValues.FirstOrDefault()?.Value ?? "";

    private static void AppendStream(JsonArray outputs, string name, string text)
    {
        if (outputs.Count > 0 && outputs[^1] is JsonObject last && (string?)last["output_type"] == "stream" && (string?)last["name"] == name)
        {
            last["text"] = Notebook.SplitLines(Notebook.JoinText(last["text"]) + text);
            return;
        }

        outputs.Add(new JsonObject { ["output_type"] = "stream", ["name"] = name, ["text"] = Notebook.SplitLines(text) });
    }

    private static JsonObject ErrorOutput(CommandFailed failed)
    {
        string name = failed.Exception?.GetType().Name ?? "Error";
        var traceback = new JsonArray();
        foreach (var line in failed.Message.Split('\n'))
        {
            traceback.Add(line.TrimEnd('\r'));
        }

        return new JsonObject { ["output_type"] = "error", ["ename"] = name, ["evalue"] = failed.Message, ["traceback"] = traceback };
    }
}

/// <summary>Writes a notebook sweep's progress line to standard error as it is updated, so a terminal shows long sweeps moving.</summary>
/// <remarks>
/// The C# kernel redirects <see cref="Console"/> while a cell runs (what a cell prints becomes its output), so this
/// writes to the process's own standard error stream.
/// </remarks>
internal sealed class SweepProgressEcho : IObserver<KernelEvent>
{
    private static readonly Lazy<TextWriter> StandardError = new(() => new StreamWriter(Console.OpenStandardError()) { AutoFlush = true });

    public void OnCompleted()
    {
    }

    public void OnError(Exception error)
    {
    }

    public void OnNext(KernelEvent value)
    {
        var view = value switch
        {
            DisplayedValueUpdated u => u.Value as NotebookCycles.Interactive.SweepProgressView,
            DisplayedValueProduced d => d.Value as NotebookCycles.Interactive.SweepProgressView,
            _ => null,
        };
        if (view is not null)
        {
            StandardError.Value.WriteLine("  " + view);
        }
    }
}
