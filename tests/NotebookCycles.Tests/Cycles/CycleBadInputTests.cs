using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>Bad input gets a clear error naming the step, the state label and the offending value.</summary>
public sealed class CycleBadInputTests
{
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    private static ClosedCycle Engine() => Cycle.Closed("Test engine", Air).Start("1", T: 300.Kelvins(), p: 100.Kilopascals());

    private static void AssertError(Func<object> build, string label, params string[] fragments)
    {
        var e = Assert.Throws<CycleDefinitionException>(build);
        Assert.Equal(label, e.StateLabel);
        Assert.Contains("Test", e.Message, StringComparison.Ordinal);
        foreach (var f in fragments)
        {
            Assert.Contains(f, e.Message, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(0.5)]
    [InlineData(double.NaN)]
    public void Compression_ratio_must_exceed_one(double r) =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: r).HeatAtConstantVolume("3", q: 1.MegajoulesPerKilogram()).ExpandIsentropic("4", toVolumeOf: "1").CoolAtConstantVolume(backTo: "1"), "2", "compression ratio", "greater than 1");

    [Fact]
    public void Negative_heat_added_is_refused() =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("3", q: (-5).KilojoulesPerKilogram()).ExpandIsentropic("4", toVolumeOf: "1").CoolAtConstantVolume(backTo: "1"), "3", "heat added", "-5");

    [Fact]
    public void Heating_to_a_lower_temperature_is_refused() =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("3", toTemperature: 500.Kelvins()).ExpandIsentropic("4", toVolumeOf: "1").CoolAtConstantVolume(backTo: "1"), "3", "500 K", "above");

    [Fact]
    public void Expansion_to_a_higher_pressure_is_refused()
    {
        var e = Assert.Throws<CycleDefinitionException>(() =>
            Cycle.SteadyFlow("Test turbine", Air).Start("1", T: 1200.Kelvins(), p: 500.Kilopascals()).Expand("2", toPressure: 800.Kilopascals()).Cool(backTo: "1"));
        Assert.Equal("2", e.StateLabel);
        Assert.Contains("expansion must end at a pressure below", e.Message, StringComparison.Ordinal);
        Assert.Contains("800 kPa", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1.2)]
    [InlineData(-0.5)]
    public void Efficiency_must_lie_in_zero_to_one(double eta)
    {
        var e = Assert.Throws<CycleDefinitionException>(() =>
            Cycle.SteadyFlow("Test", Air).Start("1", T: 300.Kelvins(), p: 100.Kilopascals()).Compress("2", pressureRatio: 8, efficiency: eta).Heat("3", toTemperature: 1300.Kelvins()).Expand("4", toPressureOf: "1").Cool(backTo: "1"));
        Assert.Equal("2", e.StateLabel);
        Assert.Contains("(0, 1]", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Reused_label_is_refused() =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("2", q: 1.MegajoulesPerKilogram()), "2", "already used");

    [Fact]
    public void Unknown_label_is_refused() =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("3", q: 1.MegajoulesPerKilogram()).ExpandIsentropic("4", toVolumeOf: "9").CoolAtConstantVolume(backTo: "1"), "4", "'9'", "known states are 1, 2, 3");

    [Fact]
    public void A_cycle_that_does_not_close_names_the_mismatch() =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("3", q: 1.MegajoulesPerKilogram()).ExpandIsentropic("4", volumeRatio: 4).CoolAtConstantVolume(backTo: "1"), "1", "cannot close at constant volume", "v4");

    [Fact]
    public void Closing_on_another_state_than_the_start_is_refused() =>
        AssertError(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("3", q: 1.MegajoulesPerKilogram()).ExpandIsentropic("4", toVolumeOf: "1").CoolAtConstantVolume(backTo: "2"), "2", "closes on its start state '1'");

    [Fact]
    public void A_state_driven_out_of_the_model_range_names_the_step()
    {
        // 200 MJ/kg at constant volume takes cold air far above its 6000 K range.
        var e = Assert.Throws<CycleDefinitionException>(() => Engine().CompressIsentropic("2", volumeRatio: 8).HeatAtConstantVolume("3", q: 200.MegajoulesPerKilogram()).ExpandIsentropic("4", toVolumeOf: "1").CoolAtConstantVolume(backTo: "1"));
        Assert.Equal("3", e.StateLabel);
        Assert.Contains("step 2, heat addition at constant volume 2→3", e.Message, StringComparison.Ordinal);
        Assert.Contains("valid T is 200 K to 6000 K", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_regenerator_that_would_destroy_entropy_is_refused()
    {
        // A hot side given a boundary colder than its stream cannot be; here the regenerator's hot inlet is colder than the cold inlet.
        var e = Assert.Throws<CycleDefinitionException>(() =>
            Cycle.SteadyFlow("Test", Air).Start("1", T: 300.Kelvins(), p: 100.Kilopascals())
                .Compress("2", pressureRatio: 30)
                .HeatInRegenerator("3", hotInlet: "5", effectiveness: 0.8)
                .Heat("4", toTemperature: 1000.Kelvins())
                .Expand("5", toPressureOf: "1")
                .CoolInRegenerator("6", coldOutlet: "3")
                .Cool(backTo: "1"));
        Assert.Contains("regenerator", e.Message, StringComparison.Ordinal);
        Assert.Contains("colder", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Start_needs_two_properties() =>
        AssertError(() => Cycle.Closed("Test", Air).Start("1", T: 300.Kelvins()), "1", "exactly two");

    [Fact]
    public void Chain_without_closing_is_refused()
    {
        var e = Assert.Throws<CycleDefinitionException>(() => Engine().CompressIsentropic("2", volumeRatio: 8).Chain.Solve());
        Assert.Contains("does not return to its start state '1'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Polytropic_exponent_one_is_refused() =>
        AssertError(() => Engine().CompressPolytropic("2", 1.0, volumeRatio: 8).CoolAtConstantVolume(backTo: "1"), "2", "n = 1");

    [Fact]
    public void Quality_outside_zero_to_one_is_refused()
    {
        var e = Assert.Throws<CycleDefinitionException>(() =>
            Cycle.SteadyFlow("Test", Air).Start("1", T: 300.Kelvins(), p: 100.Kilopascals()).Heat("2", toQuality: 1.3).Cool(backTo: "1"));
        Assert.Equal("2", e.StateLabel);
        Assert.Contains("quality x = 1.3 is outside the valid range 0 to 1", e.Message, StringComparison.Ordinal);
    }
}
