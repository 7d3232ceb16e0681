using System.Globalization;
using System.Runtime.CompilerServices;
using System.Text;
using Microsoft.DotNet.Interactive;
using NotebookCycles.Rendering;
using NotebookCycles.Sweeps;
using XPlot.Plotly;

namespace NotebookCycles.Interactive;

/// <summary>
/// plotly.js (npm plotly.js-dist-min, embedded in this assembly at build time) as an inline script, given once per
/// kernel session: the first interactive chart a kernel displays carries it, later charts use window.Plotly.
/// </summary>
public static class PlotlyScript
{
    /// <summary>The plotly.js version embedded.</summary>
    public const string Version = "2.35.3";

    private static readonly Lazy<string> Script = new(Build);
    private static readonly ConditionalWeakTable<Kernel, object> Given = new();

    /// <summary>
    /// The &lt;script&gt; element that defines window.Plotly, with the page's AMD loader (define/require, as RequireJS
    /// front ends have) hidden while it runs so plotly.js sets the global instead of registering a module.
    /// </summary>
    public static string Element => Script.Value;

    /// <summary>
    /// The script element the first time it is asked for in a kernel session (the root kernel of the current
    /// submission), "" after that; outside a kernel (no <see cref="KernelInvocationContext.Current"/>) always the element.
    /// </summary>
    public static string ForCurrentSession()
    {
        var kernel = KernelInvocationContext.Current?.HandlingKernel?.RootKernel;
        if (kernel is null)
        {
            return Element;
        }

        lock (Given)
        {
            if (Given.TryGetValue(kernel, out _))
            {
                return "";
            }

            Given.Add(kernel, new object());
        }

        return Element;
    }

    private static string Build()
    {
        using var stream = typeof(PlotlyScript).Assembly.GetManifestResourceStream("NotebookCycles.Interactive.plotly.min.js")
            ?? throw new InvalidOperationException("plotly.min.js is not embedded in NotebookCycles.Interactive (the build fetches it with plotly/fetch-plotly.sh).");
        using var reader = new StreamReader(stream, Encoding.UTF8);
        string plotly = reader.ReadToEnd().Replace("</script", "<\\/script", StringComparison.OrdinalIgnoreCase);
        return "<script data-nbc-plotly=\"" + Version + "\">" +
               "(function(){var w=window;w.__nbcAmd={define:w.define,require:w.require};w.define=undefined;w.require=undefined;})();\ntry{\n" +
               plotly +
               "\n}finally{(function(){var w=window,s=w.__nbcAmd;if(s){w.define=s.define;w.require=s.require;try{delete w.__nbcAmd;}catch(e){w.__nbcAmd=undefined;}}})();}</script>";
    }
}

/// <summary>
/// Interactive plotly charts of sweeps and optima, built with XPlot.Plotly and rendered offline
/// (<see cref="PlotlyChart.GetInlineJS"/> against the embedded plotly.js), each next to its static SVG, which stays
/// visible wherever plotly.js is absent (an exported memo, a page without scripts).
/// </summary>
public static class PlotlyCharts
{
    /// <summary>The interactive chart of one figure of a sweep, with its SVG fallback (no plotly.js script included).</summary>
    public static string Sweep(SweepResult sweep, SweepFigure figure, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        options ??= RenderOptions.Default;
        var traces = Traces(sweep, figure, options.Units, out string yTitle);
        var chart = Chart.Plot(traces);
        chart.WithTitle(Label(figure) + " against " + sweep.XName);
        chart.WithXTitle(sweep.XName);
        chart.WithYTitle(yTitle);
        chart.WithLegend(sweep.YName is not null);
        chart.WithWidth(640);
        chart.WithHeight(380);
        return Wrap(chart, SweepSvg.Chart(sweep, figure, options));
    }

    /// <summary>The interactive scan chart of an optimum with the optimum marked, with its SVG fallback.</summary>
    public static string Optimum(OptimumResult optimum, SweepFigure? figure = null, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        options ??= RenderOptions.Default;
        var f = figure ?? SweepSvg.ObjectiveFigure(optimum);
        var traces = Traces(optimum.Scan, f, options.Units, out string yTitle);
        var q = Quantity(f);
        traces.Add(new Scatter
        {
            x = new[] { optimum.Value },
            y = new[] { Value(UnitText.Convert(Get(f, optimum.Cycle), q, options.Units)) },
            name = "optimum " + optimum.Value.ToString("G6", CultureInfo.InvariantCulture),
            mode = "markers",
            marker = new Marker { size = 11.0, symbol = "circle-open" },
        });
        var chart = Chart.Plot(traces);
        chart.WithTitle(Label(f) + " against " + optimum.Parameter + " (scan)");
        chart.WithXTitle(optimum.Parameter);
        chart.WithYTitle(yTitle);
        chart.WithLegend(true);
        chart.WithWidth(640);
        chart.WithHeight(380);
        return Wrap(chart, SweepSvg.Scan(optimum, f, options));
    }

