using System.Globalization;
using System.Text.RegularExpressions;
using NotebookCycles.Gases;
using NotebookCycles.Rendering;
using NotebookCycles.Sweeps;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

public sealed class PlotlyChartsTests
{
    private static SweepResult BraytonSweep() =>
        Sweep.Over("pressure ratio", [1, 4, 8], rp => NotebookCycles.Cycles.GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), rp, 1300.Kelvins()));

    [Fact]
    public void The_trace_holds_display_unit_values_and_null_for_a_failed_point()
    {
        var sweep = BraytonSweep();
        double w4 = sweep.Points[1].Figures!.NetWork;
        string si = PlotlyCharts.Sweep(sweep, SweepFigure.NetWork);
        string us = PlotlyCharts.Sweep(sweep, SweepFigure.NetWork, new RenderOptions { Units = DisplayUnits.UsCustomary });
        Assert.Matches("\"y\":\\[null,", si);
        Assert.Contains((w4 / 1000).ToString("R", CultureInfo.InvariantCulture), si, StringComparison.Ordinal);
        Assert.Contains((w4 / 2326).ToString("R", CultureInfo.InvariantCulture), us, StringComparison.Ordinal);
        Assert.Contains("Net work, Btu/lbm", us, StringComparison.Ordinal);
    }

    [Fact]
    public void Each_chart_has_its_own_id_and_draws_only_when_plotly_is_there()
    {
        var sweep = BraytonSweep();
        string a = PlotlyCharts.Sweep(sweep, SweepFigure.ThermalEfficiency), b = PlotlyCharts.Sweep(sweep, SweepFigure.ThermalEfficiency);
        string IdOf(string h) => Regex.Match(h, "<div id=\"(nbc-plot-[0-9a-f]{32})\"").Groups[1].Value;
        Assert.NotEqual(IdOf(a), IdOf(b));
        Assert.Contains("if(!Plotly||!Plotly.newPlot){return;}", a, StringComparison.Ordinal);
        Assert.DoesNotContain(PlotlyScript.Version + "\">", a, StringComparison.Ordinal);
        Assert.Contains("<div class=\"nbc-fallback\" id=\"" + IdOf(a) + "-svg\"><svg ", a, StringComparison.Ordinal);
    }

    [Fact]
    public void User_strings_in_the_chart_are_encoded_or_quoted()
    {
        var sweep = Sweep.Over("r </script><b>", [4.0, 8.0], rp => NotebookCycles.Cycles.GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), rp, 1300.Kelvins()));
        string html = PlotlyCharts.Sweep(sweep, SweepFigure.NetWork);
        Assert.Single(Regex.Matches(html, "</script>"));
        Assert.DoesNotContain("<b>", html, StringComparison.Ordinal);
        Assert.Contains("r \\u003c/script>\\u003cb>", html, StringComparison.Ordinal);
        Assert.Contains("r &lt;/script&gt;&lt;b&gt;", html, StringComparison.Ordinal);
    }
}
