using NotebookCycles.Gases;
using Xunit;

namespace NotebookCycles.Tests.Gases;

public sealed class FuelTests
{
    [Fact]
    public void Methane_stoichiometric_air_fuel_ratio_matches_the_hand_value()
    {
        // Hand value: CH4 + 2 O2 per mole of fuel; air per O2 = 1/0.209476 (NASA Glenn Air record composition);
        // atomic weights C 12.0107, H 1.00794, O 15.9994, N 14.0067, Ar 39.948 g/mol (IUPAC 2001 standard atomic weights).
        double mN2 = 2 * 14.0067, mO2 = 2 * 15.9994, mCo2 = 12.0107 + 2 * 15.9994;
        double mAir = 0.78084 * mN2 + 0.209476 * mO2 + 0.009365 * 39.948 + 0.000319 * mCo2;
        double mCh4 = 12.0107 + 4 * 1.00794;
        double hand = 2 / 0.209476 * mAir / mCh4;
        Assert.Equal(hand, Fuel.Methane.StoichiometricAirFuelRatio, 1e-4);
        Assert.InRange(hand, 17.1, 17.3); // textbook figure about 17.2 (common practice, no source)
    }

    [Theory]
    [InlineData("methane", 50.0, 0.002)]   // LHV 50.0 MJ/kg, from memory (usual textbook figure)
    [InlineData("propane", 46.35, 0.002)]  // LHV 46.35 MJ/kg, from memory
    [InlineData("n-octane", 44.79, 0.002)] // LHV 44.79 MJ/kg for the vapour, from memory
    [InlineData("hydrogen", 119.96, 0.001)] // LHV 119.96 MJ/kg, from memory
    public void Lower_heating_value_agrees_with_published_figures(string name, double published, double relative)
    {
        Fuel fuel = Fuels().Single(f => f.Name == name);
        Assert.InRange(fuel.LowerHeatingValue / 1e6 / published - 1, -relative, relative);
    }

    [Fact]
    public void Lower_heating_value_is_the_enthalpy_of_reaction_at_298_K()
    {
        // LHV = −Δh of CxHyOz + a O2 → x CO2 + y/2 H2O(g) at 298.15 K, from the NASA Glenn formation-datum enthalpies.
        foreach (Fuel fuel in Fuels())
        {
            double hProducts = fuel.CarbonAtoms * IdealGas.Species("CO2", EnthalpyDatum.Formation).Enthalpy(298.15) * GasSpecies.Get("CO2").MolarMass
                + fuel.HydrogenAtoms / 2 * IdealGas.Species("H2O", EnthalpyDatum.Formation).Enthalpy(298.15) * GasSpecies.Get("H2O").MolarMass;
            double hReactants = fuel.EnthalpyOfFormation + fuel.StoichiometricOxygen * IdealGas.Species("O2", EnthalpyDatum.Formation).Enthalpy(298.15) * GasSpecies.Get("O2").MolarMass;
            Assert.Equal(1.0, (hReactants - hProducts) / fuel.MolarMass / fuel.LowerHeatingValue, 1e-7);
        }
    }

    [Fact]
    public void Maximum_equivalence_ratio_follows_the_rich_rule()
    {
        // φ_max = 2(x + y/4 − z/2)/(x + y/2 − z): methane 4/3, hydrogen 1 (rule of docs/models-ideal-gas.md).
        Assert.Equal(4.0 / 3.0, Fuel.Methane.MaximumEquivalenceRatio, 1e-12);
        Assert.Equal(1.0, Fuel.Hydrogen.MaximumEquivalenceRatio, 1e-12);
        Fuel methanol = Fuel.Create("methanol", 1, 4, 1, -200_940, "test value, invented for the rule only");
        Assert.Equal(1.5, methanol.MaximumEquivalenceRatio, 1e-12);
    }

    [Theory]
    [InlineData(-1, 4, 0)]
    [InlineData(1, double.NaN, 0)]
    [InlineData(1, 4, double.PositiveInfinity)]
    public void Atom_counts_outside_their_range_are_rejected(double c, double h, double o)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Fuel.Create("bad", c, h, o, 0, "none"));
        Assert.Contains("atoms must be a finite number in the valid range 0 to 1000", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0, 0, 1)]
    [InlineData(0, 2, 4)]
    public void Fuels_without_oxygen_demand_are_rejected(double c, double h, double o)
    {
        var e = Assert.Throws<ArgumentException>(() => Fuel.Create("bad", c, h, o, 0, "none"));
        Assert.Contains("positive oxygen demand x + y/4 − z/2", e.Message, StringComparison.Ordinal);
    }

    internal static IEnumerable<Fuel> Fuels() => [Fuel.Methane, Fuel.Propane, Fuel.NOctane, Fuel.NDodecane, Fuel.Hydrogen];
}
