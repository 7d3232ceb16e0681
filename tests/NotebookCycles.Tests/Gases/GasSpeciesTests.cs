using NotebookCycles.Gases;
using Xunit;

namespace NotebookCycles.Tests.Gases;

public sealed class GasSpeciesTests
{
    public static TheoryData<string> SpeciesNames => new() { "N2", "O2", "Ar", "CO2", "H2O", "CO", "Air" };

    [Fact]
    public void The_embedded_database_has_the_species_of_the_reference_file()
    {
        // NASA/TP-2002-211556 database as shipped in ReferenceData/nasa_glenn_9coeff.csv.
        var fileSpecies = ReferenceCsv.Rows("nasa_glenn_9coeff.csv").Select(r => r[0]).Distinct().ToList();
        Assert.Equal(fileSpecies, GasSpecies.Names.ToList());
    }

    [Theory]
    [MemberData(nameof(SpeciesNames))]
    public void Molar_mass_and_formation_enthalpy_match_the_reference_file(string name)
    {
        // NASA/TP-2002-211556 database, ReferenceData/nasa_glenn_9coeff.csv columns M, Hf298, H298-H0.
        string[] row = ReferenceCsv.Rows("nasa_glenn_9coeff.csv").First(r => r[0] == name);
        GasSpecies s = GasSpecies.Get(name);
        Assert.Equal(ReferenceCsv.D(row[2]) / 1000, s.MolarMass, 1e-15);
        Assert.Equal(ReferenceCsv.D(row[3]), s.EnthalpyOfFormation);
        Assert.Equal(ReferenceCsv.D(row[4]), s.EnthalpyAboveZeroKelvin);
    }

    [Theory]
    [MemberData(nameof(SpeciesNames))]
    public void Formation_datum_gives_the_enthalpy_of_formation_at_298_15_K(string name)
    {
        // NASA/TP-2002-211556: H(298.15 K) = Hf298 on the database datum; file header: reproduced to 0.001 J/mol.
        GasSpecies s = GasSpecies.Get(name);
        IdealGasMixture gas = IdealGas.Species(name, EnthalpyDatum.Formation);
        double hMolar = gas.Enthalpy(298.15) * s.MolarMass;
        Assert.InRange(hMolar - s.EnthalpyOfFormation, -0.002, 0.002);
    }

    [Theory]
    [MemberData(nameof(SpeciesNames))]
    public void Sensible_datum_gives_H298_minus_H0_at_298_15_K(string name)
    {
        // Sensible datum h(T) = H(T) − Hf298 + (H298 − H0): at 298.15 K it is H298 − H0 (NASA/TP-2002-211556 file column).
        GasSpecies s = GasSpecies.Get(name);
        IdealGasMixture gas = IdealGas.Species(name);
        Assert.InRange(gas.Enthalpy(298.15) * s.MolarMass - s.EnthalpyAboveZeroKelvin, -0.002, 0.002);
    }

    [Theory]
    [MemberData(nameof(SpeciesNames))]
    public void Cp_h_and_s_are_continuous_at_1000_K(string name)
    {
        // The two fitted intervals meet at 1000 K (NASA/TP-2002-211556); compare values a hair either side.
        IdealGasMixture gas = IdealGas.Species(name, EnthalpyDatum.Formation);
        const double below = 1000 - 1e-9, above = 1000;
        Assert.Equal(1, gas.Cp(above) / gas.Cp(below), 1e-6);
        Assert.InRange((gas.Enthalpy(above) - gas.Enthalpy(below)) * GasSpecies.Get(name).MolarMass, -0.05, 0.05); // J/mol
        Assert.InRange((gas.StandardEntropy(above) - gas.StandardEntropy(below)) * GasSpecies.Get(name).MolarMass, -1e-4, 1e-4); // J/(mol·K)
    }

    [Theory]
    [InlineData("He")]
    [InlineData("n2")]
    [InlineData("")]
    public void Unknown_species_names_the_known_ones(string name)
    {
        var e = Assert.Throws<ArgumentException>(() => GasSpecies.Get(name));
        Assert.Contains("Unknown gas species", e.Message, StringComparison.Ordinal);
        Assert.Contains("N2, O2, Ar, CO2, H2O, CO, Air", e.Message, StringComparison.Ordinal);
    }
}
