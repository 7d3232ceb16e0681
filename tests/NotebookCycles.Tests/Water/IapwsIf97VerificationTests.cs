using NotebookCycles.Properties;
using NotebookCycles.Water;
using Xunit;

namespace NotebookCycles.Tests.Water;

/// <summary>
/// The computer-program verification values of IAPWS R7-97(2012) (ReferenceData/iapws_if97_verification.csv, 106 rows,
/// each naming its release table) and the metastable-vapour Table 18 rows of
/// ReferenceData/iapws_if97_supplementary_verification.csv, all to 1e-8 relative.
/// </summary>
public sealed class IapwsIf97VerificationTests
{
    private const double Tolerance = 1e-8;
    private static readonly IapwsIf97 Steam = IapwsIf97.Default;

    public static TheoryData<string, string, string, string, double> MainRelease()
    {
        var data = new TheoryData<string, string, string, string, double>();
        foreach (var row in ReferenceCsv.Read("iapws_if97_verification.csv"))
        {
            data.Add(row["source_table"], row["inputs"], row["quantity"], row["unit"], ReferenceCsv.Number(row["value"]));
        }

        return data;
    }

    public static TheoryData<string, string, string, string, double> MetastableTable18()
    {
        var data = new TheoryData<string, string, string, string, double>();
        foreach (var row in ReferenceCsv.Read("iapws_if97_supplementary_verification.csv"))
        {
            if (row["release"] == "IAPWS R7-97(2012)" && row["table"] == "Table 18")
            {
                data.Add("IAPWS R7-97(2012) " + row["table"], row["inputs"], row["quantity"].Split(',')[0], row["unit"], ReferenceCsv.Number(row["value"]));
            }
        }

        return data;
    }

    [Fact]
    public void The_files_hold_106_main_release_values_and_18_metastable_values()
    {
        Assert.Equal(106, MainRelease().Count);
        Assert.Equal(18, MetastableTable18().Count);
    }

    [Theory]
    [MemberData(nameof(MainRelease))]
    public void Main_release_verification_value(string sourceTable, string inputs, string quantity, string unit, double expected)
    {
        double actual = Compute(sourceTable, ReferenceCsv.Inputs(inputs), quantity);
        AssertClose(sourceTable, inputs, quantity, unit, expected, actual);
    }

    [Theory]
    [MemberData(nameof(MetastableTable18))]
    public void Metastable_vapour_verification_value(string sourceTable, string inputs, string quantity, string unit, double expected)
    {
        var i = ReferenceCsv.Inputs(inputs);
        var st = Steam.MetastableVapourFromTP(i["T"], i["p"] * 1e6);
        AssertClose(sourceTable, inputs, quantity, unit, expected, Single(st, quantity));
    }

    private static void AssertClose(string sourceTable, string inputs, string quantity, string unit, double expected, double actual)
    {
        double rel = Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(rel <= Tolerance, $"{sourceTable}: {quantity} at {inputs} = {actual:G12} {unit}, expected {expected:G12} (relative error {rel:E2}, limit {Tolerance:E0})");
    }

    private static double Compute(string table, Dictionary<string, double> i, string quantity)
    {
        if (table.Contains("region 1 backward T(p,h)", StringComparison.Ordinal))
        {
            return Region1.TemperaturePH(i["p"], i["h"]);
        }

        if (table.Contains("region 1 backward T(p,s)", StringComparison.Ordinal))
        {
            return Region1.TemperaturePS(i["p"], i["s"]);
        }

        if (table.Contains("region 2 backward T(p,h)", StringComparison.Ordinal))
        {
            return Region2.TemperaturePH(i["p"], i["h"]);
        }

        if (table.Contains("region 2 backward T(p,s)", StringComparison.Ordinal))
        {
            return Region2.TemperaturePS(i["p"], i["s"]);
        }

        if (table.Contains("B23 eq. 5", StringComparison.Ordinal))
        {
            return Region3.PressureB23(i["T"]);
        }

        if (table.Contains("B23 eq. 6", StringComparison.Ordinal))
        {
            return Region3.TemperatureB23(i["p"]);
        }

        if (table.Contains("B2bc eq. 20", StringComparison.Ordinal))
        {
            return Region2.PressureB2bc(i["h"]);
        }

        if (table.Contains("B2bc eq. 21", StringComparison.Ordinal))
        {
            return Region2.EnthalpyB2bc(i["p"]);
        }

        if (table.Contains("saturation pressure", StringComparison.Ordinal))
        {
            return Steam.SaturationPressure(i["T"]) * 1e-6;
        }

        if (table.Contains("saturation temperature", StringComparison.Ordinal))
        {
            return Steam.SaturationTemperature(i["p"] * 1e6);
        }

        if (table.Contains("region 3", StringComparison.Ordinal))
        {
            var st3 = Steam.FromTV(i["T"], 1.0 / i["rho"]);
            Assert.Equal(3, Steam.Region(st3));
            return quantity == "p" ? st3.P * 1e-6 : Single(st3, quantity);
        }

        var st = Steam.FromTP(i["T"], i["p"] * 1e6);
        int region = table.Contains("region 1", StringComparison.Ordinal) ? 1 : table.Contains("region 2", StringComparison.Ordinal) ? 2 : 5;
        Assert.Equal(region, Steam.Region(i["T"], i["p"] * 1e6));
        return Single(st, quantity);
    }

    /// <summary>A property in the file's units (m³/kg, kJ/kg, kJ/(kg K), m/s).</summary>
    private static double Single(in StatePoint st, string quantity) => quantity switch
    {
        "v" => st.V,
        "h" => st.H * 1e-3,
        "u" => st.U * 1e-3,
        "s" => st.S * 1e-3,
        "cp" => st.Cp * 1e-3,
        "w" => st.W,
        _ => throw new ArgumentException("Unknown quantity " + quantity),
    };
}
