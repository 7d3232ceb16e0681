using NotebookCycles.Cycles;
using NotebookCycles.Refrigerants;
using UnitsNet;
using Xunit;

namespace NotebookCycles.Tests.Refrigerants;

/// <summary>Vapour-compression cycles through the chain.</summary>
public sealed class RefrigerationCyclesTests
{
    [Fact]
    public void Ideal_cycle_matches_a_hand_computation_from_published_saturation_rows()
    {
        // Tillner-Roth & Baehr, JPCRD 23 (1994) Table 8 (saturation, p. 696), R-134a, IIR:
        // 250 K: h′ = 169.57, h″ = 384.60 kJ/kg, s′ = 0.8841, s″ = 1.7443 kJ/(kg·K), p = 0.11561 MPa;
        // 300 K: h′ = 237.19, h″ = 413.27 kJ/kg, s″ = 1.7156 kJ/(kg·K), p = 0.70282 MPa.
        // Cycle with a dry-saturated compressor discharge: 1 wet at 250 K with s1 = s″(300 K), 2 saturated vapour at
        // 300 K, 3 saturated liquid at 300 K, 4 throttled to 250 K. Every state comes from the table.
        double x1 = (1.7156 - 0.8841) / (1.7443 - 0.8841);
        double h1 = 169.57 + x1 * (384.60 - 169.57), h2 = 413.27, h3 = 237.19;
        double cop = (h1 - h3) / (h2 - h1);
        var m = Refrigerant.R134a;
        var cycle = Cycle.SteadyFlow("check", m)
            .Start("1", T: Temperature.FromKelvins(250), x: x1)
            .Compress("2", toPressure: Pressure.FromPascals(m.SaturationPressure(300)))
            .Condense("3", toQuality: 0)
            .Throttle("4", toPressure: Pressure.FromPascals(m.SaturationPressure(250)))
            .Heat(backTo: "1");
        // Table rounding (h to 0.01 kJ/kg, s to 1e-4 kJ/(kg·K)) moves h1 by up to about 0.03 kJ/kg and the COP by about 0.4 %.
        Assert.Equal(h2, cycle["2"].Point.H / 1e3, 0.03);
        Assert.Equal(1, cycle["2"].Point.X, 2e-3);
        Assert.Equal(h3, cycle["3"].Point.H / 1e3, 0.005);
        Assert.Equal(cop, cycle.Figures.CopCooling, 0.004 * cop);
        Assert.Equal(0.70282, cycle["2"].Point.P / 1e6, 5e-6);
    }

    [Fact]
    public void Template_figures_agree_with_the_chain_figures()
    {
        var m = Refrigerant.R134a;
        var design = new VapourCompressionOptions { Superheat = TemperatureDelta.FromKelvins(5), Subcooling = TemperatureDelta.FromKelvins(3), CompressorEfficiency = 0.75 };
        var cycle = RefrigerationCycles.VapourCompression(m, Temperature.FromDegreesCelsius(-10), Temperature.FromDegreesCelsius(40), design);
        var f = VapourCompressionFigures.From(cycle);
        Assert.Equal(cycle.Figures.CopCooling, f.CopCooling, 1e-9);
        Assert.Equal(cycle.Figures.CopHeating, f.CopHeating, 1e-9);
        Assert.Equal(f.CopCooling + 1, f.CopHeating, 1e-9);
        Assert.Equal(263.15, f.EvaporatingTemperature, 1e-6);
        Assert.Equal(313.15, f.CondensingTemperature, 1e-6);
        Assert.Equal(263.15 / 50, f.CarnotCop, 1e-6);
        Assert.True(f.CopCooling < f.CarnotCop);
        Assert.Equal(268.15, cycle["1"].Point.T, 1e-6);
        Assert.Equal(310.15, cycle["3"].Point.T, 1e-6);
        Assert.True(f.DischargeTemperature > 313.15);
        Assert.Equal(m.SaturationPressure(313.15) / m.SaturationPressure(263.15), f.PressureRatio, 1e-9);
        Assert.Equal(f.RefrigeratingEffect / cycle["1"].Point.V, f.VolumetricCapacity, 1e-6);
        Assert.Equal(cycle["3"].Point.H, cycle["4"].Point.H, 1e-6);
    }

    [Theory]
    [InlineData("R32")]
    [InlineData("R1234yf")]
    [InlineData("R717")]
    [InlineData("R290")]
    [InlineData("R744")]
    public void Every_fluid_runs_a_cycle(string fluid)
    {
        var m = Refrigerant.Get(fluid);
        var cycle = RefrigerationCycles.VapourCompression(m, Temperature.FromDegreesCelsius(-20), Temperature.FromDegreesCelsius(fluid == "R744" ? 20 : 35));
        Assert.All(cycle.Checks, c => Assert.True(c.Passed, c.ToString()));
        Assert.True(cycle.Figures.CopCooling > 1);
    }

