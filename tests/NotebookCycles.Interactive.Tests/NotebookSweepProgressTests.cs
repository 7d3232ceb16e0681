using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

/// <summary>Sweep progress in a real C# kernel: shown only for sweeps that run past the delay, updated in place.</summary>
[Collection(FormatterRegistry.Name)]
public sealed class NotebookSweepProgressTests
{
    private const string Build = "r => { System.Threading.Thread.Sleep(SLEEP); return GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), r, 1300.Kelvins()); }";

    [Fact]
    public async Task A_sweep_past_the_delay_shows_progress_and_updates_it_to_done()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        var result = await session.SubmitAsync("NotebookSweep.Over(\"pressure ratio\", ParameterRange.Linear(2, 16, 8), " + Build.Replace("SLEEP", "200", StringComparison.Ordinal) + ").Points.Length");
        var shown = result.Events.OfType<DisplayedValueProduced>().Where(e => Html(e).Contains("nbc-progress", StringComparison.Ordinal)).ToList();
        var progress = Assert.Single(shown);
        var updates = result.Events.OfType<DisplayedValueUpdated>().Where(e => e.ValueId == progress.ValueId).ToList();
        Assert.NotEmpty(updates);
        Assert.Contains("8 of 8 points", Html(updates[^1]), StringComparison.Ordinal);
        Assert.Contains(", done", Html(updates[^1]), StringComparison.Ordinal);
        Assert.Equal(8, (int)result.Events.OfType<ReturnValueProduced>().Single().Value!);
    }

    [Fact]
    public async Task A_quick_sweep_shows_no_progress()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        var result = await session.SubmitAsync("NotebookSweep.Over(\"pressure ratio\", ParameterRange.Linear(2, 16, 8), " + Build.Replace("SLEEP", "0", StringComparison.Ordinal) + ").Points.Length");
        Assert.DoesNotContain(result.Events.OfType<DisplayedValueProduced>(), e => Html(e).Contains("nbc-progress", StringComparison.Ordinal));
    }

    [Fact]
    public async Task The_progress_helper_takes_a_delay_and_is_silent_outside_a_notebook()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        var result = await session.SubmitAsync(
            "var p = new NotebookSweepProgress(\"quick <sweep>\", TimeSpan.Zero);\n" +
            "Sweep.Over(\"r\", ParameterRange.Linear(2, 16, 4), " + Build.Replace("SLEEP", "0", StringComparison.Ordinal) + ", new SweepOptions { Progress = p });\np.Dispose();\np.Shown");
        Assert.True((bool)result.Events.OfType<ReturnValueProduced>().Single().Value!);
        Assert.Contains(result.Events.OfType<DisplayedValueProduced>(), e => Html(e).Contains("quick &lt;sweep&gt;: ", StringComparison.Ordinal));

        var outside = new NotebookSweepProgress("outside", TimeSpan.Zero);
        outside.Report(new NotebookCycles.Sweeps.SweepProgress(1, 1));
        outside.Dispose();
        Assert.False(outside.Shown);
    }

    private static string Html(DisplayEvent e) => e.FormattedValues.FirstOrDefault(f => f.MimeType == HtmlFormatter.MimeType)?.Value ?? "";
}
