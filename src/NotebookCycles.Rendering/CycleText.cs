using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;

namespace NotebookCycles.Rendering;

/// <summary>Plain-text renderings (aligned columns) of states, steps, records, cycles and comparisons, in the chosen display units.</summary>
public static class CycleText
{
    /// <summary>The cycle as plain text: title, model, states, record, figures, checks, warnings, caution.</summary>
    public static string Cycle(CycleResult cycle, RenderOptions? options = null) => TextReport.Cycle(cycle, options, markdown: false);

    /// <summary>The table of the cycle's states.</summary>
    public static string States(CycleResult cycle, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        return TextReport.StateGrid(cycle.States, cycle, (options ?? RenderOptions.Default).Units).Render(false);
    }

    /// <summary>A table of any states, every state one row.</summary>
    public static string States(IEnumerable<State> states, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(states);
        return TextReport.StateGrid(states.ToList(), null, (options ?? RenderOptions.Default).Units).Render(false);
    }

    /// <summary>One state as a one-row table with its model.</summary>
    public static string State(State state, RenderOptions? options = null) => TextReport.State(state, options, markdown: false);

    /// <summary>One step: process, assumptions, record lines, balances.</summary>
    public static string Step(Step step, RenderOptions? options = null) => TextReport.Step(step, options, markdown: false);

    /// <summary>The calculation record alone.</summary>
    public static string Record(CalculationRecord record, RenderOptions? options = null) => TextReport.Record(record, options, markdown: false);

    /// <summary>Cycles side by side with differences from the first.</summary>
    public static string Comparison(CycleComparison comparison, RenderOptions? options = null) => TextReport.Comparison(comparison, options, markdown: false);
}

/// <summary>Markdown renderings (pipe tables) of states, steps, records, cycles and comparisons, in the chosen display units. Diagrams are in the HTML only.</summary>
public static class CycleMarkdown
{
    /// <summary>The cycle as Markdown.</summary>
    public static string Cycle(CycleResult cycle, RenderOptions? options = null) => TextReport.Cycle(cycle, options, markdown: true);

    /// <summary>One state as Markdown.</summary>
    public static string State(State state, RenderOptions? options = null) => TextReport.State(state, options, markdown: true);

    /// <summary>One step as Markdown.</summary>
    public static string Step(Step step, RenderOptions? options = null) => TextReport.Step(step, options, markdown: true);

    /// <summary>The calculation record as Markdown.</summary>
    public static string Record(CalculationRecord record, RenderOptions? options = null) => TextReport.Record(record, options, markdown: true);

    /// <summary>A comparison as Markdown.</summary>
    public static string Comparison(CycleComparison comparison, RenderOptions? options = null) => TextReport.Comparison(comparison, options, markdown: true);
}

/// <summary>A table of strings rendered as aligned plain text or a Markdown pipe table.</summary>
internal sealed class Grid
{
    private readonly string[] _head;
    private readonly bool[] _left;
    private readonly List<string[]> _rows = [];

    public Grid(string[] head, bool[] left)
    {
        _head = head;
        _left = left;
    }

    public void Add(params string[] row) => _rows.Add(row);

    public string Render(bool markdown)
    {
        var sb = new StringBuilder(1024);
        if (markdown)
        {
            sb.Append("| ").AppendJoin(" | ", _head.Select(Pipe)).AppendLine(" |");
            sb.Append('|');
            for (int c = 0; c < _head.Length; c++)
            {
                sb.Append(_left[c] ? "---|" : "---:|");
            }

            sb.AppendLine();
            foreach (var row in _rows)
            {
                sb.Append("| ").AppendJoin(" | ", row.Select(Pipe)).AppendLine(" |");
            }

            return sb.ToString();
        }

        var width = new int[_head.Length];
        for (int c = 0; c < _head.Length; c++)
        {
            width[c] = _head[c].Length;
            foreach (var row in _rows)
            {
                width[c] = Math.Max(width[c], row[c].Length);
            }
        }

        Line(sb, _head, width);
        for (int c = 0; c < _head.Length; c++)
        {
            sb.Append(c == 0 ? "" : "  ").Append(new string('-', width[c]));
        }

        sb.AppendLine();
        foreach (var row in _rows)
        {
            Line(sb, row, width);
        }

        return sb.ToString();
    }

    private void Line(StringBuilder sb, string[] cells, int[] width)
    {
        var line = new StringBuilder(128);
        for (int c = 0; c < cells.Length; c++)
        {
            line.Append(c == 0 ? "" : "  ");
            line.Append(_left[c] ? cells[c].PadRight(width[c]) : cells[c].PadLeft(width[c]));
        }

        sb.AppendLine(line.ToString().TrimEnd());
    }

