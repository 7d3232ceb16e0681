using Xunit;

namespace NotebookCycles.Rendering.Tests;

public sealed class SweepTextTests
{
    [Fact]
    public void The_text_table_has_a_row_per_point_with_failure_reasons()
    {
        var sweep = TestSweeps.BraytonOverPressureRatio();
        string text = SweepText.Sweep(sweep);
        var lines = text.Split('\n');
        Assert.Contains(lines, l => l.StartsWith("pressure ratio  Thermal efficiency", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.TrimStart().StartsWith("1 ", StringComparison.Ordinal) && l.Contains("failed: " + sweep.Points[0].FailureReason, StringComparison.Ordinal));
        Assert.Contains("7 points, 1 failed", text, StringComparison.Ordinal);
        Assert.DoesNotContain("<", text, StringComparison.Ordinal);
    }

    [Fact]
    public void A_large_sweep_shows_a_subset_in_text_too()
    {
        string text = SweepText.Sweep(TestSweeps.OttoOverManyRatios());
        Assert.Contains("160 more rows not shown", text, StringComparison.Ordinal);
    }

    [Fact]
    public void The_optimum_text_has_its_summary_and_the_cycle()
    {
        var optimum = TestSweeps.BraytonBestNetWork();
        string text = SweepText.Optimum(optimum);
        Assert.Contains("Optimum of pressure ratio", text, StringComparison.Ordinal);
        Assert.Contains("Constraint", text, StringComparison.Ordinal);
        Assert.Contains(CycleText.Cycle(optimum.Cycle), text, StringComparison.Ordinal);
    }
}
