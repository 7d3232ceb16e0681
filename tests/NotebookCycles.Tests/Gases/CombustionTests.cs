using NotebookCycles.Gases;
using Xunit;

namespace NotebookCycles.Tests.Gases;

public sealed class CombustionTests
{
    public static TheoryData<string, double> Cases()
    {
        var data = new TheoryData<string, double>();
        foreach (Fuel f in FuelTests.Fuels())
        {
            foreach (double phi in new[] { 0.3, 0.8, 1.0, 1.1, 1.3 })
            {
                if (phi <= f.MaximumEquivalenceRatio)
                {
                    data.Add(f.Name, phi);
                }
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Elements_balance(string fuelName, double phi)
    {
        // Conservation of C, H, O, N and Ar atoms between fuel + dry air and the products.
        Fuel fuel = FuelTests.Fuels().Single(f => f.Name == fuelName);
        CombustionProducts p = Combustion.Burn(fuel, phi);
        double air = p.AirMolesPerFuelMole;
        double n(string s) => p.MolesPerFuelMole.Where(m => m.Species == s).Sum(m => m.Moles);
        Assert.Equal(fuel.CarbonAtoms + air * 0.000319, n("CO2") + n("CO"), 1e-10);
        Assert.Equal(fuel.HydrogenAtoms, 2 * n("H2O"), 1e-10);
        Assert.Equal(fuel.OxygenAtoms + air * (2 * 0.209476 + 2 * 0.000319), 2 * n("CO2") + n("CO") + n("H2O") + 2 * n("O2"), 1e-10);
        Assert.Equal(2 * air * 0.78084, 2 * n("N2"), 1e-10);
        Assert.Equal(air * 0.009365, n("Ar"), 1e-12);

        // Mass balance: products per kg fuel = 1 + AFR.
        double productMass = p.Gas.MolarMass * p.TotalMolesPerFuelMole;
        Assert.Equal(1 + p.AirFuelRatio, productMass / fuel.MolarMass, 1e-9);
        Assert.Equal(1.0, p.Gas.Components.Sum(c => c.MoleFraction), 1e-12);
    }

    [Fact]
    public void Stoichiometric_products_have_no_oxygen_and_no_CO()
    {
        CombustionProducts p = Combustion.Burn(Fuel.Propane, 1.0);
        Assert.Equal(0.0, p.MoleFraction("O2"));
        Assert.Equal(0.0, p.MoleFraction("CO"));
        Assert.DoesNotContain(p.Gas.Components, c => c.Species.Name == "O2");
    }

    [Fact]
    public void Lean_products_carry_the_excess_oxygen()
    {
        // At φ = 0.5 half the oxygen supplied is left: n(O2) = a_st·(1/φ − 1) per mole of fuel.
        CombustionProducts p = Combustion.Burn(Fuel.Methane, 0.5);
        double o2 = p.MolesPerFuelMole.Single(m => m.Species == "O2").Moles;
        Assert.Equal(2.0 * (1 / 0.5 - 1), o2, 1e-12);
        Assert.Equal(0.0, p.MoleFraction("CO"));
    }

    [Fact]
    public void Rich_products_follow_the_hydrogen_first_rule()
    {
        // CH4 at φ = 1.2: O2 = 2/1.2; H2O takes 2 O atoms, CO takes 1, CO2 gets the rest (docs/models-ideal-gas.md,
        // common practice, no source).
        CombustionProducts p = Combustion.Burn(Fuel.Methane, 1.2);
        double oAtoms = 2 * 2 / 1.2;
        double co2Fuel = oAtoms - 2 - 1;
        double air = p.AirMolesPerFuelMole;
        Assert.Equal(co2Fuel + air * 0.000319, p.MolesPerFuelMole.Single(m => m.Species == "CO2").Moles, 1e-12);
        Assert.Equal(1 - co2Fuel, p.MolesPerFuelMole.Single(m => m.Species == "CO").Moles, 1e-12);
        Assert.Equal(0.0, p.MoleFraction("O2"));
        CombustionProducts richest = Combustion.Burn(Fuel.Methane, 4.0 / 3.0);
        Assert.Equal(1.0, richest.MolesPerFuelMole.Single(m => m.Species == "CO").Moles, 1e-12);
    }

    [Fact]
    public void Air_fuel_ratio_and_equivalence_ratio_agree()
    {
        foreach (Fuel fuel in FuelTests.Fuels())
        {
            foreach (double phi in new[] { 0.25, 0.7, 1.0 })
            {
                double afr = Combustion.AirFuelRatio(fuel, phi);
                Assert.Equal(phi, Combustion.EquivalenceRatio(fuel, afr), 1e-12);
                CombustionProducts a = Combustion.Burn(fuel, phi);
                CombustionProducts b = Combustion.BurnAtAirFuelRatio(fuel, afr);
                Assert.Equal(a.AirFuelRatio, b.AirFuelRatio, 1e-9);
                Assert.Equal(a.Gas.MolarMass, b.Gas.MolarMass, 1e-12);
                Assert.Equal(afr * fuel.MolarMass / Combustion.DryAirMolarMass, a.AirMolesPerFuelMole, 1e-9);
            }
        }
    }

    [Fact]
    public void Products_have_a_usable_gas_model_on_the_formation_datum()
    {
        // Energy balance at 298.15 K: h(reactants) − h(products) per kg fuel = LHV (lean, water as vapour).
        Fuel fuel = Fuel.Methane;
        CombustionProducts p = Combustion.Burn(fuel, 0.8);
        Assert.Equal(EnthalpyDatum.Formation, p.Gas.Datum);
        double airMass = p.AirFuelRatio;
        double hReactants = fuel.EnthalpyOfFormation / fuel.MolarMass + airMass * IdealGas.DryAir.WithDatum(EnthalpyDatum.Formation).Enthalpy(298.15);
        double hProducts = p.MassPerFuelMass * p.Gas.Enthalpy(298.15);
        Assert.Equal(1.0, (hReactants - hProducts) / fuel.LowerHeatingValue, 1e-6);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-0.5)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(1.34)]
    public void Bad_equivalence_ratio_names_phi_and_its_range(double phi)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Combustion.Burn(Fuel.Methane, phi));
        Assert.Contains("Equivalence ratio φ", e.Message, StringComparison.Ordinal);
        Assert.Contains("valid range 0 < φ ≤ 1.33333 for methane", e.Message, StringComparison.Ordinal);
        if (phi > 1.34 - 1e-9 && phi < 2)
        {
            Assert.Contains("not enough oxygen", e.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Rich_hydrogen_is_rejected_with_its_range()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Combustion.Burn(Fuel.Hydrogen, 1.05));
        Assert.Contains("valid range 0 < φ ≤ 1 for hydrogen", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(10.0)]
    [InlineData(double.NaN)]
    public void Bad_air_fuel_ratio_names_AFR_and_its_range(double afr)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Combustion.BurnAtAirFuelRatio(Fuel.Methane, afr));
        Assert.Contains("Air-fuel ratio AFR", e.Message, StringComparison.Ordinal);
        double minimum = Fuel.Methane.StoichiometricAirFuelRatio / Fuel.Methane.MaximumEquivalenceRatio; // about 12.93
        Assert.Contains("valid range AFR ≥ " + minimum.ToString("0.#####", System.Globalization.CultureInfo.InvariantCulture), e.Message, StringComparison.Ordinal);
        Assert.InRange(minimum, 12.9, 12.95);
    }
}