    private static string Pipe(string cell) => cell.Replace("|", "\\|", StringComparison.Ordinal);
}

internal static class TextReport
{
    public static string Cycle(CycleResult cycle, RenderOptions? options, bool markdown)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        var u = (options ?? RenderOptions.Default).Units;
        var t = new StringBuilder(8000);
        Heading(t, 1, cycle.Title, markdown);
        t.Append("Property model: ").Append(cycle.Model.Name).Append(". ").AppendLine(cycle.Model.Citation);
        t.Append(char.ToUpperInvariant(StateColumns.SystemText(cycle)[0])).Append(StateColumns.SystemText(cycle)[1..]).Append(". Units: ").Append(UnitText.Describe(u)).AppendLine(".").AppendLine();
        Heading(t, 2, "States", markdown);
        t.Append(StateGrid(cycle.States, cycle, u).Render(markdown)).AppendLine();
        Heading(t, 2, "Calculation record", markdown);
        foreach (var step in cycle.Steps)
        {
            StepBody(t, step, u, cycle, markdown);
        }

        Heading(t, 2, "Figures of merit", markdown);
        var figures = new Grid(["Figure", "Value", "Unit"], [true, false, true]);
        foreach (var f in FigureList.Applicable(cycle))
        {
            figures.Add(f.Name, UnitText.Number(f.Value, f.Quantity, u), UnitText.Unit(f.Quantity, u));
        }

        t.Append(figures.Render(markdown)).AppendLine();
        Heading(t, 2, "Checks", markdown);
        int passed = cycle.Checks.Count(c => c.Passed);
        t.Append(passed == cycle.Checks.Length ? "All " : "").Append(passed.ToString(CultureInfo.InvariantCulture))
         .Append(passed == cycle.Checks.Length ? "" : " of " + cycle.Checks.Length.ToString(CultureInfo.InvariantCulture)).AppendLine(" checks passed:");
        foreach (var c in cycle.Checks)
        {
            t.Append("- ").Append(c.Passed ? "passed" : "FAILED").Append(": ").Append(c.Name).Append(" — ").AppendLine(c.Detail);
        }

        if (cycle.Warnings.Length > 0)
        {
            t.AppendLine();
            Heading(t, 2, "Warnings", markdown);
            foreach (var w in cycle.Warnings)
            {
                t.Append("- ").AppendLine(w);
            }
        }

