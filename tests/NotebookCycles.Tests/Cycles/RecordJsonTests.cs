using System.Text;
using System.Text.Json;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Sweeps;
using UnitsNet;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

public sealed class RecordJsonTests
{
    private static JsonElement Write(Action<Utf8JsonWriter> write)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream))
        {
            write(json);
        }

        return JsonDocument.Parse(Encoding.UTF8.GetString(stream.ToArray())).RootElement.Clone();
    }

    private static CycleResult Otto(double r) =>
        AirStandardCycles.Otto(ColdAirStandard.Air, Temperature.FromKelvins(300), Pressure.FromKilopascals(100), r, heatAdded: SpecificEnergy.FromKilojoulesPerKilogram(1800));

    [Fact]
    public void A_cycle_is_the_same_object_as_its_own_json()
    {
        var cycle = Otto(8);
        var written = Write(j => RecordJson.WriteCycle(j, cycle));
        var own = JsonDocument.Parse(cycle.ToJson()).RootElement;
        Assert.Equal(own.GetRawText().Replace(" ", "", StringComparison.Ordinal).Replace("\n", "", StringComparison.Ordinal).Replace("\r", "", StringComparison.Ordinal),
            written.GetRawText().Replace(" ", "", StringComparison.Ordinal));
        Assert.Equal("cycle", written.GetProperty("kind").GetString());
    }

    [Fact]
    public void A_state_is_written_in_SI_with_null_quality_when_single_phase()
    {
        var state = Otto(8)["2"];
        var json = Write(j => RecordJson.WriteState(j, state));
        Assert.Equal("state", json.GetProperty("kind").GetString());
        Assert.Equal("2", json.GetProperty("label").GetString());
        Assert.Equal(state.Point.T, json.GetProperty("T_K").GetDouble());
        Assert.Equal(state.Point.P, json.GetProperty("p_Pa").GetDouble());
        Assert.Equal(state.Point.H, json.GetProperty("h_J_per_kg").GetDouble());
        Assert.Equal(JsonValueKind.Null, json.GetProperty("x").ValueKind);
        Assert.Equal("IdealGas", json.GetProperty("phase").GetString());
    }

    [Fact]
    public void A_sweep_keeps_failed_points_with_their_reason_and_null_figures()
    {
        // r = 0.5 is not a compression: that point fails and must stay in the output.
        var sweep = Sweep.Over("r", [0.5, 8, 10], Otto);
        var json = Write(j => RecordJson.WriteSweep(j, sweep));
        Assert.Equal("sweep", json.GetProperty("kind").GetString());
        Assert.Equal("r", json.GetProperty("parameter").GetString());
        Assert.Equal(JsonValueKind.Null, json.GetProperty("second_parameter").ValueKind);
        var points = json.GetProperty("points");
        Assert.Equal(3, points.GetArrayLength());
        Assert.False(points[0].GetProperty("succeeded").GetBoolean());
        Assert.False(string.IsNullOrEmpty(points[0].GetProperty("failure").GetString()));
        Assert.Equal(JsonValueKind.Null, points[0].GetProperty("figures").ValueKind);
        Assert.True(points[1].GetProperty("succeeded").GetBoolean());
        Assert.Equal(sweep.Points[1].Figures!.ThermalEfficiency, points[1].GetProperty("figures").GetProperty("thermal_efficiency").GetDouble());
        // A figure that does not apply (the back-work ratio of a closed cycle) is null, not NaN.
        Assert.Equal(JsonValueKind.Null, points[1].GetProperty("figures").GetProperty("back_work_ratio").ValueKind);
        Assert.Equal(JsonValueKind.Null, points[1].GetProperty("y").ValueKind);
    }

    [Fact]
    public void An_optimum_carries_its_cycle_and_its_scan()
    {
        var optimum = Optimum.MaximumNetWork("r", 4, 12, Otto, relativeTolerance: 1e-4);
        var json = Write(j => RecordJson.WriteOptimum(j, optimum));
        Assert.Equal("optimum", json.GetProperty("kind").GetString());
        Assert.Equal(optimum.Value, json.GetProperty("value").GetDouble());
        Assert.Equal("cycle", json.GetProperty("cycle").GetProperty("kind").GetString());
        Assert.Equal(optimum.Scan.Points.Length, json.GetProperty("scan").GetProperty("points").GetArrayLength());
    }

    [Fact]
    public void Null_arguments_are_refused()
    {
        using var stream = new MemoryStream();
        using var json = new Utf8JsonWriter(stream);
        Assert.Throws<ArgumentNullException>(() => RecordJson.WriteCycle(json, null!));
        Assert.Throws<ArgumentNullException>(() => RecordJson.WriteSweep(null!, Sweep.Over("r", [8.0], Otto)));
    }
}
