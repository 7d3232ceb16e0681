using System.Text.RegularExpressions;
using NotebookCycles.Sweeps;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

public sealed class SweepHtmlTests
{
    [Fact]
    public void Every_point_is_a_row_and_a_failed_point_gives_its_reason()
    {
        var sweep = TestSweeps.BraytonOverPressureRatio();
        string html = SweepHtml.Sweep(sweep);
        Assert.Equal(sweep.Points.Length, Regex.Matches(html, "<tr data-point=").Count);
        var failed = Assert.Single(sweep.Failed);
        var row = Regex.Match(html, "<tr data-point=\"0\" class=\"nbc-failed\"><td>1</td><td class=\"nbc-reason\" colspan=\"(\\d+)\">Failed: ([^<]*)</td></tr>");
        Assert.True(row.Success, "the failed row is missing");
        Assert.Equal(HtmlText.Encode(failed.FailureReason), row.Groups[2].Value);
        Assert.Contains("1 failed (their rows give the reason)", html, StringComparison.Ordinal);
        Assert.Equal(2, Regex.Matches(html, "<svg ").Count);
    }

    [Fact]
    public void The_columns_are_the_figures_that_apply()
    {
        string brayton = SweepHtml.Table(TestSweeps.BraytonOverPressureRatio());
        Assert.Contains("<th>Back-work ratio</th>", brayton, StringComparison.Ordinal);
        Assert.DoesNotContain("Mean effective pressure", brayton, StringComparison.Ordinal);
        string otto = SweepHtml.Table(TestSweeps.OttoOverManyRatios());
        Assert.Contains("<th>Mean effective pressure <span class=\"nbc-u\">kPa</span></th>", otto, StringComparison.Ordinal);
        foreach (var head in new[] { "<th>Thermal efficiency</th>", "<th>Net work <span class=\"nbc-u\">kJ/kg</span></th>", "<th>Peak temperature <span class=\"nbc-u\">K</span></th>", "<th>Peak pressure <span class=\"nbc-u\">kPa</span></th>" })
        {
            Assert.Contains(head, otto, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Numbers_follow_the_display_units()
    {
        var sweep = TestSweeps.BraytonOverPressureRatio();
        var second = sweep.Points[1].Figures!;
        string si = SweepHtml.Table(sweep);
        string cbar = SweepHtml.Table(sweep, new RenderOptions { Units = DisplayUnits.SiCelsiusBar });
        Assert.Contains("<td>" + UnitText.Number(second.MaximumTemperature, DisplayQuantity.Temperature, DisplayUnits.Si) + "</td>", si, StringComparison.Ordinal);
        // 1300 K turbine inlet is the peak: 1026.85 °C; 200 kPa peak pressure is 2.0000 bar.
        Assert.Contains("<td>1026.85</td><td>2.0000</td>", cbar, StringComparison.Ordinal);
        Assert.Contains("<th>Peak pressure <span class=\"nbc-u\">bar</span></th>", cbar, StringComparison.Ordinal);
    }

    [Fact]
    public void A_large_sweep_shows_its_first_and_last_rows_with_a_note()
    {
        var sweep = TestSweeps.OttoOverManyRatios();
        string html = SweepHtml.Sweep(sweep);
        var rows = Regex.Matches(html, "<tr data-point=\"(\\d+)\"").Select(m => int.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture)).ToList();
        Assert.Equal(40, rows.Count);
        Assert.Equal([.. Enumerable.Range(0, 20), .. Enumerable.Range(180, 20)], rows);
        Assert.Contains("… 160 more rows not shown; the charts use every point", html, StringComparison.Ordinal);
        Assert.Equal(10, Regex.Matches(SweepHtml.Table(sweep, new RenderOptions { TableRows = 10 }), "<tr data-point=").Count);
        Assert.Throws<ArgumentOutOfRangeException>(() => SweepHtml.Table(sweep, new RenderOptions { TableRows = 2 }));
    }

    [Fact]
    public void A_two_parameter_table_has_both_parameters()
    {
        var sweep = TestSweeps.BraytonOverRatioAndTemperature();
        string html = SweepHtml.Table(sweep);
        Assert.Contains("<th>pressure ratio</th><th>turbine inlet temperature, K</th>", html, StringComparison.Ordinal);
        Assert.Contains("<tr data-point=\"1\"><td>2</td><td>1300</td>", html, StringComparison.Ordinal);
        Assert.Equal(30, Regex.Matches(html, "<tr data-point=").Count);
    }

    [Fact]
    public void User_strings_are_encoded()
    {
        var sweep = Sweep.Over("r <b>", [2.0, 4.0], r => TestSweeps.Brayton(r, 1300), title: "Sweep <script>alert(1)</script>");
        string html = SweepHtml.Sweep(sweep);
        Assert.DoesNotContain("<script>", html, StringComparison.Ordinal);
        Assert.DoesNotContain("<b>", html, StringComparison.Ordinal);
        Assert.Contains("Sweep &lt;script&gt;alert(1)&lt;/script&gt;", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_optimum_shows_value_tolerance_objective_constraint_scan_and_the_cycle()
    {
        var optimum = TestSweeps.BraytonBestNetWork();
        string html = SweepHtml.Optimum(optimum);
        Assert.Contains("<h3 class=\"nbc-title\">Optimum of pressure ratio</h3>", html, StringComparison.Ordinal);
        Assert.Contains("<tr><th class=\"nbc-l\">pressure ratio</th><td class=\"nbc-l\">" + optimum.Value.ToString("G6", System.Globalization.CultureInfo.InvariantCulture) + " ± ", html, StringComparison.Ordinal);
        Assert.Contains("Net work = " + UnitText.WithUnit(optimum.Objective, DisplayQuantity.SpecificEnergy, DisplayUnits.Si), html, StringComparison.Ordinal);
        Assert.Contains("<td class=\"nbc-l\">not active", html, StringComparison.Ordinal);
        Assert.Single(Regex.Matches(html, "<g class=\"nbc-optimum\""));
        Assert.Contains(CycleHtml.Cycle(optimum.Cycle), html, StringComparison.Ordinal);
        Assert.DoesNotContain("<g class=\"nbc-optimum\"", SweepHtml.Optimum(optimum, scanChart: false), StringComparison.Ordinal);
    }

    [Fact]
    public void An_active_constraint_is_reported()
    {
        // Peak pressure at most 1000 kPa cuts the free net-work optimum (near ratio 13 for 1300 K over 300 K, from the
        // ideal-gas relation r = (T3/T1)^(k/(2(k−1)))) at ratio 10.
        var optimum = Optimum.MaximumNetWork("pressure ratio", 2, 30, rp => TestSweeps.Brayton(rp, 1300), CycleConstraint.Maximum("peak pressure", c => c.Figures.MaximumPressure, 1.0e6), 1e-6);
        Assert.True(optimum.ConstraintActive);
        Assert.Contains("active: the optimum lies on the constraint", SweepHtml.Optimum(optimum), StringComparison.Ordinal);
    }
}
