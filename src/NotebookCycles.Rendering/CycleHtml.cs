using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;

namespace NotebookCycles.Rendering;

/// <summary>
/// HTML fragments for notebooks and reports: a cycle report, a state table, one state, one step, a calculation record
/// and a comparison of cycles. Every fragment is a &lt;div class="nbc …"&gt; carrying its own scoped styles (class names
/// prefixed nbc-), light and dark themes and print; no script, no external resources. Every user string is encoded.
/// Output is deterministic for the same input and options.
/// </summary>
public static class CycleHtml
{
    /// <summary>The full report: title, model and citation, the state table, the diagrams, the step-by-step record, figures of merit, checks, warnings and the caution.</summary>
    public static string Cycle(CycleResult cycle, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        options ??= RenderOptions.Default;
        var u = options.Units;
        var h = new StringBuilder(24_000);
        Open(h, "nbc-cycle");
        h.Append("<h3 class=\"nbc-title\">").Enc(cycle.Title).Append("</h3>");
        h.Append("<p class=\"nbc-meta\">Property model: <b>").Enc(cycle.Model.Name).Append("</b>. <span class=\"nbc-cite\">").Enc(cycle.Model.Citation)
         .Append("</span><br>").Enc(Capital(StateColumns.SystemText(cycle))).Append(". Units: ").Enc(UnitText.Describe(u)).Append(".</p>");
        StateTable(h, cycle.States, cycle, u);
        if (options.Diagrams)
        {
            h.Append("<div class=\"nbc-diagrams\">");
            foreach (var kind in CycleSvg.DiagramsFor(cycle))
            {
                CycleSvg.Write(h, cycle, kind, options);
            }

            h.Append("</div>");
        }

        h.Append("<h4>Calculation record</h4>");
        RecordBody(h, cycle, u);
        h.Append("<h4>Figures of merit</h4>");
        FiguresTable(h, cycle, u);
        Checks(h, cycle);
        Warnings(h, cycle.Warnings);
        h.Append("<p class=\"nbc-caution\">").Enc(CycleResult.Caution).Append("</p>");
        return Close(h);
    }

    /// <summary>The table of the cycle's states, every state one row.</summary>
    public static string States(CycleResult cycle, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        var h = new StringBuilder(4000);
        Open(h, "nbc-statetable");
        StateTable(h, cycle.States, cycle, (options ?? RenderOptions.Default).Units);
        return Close(h);
    }

    /// <summary>A table of any states (for example <c>cycle.States</c> or states built one by one), every state one row.</summary>
    public static string States(IEnumerable<State> states, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(states);
        var list = states.ToList();
        var h = new StringBuilder(600 + 400 * list.Count);
        Open(h, "nbc-statetable");
        StateTable(h, list, null, (options ?? RenderOptions.Default).Units);
        return Close(h);
    }

    /// <summary>One state: a one-row table with its model.</summary>
    public static string State(State state, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(state);
        var h = new StringBuilder(2000);
        Open(h, "nbc-state");
        StateTable(h, [state], null, (options ?? RenderOptions.Default).Units);
        h.Append("<p class=\"nbc-meta\">").Enc(state.Model.Name).Append(", ").Enc(PhaseText(state.Phase)).Append(".</p>");
        Warnings(h, state.Warnings);
        return Close(h);
    }

    /// <summary>One step: its process, assumptions, record lines and balances.</summary>
    public static string Step(Step step, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(step);
        var h = new StringBuilder(3000);
        Open(h, "nbc-onestep");
        h.Append("<ol class=\"nbc-record\" start=\"").Append(step.Index.ToString(CultureInfo.InvariantCulture)).Append("\">");
        StepItem(h, step, (options ?? RenderOptions.Default).Units, null);
        h.Append("</ol>");
        return Close(h);
    }

    /// <summary>The calculation record alone: every step in order.</summary>
    public static string Record(CalculationRecord record, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(record);
        var h = new StringBuilder(12_000);
        Open(h, "nbc-recordonly");
        h.Append("<h4>Calculation record: ").Enc(record.Cycle.Title).Append("</h4>");
        h.Append("<p class=\"nbc-meta\">").Enc(record.Cycle.Model.Name).Append("; ").Enc(StateColumns.SystemText(record.Cycle)).Append(".</p>");
        RecordBody(h, record.Cycle, (options ?? RenderOptions.Default).Units);
        h.Append("<p class=\"nbc-caution\">").Enc(CycleResult.Caution).Append("</p>");
        return Close(h);
    }

