using NotebookCycles.Properties;
using NotebookCycles.Refrigerants;
using Xunit;

namespace NotebookCycles.Tests.Refrigerants;

/// <summary>
/// Every row of refrigerant_verification.csv reproduced within its printed precision (half a unit of the last printed
/// digit). The source of each value (paper and table) is the row's own <c>source</c> column, shown in the test name.
/// </summary>
public sealed class RefrigerantVerificationTests
{
    /// <summary>The rows, grouped by source so the test explorer names the paper and table.</summary>
    public static TheoryData<string, int> Rows()
    {
        var data = new TheoryData<string, int>();
        foreach (var row in RefrigerantVerificationRows())
        {
            data.Add(row.Source, row.Line);
        }

        return data;
    }

    private static IEnumerable<RefrigerantRow> RefrigerantVerificationRows() => RefrigerantRow.All;

    [Theory]
    [MemberData(nameof(Rows))]
    public void Published_value_is_reproduced(string source, int line)
    {
        var row = RefrigerantRow.All.Single(r => r.Line == line);
        Assert.Equal(source, row.Source);
        double computed = Compute(row);
        double tolerance = Tolerance(row);
        Assert.True(Math.Abs(computed - row.Value) <= tolerance,
            $"{row}: computed {computed:G10}, published {row.Published} ({source}); |Δ| = {Math.Abs(computed - row.Value):G3} > {tolerance:G3}");
    }

    internal static double Tolerance(RefrigerantRow row) => row.HalfUnit * (1 + 1e-9);

    internal static Refrigerant Model(RefrigerantRow row)
    {
        var reference = row.Reference switch
        {
            "IIR" => ReferenceState.Iir,
            _ => ReferenceState.Equation,
        };
        return Refrigerant.Get(row.Fluid switch
        {
            "R717" => "R717-1993",
            "R717_Gao2023" => "R717",
            var f => f,
        }, reference);
    }

    internal static double Compute(RefrigerantRow row)
    {
        var m = Model(row);
        switch (row.Kind)
        {
            case "satT":
            case "satp":
                {
                    var sat = row.Kind == "satT" ? m.Saturation(row.T) : m.SaturationAtPressure(row.P);
                    return Saturated(sat, row.Quantity);
                }

            case "Tp":
                {
                    var s = m.FromTP(row.T, row.P);
                    return Single(s, row.Quantity, m.MolarMass);
                }

            case "Trho":
                {
                    var s = m.FromTRho(row.T, row.RhoMolar * m.MolarMass);
                    return Single(s, row.Quantity, m.MolarMass);
                }

            case "crit":
                {
                    var core = m.Core;
                    return row.Quantity switch
                    {
                        "Tc_K" => core.ReducingTemperature,
                        "rhoc" => core.ReducingDensity,
                        "rhoc_mol_dm3" => core.ReducingDensity / m.MolarMass / 1000,
                        "pc_MPa" => core.Pressure(core.ReducingTemperature, core.ReducingDensity) / 1e6,
                        _ => throw new InvalidOperationException(row.Quantity),
                    };
                }

            default:
                throw new InvalidOperationException(row.Kind);
        }
    }

    private static double Saturated(SaturationProperties sat, string q) => q switch
    {
        "p_MPa" => sat.P / 1e6,
        "p_kPa" => sat.P / 1e3,
        "T_K" => sat.T,
        "T_C" => sat.T - 273.15,
        "rhoL" => sat.Liquid.Rho,
        "rhoV" => sat.Vapour.Rho,
        "hL" => sat.Liquid.H / 1e3,
        "hV" => sat.Vapour.H / 1e3,
        "sL" => sat.Liquid.S / 1e3,
        "sV" => sat.Vapour.S / 1e3,
        "cvL" => sat.Liquid.Cv / 1e3,
        "cvV" => sat.Vapour.Cv / 1e3,
        "cpL" => sat.Liquid.Cp / 1e3,
        "cpV" => sat.Vapour.Cp / 1e3,
        "wL" => sat.Liquid.W,
        "wV" => sat.Vapour.W,
        "dh_vap" => (sat.Vapour.H - sat.Liquid.H) / 1e3,
        "ds_vap" => (sat.Vapour.S - sat.Liquid.S) / 1e3,
        _ => throw new InvalidOperationException(q),
    };

    private static double Single(StatePoint s, string q, double molarMass) => q switch
    {
        "rho" => s.Rho,
        "rho_mol_dm3" => s.Rho / molarMass / 1000,
        "p_MPa" => s.P / 1e6,
        "h" => s.H / 1e3,
        "s" => s.S / 1e3,
        "u" => s.U / 1e3,
        "cv" => s.Cv / 1e3,
        "cp" => s.Cp / 1e3,
        "w" => s.W,
        "cvm" => s.Cv * molarMass,
        "cpm" => s.Cp * molarMass,
        "hm" => s.H * molarMass / 1e3,
        "sm" => s.S * molarMass,
        _ => throw new InvalidOperationException(q),
    };
}
