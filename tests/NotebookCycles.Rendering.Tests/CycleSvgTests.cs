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

    [Fact]
    public void The_overlay_has_one_path_per_step_per_variant_in_the_variant_colour()
    {
        var comparison = TestSweeps.BraytonVariants();
        string svg = CycleSvg.Overlay(comparison);
        for (int v = 0; v < comparison.Variants.Length; v++)
        {
            var (name, cycle) = comparison.Variants[v];
            string encoded = HtmlText.Encode(name);
            foreach (var step in cycle.Steps)
            {
                var path = Regex.Matches(svg, $"<path class=\"nbc-curve nbc-c{v}[^\"]*\" data-variant=\"{Regex.Escape(encoded)}\" data-step=\"{Regex.Escape(step.Name)}\" d=\"([^\"]*)\"");
                Assert.Single(path);
                int vertices = Regex.Matches(path[0].Groups[1].Value, "[ML]").Count;
                Assert.Equal(step.SamplePath(RenderOptions.Default.PathPoints).Count, vertices);
            }

            Assert.Equal(cycle.Steps.Length, Regex.Matches(svg, $"data-variant=\"{Regex.Escape(encoded)}\"").Count);
            Assert.Contains(">" + encoded + "</text>", svg, StringComparison.Ordinal);
        }

        Assert.Contains("losses &lt;85 % &amp; 88 %&gt;", svg, StringComparison.Ordinal);
        Assert.Contains(">s, kJ/(kg·K)</text>", svg, StringComparison.Ordinal);
        Assert.Contains(">T, K</text>", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void The_overlay_follows_the_display_units_and_draws_the_dome_of_a_saturation_model()
    {
        var comparison = TestSweeps.BraytonVariants();
        Assert.Contains(">T, °F</text>", CycleSvg.Overlay(comparison, options: new RenderOptions { Units = DisplayUnits.UsCustomary }), StringComparison.Ordinal);
        Assert.DoesNotContain("data-curve=\"saturation\"", CycleSvg.Overlay(comparison), StringComparison.Ordinal);
        var wet = NotebookCycles.Cycles.CycleComparison.Of(TestCycles.OnSaturationModel(), TestCycles.OnSaturationModel());
        Assert.Contains("data-curve=\"saturation\"", CycleSvg.Overlay(wet, DiagramKind.EnthalpyEntropy), StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => CycleSvg.Overlay(comparison, DiagramKind.PressureVolume));
    }
}

public sealed class PressureEnthalpyDiagramTests
{
    private static NotebookCycles.Cycles.CycleResult HeatPump() =>
        NotebookCycles.Cycles.RefrigerationCycles.VapourCompression(NotebookCycles.Refrigerants.Refrigerant.R134a, UnitsNet.Temperature.FromDegreesCelsius(-5), UnitsNet.Temperature.FromDegreesCelsius(45));

    [Fact]
    public void A_refrigerant_cycle_gets_the_log_p_h_diagram_with_dome_and_isotherms()
    {
        var cycle = HeatPump();
        Assert.Equal(DiagramKind.PressureEnthalpy, CycleSvg.DiagramsFor(cycle)[0]);
        string svg = CycleSvg.PressureEnthalpy(cycle);
        Assert.Contains("log p-h diagram", svg, StringComparison.Ordinal);
        Assert.Contains("data-curve=\"saturation\"", svg, StringComparison.Ordinal);
        Assert.True(System.Text.RegularExpressions.Regex.Matches(svg, "data-curve=\"isotherm\"").Count >= 3);
        Assert.Equal(cycle.Steps.Length, System.Text.RegularExpressions.Regex.Matches(svg, "class=\"nbc-step ").Count);
    }

    [Fact]
    public void The_evaporator_is_horizontal_on_the_log_p_h_diagram()
    {
        // A constant-pressure step is a horizontal line at log p: every y of its path is the same.
        var cycle = HeatPump();
        string svg = CycleSvg.PressureEnthalpy(cycle);
        var evaporator = cycle.Steps[^1];
        var m = System.Text.RegularExpressions.Regex.Match(svg, "data-step=\"" + System.Net.WebUtility.HtmlEncode(evaporator.Name).Replace("→", "(?:→|&#8594;)") + "\" d=\"([^\"]+)\"");
        Assert.True(m.Success, svg[..Math.Min(400, svg.Length)]);
        var ys = System.Text.RegularExpressions.Regex.Matches(m.Groups[1].Value, "[ML][0-9.]+ ([0-9.]+)").Select(x => x.Groups[1].Value).Distinct().ToList();
        Assert.Single(ys);
    }
}
