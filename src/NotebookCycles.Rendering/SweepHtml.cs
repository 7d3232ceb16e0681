using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Rendering;

/// <summary>
/// HTML fragments for sweeps and optima: the sweep's charts and table (failed points as rows with their reason), and an
/// optimum's value, objective, constraint, scan chart and the cycle's own report. Self-contained like
/// <see cref="CycleHtml"/>: scoped styles, no script, every user string encoded, deterministic.
/// </summary>
public static class SweepHtml
{
    private const string Style =
        "<style>.nbc-sweeptable tr.nbc-failed td,.nbc-sweeptable tr.nbc-failed th{opacity:.85}" +
        ".nbc-sweeptable .nbc-reason{text-align:left;white-space:normal;max-width:48em;font-style:italic}" +
        ".nbc-sweeptable tr.nbc-skip td{text-align:center;font-style:italic;opacity:.75}" +
        ".nbc-optimum .nbc-cycle{margin-top:1em;padding-top:.4em;border-top:1px solid rgba(128,128,128,.35)}</style>";

    /// <summary>
    /// The sweep: a heading with the point and failure counts, a chart per figure (default
    /// <see cref="SweepSvg.DefaultFigures"/>; all points), and the table (at most <see cref="RenderOptions.TableRows"/> rows:
    /// first and last rows with a note between).
    /// </summary>
    public static string Sweep(SweepResult sweep, RenderOptions? options = null, IReadOnlyList<SweepFigure>? figures = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        options ??= RenderOptions.Default;
        var h = new StringBuilder(16_000);
        CycleHtml.Open(h, "nbc-sweep");
        h.Append(Style);
        Heading(h, sweep, options.Units);
        if (options.Diagrams)
        {
            h.Append("<div class=\"nbc-diagrams nbc-sweepcharts\">");
            foreach (var f in figures ?? SweepSvg.DefaultFigures(sweep))
            {
                h.Append(SweepSvg.Chart(sweep, f, options));
            }

            h.Append("</div>");
        }

        WriteTable(h, sweep, options);
        h.Append("<p class=\"nbc-caution\">").Enc(CycleResult.Caution).Append("</p>");
        return CycleHtml.Close(h);
    }

    /// <summary>The sweep's heading line and table alone (no charts), as a fragment.</summary>
    public static string Table(SweepResult sweep, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        options ??= RenderOptions.Default;
        var h = new StringBuilder(12_000);
        CycleHtml.Open(h, "nbc-sweep");
        h.Append(Style);
        Heading(h, sweep, options.Units);
        WriteTable(h, sweep, options);
        return CycleHtml.Close(h);
    }

    /// <summary>
    /// The optimum: the parameter value ± tolerance, the objective, whether a constraint is active, the number of cycles
    /// solved, the scan chart with the optimum marked (<paramref name="figure"/>, default <see cref="SweepSvg.ObjectiveFigure"/>),
    /// and the optimum cycle's full report (<see cref="CycleHtml.Cycle"/>). <paramref name="scanChart"/> false leaves the scan
    /// chart out (for a page that draws its own), the cycle's diagrams still following <see cref="RenderOptions.Diagrams"/>.
    /// </summary>
    public static string Optimum(OptimumResult optimum, RenderOptions? options = null, SweepFigure? figure = null, bool scanChart = true)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        options ??= RenderOptions.Default;
        var h = new StringBuilder(40_000);
        CycleHtml.Open(h, "nbc-optimum");
        h.Append(Style);
        h.Append("<h3 class=\"nbc-title\">Optimum of ").Enc(optimum.Parameter).Append("</h3>");
        h.Append("<table class=\"nbc-table nbc-figures nbc-optimumtable\"><tbody>");
        foreach (var (name, value) in Summary(optimum, options.Units))
        {
            h.Append("<tr><th class=\"nbc-l\">").Enc(name).Append("</th><td class=\"nbc-l\">").Enc(value).Append("</td></tr>");
        }

        h.Append("</tbody></table>");
        if (options.Diagrams && scanChart)
        {
            h.Append("<div class=\"nbc-diagrams nbc-sweepcharts\">").Append(SweepSvg.Scan(optimum, figure, options)).Append("</div>");
        }

