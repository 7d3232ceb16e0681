using NotebookCycles.Cycles;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

/// <summary>
/// The display-unit switch. Conversion factors: NIST Special Publication 811 (2008), Appendix B (psi = 6.894757 E+03 Pa;
/// Btu_IT/lb = 2.326 E+03 J/kg exactly; Btu_IT/(lb·°R) = 4.1868 E+03 J/(kg·K) exactly; ft³/lb = 6.242796 E−02 m³/kg);
/// t/°C = T/K − 273.15 and t/°F = 1.8·T/K − 459.67 by definition (SI Brochure, 9th edition; NIST SP 811 B.9).
/// </summary>
public sealed class UnitTextTests
{
    [Fact]
    public void Temperature_300_K_is_26_85_C_and_80_33_F()
    {
        Assert.Equal("300.00 K", UnitText.WithUnit(300, DisplayQuantity.Temperature, DisplayUnits.Si));
        Assert.Equal("26.85 °C", UnitText.WithUnit(300, DisplayQuantity.Temperature, DisplayUnits.SiCelsiusBar));
        Assert.Equal("80.33 °F", UnitText.WithUnit(300, DisplayQuantity.Temperature, DisplayUnits.UsCustomary));
        Assert.Equal("540.00 °R", UnitText.WithUnit(300, DisplayQuantity.AbsoluteTemperature, DisplayUnits.UsCustomary));
        Assert.Equal("300.00 K", UnitText.WithUnit(300, DisplayQuantity.AbsoluteTemperature, DisplayUnits.SiCelsiusBar));
    }

    [Fact]
    public void Pressure_100_kPa_is_1_bar_and_14_5038_psia()
    {
        Assert.Equal(100.0, UnitText.Convert(100e3, DisplayQuantity.Pressure, DisplayUnits.Si), 12);
        Assert.Equal(1.0, UnitText.Convert(100e3, DisplayQuantity.Pressure, DisplayUnits.SiCelsiusBar), 12);
        Assert.Equal(14.5038, UnitText.Convert(100e3, DisplayQuantity.Pressure, DisplayUnits.UsCustomary), 4);
        Assert.Equal("100.00 kPa", UnitText.WithUnit(100e3, DisplayQuantity.Pressure, DisplayUnits.Si));
        Assert.Equal("1.0000 bar", UnitText.WithUnit(100e3, DisplayQuantity.Pressure, DisplayUnits.SiCelsiusBar));
        Assert.Equal("14.504 psia", UnitText.WithUnit(100e3, DisplayQuantity.Pressure, DisplayUnits.UsCustomary));
    }

    [Fact]
    public void Energy_entropy_and_volume_convert_by_the_exact_factors()
    {
        Assert.Equal(1.0, UnitText.Convert(2326, DisplayQuantity.SpecificEnergy, DisplayUnits.UsCustomary), 12);
        Assert.Equal(2.326, UnitText.Convert(2326, DisplayQuantity.SpecificEnergy, DisplayUnits.SiCelsiusBar), 12);
        Assert.Equal(1.0, UnitText.Convert(4186.8, DisplayQuantity.SpecificEntropy, DisplayUnits.UsCustomary), 12);
        Assert.Equal(16.01846, UnitText.Convert(1.0, DisplayQuantity.SpecificVolume, DisplayUnits.UsCustomary), 5);
        Assert.Equal("Btu/(lbm·R)", UnitText.Unit(DisplayQuantity.SpecificEntropy, DisplayUnits.UsCustomary));
    }

    [Fact]
    public void Heat_rate_and_specific_consumption_per_kWh()
    {
        // A heat rate of 2 J/J (η = 0.5) is 7200 kJ/kWh; 1 kWh = 3.6 MJ = 3412.14 Btu_IT (NIST SP 811 B.8).
        Assert.Equal(7200.0, UnitText.Convert(2.0, DisplayQuantity.HeatRate, DisplayUnits.Si), 9);
        Assert.Equal(6824.28, UnitText.Convert(2.0, DisplayQuantity.HeatRate, DisplayUnits.UsCustomary), 2);
        Assert.Equal("kJ/kWh", UnitText.Unit(DisplayQuantity.HeatRate, DisplayUnits.SiCelsiusBar));
        Assert.Equal("Btu/kWh", UnitText.Unit(DisplayQuantity.HeatRate, DisplayUnits.UsCustomary));

        // 1e-6 kg/J is 3.6 kg/kWh; 1 lb = 0.45359237 kg exactly (NIST SP 811 B.8).
        Assert.Equal(3.6, UnitText.Convert(1e-6, DisplayQuantity.SpecificConsumption, DisplayUnits.Si), 12);
        Assert.Equal(3.6 / 0.45359237, UnitText.Convert(1e-6, DisplayQuantity.SpecificConsumption, DisplayUnits.UsCustomary), 9);
        Assert.Equal("lbm/kWh", UnitText.Unit(DisplayQuantity.SpecificConsumption, DisplayUnits.UsCustomary));
    }

    [Fact]
    public void The_same_cycle_in_three_systems_shows_converted_numbers_and_the_SI_values_do_not_change()
    {
        var cycle = TestCycles.Otto();
        double t1 = cycle["1"].Point.T, p1 = cycle["1"].Point.P;
        string si = CycleHtml.States(cycle, new RenderOptions { Units = DisplayUnits.Si });
        string bar = CycleHtml.States(cycle, new RenderOptions { Units = DisplayUnits.SiCelsiusBar });
        string us = CycleHtml.States(cycle, new RenderOptions { Units = DisplayUnits.UsCustomary });

        Assert.Contains("<th class=\"nbc-l\">1</th><td>300.00</td><td>100.00</td>", si, StringComparison.Ordinal);
        Assert.Contains("<th class=\"nbc-l\">1</th><td>26.85</td><td>1.0000</td>", bar, StringComparison.Ordinal);
        Assert.Contains("<th class=\"nbc-l\">1</th><td>80.33</td><td>14.504</td>", us, StringComparison.Ordinal);
        Assert.Contains("°C", bar, StringComparison.Ordinal);
        Assert.Contains("psia", us, StringComparison.Ordinal);
        Assert.Equal(t1, cycle["1"].Point.T);
        Assert.Equal(p1, cycle["1"].Point.P);
    }

    [Fact]
    public void Temperatures_inside_relations_stay_absolute()
    {
        var line = new RecordLine("T2", "T1·r^(k−1)", "{0}·{1}^({2}−1)", [new(300, QuantityKind.Temperature), new(8, QuantityKind.Dimensionless), new(1.4, QuantityKind.Dimensionless)], new(689.2, QuantityKind.Temperature));
        Assert.Equal("T2 = T1·r^(k−1) = 300.00·8.000^(1.400−1) = 689.20 K", UnitText.Line(line, DisplayUnits.SiCelsiusBar));
        Assert.Equal("T2 = T1·r^(k−1) = 540.00·8.000^(1.400−1) = 1240.56 °R", UnitText.Line(line, DisplayUnits.UsCustomary));
        string record = CycleText.Record(TestCycles.Otto().Record(), new RenderOptions { Units = DisplayUnits.SiCelsiusBar });
        Assert.DoesNotContain("°C", record, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.000123456, 5, "0.00012346")]
    [InlineData(1234.5678, 5, "1234.6")]
    [InlineData(99999.7, 5, "100000")]
    [InlineData(-0.00001, 4, "-1.000E-5")]
    [InlineData(0.0, 4, "0")]
    [InlineData(double.NaN, 4, "—")]
    public void Significant_digits(double value, int digits, string expected) =>
        Assert.Equal(expected, UnitText.Significant(value, digits));
}
