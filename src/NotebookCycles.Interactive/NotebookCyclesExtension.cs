using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;
using NotebookCycles.Rendering;

namespace NotebookCycles.Interactive;

/// <summary>
/// The notebook extension: registers HTML and plain-text formatters for states, cycles, steps, calculation records
/// and comparisons, adds the library's namespaces to the C# kernel, and says what it loaded. The package's
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
        Formatter.Register<CycleComparison>((c, w) => w.Write(CycleText.Comparison(c, NotebookCyclesDisplay.Options)), PlainTextFormatter.MimeType);
        SweepFormatters.Register();
    }

    /// <summary>The line shown after loading.</summary>
    internal static string LoadedMessage(bool namespacesAdded) =>
        "<div class=\"nbc-loaded\" style=\"font-size:.92em\">NotebookCycles loaded: tables and T-s / p-v / h-s diagrams for states, cycles, steps, records (<code>cycle.Record()</code>) and comparisons (<code>CycleComparison.Of(a, b)</code>); " +
        "display units <code>NotebookCyclesDisplay.Units = DisplayUnits.SiCelsiusBar</code>" + (namespacesAdded ? "; namespaces imported" : "") +
        ".<br>Try: <code>" + HtmlText.Encode(TryLine) + "</code></div>";
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