    /// <summary>Cycles side by side: a figures table with each cycle's difference from the first, and (with diagrams on) their T-s diagrams overlaid, one colour per variant.</summary>
    public static string Comparison(CycleComparison comparison, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        var u = (options ?? RenderOptions.Default).Units;
        var cycles = comparison.Cycles;
        var names = comparison.Names;
        var all = new Figure[cycles.Length][];
        for (int c = 0; c < cycles.Length; c++)
        {
            all[c] = FigureList.All(cycles[c]);
        }

        var h = new StringBuilder(6000);
        Open(h, "nbc-comparison");
        h.Append("<h4>").Enc(comparison.Title).Append(": ").Append(cycles.Length.ToString(CultureInfo.InvariantCulture)).Append(" cycles</h4>");
        h.Append("<table class=\"nbc-table nbc-figures\"><thead><tr><th class=\"nbc-l\">Figure</th><th class=\"nbc-l\">Unit</th>");
        for (int c = 0; c < cycles.Length; c++)
        {
            h.Append("<th>").Enc(names[c]).Append(c == 0 ? " <span class=\"nbc-u\">(baseline)</span>" : "").Append("</th>");
            if (c > 0)
            {
                h.Append("<th class=\"nbc-d\">Δ vs baseline</th>");
            }
        }

        h.Append("</tr></thead><tbody>");
        for (int i = 0; i < all[0].Length; i++)
        {
            bool any = false;
            for (int c = 0; c < cycles.Length; c++)
            {
                any |= !double.IsNaN(all[c][i].Value);
            }

            if (!any)
            {
                continue;
            }

            var baseline = all[0][i];
            h.Append("<tr><th class=\"nbc-l\">").Enc(baseline.Name).Append("</th><td class=\"nbc-l nbc-u\">").Enc(UnitText.Unit(baseline.Quantity, u)).Append("</td>");
            for (int c = 0; c < cycles.Length; c++)
            {
                h.Append("<td>").Append(UnitText.Number(all[c][i].Value, all[c][i].Quantity, u)).Append("</td>");
                if (c > 0)
                {
                    h.Append("<td class=\"nbc-d\">").Append(Delta(baseline, all[c][i], u)).Append("</td>");
                }
            }

            h.Append("</tr>");
        }

        h.Append("</tbody></table>");
        if ((options ?? RenderOptions.Default).Diagrams)
        {
            h.Append("<div class=\"nbc-diagrams\">").Append(CycleSvg.Overlay(comparison, DiagramKind.TemperatureEntropy, options)).Append("</div>");
        }

        h.Append("<p class=\"nbc-meta\">");
        for (int c = 0; c < cycles.Length; c++)
        {
            h.Append(c == 0 ? "" : "<br>").Enc(names[c]).Append(": ").Enc(cycles[c].Model.Name).Append(", ").Append(cycles[c].Checks.Length.ToString(CultureInfo.InvariantCulture)).Append(" checks passed");
        }

        h.Append(". Units: ").Enc(UnitText.Describe(u)).Append(".</p>");
        h.Append("<p class=\"nbc-caution\">").Enc(CycleResult.Caution).Append("</p>");
        return Close(h);
    }

    internal static string Delta(Figure baseline, Figure other, DisplayUnits u)
    {
        if (double.IsNaN(baseline.Value) || double.IsNaN(other.Value))
        {
            return "—";
        }

        double d = FigureList.Difference(baseline, other, u);
        string text = baseline.Quantity is DisplayQuantity.Temperature or DisplayQuantity.AbsoluteTemperature ? UnitText.Fixed(d, 2) : UnitText.Significant(d, 4);
        return d > 0 ? "+" + text : text.Replace("-", "−", StringComparison.Ordinal);
    }

