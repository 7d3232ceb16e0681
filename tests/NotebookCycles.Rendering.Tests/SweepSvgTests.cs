using System.Text.RegularExpressions;
using NotebookCycles.Sweeps;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

public sealed class SweepSvgTests
{
    [Fact]
    public void A_one_parameter_chart_has_one_curve_broken_at_the_failed_point()
    {
        var sweep = TestSweeps.BraytonOverPressureRatio();
        string svg = SweepSvg.Chart(sweep, SweepFigure.ThermalEfficiency);
        var curves = Regex.Matches(svg, "<path class=\"nbc-curve[^\"]*\" data-figure=\"ThermalEfficiency\" d=\"([^\"]*)\"");
        Assert.Single(curves);
        string d = curves[0].Groups[1].Value;
        // Seven points, the first failed: the path starts at the second and has five more vertices.
        Assert.Single(Regex.Matches(d, "M"));
        Assert.Equal(sweep.Points.Length - 2, Regex.Matches(d, "L").Count);
        Assert.Equal(sweep.Points.Length - 1, Regex.Matches(svg, "<circle ").Count);
        Assert.Contains("1 of 7 points failed", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("nbc-legend", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void A_two_parameter_chart_has_one_curve_per_second_value_and_a_legend()
    {
        var sweep = TestSweeps.BraytonOverRatioAndTemperature();
        string svg = SweepSvg.Chart(sweep, SweepFigure.NetWork);
        foreach (var t in new[] { "1100", "1300", "1500" })
        {
            var curve = Regex.Match(svg, $"<path class=\"nbc-curve[^\"]*\" data-figure=\"NetWork\" data-second=\"{t}\" d=\"([^\"]*)\"");
            Assert.True(curve.Success, "no curve for " + t);
            Assert.Equal(9, Regex.Matches(curve.Groups[1].Value, "L").Count);
            Assert.Contains($"<title>turbine inlet temperature, K = {t}</title>", svg, StringComparison.Ordinal);
            Assert.Contains($">{t}</text>", svg, StringComparison.Ordinal);
        }

        Assert.Equal(3, Regex.Matches(svg, "data-figure=\"NetWork\"").Count);
        Assert.Contains("class=\"nbc-legend\"", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void A_large_sweep_chart_uses_every_point()
    {
        var sweep = TestSweeps.OttoOverManyRatios();
        string svg = SweepSvg.Chart(sweep, SweepFigure.MeanEffectivePressure);
        string d = Regex.Match(svg, "data-figure=\"MeanEffectivePressure\" d=\"([^\"]*)\"").Groups[1].Value;
        Assert.Equal(199, Regex.Matches(d, "L").Count);
        Assert.DoesNotContain("<circle ", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void The_axis_carries_the_display_unit()
    {
        var sweep = TestSweeps.BraytonOverPressureRatio();
        Assert.Contains(">Peak temperature, K</text>", SweepSvg.Chart(sweep, SweepFigure.PeakTemperature), StringComparison.Ordinal);
        Assert.Contains(">Peak temperature, °C</text>", SweepSvg.Chart(sweep, SweepFigure.PeakTemperature, new RenderOptions { Units = DisplayUnits.SiCelsiusBar }), StringComparison.Ordinal);
        Assert.Contains(">Net work, Btu/lbm</text>", SweepSvg.Chart(sweep, SweepFigure.NetWork, new RenderOptions { Units = DisplayUnits.UsCustomary }), StringComparison.Ordinal);
    }

    [Fact]
    public void Chart_values_are_converted_to_display_units()
    {
        // The same curve in K and in °C differs only by the tick labels: the y range shifts by 273.15.
        var sweep = TestSweeps.BraytonOverPressureRatio();
        string k = SweepSvg.Chart(sweep, SweepFigure.PeakTemperature);
        string c = SweepSvg.Chart(sweep, SweepFigure.PeakTemperature, new RenderOptions { Units = DisplayUnits.SiCelsiusBar });
        string PathOf(string svg) => Regex.Match(svg, "data-figure=\"PeakTemperature\" d=\"([^\"]*)\"").Groups[1].Value;
        Assert.Equal(PathOf(k), PathOf(c));
        Assert.NotEqual(k, c);
    }

    [Fact]
    public void User_strings_are_encoded()
    {
        var sweep = TestSweeps.BraytonOverPressureRatio("ratio <p2/p1> & \"x\"");
        string svg = SweepSvg.Chart(sweep, SweepFigure.ThermalEfficiency);
        Assert.Contains("ratio &lt;p2/p1&gt; &amp; &quot;x&quot;", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("<p2/p1>", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void The_scan_chart_marks_the_optimum_and_picks_the_objective_figure()
    {
        var optimum = TestSweeps.BraytonBestNetWork();
        Assert.Equal(SweepFigure.NetWork, SweepSvg.ObjectiveFigure(optimum));
        string svg = SweepSvg.Scan(optimum);
        Assert.Contains("data-figure=\"NetWork\"", svg, StringComparison.Ordinal);
        Assert.Single(Regex.Matches(svg, "<g class=\"nbc-optimum\""));
        Assert.Contains(">optimum " + optimum.Value.ToString("G6", System.Globalization.CultureInfo.InvariantCulture) + "</text>", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void Default_figures_follow_what_applies()
    {
        Assert.Equal([SweepFigure.ThermalEfficiency, SweepFigure.NetWork], SweepSvg.DefaultFigures(TestSweeps.BraytonOverPressureRatio()));
        Assert.True(SweepSvg.Applies(TestSweeps.OttoOverManyRatios(), SweepFigure.MeanEffectivePressure));
        Assert.False(SweepSvg.Applies(TestSweeps.BraytonOverPressureRatio(), SweepFigure.MeanEffectivePressure));
    }

    [Fact]
    public void The_chart_is_deterministic() =>
        Assert.Equal(SweepSvg.Chart(TestSweeps.BraytonOverRatioAndTemperature(), SweepFigure.ThermalEfficiency), SweepSvg.Chart(TestSweeps.BraytonOverRatioAndTemperature(), SweepFigure.ThermalEfficiency));

    [Fact]
    public void Curves_follow_the_grid_even_with_a_repeated_second_value()
    {
        var sweep = Sweep.Over("pressure ratio", [4.0, 8.0, 12.0], "turbine inlet temperature, K", [1300.0, 1300.0], TestSweeps.Brayton);
        var curves = SweepSvg.Curves(sweep, SweepFigure.NetWork, DisplayUnits.Si);
        Assert.Equal(2, curves.Count);
        Assert.All(curves, c => Assert.Equal([4.0, 8.0, 12.0], c.X));
        Assert.Equal(sweep.Points[2].Figures!.NetWork / 1000, curves[0].Y[1], 12);
        Assert.True(double.IsNaN(SweepSvg.Curves(TestSweeps.BraytonOverPressureRatio(), SweepFigure.NetWork, DisplayUnits.Si)[0].Y[0]));
    }
}
