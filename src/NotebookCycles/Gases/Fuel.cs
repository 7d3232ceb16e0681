using System.Globalization;

namespace NotebookCycles.Gases;

/// <summary>
/// A fuel CxHyOz burned as a gas (vapour) at 298.15 K: its composition, molar mass, enthalpy of formation (with the
/// source of that value) and the lower heating value that follows from it.
/// </summary>
/// <remarks>
/// Molar masses use the standard atomic weights C 12.0107, H 1.00794, O 15.9994 g/mol (IUPAC 2001), the values the
/// NASA Glenn database's molar masses rest on (its CO2 is 44.0095 g/mol, H2O 18.01528 g/mol).
/// The lower heating value is computed, not looked up: LHV = [ΔHf(fuel) − x·ΔHf(CO2) − (y/2)·ΔHf(H2O, gas)]/M, with
/// the enthalpies of formation of CO2 and H2O from the NASA Glenn database (NASA/TP-2002-211556), for the fuel as a
/// gas at 298.15 K and water as vapour in the products. A liquid fuel's LHV is lower by its enthalpy of vaporisation.
/// </remarks>
public sealed class Fuel
{
    /// <summary>Atomic weight of carbon, g/mol (IUPAC 2001, as in the NASA Glenn molar masses).</summary>
    public const double CarbonAtomicWeight = 12.0107;

    /// <summary>Atomic weight of hydrogen, g/mol (IUPAC 2001, as in the NASA Glenn molar masses).</summary>
    public const double HydrogenAtomicWeight = 1.00794;

    /// <summary>Atomic weight of oxygen, g/mol (IUPAC 2001, as in the NASA Glenn molar masses).</summary>
    public const double OxygenAtomicWeight = 15.9994;

    private Fuel(string name, double carbon, double hydrogen, double oxygen, double enthalpyOfFormation, string enthalpyOfFormationSource)
    {
        Name = name;
        CarbonAtoms = carbon;
        HydrogenAtoms = hydrogen;
        OxygenAtoms = oxygen;
        EnthalpyOfFormation = enthalpyOfFormation;
        EnthalpyOfFormationSource = enthalpyOfFormationSource;
        MolarMass = (carbon * CarbonAtomicWeight + hydrogen * HydrogenAtomicWeight + oxygen * OxygenAtomicWeight) / 1000.0;
        double hfCo2 = GasSpecies.Get("CO2").EnthalpyOfFormation;
        double hfH2O = GasSpecies.Get("H2O").EnthalpyOfFormation;
        LowerHeatingValue = (enthalpyOfFormation - carbon * hfCo2 - hydrogen / 2 * hfH2O) / MolarMass;
        StoichiometricOxygen = carbon + hydrogen / 4 - oxygen / 2;
        StoichiometricAirFuelRatio = StoichiometricOxygen / Combustion.OxygenInAir * Combustion.DryAirMolarMass / MolarMass;
        MaximumEquivalenceRatio = 2 * StoichiometricOxygen / (carbon + hydrogen / 2 - oxygen);
    }

    /// <summary>Methane CH4; ΔHf = −74.600 kJ/mol (NASA Glenn database thermo.inp, CH4 record, Gurvich 1991).</summary>
    public static Fuel Methane { get; } = new("methane", 1, 4, 0, -74_600.0, "NASA Glenn database thermo.inp (NASA/TP-2002-211556), CH4 record, after Gurvich 1991");

    /// <summary>Propane C3H8; ΔHf = −104.68 kJ/mol (NASA Glenn database value, from memory).</summary>
    public static Fuel Propane { get; } = new("propane", 3, 8, 0, -104_680.0, "NASA Glenn database C3H8 record, value from memory");

    /// <summary>n-Octane C8H18 (vapour); ΔHf = −208.75 kJ/mol (NASA Glenn database value, from memory).</summary>
    public static Fuel NOctane { get; } = new("n-octane", 8, 18, 0, -208_750.0, "NASA Glenn database C8H18,n-octane record, value from memory");

