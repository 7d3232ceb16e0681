using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Sweeps;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Tests.Sweeps;

public sealed class SweepTests(Xunit.Abstractions.ITestOutputHelper output)
{
    private const double K = 1.4;
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    private static CycleResult Otto(double r) => AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), r, heatAdded: 1.6.MegajoulesPerKilogram(), options: new CycleOptions { Record = false });

    [Fact]
    public void Cold_air_Otto_sweep_matches_the_closed_form_at_every_point()
    {
        var sweep = Sweep.Over("compression ratio", ParameterRange.Linear(4, 20, 161), Otto);
        Assert.Equal(161, sweep.Points.Length);
        foreach (var p in sweep.Points)
        {
            // η = 1 − r^(1−k), cold-air-standard closed form.
            Assert.Equal(1 - Math.Pow(p.X, 1 - K), p.Figures!.ThermalEfficiency, 1e-12);
        }
    }

    [Fact]
    public void Optimum_pressure_ratio_for_specific_work_matches_the_closed_form()
    {
        double t1 = 300, t3 = 1400;
        var best = Optimum.MaximumNetWork("pressure ratio", 1.5, 40, rp => GasTurbineCycles.Brayton(Air, t1.Kelvins(), 100.Kilopascals(), rp, t3.Kelvins(), options: new CycleOptions { Record = false }));

        // rp* = (T3/T1)^(k/(2(k−1))) for the ideal cold-air Brayton cycle (maximum specific work).
        double expected = Math.Pow(t3 / t1, K / (2 * (K - 1)));
        Assert.Equal(expected, best.Value, 1e-6 * expected);
        Assert.True(best.Tolerance < 1e-6 * expected);
        Assert.False(best.ConstraintActive);
    }

    [Fact]
    public void Optimum_under_a_constraint_sits_on_the_limit()
    {
        // Otto efficiency rises with r; a peak-pressure limit of 8 MPa caps it. The limit is reached where p3 = 8 MPa.
        var limit = CycleConstraint.Maximum("peak pressure", c => c.Figures.MaximumPressure, 8e6);
        var best = Optimum.MaximumEfficiency("compression ratio", 4, 20, Otto, limit);
        Assert.True(best.ConstraintActive);
        Assert.True(best.Cycle.Figures.MaximumPressure <= 8e6);
        Assert.Equal(8e6, best.Cycle.Figures.MaximumPressure, 1e-5 * 8e6);
    }

    [Fact]
    public void Failed_points_are_kept_with_their_reason()
    {
        // A compression ratio of 1 is refused; the other points solve.
        var sweep = Sweep.Over("compression ratio", [1.0, 8.0, 10.0], r => AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), r, heatAdded: 1.MegajoulesPerKilogram()));
        Assert.False(sweep.Points[0].Succeeded);
        Assert.Contains("compression ratio", sweep.Points[0].FailureReason, StringComparison.Ordinal);
        Assert.True(sweep.Points[1].Succeeded);
        Assert.Single(sweep.Failed);
        Assert.Contains("greater than 1", sweep.ToCsv(), StringComparison.Ordinal);
    }

    [Fact]
    public void Parallel_run_equals_serial_run_in_order()
    {
        var values = ParameterRange.Linear(4, 20, 3000);
        var parallel = Sweep.Over("r", values, Otto, new SweepOptions { ParallelThreshold = 1 });
        var serial = Sweep.Over("r", values, Otto, new SweepOptions { ParallelThreshold = int.MaxValue });
        for (int i = 0; i < values.Length; i++)
        {
            Assert.Equal(serial.Points[i].X, parallel.Points[i].X);
            Assert.Equal(serial.Points[i].Figures!.NetWork, parallel.Points[i].Figures!.NetWork);
            Assert.Equal(serial.Points[i].Figures!.ThermalEfficiency, parallel.Points[i].Figures!.ThermalEfficiency);
        }
    }

    [Fact]
    public void Two_parameter_sweep_varies_the_first_slowest()
    {
        var sweep = Sweep.Over("rp", [4.0, 8.0], "TIT (K)", [1200.0, 1400.0, 1600.0], (rp, t) => GasTurbineCycles.Brayton(Air, 300.Kelvins(), 100.Kilopascals(), rp, t.Kelvins()));
        Assert.Equal(6, sweep.Points.Length);
        Assert.Equal([4.0, 4.0, 4.0, 8.0, 8.0, 8.0], sweep.Points.Select(p => p.X));
        Assert.Equal([1200.0, 1400.0, 1600.0, 1200.0, 1400.0, 1600.0], sweep.Points.Select(p => p.Y));
    }

    [Fact]
    public void Csv_quotes_fields_and_uses_invariant_numbers()
    {
        var sweep = Sweep.Over("ratio, volume", [1.0, 8.0], r => AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), r, heatAdded: 1.MegajoulesPerKilogram()));
        var lines = sweep.ToCsv().Split("\r\n");
        Assert.StartsWith("\"ratio, volume\",heat_in_J_per_kg,", lines[0], StringComparison.Ordinal);
        Assert.StartsWith("8,1000000,", lines[2], StringComparison.Ordinal);
        Assert.EndsWith("\"", lines[1], StringComparison.Ordinal);
    }

    [Fact]
    public void Comparison_reports_differences_against_the_baseline()
    {
        var a = AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1.MegajoulesPerKilogram());
        var b = AirStandardCycles.Otto(Air, 300.Kelvins(), 100.Kilopascals(), 10, heatAdded: 1.MegajoulesPerKilogram());
        var comparison = CycleComparison.Of("Compression ratio", ("r = 8", a), ("r = 10", b));
        var eta = comparison.Rows.Single(r => r.Name == "Thermal efficiency");
        Assert.Equal(b.Figures.ThermalEfficiency - a.Figures.ThermalEfficiency, eta.Difference(1), 1e-15);
        Assert.DoesNotContain(comparison.Rows, r => r.Name == "Back-work ratio");
    }

    [Fact]
    public void A_sweep_of_100000_points_without_cycles_keeps_under_50_MB()
    {
        long before = GC.GetTotalMemory(forceFullCollection: true);
        var sweep = Sweep.Over("compression ratio", ParameterRange.Linear(4, 20, 100_000), Otto);
        long after = GC.GetTotalMemory(forceFullCollection: true);
        Assert.Equal(100_000, sweep.Points.Length);
        Assert.All(sweep.Points, p => Assert.Null(p.Cycle));
        output.WriteLine($"retained by a 100 000-point sweep: {(after - before) / 1048576.0:F1} MB");
        Assert.True(after - before < 50L * 1024 * 1024, $"retained {(after - before) / 1048576.0:F1} MB");
        GC.KeepAlive(sweep);
    }
}
