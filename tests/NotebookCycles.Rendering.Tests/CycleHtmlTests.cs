using System.Text;
using System.Text.RegularExpressions;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

public sealed class CycleHtmlTests
{
    [Fact]
    public void Report_has_every_state_every_step_and_one_path_per_step_on_each_diagram()
    {
        var cycle = TestCycles.RegenerativeBrayton();
        string html = CycleHtml.Cycle(cycle);

        foreach (var state in cycle.States)
        {
            Assert.Contains($"<tr data-state=\"{state.Label}\">", html, StringComparison.Ordinal);
        }

        Assert.Equal(cycle.States.Length, Count(html, "<tr data-state="));
        Assert.Equal(2, Count(html, "<svg "));
        Assert.Equal(2 * cycle.Steps.Length, Count(html, "class=\"nbc-step "));
        foreach (var step in cycle.Steps)
        {
            Assert.Equal(2, Count(html, $"data-step=\"{step.Name}\" d=\"M"));
            Assert.Contains($"<li class=\"nbc-steprec\" data-step=\"{step.Name}\">", html, StringComparison.Ordinal);
        }

        Assert.Contains(cycle.Model.Name, html, StringComparison.Ordinal);
        Assert.Contains(HtmlText.Encode(cycle.Model.Citation), html, StringComparison.Ordinal);
        Assert.Contains("<p class=\"nbc-caution\">" + CycleResult.Caution + "</p>", html, StringComparison.Ordinal);
        Assert.Contains($"All {cycle.Checks.Length} checks passed", html, StringComparison.Ordinal);
        Assert.Contains("Back-work ratio", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Output_has_no_script_no_external_resource_and_no_ids()
    {
        string html = CycleHtml.Cycle(TestCycles.Otto());
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(" src=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(" href=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(" id=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("@import", html, StringComparison.OrdinalIgnoreCase);

        // The only URL is the SVG namespace name, which is never fetched.
        var urls = Regex.Matches(html, "https?://[^\"]+").Select(m => m.Value).Distinct().ToArray();
        Assert.Equal(["http://www.w3.org/2000/svg"], urls);
    }

    [Fact]
    public void User_strings_are_encoded()
    {
        var cycle = AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram(), title: "<script>alert('x')</script> & \"Otto\"");
        foreach (string html in new[] { CycleHtml.Cycle(cycle), CycleHtml.Record(cycle.Record()), CycleHtml.Comparison(CycleComparison.Of(cycle, cycle)) })
        {
            Assert.DoesNotContain("<script>", html, StringComparison.Ordinal);
            Assert.Contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;Otto&quot;", html, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Rendering_is_deterministic()
    {
        Assert.Equal(CycleHtml.Cycle(TestCycles.Diesel()), CycleHtml.Cycle(TestCycles.Diesel()));
    }

    [Fact]
    public void A_four_state_report_with_diagrams_stays_under_60_kB()
    {
        var cycle = TestCycles.Otto();
        Assert.Equal(4, cycle.States.Length);
        foreach (var units in Enum.GetValues<DisplayUnits>())
        {
            int bytes = Encoding.UTF8.GetByteCount(CycleHtml.Cycle(cycle, new RenderOptions { Units = units }));
            Assert.InRange(bytes, 5_000, 60_000);
        }
    }

    [Fact]
    public void State_step_and_record_fragments_show_their_content()
    {
        var cycle = TestCycles.Otto();
        string state = CycleHtml.State(cycle["3"]);
        Assert.Equal(1, Count(state, "<tr data-state="));
        Assert.Contains("ideal gas", state, StringComparison.Ordinal);

        var step = cycle.Steps[1];
        string stepHtml = CycleHtml.Step(step);
        Assert.Contains(step.Process, stepHtml, StringComparison.Ordinal);
        Assert.Equal(step.Lines.Length, Count(stepHtml, "<li>"));

        string record = CycleHtml.Record(cycle.Record());
        Assert.Equal(cycle.Steps.Length, Count(record, "<li class=\"nbc-steprec\""));
        Assert.DoesNotContain("<svg", record, StringComparison.Ordinal);
    }

    [Fact]
    public void Comparison_shows_differences_against_the_first_cycle()
    {
        var a = TestCycles.Otto();
        var b = AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 10, heatAdded: 1800.KilojoulesPerKilogram(), title: "Otto, r = 10");
        string html = CycleHtml.Comparison(a.CompareWith(b));
        double dEta = b.Figures.ThermalEfficiency - a.Figures.ThermalEfficiency;
        Assert.True(dEta > 0);
        Assert.Contains("<td class=\"nbc-d\">+" + UnitText.Significant(dEta, 4) + "</td>", html, StringComparison.Ordinal);
        Assert.Contains("Otto, r = 10", html, StringComparison.Ordinal);
        Assert.Contains("(baseline)", html, StringComparison.Ordinal);
    }

    [Fact]
    public void A_list_of_states_is_one_table()
    {
        var cycle = TestCycles.Diesel();
        string html = CycleHtml.States(cycle.States.Reverse());
        Assert.Equal(cycle.States.Length, Count(html, "<tr data-state="));
        Assert.True(html.IndexOf("data-state=\"4\"", StringComparison.Ordinal) < html.IndexOf("data-state=\"1\"", StringComparison.Ordinal));
        Assert.Equal(cycle.States.Length + 2, CycleText.States(cycle.States).Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
    }

    [Fact]
    public void Diagrams_can_be_left_out()
    {
        string html = CycleHtml.Cycle(TestCycles.Otto(), new RenderOptions { Diagrams = false });
        Assert.DoesNotContain("<svg", html, StringComparison.Ordinal);
    }

    internal static int Count(string text, string part)
    {
        int n = 0;
        for (int i = text.IndexOf(part, StringComparison.Ordinal); i >= 0; i = text.IndexOf(part, i + part.Length, StringComparison.Ordinal))
        {
            n++;
        }

        return n;
    }

    [Fact]
    public void A_comparison_has_its_figures_table_and_the_overlaid_T_s_diagram_unless_diagrams_are_off()
    {
        var comparison = TestSweeps.BraytonVariants();
        string html = CycleHtml.Comparison(comparison);
        Assert.Contains("<table class=\"nbc-table nbc-figures\">", html, StringComparison.Ordinal);
        Assert.Single(Regex.Matches(html, "<svg "));
        Assert.Contains("nbc-ts nbc-overlay", html, StringComparison.Ordinal);
        int paths = comparison.Cycles.Sum(c => c.Steps.Length);
        Assert.Equal(paths, Regex.Matches(html, "data-variant=").Count);
        Assert.DoesNotContain("<svg ", CycleHtml.Comparison(comparison, new RenderOptions { Diagrams = false }), StringComparison.Ordinal);
    }
}