    private static void StateTable(StringBuilder h, IReadOnlyList<State> states, CycleResult? cycle, DisplayUnits u)
    {
        bool quality = StateColumns.HasQuality(states);
        bool mass = StateColumns.HasMassFractions(cycle);
        h.Append("<table class=\"nbc-table nbc-states\"><thead><tr><th class=\"nbc-l\">State</th>");
        Head(h, "T", DisplayQuantity.Temperature, u);
        Head(h, "p", DisplayQuantity.Pressure, u);
        Head(h, "v", DisplayQuantity.SpecificVolume, u);
        Head(h, "u", DisplayQuantity.SpecificEnergy, u);
        Head(h, "h", DisplayQuantity.SpecificEnergy, u);
        Head(h, "s", DisplayQuantity.SpecificEntropy, u);
        if (quality)
        {
            h.Append("<th>x</th>");
        }

        if (mass)
        {
            h.Append("<th>m/m₁</th>");
        }

        h.Append("</tr></thead><tbody>");
        for (int i = 0; i < states.Count; i++)
        {
            var s = states[i];
            var p = s.Point;
            h.Append("<tr data-state=\"").Enc(s.Label).Append("\"><th class=\"nbc-l\">").Enc(s.Label).Append("</th>");
            Cell(h, p.T, DisplayQuantity.Temperature, u);
            Cell(h, p.P, DisplayQuantity.Pressure, u);
            Cell(h, p.V, DisplayQuantity.SpecificVolume, u);
            Cell(h, p.U, DisplayQuantity.SpecificEnergy, u);
            Cell(h, p.H, DisplayQuantity.SpecificEnergy, u);
            Cell(h, p.S, DisplayQuantity.SpecificEntropy, u);
            if (quality)
            {
                h.Append("<td>").Append(double.IsNaN(p.X) ? "—" : UnitText.Fixed(p.X, 4)).Append("</td>");
            }

            if (mass)
            {
                h.Append("<td>").Append(UnitText.Significant(cycle!.StateMassFractions[i], 4)).Append("</td>");
            }

            h.Append("</tr>");
        }

        h.Append("</tbody></table>");
    }

    private static void Head(StringBuilder h, string symbol, DisplayQuantity q, DisplayUnits u) =>
        h.Append("<th>").Append(symbol).Append(" <span class=\"nbc-u\">").Enc(UnitText.Unit(q, u)).Append("</span></th>");

    private static void Cell(StringBuilder h, double si, DisplayQuantity q, DisplayUnits u) =>
        h.Append("<td>").Append(UnitText.Number(si, q, u)).Append("</td>");

    private static void RecordBody(StringBuilder h, CycleResult cycle, DisplayUnits u)
    {
        if (!cycle.Recorded)
        {
            h.Append("<p class=\"nbc-meta\">The relation lines were not kept for this cycle (record off); balances per step follow.</p>");
        }

        h.Append("<ol class=\"nbc-record\">");
        foreach (var step in cycle.Steps)
        {
            StepItem(h, step, u, cycle);
        }

        h.Append("</ol>");
    }

    private static void StepItem(StringBuilder h, Step step, DisplayUnits u, CycleResult? cycle)
    {
        h.Append("<li class=\"nbc-steprec\" data-step=\"").Enc(step.Name).Append("\"><p class=\"nbc-stephead\"><b>").Enc(step.Name).Append("</b> ").Enc(step.Process).Append("</p>");
        if (step.Assumptions.Length > 0)
        {
            h.Append("<p class=\"nbc-assume\">Assumptions: ").Enc(string.Join("; ", step.Assumptions)).Append(".</p>");
        }

        if (step.Lines.Length > 0)
        {
            h.Append("<ul class=\"nbc-lines\">");
            foreach (var line in step.Lines)
            {
                h.Append("<li>").Enc(UnitText.Line(line, u)).Append("</li>");
            }

            h.Append("</ul>");
        }

        h.Append("<p class=\"nbc-balance\">").Enc(Balance(step, u, cycle)).Append("</p>");
        if (step.Warnings.Length > 0)
        {
            Warnings(h, step.Warnings);
        }

        h.Append("</li>");
    }

    internal static string Balance(Step step, DisplayUnits u, CycleResult? cycle)
    {
        var b = new StringBuilder(200);
        b.Append("q = ").Append(UnitText.WithUnit(step.Q, DisplayQuantity.SpecificEnergy, u))
         .Append(", w = ").Append(UnitText.WithUnit(step.W, DisplayQuantity.SpecificEnergy, u))
         .Append(", Δs = ").Append(UnitText.WithUnit(step.DeltaS, DisplayQuantity.SpecificEntropy, u))
         .Append(", s_gen = ").Append(UnitText.WithUnit(step.EntropyGenerated, DisplayQuantity.SpecificEntropy, u));
        if (step.Q != 0 && double.IsFinite(step.BoundaryTemperature))
        {
            b.Append(" (boundary at ").Append(UnitText.WithUnit(step.BoundaryTemperature, DisplayQuantity.AbsoluteTemperature, u)).Append(step.BoundaryTemperatureAssumed ? ", assumed)" : ")");
        }

        if (cycle is not null)
        {
            b.Append(", exergy destroyed ").Append(UnitText.WithUnit(cycle.ExergyDestroyed(step), DisplayQuantity.SpecificEnergy, u));
        }

        if (step.HeatIsInternal)
        {
            b.Append("; heat exchanged inside the cycle");
        }

        if (step.MassFraction != 1)
        {
            b.Append("; mass fraction ").Append(UnitText.Significant(step.MassFraction, 4));
        }

        return b.ToString();
    }

