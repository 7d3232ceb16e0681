using System.Text.RegularExpressions;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

/// <summary>Sweeps, optima and comparisons displayed in a real C# kernel with the extension loaded.</summary>
[Collection(FormatterRegistry.Name)]
public sealed class SweepDisplayTests
{
    private const string BraytonSweep =
        "var sweep = Sweep.Over(\"pressure ratio\", ParameterRange.Linear(1, 20, 11), rp => GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), rp, 1300.Kelvins()));";

    private const string PlotlyBanner = "plotly.js v" + PlotlyScript.Version;

    [Fact]
    public async Task Two_displayed_sweep_charts_carry_plotly_once_and_each_its_SVG_fallback()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        await session.SubmitAsync(BraytonSweep);
        var result = await session.SubmitAsync("display(sweep);\ndisplay(sweep);");
        var html = Displayed(result.Events);
        Assert.Equal(2, html.Count);
        Assert.Single(Regex.Matches(string.Concat(html), Regex.Escape(PlotlyBanner)));
        Assert.Contains(PlotlyBanner, html[0], StringComparison.Ordinal);
        Assert.Single(Regex.Matches(html[0], "<script data-nbc-plotly=\"2.35.3\">"));
        foreach (var h in html)
        {
            // Two figures by default (efficiency and net work): two interactive charts, each with its SVG beside it.
            Assert.Equal(2, Regex.Matches(h, "Plotly.newPlot\\('nbc-plot-").Count);
            Assert.Equal(2, Regex.Matches(h, "<div class=\"nbc-fallback\" id=\"nbc-plot-[0-9a-f]{32}-svg\"><svg ").Count);
            Assert.Contains("<tr data-point=\"0\" class=\"nbc-failed\">", h, StringComparison.Ordinal);
            Assert.DoesNotContain("<script src", h, StringComparison.Ordinal);
        }

        // A later submission in the same session references window.Plotly only; a new session gets the script again.
        string third = await session.HtmlOfAsync("sweep");
        Assert.DoesNotContain(PlotlyBanner, third, StringComparison.Ordinal);
        Assert.Contains("window.Plotly", third, StringComparison.Ordinal);
        using var other = new KernelSession();
        await other.LoadExtensionAsync();
        await other.SubmitAsync(BraytonSweep);
        Assert.Contains(PlotlyBanner, await other.HtmlOfAsync("sweep"), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_plotly_script_hides_the_page_AMD_loader_while_it_runs()
    {
        string script = PlotlyScript.Element;
        int hide = script.IndexOf("w.define=undefined;w.require=undefined;", StringComparison.Ordinal);
        int body = script.IndexOf(PlotlyBanner, StringComparison.Ordinal);
        int restore = script.IndexOf("w.define=s.define;w.require=s.require;", StringComparison.Ordinal);
        Assert.True(hide >= 0 && body > hide && restore > body, "define/require must be hidden before plotly.js runs and restored after");
        Assert.Single(Regex.Matches(script, "</script>"));
        Assert.True(script.Length > 3_000_000, $"the embedded plotly.js is only {script.Length} characters");
        await Task.CompletedTask;
    }

    [Fact]
    public async Task A_sweep_has_a_plain_text_table_too()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        await session.SubmitAsync(BraytonSweep);
        string text = (await session.SubmitAsync("using Microsoft.DotNet.Interactive.Formatting;\nsweep.ToDisplayString(\"text/plain\")")).Events.OfType<ReturnValueProduced>().Single().Value!.ToString()!;
        Assert.Contains("11 points, 1 failed", text, StringComparison.Ordinal);
        Assert.Contains("failed: ", text, StringComparison.Ordinal);
        Assert.DoesNotContain("<script", text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task An_optimum_shows_its_interactive_scan_its_summary_and_the_cycle_report()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        string html = await session.HtmlOfAsync("Optimum.MaximumNetWork(\"pressure ratio\", 2, 30, rp => GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), rp, 1300.Kelvins()), relativeTolerance: 1e-6)");
        Assert.Contains("<h3 class=\"nbc-title\">Optimum of pressure ratio</h3>", html, StringComparison.Ordinal);
        Assert.Single(Regex.Matches(html, "Plotly.newPlot\\('nbc-plot-"));
        Assert.Single(Regex.Matches(html, "<g class=\"nbc-optimum\""));
        Assert.Contains("<h3 class=\"nbc-title\">Brayton cycle</h3>", html, StringComparison.Ordinal);
        Assert.Contains(PlotlyBanner, html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_comparison_shows_the_overlaid_T_s_diagram()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        await session.SubmitAsync("var a = GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, 1300.Kelvins());\nvar b = GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 12, 1300.Kelvins());");
        string html = await session.HtmlOfAsync("CycleComparison.Of(\"Ratio 8 or 12\", (\"r = 8\", a), (\"r = 12\", b))");
        Assert.Contains("nbc-ts nbc-overlay", html, StringComparison.Ordinal);
        Assert.Equal(4, Regex.Matches(html, "data-variant=\"r = 8\"").Count);
        Assert.Equal(4, Regex.Matches(html, "data-variant=\"r = 12\"").Count);
    }

    private static List<string> Displayed(IEnumerable<KernelEvent> events) =>
        events.OfType<DisplayedValueProduced>().SelectMany(e => e.FormattedValues).Where(f => f.MimeType == HtmlFormatter.MimeType).Select(f => f.Value).ToList();
}
