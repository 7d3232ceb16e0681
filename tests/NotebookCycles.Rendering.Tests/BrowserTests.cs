using System.Text.RegularExpressions;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

/// <summary>The rendered report opened in a real headless browser, offline: it lays out, the SVG draws, and a screenshot is kept.</summary>
public sealed class BrowserTests
{
    /// <summary>Where the screenshots go (kept as test artifacts in the test output folder).</summary>
    public static string ArtifactFolder => Path.Combine(AppContext.BaseDirectory, "browser-artifacts");

    [ChromiumFact]
    public void Report_draws_in_a_headless_browser_in_light_and_dark_themes()
    {
        Directory.CreateDirectory(ArtifactFolder);
        var cycle = TestCycles.Otto();
        string report = CycleHtml.Cycle(cycle);
        string light = Page(Path.Combine(ArtifactFolder, "otto-light.html"), report, dark: false);
        string dark = Page(Path.Combine(ArtifactFolder, "saturation-dark.html"), CycleHtml.Cycle(TestCycles.OnSaturationModel(), new RenderOptions { Units = DisplayUnits.SiCelsiusBar }), dark: true);

        string dom = Browser.Run(new Uri(light).AbsoluteUri, "--dump-dom");
        Assert.Equal(2, Regex.Matches(dom, "<svg ").Count);
        Assert.Equal(2 * cycle.Steps.Length, Regex.Matches(dom, "<path class=\"nbc-step ").Count);
        Assert.Equal(cycle.States.Length, Regex.Matches(dom, "<tr data-state=").Count);
        Assert.Contains("Calculation record", dom, StringComparison.Ordinal);

        foreach (var (page, png, flags) in new[] { (light, "otto-light.png", Array.Empty<string>()), (dark, "saturation-dark.png", ["--force-dark-mode"]) })
        {
            string shot = Path.Combine(ArtifactFolder, png);
            File.Delete(shot);
            Browser.Run(new Uri(page).AbsoluteUri, [.. flags, "--window-size=1200,1500", "--hide-scrollbars", "--screenshot=" + shot]);
            var bytes = File.ReadAllBytes(shot);
            Assert.True(bytes.Length > 30_000, $"the screenshot {shot} is {bytes.Length} bytes: nearly empty");
            Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);
        }
    }

    [ChromiumFact]
    public void A_sweep_chart_draws_offline_in_a_headless_browser()
    {
        Directory.CreateDirectory(ArtifactFolder);
        var sweep = TestSweeps.BraytonOverRatioAndTemperature();
        var comparison = TestSweeps.BraytonVariants();
        string fragment = SweepHtml.Sweep(sweep, null, [SweepFigure.NetWork, SweepFigure.ThermalEfficiency]) + CycleHtml.Comparison(comparison);
        string page = Page(Path.Combine(ArtifactFolder, "sweep-light.html"), fragment, dark: false);

        string dom = Browser.Run(new Uri(page).AbsoluteUri, "--dump-dom");
        Assert.Equal(3, Regex.Matches(dom, "<svg ").Count);
        Assert.Equal(3, Regex.Matches(dom, "data-figure=\"NetWork\"").Count);
        Assert.Equal(sweep.Points.Length, Regex.Matches(dom, "<tr data-point=").Count);
        Assert.Equal(comparison.Cycles.Sum(c => c.Steps.Length), Regex.Matches(dom, "data-variant=").Count);

        string shot = Path.Combine(ArtifactFolder, "sweep-light.png");
        File.Delete(shot);
        Browser.Run(new Uri(page).AbsoluteUri, "--window-size=1200,1500", "--hide-scrollbars", "--screenshot=" + shot);
        var bytes = File.ReadAllBytes(shot);
        Assert.True(bytes.Length > 30_000, $"the screenshot {shot} is {bytes.Length} bytes: nearly empty");
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);
    }

    [Theory]
    [InlineData(null, null, true)]
    [InlineData(null, "false", true)]
    [InlineData(null, "true", false)]
    [InlineData("/usr/bin/chromium", null, false)]
    [InlineData("/usr/bin/chromium", "true", false)]
    public void The_browser_test_is_skipped_only_without_a_browser_outside_CI(string? browser, string? ci, bool skipped) =>
        Assert.Equal(skipped, ChromiumFactAttribute.SkipReason(browser, ci) is not null);

    private static string Page(string path, string fragment, bool dark)
    {
        string body = dark ? "<body style=\"background:#1e1e1e;color:#d4d4d4;color-scheme:dark\">" : "<body style=\"background:#fff;color:#111\">";
        File.WriteAllText(path, "<!doctype html><html><head><meta charset=\"utf-8\"><title>NotebookCycles report</title></head>" + body + fragment + "</body></html>");
        return path;
    }
}
