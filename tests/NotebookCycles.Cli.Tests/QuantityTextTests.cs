using NotebookCycles.Properties;
using Xunit;

namespace NotebookCycles.Cli.Tests;

public sealed class QuantityTextTests
{
    // Conversion factors are exact by the unit definitions (NIST SP 811, 2008 edition, Appendix B: 1 lbf/in² =
    // 6894.757 Pa to the digits printed there; 1 Btu_IT/lb = 2326 J/kg; 1 Btu_IT/(lb·°R) = 4186.8 J/(kg·K);
    // 1 ft³/lb = 0.06242796 m³/kg; T(K) = t(°C) + 273.15 = (t(°F) + 459.67)·5/9 = T(R)·5/9).
    [Theory]
    [InlineData("T=300K", StateProperty.Temperature, 300.0)]
    [InlineData("T=26.85C", StateProperty.Temperature, 300.0)]
    [InlineData("T=100 °C", StateProperty.Temperature, 373.15)]
    [InlineData("T=212F", StateProperty.Temperature, 373.15)]
    [InlineData("T=671.67R", StateProperty.Temperature, 373.15)]
    [InlineData("p=20bar", StateProperty.Pressure, 2.0e6)]
    [InlineData("p=3MPa", StateProperty.Pressure, 3.0e6)]
    [InlineData("p=101.325kPa", StateProperty.Pressure, 101_325.0)]
    [InlineData("p=1atm", StateProperty.Pressure, 101_325.0)]
    [InlineData("p=1psia", StateProperty.Pressure, 6894.757)]
    [InlineData("v=1m3/kg", StateProperty.SpecificVolume, 1.0)]
    [InlineData("v=1 m³/kg", StateProperty.SpecificVolume, 1.0)]
    [InlineData("v=1ft3/lb", StateProperty.SpecificVolume, 0.06242796)]
    [InlineData("h=3100kJ/kg", StateProperty.Enthalpy, 3.1e6)]
    [InlineData("u=1Btu/lb", StateProperty.InternalEnergy, 2326.0)]
    [InlineData("s=6.5kJ/kgK", StateProperty.Entropy, 6500.0)]
    [InlineData("s=6.5 kJ/(kg·K)", StateProperty.Entropy, 6500.0)]
    [InlineData("s=1Btu/lbR", StateProperty.Entropy, 4186.8)]
    [InlineData("x=0.9", StateProperty.Quality, 0.9)]
    [InlineData("x=90%", StateProperty.Quality, 0.9)]
    public void Parses_value_and_unit_to_SI(string text, StateProperty property, double si)
    {
        var input = QuantityText.Parse(text);
        Assert.Equal(property, input.Property);
        Assert.True(Math.Abs(input.Value - si) <= 1e-6 * Math.Abs(si), $"{text}: {input.Value} vs {si}");
    }
}