    private static List<Scatter> Traces(SweepResult sweep, SweepFigure figure, DisplayUnits units, out string yTitle)
    {
        string unit = UnitText.Unit(Quantity(figure), units);
        yTitle = unit.Length == 0 ? Label(figure) : Label(figure) + ", " + unit;
        var traces = new List<Scatter>();
        foreach (var (second, x, y) in SweepSvg.Curves(sweep, figure, units))
        {
            string colour = Palette[traces.Count % Palette.Length];
            var values = new object?[y.Length];
            for (int i = 0; i < y.Length; i++)
            {
                values[i] = Value(y[i]);
            }

            traces.Add(new Scatter
            {
                line = new Line { color = colour, width = 2.0 },
                marker = new Marker { color = colour, size = 6.0 },
                x = x,
                y = values,
                name = sweep.YName is null ? Label(figure) : sweep.YName + " = " + second.ToString("G6", CultureInfo.InvariantCulture),
                mode = x.Length <= 60 ? "lines+markers" : "lines",
            });
        }

        return traces;
    }

    private static string Wrap(PlotlyChart chart, string svg)
    {
        string id = "nbc-plot-" + Guid.NewGuid().ToString("N");
        chart.WithId(id);
        // The notebook's theme: transparent background, the text colour of the page, faint grid lines (as the SVG has).
        const string Theme =
            "var nbcColour=getComputedStyle(box).color;layout.paper_bgcolor='rgba(0,0,0,0)';layout.plot_bgcolor='rgba(0,0,0,0)';layout.font={color:nbcColour};" +
            "['xaxis','yaxis'].forEach(function(a){layout[a]=layout[a]||{};layout[a].gridcolor='rgba(128,128,128,0.25)';layout[a].zerolinecolor='rgba(128,128,128,0.5)';});";
        string js = ScriptBody(chart.GetInlineJS())
            .Replace("Plotly.newPlot(", Theme + "Plotly.newPlot(", StringComparison.Ordinal)
            // '<' occurs only inside the JSON's strings (titles, names): escaped, user text cannot close the script element.
            .Replace("<", "\\u003c", StringComparison.Ordinal);
        var h = new StringBuilder(svg.Length + js.Length + 800);
        h.Append("<div class=\"nbc-plot\">")
         .Append("<div id=\"").Append(id).Append("\" class=\"nbc-plotly\" style=\"width:640px;height:380px;max-width:100%;display:none\"></div>")
         .Append("<div class=\"nbc-fallback\" id=\"").Append(id).Append("-svg\">").Append(svg).Append("</div>")
         .Append("<script>(function(){var Plotly=window.Plotly;if(!Plotly||!Plotly.newPlot){return;}")
         .Append("var box=document.getElementById('").Append(id).Append("'),svg=document.getElementById('").Append(id).Append("-svg');if(!box){return;}")
         .Append("box.style.display='block';try{").Append(js).Append("if(svg){svg.style.display='none';}}catch(e){box.style.display='none';}})();</script>")
         .Append("</div>");
        return h.ToString();
    }

    // The light-theme palette of the static diagrams, so a chart and its SVG fallback show the same colours.
    private static readonly string[] Palette = ["#1f65a8", "#c2410c", "#2f7d32", "#be185d", "#7c3aed", "#0e7490"];

    /// <summary>The code inside the one script element XPlot writes (only its own opening and closing tags removed).</summary>
    private static string ScriptBody(string element)
    {
        string js = element.Trim();
        if (js.StartsWith("<script>", StringComparison.Ordinal))
        {
            js = js["<script>".Length..];
        }

        if (js.EndsWith("</script>", StringComparison.Ordinal))
        {
            js = js[..^"</script>".Length];
        }

        return js;
    }

    private static object? Value(double v) => double.IsFinite(v) ? v : null;

    private static double Get(SweepFigure f, Cycles.CycleResult cycle) => SweepFigures.Get(f, cycle.Figures);

    private static DisplayQuantity Quantity(SweepFigure f) => SweepFigures.Quantity(f);

    private static string Label(SweepFigure f) => SweepFigures.Name(f);
}