        t.AppendLine().AppendLine(markdown ? "*" + CycleResult.Caution + "*" : CycleResult.Caution);
        return t.ToString();
    }

    public static string State(State state, RenderOptions? options, bool markdown)
    {
        ArgumentNullException.ThrowIfNull(state);
        var u = (options ?? RenderOptions.Default).Units;
        var t = new StringBuilder(600);
        t.Append(StateGrid([state], null, u).Render(markdown));
        t.Append(state.Model.Name).Append(", ").Append(CycleHtml.PhaseText(state.Phase)).AppendLine(".");
        foreach (var w in state.Warnings)
        {
            t.Append("Warning: ").AppendLine(w);
        }

        return t.ToString();
    }

    public static string Step(Step step, RenderOptions? options, bool markdown)
    {
        ArgumentNullException.ThrowIfNull(step);
        var t = new StringBuilder(1200);
        StepBody(t, step, (options ?? RenderOptions.Default).Units, null, markdown);
        return t.ToString();
    }

    public static string Record(CalculationRecord record, RenderOptions? options, bool markdown)
    {
        ArgumentNullException.ThrowIfNull(record);
        var u = (options ?? RenderOptions.Default).Units;
        var t = new StringBuilder(4000);
        Heading(t, 2, "Calculation record: " + record.Cycle.Title, markdown);
        t.Append(record.Cycle.Model.Name).Append("; ").Append(StateColumns.SystemText(record.Cycle)).AppendLine(".").AppendLine();
        foreach (var step in record.Steps)
        {
            StepBody(t, step, u, record.Cycle, markdown);
        }

        t.AppendLine(markdown ? "*" + CycleResult.Caution + "*" : CycleResult.Caution);
        return t.ToString();
    }

    public static string Comparison(CycleComparison comparison, RenderOptions? options, bool markdown)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        var u = (options ?? RenderOptions.Default).Units;
        var cycles = comparison.Cycles;
        var names = comparison.Names;
        var head = new List<string> { "Figure", "Unit" };
        var left = new List<bool> { true, true };
        for (int c = 0; c < cycles.Length; c++)
        {
            head.Add(c == 0 ? names[c] + " (baseline)" : names[c]);
            left.Add(false);
            if (c > 0)
            {
                head.Add("Δ");
                left.Add(false);
            }
        }

        var grid = new Grid([.. head], [.. left]);
        var all = cycles.Select(FigureList.All).ToArray();
        for (int i = 0; i < all[0].Length; i++)
        {
            if (all.All(f => double.IsNaN(f[i].Value)))
            {
                continue;
            }

            var row = new List<string> { all[0][i].Name, UnitText.Unit(all[0][i].Quantity, u) };
            for (int c = 0; c < cycles.Length; c++)
            {
                row.Add(UnitText.Number(all[c][i].Value, all[c][i].Quantity, u));
                if (c > 0)
                {
                    row.Add(CycleHtml.Delta(all[0][i], all[c][i], u));
                }
            }

            grid.Add([.. row]);
        }

        var t = new StringBuilder(2000);
        Heading(t, 2, comparison.Title + ": " + cycles.Length.ToString(CultureInfo.InvariantCulture) + " cycles", markdown);
        t.Append(grid.Render(markdown)).AppendLine();
        t.Append("Units: ").Append(UnitText.Describe(u)).AppendLine(".");
        t.AppendLine(markdown ? "*" + CycleResult.Caution + "*" : CycleResult.Caution);
        return t.ToString();
    }

    public static Grid StateGrid(IReadOnlyList<State> states, CycleResult? cycle, DisplayUnits u)
    {
        bool quality = StateColumns.HasQuality(states);
        bool mass = StateColumns.HasMassFractions(cycle);
        var head = new List<string>
        {
            "State",
            "T (" + UnitText.Unit(DisplayQuantity.Temperature, u) + ")",
            "p (" + UnitText.Unit(DisplayQuantity.Pressure, u) + ")",
            "v (" + UnitText.Unit(DisplayQuantity.SpecificVolume, u) + ")",
            "u (" + UnitText.Unit(DisplayQuantity.SpecificEnergy, u) + ")",
            "h (" + UnitText.Unit(DisplayQuantity.SpecificEnergy, u) + ")",
            "s (" + UnitText.Unit(DisplayQuantity.SpecificEntropy, u) + ")",
        };
        if (quality)
        {
            head.Add("x");
        }

        if (mass)
        {
            head.Add("m/m1");
        }

        var left = new bool[head.Count];
        left[0] = true;
        var grid = new Grid([.. head], left);
        for (int i = 0; i < states.Count; i++)
        {
            var p = states[i].Point;
            var row = new List<string>
            {
                states[i].Label,
                UnitText.Number(p.T, DisplayQuantity.Temperature, u),
                UnitText.Number(p.P, DisplayQuantity.Pressure, u),
                UnitText.Number(p.V, DisplayQuantity.SpecificVolume, u),
                UnitText.Number(p.U, DisplayQuantity.SpecificEnergy, u),
                UnitText.Number(p.H, DisplayQuantity.SpecificEnergy, u),
                UnitText.Number(p.S, DisplayQuantity.SpecificEntropy, u),
            };
            if (quality)
            {
                row.Add(double.IsNaN(p.X) ? "—" : UnitText.Fixed(p.X, 4));
            }

            if (mass)
            {
                row.Add(UnitText.Significant(cycle!.StateMassFractions[i], 4));
            }

            grid.Add([.. row]);
        }

        return grid;
    }

    private static void StepBody(StringBuilder t, Step step, DisplayUnits u, CycleResult? cycle, bool markdown)
    {
        string head = "Step " + step.Index.ToString(CultureInfo.InvariantCulture) + ", " + step.Name + ": " + step.Process;
        if (markdown)
        {
            t.Append("### ").AppendLine(head).AppendLine();
        }
        else
        {
            t.AppendLine(head);
        }

        if (step.Assumptions.Length > 0)
        {
            t.Append(markdown ? "" : "  ").Append("Assumptions: ").Append(string.Join("; ", step.Assumptions)).AppendLine(".");
            if (markdown)
            {
                t.AppendLine();
            }
        }

        foreach (var line in step.Lines)
        {
            t.Append(markdown ? "- " : "  ").AppendLine(UnitText.Line(line, u));
        }

        t.Append(markdown ? "- " : "  ").AppendLine(CycleHtml.Balance(step, u, cycle));
        foreach (var w in step.Warnings)
        {
            t.Append(markdown ? "- **Warning:** " : "  Warning: ").AppendLine(w);
        }

        t.AppendLine();
    }

    internal static void Heading(StringBuilder t, int level, string text, bool markdown)
    {
        if (markdown)
        {
            t.Append(new string('#', level)).Append(' ').AppendLine(text).AppendLine();
        }
        else
        {
            t.AppendLine(text).AppendLine(new string(level == 1 ? '=' : '-', Math.Min(text.Length, 100)));
        }
    }
}
