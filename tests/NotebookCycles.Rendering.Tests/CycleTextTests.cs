using NotebookCycles.Cycles;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

public sealed class CycleTextTests
{
    [Fact]
    public void Plain_text_report_has_every_state_step_figure_and_the_caution()
    {
        var cycle = TestCycles.RegenerativeBrayton();
        string text = CycleText.Cycle(cycle);
        var lines = text.Split('\n');
        foreach (var s in cycle.States)
        {
            Assert.Contains(lines, l => l.StartsWith(s.Label + " ", StringComparison.Ordinal));
        }

        foreach (var step in cycle.Steps)
        {
            Assert.Contains($"Step {step.Index}, {step.Name}: {step.Process}", text, StringComparison.Ordinal);
        }

        Assert.Contains("Thermal efficiency", text, StringComparison.Ordinal);
        Assert.Contains(CycleResult.Caution, text, StringComparison.Ordinal);
        Assert.DoesNotContain("<", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Markdown_report_uses_pipe_tables_in_the_chosen_units()
    {
        var cycle = TestCycles.Otto();
        string md = CycleMarkdown.Cycle(cycle, new RenderOptions { Units = DisplayUnits.UsCustomary });
        Assert.StartsWith("# Otto cycle", md, StringComparison.Ordinal);
        Assert.Contains("| State | T (°F) | p (psia) | v (ft³/lbm) | u (Btu/lbm) | h (Btu/lbm) | s (Btu/(lbm·R)) |", md, StringComparison.Ordinal);
        Assert.Contains("| 1 | 80.33 | 14.504 |", md, StringComparison.Ordinal);
        Assert.Contains("*" + CycleResult.Caution + "*", md, StringComparison.Ordinal);
    }

    [Fact]
    public void Comparison_text_lists_each_cycle_and_the_differences()
    {
        var a = TestCycles.Otto();
        var b = TestCycles.Diesel();
        string text = CycleText.Comparison(CycleComparison.Of(a, b));
        Assert.Contains("Otto cycle (baseline)", text, StringComparison.Ordinal);
        Assert.Contains("Diesel cycle", text, StringComparison.Ordinal);
        Assert.Contains("Δ", text, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => CycleComparison.Of());
    }

    [Fact]
    public void State_and_step_text()
    {
        var cycle = TestCycles.Otto();
        Assert.Contains("Cold-air-standard", CycleText.State(cycle["2"]), StringComparison.Ordinal);
        string step = CycleText.Step(cycle.Steps[0]);
        Assert.Contains("Step 1, 1→2", step, StringComparison.Ordinal);
        Assert.Contains("q = 0 kJ/kg", step, StringComparison.Ordinal);
    }
}
