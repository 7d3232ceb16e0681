using NotebookCycles.Gases;
using Xunit;

namespace NotebookCycles.Tests.Gases;

public sealed class IdealGasTests
{
    [Fact]
    public void Dry_air_mixture_reproduces_the_NASA_Air_record()
    {
        // The NASA Glenn database (NASA/TP-2002-211556, ReferenceData/nasa_glenn_9coeff.csv) fits its Air record to
        // the same composition; its S includes the ideal entropy of mixing. Stated tolerance: 0.01 % in cp and h,
        // 0.01 J/(kg·K) in s (found: below 1e-6 relative in cp and h, 0.001 J/(kg·K) in s).
        IdealGasMixture mix = IdealGas.DryAir;
        IdealGasMixture record = IdealGas.Species("Air");
        Assert.Equal(record.MolarMass, mix.MolarMass, 1e-9);
        foreach (double t in new[] { 200.0, 298.15, 500, 999.9, 1000, 1800, 3000, 4500, 6000 })
        {
            Assert.InRange(mix.Cp(t) / record.Cp(t) - 1, -1e-4, 1e-4);
            Assert.InRange(mix.Enthalpy(t) / record.Enthalpy(t) - 1, -1e-4, 1e-4);
            Assert.InRange(mix.Entropy(t, 1e5) - record.Entropy(t, 1e5), -0.01, 0.01);
        }
    }

    [Fact]
    public void Dry_air_has_the_stated_composition_and_gas_constant()
    {
        // Composition of the NASA Glenn Air record (file header): mole % N2 78.084, O2 20.9476, Ar 0.9365, CO2 0.0319.
        IdealGasMixture air = IdealGas.DryAir;
        Assert.Equal(["N2", "O2", "Ar", "CO2"], air.Components.Select(c => c.Species.Name).ToArray());
        Assert.Equal(0.78084, air.Components[0].MoleFraction, 1e-12);
        Assert.Equal(1.0, air.Components.Sum(c => c.MassFraction), 1e-12);
        Assert.IsNotType<GasComponent[]>(air.Components); // immutable model: no writable array handed out
        Assert.Equal(8.314510 / 0.0289651159, air.GasConstant, 1e-3); // R of the fits / M of the Air record

        // On the formation datum, h(298.15 K) of dry air is its CO2's share of ΔHf: the Air record's Hf298 = −125.53 J/mol
        // (NASA/TP-2002-211556 file).
        Assert.InRange(air.WithDatum(EnthalpyDatum.Formation).Enthalpy(298.15) * air.MolarMass - (-125.53), -0.01, 0.01);
    }

    [Fact]
    public void Mass_and_mole_fractions_give_the_same_mixture()
    {
        IdealGasMixture byMole = IdealGas.Mixture(("N2", 0.7), ("CO2", 0.1), ("H2O", 0.2));
        var mass = byMole.Components.Select(c => (c.Species.Name, c.MassFraction)).ToList();
        IdealGasMixture byMass = IdealGas.Mixture(mass, CompositionBasis.Mass);
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(byMole.Components[i].MoleFraction, byMass.Components[i].MoleFraction, 1e-12);
        }

        Assert.Equal(byMole.Enthalpy(1500), byMass.Enthalpy(1500), 1e-6);
        Assert.Equal(byMole.Entropy(1500, 2e5), byMass.Entropy(1500, 2e5), 1e-9);
    }

    [Fact]
    public void A_mixture_costs_the_same_as_its_mass_weighted_species()
    {
        // Ideal mixing: h_mix = Σ wᵢ·hᵢ and cp_mix = Σ wᵢ·cpᵢ (mass fractions).
        IdealGasMixture mix = IdealGas.Mixture(("N2", 0.5), ("O2", 0.3), ("CO2", 0.2));
        foreach (double t in new[] { 250.0, 1000, 2500 })
        {
            double h = 0, cp = 0;
            foreach (GasComponent c in mix.Components)
            {
                IdealGasMixture pure = IdealGas.Species(c.Species.Name);
                h += c.MassFraction * pure.Enthalpy(t);
                cp += c.MassFraction * pure.Cp(t);
            }

            Assert.Equal(h, mix.Enthalpy(t), 1e-6);
            Assert.Equal(cp, mix.Cp(t), 1e-9);
        }
    }

    [Fact]
    public void Fractions_not_summing_to_one_name_the_sum_and_the_valid_range()
    {
        var e = Assert.Throws<ArgumentException>(() => IdealGas.Mixture(("N2", 0.7), ("O2", 0.2)));
        Assert.Contains("mole fractions sum to 0.9", e.Message, StringComparison.Ordinal);
        Assert.Contains("valid range 1 ± 1e-6", e.Message, StringComparison.Ordinal);
        var m = Assert.Throws<ArgumentException>(() => IdealGas.Mixture([("N2", 0.7), ("O2", 0.4)], CompositionBasis.Mass));
        Assert.Contains("mass fractions sum to 1.1", m.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(1.1)]
    [InlineData(double.NaN)]
    public void A_fraction_outside_0_to_1_names_the_species_and_the_range(double f)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => IdealGas.Mixture(("N2", 1 - f), ("O2", f)));
        Assert.Contains("mole fraction of", e.Message, StringComparison.Ordinal);
        Assert.Contains("valid range 0 to 1", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_or_repeated_species_are_rejected()
    {
        var e = Assert.Throws<ArgumentException>(() => IdealGas.Species("Xe"));
        Assert.Contains("Unknown gas species \"Xe\"", e.Message, StringComparison.Ordinal);
        Assert.Contains("N2, O2, Ar, CO2, H2O, CO, Air", e.Message, StringComparison.Ordinal);
        var m = Assert.Throws<ArgumentException>(() => IdealGas.Mixture(("N2", 0.5), ("Kr", 0.5)));
        Assert.Contains("Kr", m.Message, StringComparison.Ordinal);
        var d = Assert.Throws<ArgumentException>(() => IdealGas.Mixture(("N2", 0.5), ("N2", 0.5)));
        Assert.Contains("appears twice", d.Message, StringComparison.Ordinal);
        var empty = Assert.Throws<ArgumentException>(() => IdealGas.Mixture(Array.Empty<(string, double)>()));
        Assert.Contains("at least one species", empty.Message, StringComparison.Ordinal);
    }
}
