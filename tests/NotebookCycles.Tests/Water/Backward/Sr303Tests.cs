using NotebookCycles.Water.Backward;
using Xunit;
using Xunit.Abstractions;

namespace NotebookCycles.Tests.Water.Backward;

public sealed class Sr303Tests(ITestOutputHelper output)
{
    public static IEnumerable<object[]> Rows() => SupplementaryVerificationData.CasesOf("SR3-03");

    public static IEnumerable<object[]> SubregionRows() => SupplementaryVerificationData.SubregionCasesOf("SR3-03");

    // Values: IAPWS SR3-03(2014) verification tables, from ReferenceData/iapws_if97_supplementary_verification.csv.
    [Theory]
    [MemberData(nameof(Rows))]
    public void Reproduces_the_release_verification_value(string release, string table, string inputs, string quantity, string unit, string value)
    {
        Assert.StartsWith("IAPWS SR3-03", release, StringComparison.Ordinal);
        Assert.False(string.IsNullOrWhiteSpace(table));
        VerificationAssert.Reproduces(inputs, quantity, unit, value);
    }

    // IAPWS SR3-03(2014): every T and v check point is given with the subregion (3a or 3b) it lies in.
    [Theory]
    [MemberData(nameof(SubregionRows))]
    public void Selector_picks_the_subregion_the_release_names(string release, string table, string inputs, string quantity, string unit, string value)
    {
        Assert.StartsWith("IAPWS SR3-03", release, StringComparison.Ordinal);
        Assert.NotEmpty(table + unit + value);
        VerificationAssert.SelectsNamedSubregion(inputs, quantity);
    }

    [Fact]
    public void Every_row_of_the_release_is_within_1e9()
    {
        VerificationAssert.MaxErrorBelowTolerance("SR3-03", 31, output);
    }

    [Fact]
    public void The_ps_equations_switch_at_the_critical_entropy()
    {
        // s_c = 4.41202148223476 kJ/(kg K), the 3a/3b boundary of T(p,s) and v(p,s) (IAPWS SR3-03(2014), boundary of the (p,s) equations).
        Assert.Equal('a', Sr303.SubregionPS(50, 4.41202148223476));
        Assert.Equal('b', Sr303.SubregionPS(50, 4.41202148223477));
        // Both equations describe the boundary state; they agree there to well under 0.1 % (consistency check, no published value).
        double ta = Sr303.T3aPS(50, 4.41202148223476);
        double tb = Sr303.T3bPS(50, 4.41202148223476);
        Assert.InRange(Math.Abs(ta - tb) / ta, 0, 1e-3);
    }

    [Fact]
    public void Pressure_above_region3_throws_naming_p_and_the_range()
    {
        VerificationAssert.OutOfRange(() => Sr303.T3PH(120, 2000), "p", "120", "16.529164253", "100");
    }

    [Fact]
    public void Saturation_enthalpy_outside_the_region3_part_throws_naming_h_and_the_range()
    {
        VerificationAssert.OutOfRange(() => Sr303.P3satH(1000), "h", "1000", "1670.858218", "2563.592004");
    }

    [Fact]
    public void Saturation_entropy_outside_the_region3_part_throws_naming_s_and_the_range()
    {
        VerificationAssert.OutOfRange(() => Sr303.P3satS(6), "s", "6", "3.77828134", "5.210887825");
    }
}
