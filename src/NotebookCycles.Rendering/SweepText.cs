using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Rendering;

/// <summary>Plain text (or Markdown) of sweeps and optima, for consoles, logs and text-only notebook output.</summary>
public static class SweepText
{
    /// <summary>The sweep's table as text: parameters, the figures that apply, failed points with their reason; large sweeps show their first and last rows with a note.</summary>
    public static string Sweep(SweepResult sweep, RenderOptions? options = null, bool markdown = false)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        options ??= RenderOptions.Default;
        var u = options.Units;
        var figures = SweepFigures.ForTable(sweep);
        var head = new List<string> { sweep.XName };
        if (sweep.YName is not null)
        {
            head.Add(sweep.YName);
        }

        foreach (var f in figures)
        {
            string unit = UnitText.Unit(SweepFigures.Quantity(f), u);
            head.Add(unit.Length == 0 ? SweepFigures.Name(f) : SweepFigures.Name(f) + " (" + unit + ")");
        }

        head.Add("Failure");
        var left = new bool[head.Count];
        left[^1] = true;
        var grid = new Grid([.. head], left);
        int n = sweep.Points.Length;
        var (shownHead, shownTail) = SweepHtml.Shown(n, options.CheckedTableRows());
        for (int i = 0; i < n; i++)
        {
            if (i == shownHead && shownTail > 0)
            {
                var gap = new string[head.Count];
                Array.Fill(gap, "…");
                gap[^1] = (n - shownHead - shownTail).ToString(CultureInfo.InvariantCulture) + " more rows not shown (ToCsv() has them all)";
                grid.Add(gap);
                i = n - shownTail - 1;
                continue;
            }

            var p = sweep.Points[i];
            var row = new List<string> { SweepFigures.Parameter(p.X) };
            if (sweep.YName is not null)
            {
                row.Add(SweepFigures.Parameter(p.Y));
            }

            foreach (var f in figures)
            {
                row.Add(p.Figures is { } fm ? UnitText.Number(SweepFigures.Get(f, fm), SweepFigures.Quantity(f), u) : "—");
            }

            row.Add(p.FailureReason is null ? "" : "failed: " + p.FailureReason.ReplaceLineEndings(" "));
            grid.Add([.. row]);
        }

        int failed = sweep.Failed.Count();
        var t = new StringBuilder(4000);
        TextReport.Heading(t, 2, sweep.Title, markdown);
        t.Append(n.ToString(CultureInfo.InvariantCulture)).Append(" points").Append(failed == 0 ? ", all solved" : ", " + failed.ToString(CultureInfo.InvariantCulture) + " failed")
         .Append(". Units: ").Append(UnitText.Describe(u)).AppendLine(".").AppendLine();
        t.Append(grid.Render(markdown)).AppendLine();
        t.AppendLine(markdown ? "*" + CycleResult.Caution + "*" : CycleResult.Caution);
        return t.ToString();
    }

    /// <summary>The optimum as text: value ± tolerance, objective, constraint, cycles solved, then the cycle's text report.</summary>
    public static string Optimum(OptimumResult optimum, RenderOptions? options = null, bool markdown = false)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        options ??= RenderOptions.Default;
        var t = new StringBuilder(8000);
        TextReport.Heading(t, 2, "Optimum of " + optimum.Parameter, markdown);
        var grid = new Grid(["Item", "Value"], [true, true]);
        foreach (var (name, value) in SweepHtml.Summary(optimum, options.Units))
        {
            grid.Add(name, value);
        }

        t.Append(grid.Render(markdown)).AppendLine();
        t.Append(markdown ? CycleMarkdown.Cycle(optimum.Cycle, options) : CycleText.Cycle(optimum.Cycle, options));
        return t.ToString();
    }
}