    [Fact]
    public void Evaporator_warmer_than_condenser_is_refused()
    {
        var ex = Assert.Throws<CycleDefinitionException>(() => RefrigerationCycles.VapourCompression(Refrigerant.R134a, Temperature.FromDegreesCelsius(40), Temperature.FromDegreesCelsius(30)));
        Assert.Contains("evaporating temperature", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Condenser_above_the_critical_temperature_is_refused()
    {
        var ex = Assert.Throws<CycleDefinitionException>(() => RefrigerationCycles.VapourCompression(Refrigerant.R744, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(35)));
        Assert.Contains("critical temperature", ex.Message, StringComparison.Ordinal);
        Assert.Contains("transcritical", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void By_pressure_equals_by_temperature()
    {
        var m = Refrigerant.R32;
        var byT = RefrigerationCycles.VapourCompression(m, Temperature.FromKelvins(263.15), Temperature.FromKelvins(313.15));
        var byP = RefrigerationCycles.VapourCompression(m, Pressure.FromPascals(m.SaturationPressure(263.15)), Pressure.FromPascals(m.SaturationPressure(313.15)));
        Assert.Equal(byT.Figures.CopCooling, byP.Figures.CopCooling, 1e-9);
        Assert.Throws<CycleDefinitionException>(() => RefrigerationCycles.VapourCompression(m, Pressure.FromMegapascals(1), Pressure.FromMegapascals(0.5)));
    }

    [Fact]
    public void Transcritical_co2_cycle()
    {
        var m = Refrigerant.R744;
        var cycle = RefrigerationCycles.Transcritical(m, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(35), Pressure.FromMegapascals(9), new VapourCompressionOptions { CompressorEfficiency = 0.7 });
        var f = VapourCompressionFigures.From(cycle);
        Assert.Equal(308.15, cycle["3"].Point.T, 1e-6);
        Assert.Equal(9e6, cycle["3"].Point.P, 1e-3);
        Assert.True(cycle["4"].Point.IsTwoPhase);
        Assert.Equal(f.RefrigeratingEffect / f.CompressorWork, cycle.Figures.CopCooling, 1e-9);
        Assert.True(f.CopCooling > 1 && f.CopCooling < f.CarnotCop);
        Assert.All(cycle.Checks, c => Assert.True(c.Passed, c.ToString()));
    }

    [Fact]
    public void Suction_line_heat_exchanger_balances_and_vanishes_at_zero_effectiveness()
    {
        var te = Temperature.FromDegreesCelsius(-10);
        var tc = Temperature.FromDegreesCelsius(45);
        var plain = RefrigerationCycles.VapourCompression(Refrigerant.R134a, te, tc, new VapourCompressionOptions { CompressorEfficiency = 0.75 });
        var none = RefrigerationCycles.VapourCompression(Refrigerant.R134a, te, tc, new VapourCompressionOptions { CompressorEfficiency = 0.75, SuctionLineEffectiveness = 0 });
        var slhx = RefrigerationCycles.VapourCompression(Refrigerant.R134a, te, tc, new VapourCompressionOptions { CompressorEfficiency = 0.75, SuctionLineEffectiveness = 0.6 });

        Assert.Equal(plain.Figures.CopCooling, none.Figures.CopCooling, 1e-9);

        // Energy balance of the exchanger: h1a − h1 = h3 − h3a (equal flows), and ε = (h1a − h1)/(h(T3, p1) − h1).
        double h1 = slhx["1"].Point.H, h1a = slhx["1a"].Point.H, h3 = slhx["3"].Point.H, h3a = slhx["3a"].Point.H;
        Assert.Equal(h1a - h1, h3 - h3a, 1e-9 * h3);
        double hStar = Refrigerant.R134a.FromTP(slhx["3"].Point.T, slhx["1"].Point.P).H;
        Assert.Equal(0.6, (h1a - h1) / (hStar - h1), 1e-9);
        var f = VapourCompressionFigures.From(slhx);
        Assert.Equal(h1 - slhx["4"].Point.H, f.RefrigeratingEffect, 1e-9);
        Assert.Equal(slhx["2"].Point.H - h1a, f.CompressorWork, 1e-9);
        Assert.True(f.RefrigeratingEffect > VapourCompressionFigures.From(plain).RefrigeratingEffect);
    }

    [Fact]
    public void Mass_flow_for_a_capacity_is_capacity_over_the_specific_effect()
    {
        var cycle = RefrigerationCycles.VapourCompression(Refrigerant.R134a, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(45), new VapourCompressionOptions { CompressorEfficiency = 0.75 });
        var f = VapourCompressionFigures.From(cycle);
        double qL = cycle["1"].Point.H - cycle["4"].Point.H, w = cycle["2"].Point.H - cycle["1"].Point.H;
        Assert.Equal(10e3 / qL, f.MassFlowForCooling(UnitsNet.Power.FromKilowatts(10)), 1e-12);
        Assert.Equal(10e3 / (qL + w), f.MassFlowForHeating(UnitsNet.Power.FromKilowatts(10)), 1e-12);
        Assert.Equal(0.9 * 2e-3 / cycle["1"].Point.V, f.MassFlowFromDisplacement(2e-3, 0.9), 1e-12);
        Assert.Throws<ArgumentOutOfRangeException>(() => f.MassFlowFromDisplacement(2e-3, 1.2));
    }

    [Fact]
    public void Optimum_high_side_pressure_of_a_transcritical_co2_cycle_is_a_true_maximum()
    {
        // CO2 cycle, evaporating at −5 °C, gas cooler outlet 35 °C, compressor η = 0.7 (invented operating point).
        var m = Refrigerant.R744;
        var design = new VapourCompressionOptions { CompressorEfficiency = 0.7 };
        var best = RefrigerationCycles.OptimumHighSidePressure(m, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(35), Pressure.FromMegapascals(7.5), Pressure.FromMegapascals(14), design);
        double cop(double p) => RefrigerationCycles.Transcritical(m, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(35), Pressure.FromPascals(p), design).Figures.CopCooling;

        Assert.InRange(best.Value, 7.6e6, 13.9e6);
        Assert.False(best.ConstraintActive);
        Assert.True(best.Objective >= cop(best.Value * 0.98));
        Assert.True(best.Objective >= cop(best.Value * 1.02));
        Assert.Equal(cop(best.Value), best.Objective, 1e-12);

        // Rule of thumb for CO2 near a 35 °C gas-cooler outlet: the optimum lies between about 8.5 and 10 MPa
        // (common practice, no source).
        Assert.InRange(best.Value, 8.5e6, 10e6);
    }

    [Fact]
    public void Transcritical_requests_that_would_condense_are_refused()
    {
        var ex = Assert.Throws<CycleDefinitionException>(() => RefrigerationCycles.Transcritical(Refrigerant.R134a, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(40), Pressure.FromMegapascals(5)));
        Assert.Contains("condenses", ex.Message, StringComparison.Ordinal);
        var low = Assert.Throws<CycleDefinitionException>(() => RefrigerationCycles.Transcritical(Refrigerant.R744, Temperature.FromDegreesCelsius(-5), Temperature.FromDegreesCelsius(35), Pressure.FromMegapascals(6)));
        Assert.Contains("subcritical", low.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_record_carries_the_coefficients_of_performance()
    {
        var cycle = RefrigerationCycles.VapourCompression(Refrigerant.R290, Temperature.FromDegreesCelsius(-10), Temperature.FromDegreesCelsius(45));
        Assert.True(cycle.Figures.NetWork < 0);
        string md = cycle.ToMarkdown();
        Assert.Contains("COP, cooling", md, StringComparison.Ordinal);
        Assert.Contains("R-290", md, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_stage_flash_tank_cycle_matches_a_direct_computation()
    {
        var m = Refrigerant.R717;
        var cycle = RefrigerationCycles.TwoStageFlashTank(m, Temperature.FromDegreesCelsius(-30), Temperature.FromDegreesCelsius(40));
        Assert.All(cycle.Checks, c => Assert.True(c.Passed, c.ToString()));

        // Direct computation with the same model, per unit mass through the condenser (mass balances by hand).
        double pe = m.SaturationPressure(243.15), pc = m.SaturationPressure(313.15), pi = Math.Sqrt(pe * pc);
        var s1 = m.FromPX(pe, 1);
        var s2 = m.FromPS(pi, s1.S);
        var s5 = m.FromPX(pc, 0);
        double x6 = m.FromPH(pi, s5.H).X;
        var g = m.FromPX(pi, 1);
        var f = m.FromPX(pi, 0);
        double h3 = (1 - x6) * s2.H + x6 * g.H;
        var s3 = m.FromPH(pi, h3);
        var s4 = m.FromPS(pc, s3.S);
        double qEvap = (1 - x6) * (s1.H - f.H);
        double work = (1 - x6) * (s2.H - s1.H) + (s4.H - s3.H);
        Assert.Equal(qEvap / work, cycle.Figures.CopCooling, 1e-9 * qEvap / work);
        Assert.Equal(s4.T, cycle["4"].Point.T, 1e-6);
        Assert.Equal(x6, cycle["6"].Point.X, 1e-10);

        var single = RefrigerationCycles.VapourCompression(m, Temperature.FromDegreesCelsius(-30), Temperature.FromDegreesCelsius(40));
        Assert.True(cycle.Figures.CopCooling > single.Figures.CopCooling);
        Assert.True(cycle["4"].Point.T < single["2"].Point.T);
        Assert.Contains("Mixing with flash-tank vapour", cycle.ToMarkdown(), StringComparison.Ordinal);
        Assert.Throws<CycleDefinitionException>(() => RefrigerationCycles.TwoStageFlashTank(m, Temperature.FromDegreesCelsius(-30), Temperature.FromDegreesCelsius(40), Pressure.FromPascals(pe / 2)));
    }
}
