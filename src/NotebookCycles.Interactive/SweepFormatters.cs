using System.Globalization;
using System.Text;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Cycles;
using NotebookCycles.Rendering;
using NotebookCycles.Sweeps;
using NotebookCycles.Units;

namespace NotebookCycles.Interactive;

/// <summary>
/// Tables for sweeps and optimum searches: one row per point with the parameter, thermal efficiency, net work,
/// back-work ratio (flow cycles) or mean effective pressure (closed cycles), peak temperature, and the reason a point
/// failed. Numbers in SI engineering units (kJ/kg, kPa, K), six significant digits.
/// </summary>
public static class SweepFormatters
{
    /// <summary>Registers the text/html and text/plain formatters for <see cref="SweepResult"/> and <see cref="OptimumResult"/>.</summary>
    public static void Register()
    {
        Formatter.Register<SweepResult>((s, w) => w.Write(Html(s)), HtmlFormatter.MimeType);
        Formatter.Register<SweepResult>((s, w) => w.Write(Text(s)), PlainTextFormatter.MimeType);
        Formatter.Register<OptimumResult>((o, w) => w.Write(Html(o)), HtmlFormatter.MimeType);
        Formatter.Register<OptimumResult>((o, w) => w.Write(Text(o)), PlainTextFormatter.MimeType);
    }

    /// <summary>The sweep as an HTML table.</summary>
    public static string Html(SweepResult sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var columns = Columns(sweep);
        var html = new StringBuilder("<div class=\"nbc nbc-sweep\"><h4>").Append(HtmlText.Encode(sweep.Title)).Append("</h4><table class=\"nbc-table\"><thead><tr>");
        foreach (var (name, _) in columns)
        {
            html.Append("<th>").Append(HtmlText.Encode(name)).Append("</th>");
        }

        html.Append("</tr></thead><tbody>");
        foreach (var row in Rows(sweep, columns))
        {
            html.Append("<tr>");
            foreach (var cell in row)
            {
                html.Append("<td>").Append(HtmlText.Encode(cell)).Append("</td>");
            }

            html.Append("</tr>");
        }

        return html.Append("</tbody></table></div>").ToString();
    }

    /// <summary>The sweep as an aligned plain-text table.</summary>
    public static string Text(SweepResult sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var columns = Columns(sweep);
        var rows = new List<string[]> { columns.Select(c => c.Name).ToArray() };
        rows.AddRange(Rows(sweep, columns));
        var widths = new int[columns.Count];
        foreach (var row in rows)
        {
            for (int i = 0; i < row.Length; i++)
            {
                widths[i] = Math.Max(widths[i], row[i].Length);
            }
        }

        var text = new StringBuilder(sweep.Title).Append('\n');
        for (int r = 0; r < rows.Count; r++)
        {
            for (int i = 0; i < rows[r].Length; i++)
            {
                text.Append(i == 0 ? "" : "  ").Append(rows[r][i].PadLeft(i == rows[r].Length - 1 && r > 0 ? 0 : widths[i]));
            }

            text.Append('\n');
            if (r == 0)
            {
                text.Append(string.Join("  ", widths.Select(w => new string('-', w)))).Append('\n');
            }
        }

        return text.ToString();
    }

    /// <summary>The optimum as HTML: the optimum's line, then the cycle at the optimum.</summary>
    public static string Html(OptimumResult optimum)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        return "<div class=\"nbc nbc-optimum\"><p><strong>" + HtmlText.Encode(Summary(optimum)) + "</strong></p>" + CycleHtml.Cycle(optimum.Cycle, NotebookCyclesDisplay.Options) + "</div>";
    }

    /// <summary>The optimum as plain text: the optimum's line, then the cycle at the optimum.</summary>
    public static string Text(OptimumResult optimum)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        return Summary(optimum) + "\n\n" + CycleText.Cycle(optimum.Cycle, NotebookCyclesDisplay.Options);
    }

    /// <summary>"Optimum of r_p: 14.2 ± 1e-8, objective 0.3812 (41 scan points, 95 cycles solved)".</summary>
    public static string Summary(OptimumResult optimum)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        return string.Create(CultureInfo.InvariantCulture, $"Optimum of {optimum.Parameter}: {SiText.Number(optimum.Value)} ± {SiText.Number(optimum.Tolerance)}, objective {SiText.Number(optimum.Objective)}{(optimum.ConstraintActive ? " (on the constraint's limit)" : "")}; {optimum.Evaluations} cycles solved.");
    }

    private static List<(string Name, Func<SweepPoint, string> Get)> Columns(SweepResult sweep)
    {
        var first = sweep.Points.FirstOrDefault(p => p.Figures is not null)?.Figures;
        bool closed = first is not null && !double.IsNaN(first.MeanEffectivePressure);
        var columns = new List<(string, Func<SweepPoint, string>)> { (sweep.XName, p => SiText.Number(p.X)) };
        if (sweep.YName is { } y)
        {
            columns.Add((y, p => SiText.Number(p.Y)));
        }

        columns.Add(("η", p => F(p, f => f.ThermalEfficiency)));
        columns.Add(("w_net (kJ/kg)", p => F(p, f => f.NetWork / 1000)));
        columns.Add(("q_in (kJ/kg)", p => F(p, f => f.HeatIn / 1000)));
        columns.Add(closed ? ("MEP (kPa)", p => F(p, f => f.MeanEffectivePressure / 1000)) : ("back-work ratio", p => F(p, f => f.BackWorkRatio)));
        columns.Add(("T_max (K)", p => F(p, f => f.MaximumTemperature)));
        columns.Add(("p_max (kPa)", p => F(p, f => f.MaximumPressure / 1000)));
        columns.Add(("failure", p => p.FailureReason ?? ""));
        return columns;
    }

    private static IEnumerable<string[]> Rows(SweepResult sweep, List<(string Name, Func<SweepPoint, string> Get)> columns)
    {
        foreach (var p in sweep.Points)
        {
            yield return columns.Select(c => c.Get(p)).ToArray();
        }
    }

    private static string F(SweepPoint p, Func<FiguresOfMerit, double> get) =>
        p.Figures is { } f && get(f) is var v && !double.IsNaN(v) ? SiText.Number(v) : "—";
}