    private static void FiguresTable(StringBuilder h, CycleResult cycle, DisplayUnits u)
    {
        h.Append("<table class=\"nbc-table nbc-figures\"><tbody>");
        foreach (var f in FigureList.Applicable(cycle))
        {
            h.Append("<tr><th class=\"nbc-l\">").Enc(f.Name).Append("</th><td>").Append(UnitText.Number(f.Value, f.Quantity, u)).Append("</td><td class=\"nbc-l nbc-u\">").Enc(UnitText.Unit(f.Quantity, u)).Append("</td></tr>");
        }

        h.Append("</tbody></table>");
    }

    private static void Checks(StringBuilder h, CycleResult cycle)
    {
        int passed = 0;
        foreach (var c in cycle.Checks)
        {
            passed += c.Passed ? 1 : 0;
        }

        h.Append("<details class=\"nbc-checks\"><summary>").Append(passed == cycle.Checks.Length ? "All " : "").Append(passed.ToString(CultureInfo.InvariantCulture))
         .Append(passed == cycle.Checks.Length ? "" : " of " + cycle.Checks.Length.ToString(CultureInfo.InvariantCulture)).Append(" checks passed</summary><ul>");
        foreach (var c in cycle.Checks)
        {
            h.Append("<li>").Append(c.Passed ? "passed" : "<b>failed</b>").Append(": ").Enc(c.Name).Append(" — ").Enc(c.Detail).Append("</li>");
        }

        h.Append("</ul></details>");
    }

    private static void Warnings(StringBuilder h, IReadOnlyList<string> warnings)
    {
        if (warnings.Count == 0)
        {
            return;
        }

        h.Append("<ul class=\"nbc-warnings\">");
        foreach (var w in warnings)
        {
            h.Append("<li>Warning: ").Enc(w).Append("</li>");
        }

        h.Append("</ul>");
    }

    internal static string PhaseText(Phase phase) => phase switch
    {
        Phase.IdealGas => "ideal gas",
        Phase.Liquid => "compressed liquid",
        Phase.Vapour => "superheated vapour",
        Phase.TwoPhase => "saturated mixture",
        Phase.Supercritical => "supercritical",
        _ => phase.ToString(),
    };

    private static string Capital(string text) => text.Length == 0 ? text : char.ToUpperInvariant(text[0]) + text[1..];

    internal static void Open(StringBuilder h, string kind) => h.Append("<div class=\"nbc ").Append(kind).Append("\">").Append(Style);

    internal static string Close(StringBuilder h) => h.Append("</div>").ToString();

    private const string Style =
        "<style>" +
        ".nbc{font-family:system-ui,-apple-system,'Segoe UI',sans-serif;font-size:13px;line-height:1.45;max-width:1180px}" +
        ".nbc h3{font-size:1.25em;margin:.3em 0}.nbc h4{font-size:1.05em;margin:1em 0 .3em}" +
        ".nbc-meta{margin:.2em 0 .6em;opacity:.85}.nbc-cite{font-style:italic}" +
        ".nbc-table{border-collapse:collapse;font-variant-numeric:tabular-nums;margin:.3em 0}" +
        ".nbc-table th,.nbc-table td{padding:2px 9px;text-align:right;border-bottom:1px solid rgba(128,128,128,.35);white-space:nowrap}" +
        ".nbc-table thead th{border-bottom:1.5px solid rgba(128,128,128,.7);font-weight:600}" +
        ".nbc-table .nbc-l{text-align:left}.nbc-u{font-weight:400;opacity:.75}.nbc-d{opacity:.8;font-style:italic}" +
        ".nbc-diagrams{display:flex;flex-wrap:wrap;gap:10px;margin:.6em 0}.nbc-diagrams svg{max-width:100%;height:auto}" +
        ".nbc-record{padding-left:1.6em;margin:.2em 0}.nbc-record p{margin:.1em 0}.nbc-steprec{margin-bottom:.5em}" +
        ".nbc-lines{margin:.1em 0;padding-left:1.2em;font-family:ui-monospace,'Cascadia Mono',Consolas,monospace;font-size:.92em}" +
        ".nbc-assume,.nbc-balance{opacity:.85}.nbc-checks{margin:.6em 0}.nbc-checks summary{cursor:pointer}" +
        ".nbc-warnings{margin:.4em 0;padding-left:1.2em}" +
        ".nbc-caution{font-size:.88em;opacity:.7;margin:.8em 0 .2em}" +
        "@media print{.nbc{max-width:none;color:#000}.nbc-checks::details-content{content-visibility:visible;display:block}}" +
        "</style>";
}
