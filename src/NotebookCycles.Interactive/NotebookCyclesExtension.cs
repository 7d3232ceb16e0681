using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;
using NotebookCycles.Rendering;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Interactive;

/// <summary>
/// The notebook extension: registers HTML and plain-text formatters for states, cycles, steps, calculation records,
/// comparisons, sweeps and optima (interactive plotly charts with static SVG fallbacks), adds the library's namespaces to the C# kernel, and says what it loaded. The package's
/// interactive-extensions/dotnet/extension.dib calls <see cref="Load"/>.
/// </summary>
public static class NotebookCyclesExtension
{
    /// <summary>The namespaces a notebook gets after loading.</summary>
    public static IReadOnlyList<string> Namespaces { get; } =
    [
        "NotebookCycles",
        "NotebookCycles.Cycles",
        "NotebookCycles.Gases",
        "NotebookCycles.Properties",
        "NotebookCycles.Rendering",
        "NotebookCycles.Sweeps",
        "NotebookCycles.Interactive",
        "NotebookCycles.Units.Literals",
        "UnitsNet",
    ];

    /// <summary>The one line the load message suggests trying.</summary>
    public const string TryLine = "AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram())";

    /// <summary>
    /// Registers the formatters (idempotent), queues the namespace imports on the C# kernel (if the kernel tree has one)
    /// and displays a short line saying what is loaded, when called inside a notebook submission.
    /// </summary>
    public static void Load(Kernel kernel)
    {
        ArgumentNullException.ThrowIfNull(kernel);
        RegisterFormatters();
        var csharp = kernel.RootKernel.FindKernelByName("csharp") ?? (kernel.Name == "csharp" ? kernel : null);
        csharp?.DeferCommand(new SubmitCode(string.Concat(Namespaces.Select(n => "using " + n + ";\n")), csharp.Name));
        if (KernelInvocationContext.Current is { } context)
        {
            KernelInvocationContextExtensions.DisplayAs(context, LoadedMessage(csharp is not null), HtmlFormatter.MimeType);
        }
    }

    /// <summary>Registers the text/html and text/plain formatters for the library's types (a cycle's state list, <c>cycle.States</c>, as one table); display units follow <see cref="NotebookCyclesDisplay.Units"/>.</summary>
    public static void RegisterFormatters()
    {
        Formatter.Register<CycleResult>((r, w) => w.Write(CycleHtml.Cycle(r, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<CycleResult>((r, w) => w.Write(CycleText.Cycle(r, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<State>((s, w) => w.Write(CycleHtml.State(s, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<State>((s, w) => w.Write(CycleText.State(s, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<System.Collections.Immutable.ImmutableArray<State>>((s, w) => w.Write(CycleHtml.States(s, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<System.Collections.Immutable.ImmutableArray<State>>((s, w) => w.Write(CycleText.States(s, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<Step>((s, w) => w.Write(CycleHtml.Step(s, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<Step>((s, w) => w.Write(CycleText.Step(s, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<CalculationRecord>((r, w) => w.Write(CycleHtml.Record(r, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<CalculationRecord>((r, w) => w.Write(CycleText.Record(r, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<CycleComparison>((c, w) => w.Write(CycleHtml.Comparison(c, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<SweepResult>((s, w) => w.Write(SweepDisplay.Html(s, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<SweepResult>((s, w) => w.Write(SweepText.Sweep(s, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<OptimumResult>((o, w) => w.Write(SweepDisplay.Html(o, NotebookCyclesDisplay.Options)), HtmlFormatter.MimeType);
        Formatter.Register<OptimumResult>((o, w) => w.Write(SweepText.Optimum(o, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        Formatter.Register<SweepProgressView>((p, w) => w.Write(p.ToHtml()), HtmlFormatter.MimeType);
        Formatter.Register<SweepProgressView>((p, w) => w.Write(p.ToString()), PlainTextFormatter.MimeType);
        Formatter.Register<CycleComparison>((c, w) => w.Write(CycleText.Comparison(c, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
    }

    /// <summary>The line shown after loading.</summary>
    internal static string LoadedMessage(bool namespacesAdded) =>
        "<div class=\"nbc-loaded\" style=\"font-size:.92em\">NotebookCycles loaded: tables and T-s / p-v / h-s diagrams for states, cycles, steps, records (<code>cycle.Record()</code>), comparisons (<code>CycleComparison.Of(a, b)</code>), sweeps and optima (<code>Sweep.Over</code>, <code>NotebookSweep.Over</code> with progress, <code>Optimum.Maximize</code>); " +
        "display units <code>NotebookCyclesDisplay.Units = DisplayUnits.SiCelsiusBar</code>" + (namespacesAdded ? "; namespaces imported" : "") +
        ".<br>Try: <code>" + HtmlText.Encode(TryLine) + "</code></div>";
}

/// <summary>
/// The HTML a notebook shows for sweeps and optima: the static fragment of <see cref="SweepHtml"/> with each chart
/// made interactive (<see cref="PlotlyCharts"/>, its SVG kept as the fallback), plotly.js included once per kernel session.
/// </summary>
public static class SweepDisplay
{
    /// <summary>A sweep: interactive charts of the default figures (<see cref="SweepSvg.DefaultFigures"/>) and the table.</summary>
    public static string Html(SweepResult sweep, RenderOptions? options = null, IReadOnlyList<SweepFigure>? figures = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        options ??= RenderOptions.Default;
        var h = new System.Text.StringBuilder(24_000);
        h.Append("<div class=\"nbc-interactive\">").Append(PlotlyScript.ForCurrentSession());
        if (options.Diagrams)
        {
            h.Append("<div class=\"nbc-plots\" style=\"display:flex;flex-wrap:wrap;gap:10px\">");
            foreach (var f in figures ?? SweepSvg.DefaultFigures(sweep))
            {
                h.Append(PlotlyCharts.Sweep(sweep, f, options));
            }

            h.Append("</div>");
        }

        return h.Append(SweepHtml.Table(sweep, options)).Append("</div>").ToString();
    }

    /// <summary>An optimum: its summary and cycle report (<see cref="SweepHtml.Optimum"/>) with the scan chart made interactive.</summary>
    public static string Html(OptimumResult optimum, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        options ??= RenderOptions.Default;
        var h = new System.Text.StringBuilder(60_000);
        h.Append("<div class=\"nbc-interactive\">").Append(PlotlyScript.ForCurrentSession());
        if (options.Diagrams)
        {
            h.Append(PlotlyCharts.Optimum(optimum, null, options));
        }

        return h.Append(SweepHtml.Optimum(optimum, options, null, scanChart: false)).Append("</div>").ToString();
    }
}

/// <summary>The display settings notebooks use; changing them changes only how numbers are shown.</summary>
public static class NotebookCyclesDisplay
{
    private static volatile RenderOptions _options = RenderOptions.Default;

    /// <summary>The unit system every formatter uses (default SI). Example: <c>NotebookCyclesDisplay.Units = DisplayUnits.UsCustomary;</c>.</summary>
    public static DisplayUnits Units
    {
        get => _options.Units;
        set => _options = _options with { Units = value };
    }

    /// <summary>Whether cycle reports draw their diagrams (default true).</summary>
    public static bool Diagrams
    {
        get => _options.Diagrams;
        set => _options = _options with { Diagrams = value };
    }

    /// <summary>The full options the formatters render with.</summary>
    public static RenderOptions Options
    {
        get => _options;
        set => _options = value ?? throw new ArgumentNullException(nameof(value));
    }

    /// <summary>Back to SI units with diagrams.</summary>
    public static void Reset() => _options = RenderOptions.Default;
}
