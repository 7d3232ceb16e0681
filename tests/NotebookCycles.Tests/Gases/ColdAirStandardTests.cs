using NotebookCycles.Gases;
using NotebookCycles.Properties;
using Xunit;

namespace NotebookCycles.Tests.Gases;

public sealed class ColdAirStandardTests
{
    private static readonly ColdAirStandard Air = ColdAirStandard.Air;

    [Fact]
    public void Isentrope_follows_the_ideal_gas_closed_form()
    {
        // Ideal-gas isentrope with constant k: T2/T1 = (p2/p1)^((k-1)/k) (textbook relation).
        var s1 = Air.FromTP(300, 100_000);
        var s2 = Air.FromPS(1_000_000, s1.S);
        Assert.Equal(300 * Math.Pow(10, 0.4 / 1.4), s2.T, 1e-9);
        var s3 = Air.FromVS(s1.V / 8, s1.S);
        Assert.Equal(300 * Math.Pow(8, 0.4), s3.T, 1e-9);
    }

    [Fact]
    public void Every_input_pair_round_trips()
    {
        var a = Air.FromTP(812.5, 3.2e6);
        foreach (var (p1, p2) in new[]
        {
            (StateProperty.Temperature, StateProperty.SpecificVolume), (StateProperty.Pressure, StateProperty.SpecificVolume),
            (StateProperty.Pressure, StateProperty.Enthalpy), (StateProperty.Pressure, StateProperty.Entropy),
            (StateProperty.SpecificVolume, StateProperty.InternalEnergy), (StateProperty.SpecificVolume, StateProperty.Entropy),
            (StateProperty.Temperature, StateProperty.Entropy),
        })
        {
            var b = Air.Solve(p1, a.Get(p1), p2, a.Get(p2));
            Assert.Equal(a.T, b.T, 1e-9 * a.T);
            Assert.Equal(a.P, b.P, 1e-9 * a.P);
        }
    }

    [Theory]
    [InlineData(double.NaN, 1e5, "T")]
    [InlineData(-10.0, 1e5, "T")]
    [InlineData(300.0, 0.0, "p")]
    [InlineData(7000.0, 1e5, "T")]
    public void Bad_input_names_the_property_and_range(double t, double p, string symbol)
    {
        var e = Assert.Throws<StateOutOfRangeException>(() => Air.FromTP(t, p));
        Assert.Contains(symbol + " ", e.Message, StringComparison.Ordinal);
        Assert.Contains("valid " + symbol + " is", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Quality_is_not_a_gas_input()
    {
        Assert.Throws<UnsupportedInputPairException>(() => ((IPropertyModel)Air).FromTX(300, 0.5));
    }
}
