using NotebookCycles.Water.Backward;
using Xunit;
using Xunit.Abstractions;

namespace NotebookCycles.Tests.Water.Backward;

public sealed class Sr201Tests(ITestOutputHelper output)
{
    public static IEnumerable<object[]> Rows() => SupplementaryVerificationData.CasesOf("SR2-01");

    public static IEnumerable<object[]> SubregionRows() => SupplementaryVerificationData.SubregionCasesOf("SR2-01");

    // Values: IAPWS SR2-01(2014) verification tables, from ReferenceData/iapws_if97_supplementary_verification.csv.
    [Theory]
    [MemberData(nameof(Rows))]
    public void Reproduces_the_release_verification_value(string release, string table, string inputs, string quantity, string unit, string value)
    {
        Assert.StartsWith("IAPWS SR2-01", release, StringComparison.Ordinal);
        Assert.False(string.IsNullOrWhiteSpace(table));
        VerificationAssert.Reproduces(inputs, quantity, unit, value);
    }

    // IAPWS SR2-01(2014) Table 9 names the subregion (2a, 2b, 2c) of each check point.
    [Theory]
    [MemberData(nameof(SubregionRows))]
    public void Region2_selector_picks_the_subregion_the_release_names(string release, string table, string inputs, string quantity, string unit, string value)
    {
        Assert.StartsWith("IAPWS SR2-01", release, StringComparison.Ordinal);
        Assert.NotEmpty(table + unit + value);
        VerificationAssert.SelectsNamedSubregion(inputs, quantity);
    }

    [Fact]
    public void Every_row_of_the_release_is_within_1e9()
    {
        VerificationAssert.MaxErrorBelowTolerance("SR2-01", 13, output);
    }

    [Fact]
    public void Subregion_equations_meet_the_selector_on_both_sides_of_the_2a_2b_boundary()
    {
        // On h = h2ab(s) the 2a and 2b equations describe the same state; their pressures agree to the release's
        // consistency tolerance (a few tenths of a percent is generous; the check is that the selector switches
        // between equations at a boundary where both are close, not a published value).
        double s = 7.0;
        double h = Sr201.H2ab(s);
        double pa = Sr201.P2aHS(h, s);
        double pb = Sr201.P2bHS(h, s);
        Assert.InRange(pa, 3.9, 4.1); // IAPWS SR2-01(2014): the 2a/2b boundary h2ab(s) follows the 4 MPa isobar
        Assert.InRange(Math.Abs(pa - pb) / pa, 0, 1e-3);
        Assert.Equal('a', Sr201.Subregion2(h, s));
        Assert.Equal('b', Sr201.Subregion2(h + 1e-6, s));
    }

    [Fact]
    public void Below_the_start_of_the_4_MPa_isobar_no_state_is_in_2a()
    {
        // For s < s''(4 MPa) = 6.069709160 kJ/(kg K) (IF97 forward equations) the 4 MPa isobar lies in the wet-steam
        // region, so every region-2 state there is above 4 MPa: subregion 2b (s ≥ 5.85) or 2c, although the cubic
        // h2ab(s) extended below its range would pass above the saturated-vapour line.
        Assert.True(Sr201.H2ab(6.0) > 2760);
        Assert.Equal('b', Sr201.Subregion2(2760, 6.0));
        Assert.Equal('c', Sr201.Subregion2(2700, 5.6));
        Assert.Equal('a', Sr201.Subregion2(2760, 6.1));
    }

    [Fact]
    public void Region1_entropy_above_the_region_throws_naming_s_and_the_range()
    {
        VerificationAssert.OutOfRange(() => Sr201.P1HS(500, 4.0), "s", "4", "-0.008582287093", "3.77828134");
    }

    [Fact]
    public void Region2_enthalpy_below_the_region_throws_naming_h_and_the_range()
    {
        VerificationAssert.OutOfRange(() => Sr201.P2HS(2000, 7), "h", "2000", "2500.892618", "4160.660928");
    }

    [Fact]
    public void NaN_input_throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Sr201.P1HS(double.NaN, 1));
        Assert.Equal("h", ex.ParamName);
        Assert.Contains("NaN", ex.Message, StringComparison.Ordinal);
    }
}
