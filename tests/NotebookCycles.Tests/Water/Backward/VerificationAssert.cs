using Xunit;
using Xunit.Abstractions;

namespace NotebookCycles.Tests.Water.Backward;

/// <summary>Shared checks of the verification rows, used by the per-release test classes.</summary>
internal static class VerificationAssert
{
    /// <summary>The row's function reproduces the row's value to the file's relative tolerance (1e-9, per its header).</summary>
    public static void Reproduces(string inputs, string quantity, string unit, string value)
    {
        var row = new VerificationRow("", "", inputs, quantity, unit, value);
        var parsed = new ParsedInputs(inputs);
        Assert.True(parsed.Count > 0, $"no numeric inputs read from '{inputs}'");
        double computed = VerificationQuantities.For(quantity).Compute(parsed);
        double error = VerificationQuantities.RelativeError(computed, row.Value);
        Assert.True(
            error <= VerificationQuantities.RelativeTolerance,
            $"{quantity} at {inputs}: computed {computed:R} {unit}, published {value} {unit}, relative error {error:E2}");
    }

    /// <summary>The selector picks the subregion that the quantity names (and that the inputs name, when they do).</summary>
    public static void SelectsNamedSubregion(string inputs, string quantity)
    {
        var mapping = VerificationQuantities.For(quantity);
        Assert.NotNull(mapping.Select);
        Assert.NotNull(mapping.ExpectedSubregion);
        var parsed = new ParsedInputs(inputs);
        if (parsed.Subregion is not null)
        {
            Assert.Equal(mapping.ExpectedSubregion.Value, parsed.Subregion[^1]);
        }

        Assert.Equal(mapping.ExpectedSubregion.Value, mapping.Select(parsed));
    }

    /// <summary>Every row of the release is within tolerance; writes the largest relative error to the test output.</summary>
    public static void MaxErrorBelowTolerance(string releaseTag, int expectedRows, ITestOutputHelper output)
    {
        double max = 0;
        string worst = "";
        int count = 0;
        foreach (var row in SupplementaryVerificationData.Rows)
        {
            if (row.ReleaseTag != releaseTag)
            {
                continue;
            }

            count++;
            double error = VerificationQuantities.ErrorOf(row);
            if (!(error <= max))
            {
                max = error;
                worst = $"{row.Quantity} at {row.Inputs}";
            }
        }

        output.WriteLine($"{releaseTag}: {count} rows, max relative error {max:E3} ({worst})");
        Assert.Equal(expectedRows, count);
        Assert.True(max <= VerificationQuantities.RelativeTolerance, $"{releaseTag}: max relative error {max:E3} at {worst}");
    }

    /// <summary>The exception names the input, and the message carries the value and both range ends.</summary>
    public static void OutOfRange(Action call, string input, string valueText, string minText, string maxText)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(call);
        Assert.Equal(input, ex.ParamName);
        Assert.Contains($"{input} = {valueText}", ex.Message, StringComparison.Ordinal);
        Assert.Contains(minText, ex.Message, StringComparison.Ordinal);
        Assert.Contains(maxText, ex.Message, StringComparison.Ordinal);
    }
}