        h.Append(CycleHtml.Cycle(optimum.Cycle, options));
        return CycleHtml.Close(h);
    }

    /// <summary>The optimum's summary lines (name, text) shared by the HTML and text renderers.</summary>
    internal static List<(string Name, string Value)> Summary(OptimumResult o, DisplayUnits u)
    {
        var objectiveFigure = SweepSvg.ObjectiveFigure(o);
        bool named = SweepFigures.Get(objectiveFigure, o.Cycle.Figures) == o.Objective;
        string objective = named
            ? SweepFigures.Name(objectiveFigure) + " = " + UnitText.WithUnit(o.Objective, SweepFigures.Quantity(objectiveFigure), u)
            : UnitText.Significant(o.Objective, 6) + " (the objective given, in its own units)";
        return
        [
            (o.Parameter, SweepFigures.Parameter(o.Value) + " ± " + UnitText.Significant(o.Tolerance, 2)),
            ("Objective at the optimum", objective),
            ("Constraint", o.ConstraintActive ? "active: the optimum lies on the constraint's limit" : "not active (a free maximum, or no constraint given)"),
            ("Cycles solved", o.Evaluations.ToString(CultureInfo.InvariantCulture) + " (a scan of " + o.Scan.Points.Length.ToString(CultureInfo.InvariantCulture) + " points, then golden-section refinement)"),
        ];
    }

    /// <summary>Which rows a table shows: all up to <paramref name="limit"/>, else the first and last halves (the gap is noted).</summary>
    internal static (int Head, int Tail) Shown(int count, int limit)
    {
        if (count <= limit)
        {
            return (count, 0);
        }

        int head = (limit + 1) / 2;
        return (head, limit - head);
    }

    private static void Heading(StringBuilder h, SweepResult sweep, DisplayUnits u)
    {
        int failed = sweep.Failed.Count();
        h.Append("<h4>").Enc(sweep.Title).Append("</h4><p class=\"nbc-meta\">")
         .Append(sweep.Points.Length.ToString(CultureInfo.InvariantCulture)).Append(" points over ").Enc(sweep.XName);
        if (sweep.YName is not null)
        {
            h.Append(" and ").Enc(sweep.YName);
        }

        h.Append(failed == 0 ? "; all solved" : "; " + failed.ToString(CultureInfo.InvariantCulture) + " failed (their rows give the reason)")
         .Append(". Units: ").Enc(UnitText.Describe(u)).Append(".</p>");
    }

    private static void WriteTable(StringBuilder h, SweepResult sweep, RenderOptions options)
    {
        var u = options.Units;
        var figures = SweepFigures.ForTable(sweep);
        int columns = 1 + (sweep.YName is null ? 0 : 1) + figures.Count;
        h.Append("<table class=\"nbc-table nbc-sweeptable\"><thead><tr><th>").Enc(sweep.XName).Append("</th>");
        if (sweep.YName is not null)
        {
            h.Append("<th>").Enc(sweep.YName).Append("</th>");
        }

        foreach (var f in figures)
        {
            string unit = UnitText.Unit(SweepFigures.Quantity(f), u);
            h.Append("<th>").Enc(SweepFigures.Name(f));
            if (unit.Length > 0)
            {
                h.Append(" <span class=\"nbc-u\">").Enc(unit).Append("</span>");
            }

            h.Append("</th>");
        }

        h.Append("</tr></thead><tbody>");
        int n = sweep.Points.Length;
        var (head, tail) = Shown(n, options.CheckedTableRows());
        for (int i = 0; i < n; i++)
        {
            if (i == head && tail > 0)
            {
                int hidden = n - head - tail, hiddenFailed = 0;
                for (int k = head; k < n - tail; k++)
                {
                    hiddenFailed += sweep.Points[k].Succeeded ? 0 : 1;
                }

                h.Append("<tr class=\"nbc-skip\"><td colspan=\"").Append(columns.ToString(CultureInfo.InvariantCulture)).Append("\">… ")
                 .Append(hidden.ToString(CultureInfo.InvariantCulture)).Append(" more rows not shown")
                 .Append(hiddenFailed > 0 ? " (" + hiddenFailed.ToString(CultureInfo.InvariantCulture) + " of them failed)" : "")
                 .Append("; the charts use every point, and ToCsv() has them all …</td></tr>");
                i = n - tail - 1;
                continue;
            }

            Row(h, sweep, i, figures, u);
        }

        h.Append("</tbody></table>");
    }

    private static void Row(StringBuilder h, SweepResult sweep, int i, List<SweepFigure> figures, DisplayUnits u)
    {
        var p = sweep.Points[i];
        h.Append("<tr data-point=\"").Append(i.ToString(CultureInfo.InvariantCulture)).Append('"').Append(p.Succeeded ? "" : " class=\"nbc-failed\"").Append("><td>").Append(SweepFigures.Parameter(p.X)).Append("</td>");
        if (sweep.YName is not null)
        {
            h.Append("<td>").Append(SweepFigures.Parameter(p.Y)).Append("</td>");
        }

        if (p.Figures is { } fm)
        {
            foreach (var f in figures)
            {
                h.Append("<td>").Append(UnitText.Number(SweepFigures.Get(f, fm), SweepFigures.Quantity(f), u)).Append("</td>");
            }
        }
        else if (figures.Count > 0)
        {
            h.Append("<td class=\"nbc-reason\" colspan=\"").Append(figures.Count.ToString(CultureInfo.InvariantCulture)).Append("\">Failed: ").Enc(p.FailureReason).Append("</td>");
        }

        h.Append("</tr>");
    }
}
