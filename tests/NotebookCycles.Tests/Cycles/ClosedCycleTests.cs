using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using UnitsNet;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

public sealed class ClosedCycleTests
{
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    [Theory]
    [InlineData(8.0)]
    [InlineData(11.0)]
    [InlineData(18.5)]
    public void Cold_air_Otto_efficiency_matches_the_closed_form(double r)
    {
        var result = Cycle.Closed("Otto", Air)
            .Start("1", T: 300.Kelvins(), p: 100.Kilopascals())
            .CompressIsentropic("2", volumeRatio: r)
            .HeatAtConstantVolume("3", q: 1.8.MegajoulesPerKilogram())
            .ExpandIsentropic("4", toVolumeOf: "1")
            .CoolAtConstantVolume(backTo: "1");

        // Cold-air-standard Otto efficiency 1 − r^(1−k) (ideal-gas relations, any thermodynamics textbook).
        Assert.Equal(1 - Math.Pow(r, 1 - 1.4), result.Figures.ThermalEfficiency, 1e-12);
        Assert.Equal(4, result.States.Length);
        Assert.Equal(4, result.Steps.Length);
        Assert.All(result.Checks, c => Assert.True(c.Passed));
        Assert.Equal(result.Figures.HeatIn - result.Figures.HeatOut, result.Figures.NetWork, 1e-6);
    }

    [Fact]
    public void Record_lines_substitute_the_numbers()
    {
        var result = Cycle.Closed("Otto", Air)
            .Start("1", T: 300.Kelvins(), p: 100.Kilopascals())
            .CompressIsentropic("2", volumeRatio: 8)
            .HeatAtConstantVolume("3", q: 1000.KilojoulesPerKilogram())
            .ExpandIsentropic("4", toVolumeOf: "1")
            .CoolAtConstantVolume(backTo: "1");
        var heat = result.Steps[1];
        var line = heat.Lines[0].ToString();
        Assert.StartsWith("u3 = u2 + q23 = ", line, StringComparison.Ordinal);
        Assert.Contains("1000", line, StringComparison.Ordinal);
        var md = result.ToMarkdown();
        Assert.Contains("Step 2, 2→3", md, StringComparison.Ordinal);
        Assert.Contains(CycleResult.Caution, md, StringComparison.Ordinal);
    }
}