    /// <summary>n-Dodecane C12H26 (vapour); ΔHf = −290.9 kJ/mol (gas-phase value, from memory).</summary>
    public static Fuel NDodecane { get; } = new("n-dodecane", 12, 26, 0, -290_900.0, "gas-phase enthalpy of formation, value from memory");

    /// <summary>Hydrogen H2; ΔHf = 0 (the element in its reference state, by definition).</summary>
    public static Fuel Hydrogen { get; } = new("hydrogen", 0, 2, 0, 0.0, "zero by definition (element in its reference state)");

    /// <summary>The fuel's name.</summary>
    public string Name { get; }

    /// <summary>Carbon atoms per molecule (x of CxHyOz).</summary>
    public double CarbonAtoms { get; }

    /// <summary>Hydrogen atoms per molecule (y).</summary>
    public double HydrogenAtoms { get; }

    /// <summary>Oxygen atoms per molecule (z).</summary>
    public double OxygenAtoms { get; }

    /// <summary>Molar mass, kg/mol.</summary>
    public double MolarMass { get; }

    /// <summary>Enthalpy of formation of the gaseous fuel at 298.15 K, J/mol.</summary>
    public double EnthalpyOfFormation { get; }

    /// <summary>Where <see cref="EnthalpyOfFormation"/> comes from.</summary>
    public string EnthalpyOfFormationSource { get; }

    /// <summary>Lower heating value at 298.15 K (fuel gas, water vapour in the products), J/kg; computed, see remarks.</summary>
    public double LowerHeatingValue { get; }

    /// <summary>Moles of O2 for complete combustion of one mole of fuel: x + y/4 − z/2.</summary>
    public double StoichiometricOxygen { get; }

    /// <summary>Stoichiometric air-fuel ratio, kg dry air per kg fuel (dry air of <see cref="IdealGas.DryAirComposition"/>).</summary>
    public double StoichiometricAirFuelRatio { get; }

    /// <summary>
    /// The richest equivalence ratio the complete-combustion rule can burn: with hydrogen to H2O first and carbon to
    /// at least CO, φ_max = 2·(x + y/4 − z/2)/(x + y/2 − z); 1 for a fuel without carbon.
    /// </summary>
    public double MaximumEquivalenceRatio { get; }

    /// <summary>
    /// A fuel CxHyOz. Atom counts must be finite and non-negative with at least one C or H atom, and the fuel must need
    /// oxygen to burn; <paramref name="enthalpyOfFormation"/> (J/mol, gas at 298.15 K) must be finite and its source named.
    /// </summary>
    public static Fuel Create(string name, double carbon, double hydrogen, double oxygen, double enthalpyOfFormation, string enthalpyOfFormationSource)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentException.ThrowIfNullOrWhiteSpace(enthalpyOfFormationSource);
        Atoms(nameof(carbon), carbon);
        Atoms(nameof(hydrogen), hydrogen);
        Atoms(nameof(oxygen), oxygen);
        if (!(carbon + hydrogen > 0) || !(carbon + hydrogen / 4 - oxygen / 2 > 0))
        {
            throw new ArgumentException($"Fuel {name}: C{carbon}H{hydrogen}O{oxygen} needs at least one C or H atom and a positive oxygen demand x + y/4 − z/2.", nameof(oxygen));
        }

        if (!double.IsFinite(enthalpyOfFormation))
        {
            throw new ArgumentOutOfRangeException(nameof(enthalpyOfFormation), enthalpyOfFormation, "The enthalpy of formation must be a finite number in J/mol.");
        }

        return new Fuel(name, carbon, hydrogen, oxygen, enthalpyOfFormation, enthalpyOfFormationSource);
    }

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{Name} (C{CarbonAtoms:0.###}H{HydrogenAtoms:0.###}O{OxygenAtoms:0.###})");

    private static void Atoms(string parameter, double count)
    {
        if (!(count >= 0 && count < 1000))
        {
            throw new ArgumentOutOfRangeException(parameter, count, $"The number of {parameter} atoms must be a finite number in the valid range 0 to 1000.");
        }
    }
}
