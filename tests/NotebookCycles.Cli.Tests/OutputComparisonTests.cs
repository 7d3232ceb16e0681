using System.Text.Json.Nodes;
using Xunit;

namespace NotebookCycles.Cli.Tests;

public sealed class OutputComparisonTests
{
    private static JsonArray Plain(string text) => [new JsonObject { ["output_type"] = "display_data", ["data"] = new JsonObject { ["text/plain"] = text }, ["metadata"] = new JsonObject() }];

    [Fact]
    public void Times_ids_and_run_stamps_are_normalised()
    {
        var a = Plain("run at 2026-12-02T01:22:40Z, id 3f2b1c7a-1234-4abc-9def-0123456789ab, took 12:00:01");
        var b = Plain("run at 2027-01-01T00:00:00Z, id 00000000-1111-2222-3333-444444444444, took 09:10:11");
        Assert.Equal(CellStatus.Unchanged, OutputComparison.Compare(1, a, b, 1e-6).Status);
    }

    [Fact]
    public void Numbers_match_within_the_relative_tolerance()
    {
        Assert.Equal(CellStatus.Unchanged, OutputComparison.Compare(1, Plain("η = 0.5647247"), Plain("η = 0.5647249"), 1e-6).Status);
        var changed = OutputComparison.Compare(1, Plain("η = 0.5647"), Plain("η = 0.5700"), 1e-6);
        Assert.Equal(CellStatus.Changed, changed.Status);
        var n = Assert.Single(changed.Numbers);
        Assert.Equal(0.5647, n.Before);
        Assert.Equal(0.57, n.After);
    }

    [Fact]
    public void Text_apart_from_numbers_must_match_exactly()
    {
        var c = OutputComparison.Compare(1, Plain("Otto cycle: 1 state"), Plain("Diesel cycle: 1 state"), 1e-6);
        Assert.Equal(CellStatus.Changed, c.Status);
        Assert.Empty(c.Numbers);
        Assert.Single(c.TextChanges);
    }

    [Fact]
    public void A_missing_or_extra_output_is_a_change()
    {
        var extra = new JsonArray { Plain("a")[0]!.DeepClone(), Plain("b")[0]!.DeepClone() };
        Assert.Equal(CellStatus.Changed, OutputComparison.Compare(1, Plain("a"), extra, 1e-6).Status);
        Assert.Equal(CellStatus.Changed, OutputComparison.Compare(1, extra, Plain("a"), 1e-6).Status);
    }

    [Theory]
    [InlineData(1.0, 1.0 + 1e-7, 1e-6, true)]
    [InlineData(1.0, 1.0 + 1e-5, 1e-6, false)]
    [InlineData(0.0, 0.0, 0.0, true)]
    [InlineData(-2.0, 2.0, 1e-6, false)]
    public void Same_is_relative(double a, double b, double tolerance, bool same) =>
        Assert.Equal(same, OutputComparison.Same(a, b, tolerance));
}
