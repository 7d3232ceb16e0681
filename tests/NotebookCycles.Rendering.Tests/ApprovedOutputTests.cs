using Xunit;

namespace NotebookCycles.Rendering.Tests;

/// <summary>Snapshots of the HTML and SVG of three representative cycles, a sweep chart and a comparison (see <see cref="Approvals"/>).</summary>
public sealed class ApprovedOutputTests
{
    [Fact]
    public void Otto_html() => Approvals.Verify("otto", "html", CycleHtml.Cycle(TestCycles.Otto()));

    [Fact]
    public void Otto_T_s_svg() => Approvals.Verify("otto-ts", "svg", CycleSvg.TemperatureEntropy(TestCycles.Otto()));

    [Fact]
    public void Regenerative_Brayton_html_in_US_units() =>
        Approvals.Verify("brayton-regenerative-us", "html", CycleHtml.Cycle(TestCycles.RegenerativeBrayton(), new RenderOptions { Units = DisplayUnits.UsCustomary }));

    [Fact]
    public void Regenerative_Brayton_p_v_svg() => Approvals.Verify("brayton-regenerative-pv", "svg", CycleSvg.PressureVolume(TestCycles.RegenerativeBrayton()));

    [Fact]
    public void Saturation_model_html_in_C_and_bar() =>
        Approvals.Verify("saturation-dome-cbar", "html", CycleHtml.Cycle(TestCycles.OnSaturationModel(), new RenderOptions { Units = DisplayUnits.SiCelsiusBar }));

    [Fact]
    public void Saturation_model_h_s_svg() => Approvals.Verify("saturation-dome-hs", "svg", CycleSvg.EnthalpyEntropy(TestCycles.OnSaturationModel()));

    [Fact]
    public void Two_parameter_sweep_chart_svg() =>
        Approvals.Verify("brayton-sweep-net-work", "svg", SweepSvg.Chart(TestSweeps.BraytonOverRatioAndTemperature(), SweepFigure.NetWork));

    [Fact]
    public void Comparison_html_with_overlaid_T_s() =>
        Approvals.Verify("brayton-variants", "html", CycleHtml.Comparison(TestSweeps.BraytonVariants()));
}
