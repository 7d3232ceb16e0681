using System.Text.RegularExpressions;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Interactive;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

[Collection(FormatterRegistry.Name)]
public sealed class NotebookCyclesExtensionTests
{
    private const string Otto = "AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram())";

    [Fact]
    public async Task Loading_extension_dib_says_what_is_loaded_and_the_line_to_try()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        var shown = session.Events.OfType<DisplayedValueProduced>().SelectMany(e => e.FormattedValues).Select(f => f.Value).ToList();
        Assert.Contains(shown, v => v.Contains("NotebookCycles loaded", StringComparison.Ordinal) && v.Contains("AirStandardCycles.Otto(", StringComparison.Ordinal));
    }

    [Fact]
    public async Task The_suggested_line_runs_as_shown()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        string html = await session.HtmlOfAsync(NotebookCyclesExtension.TryLine);
        Assert.Contains("<h3 class=\"nbc-title\">Otto cycle</h3>", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_cycle_displays_its_state_table_diagrams_and_record()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        string html = await session.HtmlOfAsync(Otto);

        foreach (var label in new[] { "1", "2", "3", "4" })
        {
            Assert.Contains($"<tr data-state=\"{label}\">", html, StringComparison.Ordinal);
        }

        Assert.Equal(2, Regex.Matches(html, "<svg ").Count);
        foreach (var step in new[] { "1→2", "2→3", "3→4", "4→1" })
        {
            Assert.Equal(2, Regex.Matches(html, $"<path class=\"nbc-step [^\"]*\" data-step=\"{step}\"").Count);
            Assert.Contains($"<li class=\"nbc-steprec\" data-step=\"{step}\">", html, StringComparison.Ordinal);
        }

        Assert.Contains("Idealised models for design studies", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_plain_text_formatter_is_registered_too()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        await session.SubmitAsync("var c = " + Otto + ";");
        string text = (await session.SubmitAsync("using Microsoft.DotNet.Interactive.Formatting;\nc.ToDisplayString(\"text/plain\")")).Events.OfType<ReturnValueProduced>().Single().Value!.ToString()!;
        Assert.Contains("Step 2, 2→3: Heat addition at constant volume", text, StringComparison.Ordinal);
        Assert.DoesNotContain("<table", text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_display_units_switch_changes_the_numbers_shown()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        await session.SubmitAsync("var c = " + Otto + ";");
        Assert.Contains("<td>300.00</td><td>100.00</td>", await session.HtmlOfAsync("c"), StringComparison.Ordinal);
        await session.SubmitAsync("NotebookCyclesDisplay.Units = DisplayUnits.SiCelsiusBar;");
        Assert.Contains("<td>26.85</td><td>1.0000</td>", await session.HtmlOfAsync("c"), StringComparison.Ordinal);
        await session.SubmitAsync("NotebookCyclesDisplay.Units = DisplayUnits.UsCustomary;");
        string us = await session.HtmlOfAsync("c");
        Assert.Contains("<td>80.33</td><td>14.504</td>", us, StringComparison.Ordinal);
        Assert.Contains("Btu/(lbm·R)", us, StringComparison.Ordinal);
    }

    [Fact]
    public async Task States_steps_records_and_comparisons_have_their_own_formatters()
    {
        using var session = new KernelSession();
        await session.LoadExtensionAsync();
        await session.SubmitAsync("var c = " + Otto + "; var d = AirStandardCycles.Diesel(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 18, cutoffRatio: 2);");

        string state = await session.HtmlOfAsync("c[\"3\"]");
        Assert.Contains("nbc-state", state, StringComparison.Ordinal);
        Assert.Single(Regex.Matches(state, "<tr data-state="));

        string states = await session.HtmlOfAsync("c.States");
        Assert.Equal(4, Regex.Matches(states, "<tr data-state=").Count);
        Assert.Single(Regex.Matches(states, "<table"));

        string step = await session.HtmlOfAsync("c.Steps[1]");
        Assert.Contains("Heat addition at constant volume", step, StringComparison.Ordinal);

        string record = await session.HtmlOfAsync("c.Record()");
        Assert.Equal(4, Regex.Matches(record, "<li class=\"nbc-steprec\"").Count);

        string comparison = await session.HtmlOfAsync("CycleComparison.Of(c, d)");
        Assert.Contains("Δ vs baseline", comparison, StringComparison.Ordinal);
        Assert.Contains("Diesel cycle", comparison, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Load_called_directly_registers_the_formatters_and_imports_the_namespaces()
    {
        using var session = new KernelSession();
        foreach (var name in new[] { "NotebookCycles.dll", "NotebookCycles.Rendering.dll", "NotebookCycles.Interactive.dll" })
        {
            await session.SubmitAsync($"#r \"{Path.Combine(AppContext.BaseDirectory, name)}\"");
        }

        NotebookCyclesExtension.Load(session.Kernel);
        Assert.Contains("nbc-cycle", TestCycle().ToDisplayString(HtmlFormatter.MimeType), StringComparison.Ordinal);
        string html = await session.HtmlOfAsync(Otto);
        Assert.Contains("<svg ", html, StringComparison.Ordinal);
    }

    private static NotebookCycles.Cycles.CycleResult TestCycle() =>
        NotebookCycles.Cycles.AirStandardCycles.Otto(NotebookCycles.Gases.ColdAirStandard.Air, UnitsNet.Temperature.FromKelvins(300), UnitsNet.Pressure.FromKilopascals(100), 8, UnitsNet.SpecificEnergy.FromKilojoulesPerKilogram(1800));
}
