using System.Globalization;
using System.Text.RegularExpressions;
using NotebookCycles.Cycles;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

public sealed class CycleSvgTests
{
    [Fact]
    public void An_isentrope_is_vertical_on_T_s_and_constant_volume_heating_is_a_curve()
    {
        var cycle = TestCycles.Otto();
        string svg = CycleSvg.TemperatureEntropy(cycle);
        var compression = Points(svg, "1→2");
        Assert.True(compression.Count > 10);
        Assert.All(compression, p => Assert.Equal(compression[0].X, p.X, 0.11));
        Assert.True(Math.Abs(compression[0].Y - compression[^1].Y) > 20);

        var heating = Points(svg, "2→3");
        var (a, b, mid) = (heating[0], heating[^1], heating[heating.Count / 2]);
        double offLine = Math.Abs((b.X - a.X) * (mid.Y - a.Y) - (b.Y - a.Y) * (mid.X - a.X)) / Math.Sqrt(Math.Pow(b.X - a.X, 2) + Math.Pow(b.Y - a.Y, 2));
        Assert.True(offLine > 3, $"the constant-volume heating is drawn {offLine} px off the chord; it should curve");
    }

    [Fact]
    public void Irreversible_steps_are_dashed_straight_lines()
    {
        var cycle = TestCycles.RegenerativeBrayton();
        string svg = CycleSvg.TemperatureEntropy(cycle);
        var compressor = cycle.Steps[0];
        Assert.Equal(PathLaw.Undefined, compressor.Law);
        Assert.Contains($"class=\"nbc-step nbc-c0 nbc-dashed\" data-step=\"{compressor.Name}\"", svg, StringComparison.Ordinal);
        Assert.Equal(2, Points(svg, compressor.Name).Count);
    }

    [Theory]
    [InlineData(DisplayUnits.Si, "T, K", "s, kJ/(kg·K)", "p, kPa (log)", "v, m³/kg (log)")]
    [InlineData(DisplayUnits.SiCelsiusBar, "T, °C", "s, kJ/(kg·K)", "p, bar (log)", "v, m³/kg (log)")]
    [InlineData(DisplayUnits.UsCustomary, "T, °F", "s, Btu/(lbm·R)", "p, psia (log)", "v, ft³/lbm (log)")]
    public void Axes_are_labelled_in_the_display_units_with_log_p_and_log_v(DisplayUnits units, string t, string s, string p, string v)
    {
        var cycle = TestCycles.Otto();
        var options = new RenderOptions { Units = units };
        string ts = CycleSvg.TemperatureEntropy(cycle, options), pv = CycleSvg.PressureVolume(cycle, options);
        Assert.Contains(">" + t + "</text>", ts, StringComparison.Ordinal);
        Assert.Contains(">" + s + "</text>", ts, StringComparison.Ordinal);
        Assert.Contains(">" + p + "</text>", pv, StringComparison.Ordinal);
        Assert.Contains(">" + v + "</text>", pv, StringComparison.Ordinal);
    }

    [Fact]
    public void On_a_log_p_v_diagram_an_isentrope_of_an_ideal_gas_with_constant_k_is_straight()
    {
        // p·v^k = const is a straight line of slope −k in log p over log v (ideal-gas relation).
        var svg = CycleSvg.PressureVolume(TestCycles.Otto());
        var pts = Points(svg, "1→2");
        double slope0 = (pts[1].Y - pts[0].Y) / (pts[1].X - pts[0].X);
        double slope1 = (pts[^1].Y - pts[^2].Y) / (pts[^1].X - pts[^2].X);
        Assert.Equal(slope0, slope1, Math.Abs(slope0) * 0.05);
    }

    [Fact]
    public void Saturation_models_get_the_dome_on_T_s_and_h_s()
    {
        var cycle = TestCycles.OnSaturationModel();
        Assert.Equal([DiagramKind.TemperatureEntropy, DiagramKind.EnthalpyEntropy, DiagramKind.PressureVolume], CycleSvg.DiagramsFor(cycle));
        string html = CycleHtml.Cycle(cycle);
        Assert.Equal(3, CycleHtmlTests.Count(html, "<svg "));
        Assert.Equal(2, CycleHtmlTests.Count(html, "class=\"nbc-dome\""));
        Assert.Contains("h-s diagram", html, StringComparison.Ordinal);
        var dome = Regex.Match(CycleSvg.TemperatureEntropy(cycle), "class=\"nbc-dome\"[^>]* d=\"([^\"]+)\"").Groups[1].Value;
        Assert.True(dome.Split('L').Length > 40);
    }

    [Fact]
    public void Gas_models_get_no_dome()
    {
        Assert.DoesNotContain("nbc-dome\" data-curve", CycleHtml.Cycle(TestCycles.Otto()), StringComparison.Ordinal);
        Assert.Equal([DiagramKind.TemperatureEntropy, DiagramKind.PressureVolume], CycleSvg.DiagramsFor(TestCycles.Otto()));
    }

    [Fact]
    public void Every_state_is_labelled()
    {
        var cycle = TestCycles.RegenerativeBrayton();
        string svg = CycleSvg.PressureVolume(cycle);
        foreach (var s in cycle.States)
        {
            Assert.Contains($"data-state=\"{s.Label}\"", svg, StringComparison.Ordinal);
        }
    }

    internal static List<(double X, double Y)> Points(string svg, string step)
    {
        var d = Regex.Match(svg, $"data-step=\"{Regex.Escape(step)}\" d=\"([^\"]+)\"").Groups[1].Value;
        Assert.False(string.IsNullOrEmpty(d), $"no path for step {step}");
        return Regex.Matches(d, "[ML](-?[0-9.]+) (-?[0-9.]+)")
            .Select(m => (double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture), double.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture)))
            .ToList();
    }
}
