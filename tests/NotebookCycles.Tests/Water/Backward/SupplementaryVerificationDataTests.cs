using Xunit;

namespace NotebookCycles.Tests.Water.Backward;

public sealed class SupplementaryVerificationDataTests
{
    [Fact]
    public void The_file_holds_135_rows_of_the_four_supplementary_releases()
    {
        // ReferenceData/SOURCES.md: 153 values, of which 18 are the R7-97(2012) Table 18 rows of the forward model.
        Assert.Equal(135, SupplementaryVerificationData.Rows.Count);
        var tags = new HashSet<string>();
        foreach (var row in SupplementaryVerificationData.Rows)
        {
            tags.Add(row.ReleaseTag);
        }

        Assert.Equal(new HashSet<string> { "SR2-01", "SR3-03", "SR4-04", "SR5-05" }, tags);
    }

    [Fact]
    public void Every_quantity_string_maps_to_a_function()
    {
        foreach (var row in SupplementaryVerificationData.Rows)
        {
            var mapping = VerificationQuantities.For(row.Quantity);
            Assert.NotNull(mapping.Compute);
            Assert.Equal(row.Quantity.Contains("subregion ", StringComparison.Ordinal), mapping.Select is not null);
        }
    }

    [Fact]
    public void Inputs_strings_are_parsed_with_units_and_subregion()
    {
        var a = new ParsedInputs("h=0.001 kJ/kg; s=0 kJ/(kg K)");
        Assert.Equal(2, a.Count);
        Assert.Equal(0.001, a["h"]);
        Assert.Equal(0.0, a["s"]);
        Assert.Null(a.Subregion);

        var b = new ParsedInputs("p=22.064 MPa; T=647.15 K; subregion 3z");
        Assert.Equal(22.064, b["p"]);
        Assert.Equal(647.15, b["T"]);
        Assert.Equal("3z", b.Subregion);

        var c = new ParsedInputs(" s = -1.5e-4 kJ/(kg K) ");
        Assert.Equal(-1.5e-4, c["s"]);
        Assert.Throws<FormatException>(() => new ParsedInputs("h=abc kJ/kg"));
    }

    [Fact]
    public void Quoted_csv_fields_keep_their_commas()
    {
        var fields = SupplementaryVerificationData.SplitCsv("IAPWS SR2-01(2014),Table 3,h=90 kJ/kg; s=0 kJ/(kg K),\"p = p1(h,s), region 1\",MPa,9.192954727E+01,6");
        Assert.Equal(7, fields.Count);
        Assert.Equal("p = p1(h,s), region 1", fields[3]);
        Assert.Equal(("p1", "h,s"), VerificationQuantities.FunctionOf(fields[3]));
    }
}
