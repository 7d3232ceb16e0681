using System.Globalization;

namespace NotebookCycles.Gases;

/// <summary>
/// Complete combustion of a fuel CxHyOz in dry air (<see cref="IdealGas.DryAirComposition"/>) at a given equivalence
/// ratio φ or air-fuel ratio (mass basis), water as vapour, no dissociation.
/// </summary>
/// <remarks>
/// Lean and stoichiometric (φ ≤ 1): products CO2, H2O, O2 (the excess), N2, Ar; the CO2 of the air passes through.
/// Rich (φ &gt; 1): hydrogen burns to H2O first, carbon to CO, then CO to CO2 with the oxygen left (common practice,
/// no source; a shortcut for the water-gas equilibrium, which would also leave H2). A mixture so rich that the oxygen
/// does not even turn all carbon into CO (φ above <see cref="Fuel.MaximumEquivalenceRatio"/>) is rejected.
/// φ = AFR_stoich/AFR.
/// </remarks>
public static class Combustion
{
    /// <summary>Mole fraction of O2 in dry air (NASA Glenn Air record composition).</summary>
    public const double OxygenInAir = 0.209476;

    /// <summary>Molar mass of dry air of <see cref="IdealGas.DryAirComposition"/>, kg/mol.</summary>
    public static readonly double DryAirMolarMass = ComputeAirMolarMass();

    /// <summary>
    /// Products of burning <paramref name="fuel"/> at equivalence ratio φ (0 &lt; φ ≤ <see cref="Fuel.MaximumEquivalenceRatio"/>).
    /// The products' gas model uses <paramref name="datum"/>, by default the formation datum that energy balances
    /// with the fuel's enthalpy of formation need.
    /// </summary>
    public static CombustionProducts Burn(Fuel fuel, double equivalenceRatio, EnthalpyDatum datum = EnthalpyDatum.Formation)
    {
        ArgumentNullException.ThrowIfNull(fuel);
        double phiMax = fuel.MaximumEquivalenceRatio;
        if (!(equivalenceRatio > 0 && equivalenceRatio <= phiMax * (1 + 1e-12)))
        {
            throw new ArgumentOutOfRangeException(
                nameof(equivalenceRatio),
                equivalenceRatio,
                string.Create(CultureInfo.InvariantCulture, $"Equivalence ratio φ = {Units.SiText.Number(equivalenceRatio)} is outside the valid range 0 < φ ≤ {phiMax:0.#####} for {fuel.Name}") +
                (equivalenceRatio > phiMax ? ": there is not enough oxygen to burn all carbon to CO after the hydrogen has burnt to H2O." : "."));
        }

        double x = fuel.CarbonAtoms, y = fuel.HydrogenAtoms, z = fuel.OxygenAtoms;
        double o2 = fuel.StoichiometricOxygen / equivalenceRatio;
        double air = o2 / OxygenInAir;
        double n2 = air * 0.78084, ar = air * 0.009365, co2Air = air * 0.000319;
        double co2, co, oxygenLeft, h2o = y / 2;
        if (equivalenceRatio <= 1)
        {
            co2 = x;
            co = 0;
            oxygenLeft = Math.Max(0, o2 - fuel.StoichiometricOxygen);
        }
        else
        {
            double oxygenAtomsAfterWater = 2 * o2 + z - y / 2;
            double toCo2 = Math.Clamp(oxygenAtomsAfterWater - x, 0, x);
            co2 = toCo2;
            co = x - toCo2;
            oxygenLeft = 0;
        }

        co2 += co2Air;
        var moles = new List<(string Species, double Moles)>(6);
        Add(moles, "CO2", co2);
        Add(moles, "CO", co);
        Add(moles, "H2O", h2o);
        Add(moles, "O2", oxygenLeft);
        Add(moles, "N2", n2);
        Add(moles, "Ar", ar);
        double total = 0;
        foreach (var (_, n) in moles)
        {
            total += n;
        }

        var fractions = new List<(string Species, double Fraction)>(moles.Count);
        foreach (var (s, n) in moles)
        {
            fractions.Add((s, n / total));
        }

        string name = string.Create(CultureInfo.InvariantCulture, $"Products of {fuel.Name} in dry air, φ = {equivalenceRatio:0.####} (NASA Glenn, variable cp)");
        IdealGasMixture gas = IdealGas.Build(name, fractions, CompositionBasis.Mole, datum);
        double afr = fuel.StoichiometricAirFuelRatio / equivalenceRatio;
        return new CombustionProducts(fuel, equivalenceRatio, afr, air, moles, total, gas);
    }

    /// <summary>Products at an air-fuel ratio (kg dry air per kg fuel); φ = AFR_stoich/AFR must lie in (0, φ_max].</summary>
    public static CombustionProducts BurnAtAirFuelRatio(Fuel fuel, double airFuelRatio, EnthalpyDatum datum = EnthalpyDatum.Formation)
    {
        ArgumentNullException.ThrowIfNull(fuel);
        double minimum = fuel.StoichiometricAirFuelRatio / fuel.MaximumEquivalenceRatio;
        if (!(airFuelRatio >= minimum * (1 - 1e-12) && airFuelRatio < double.PositiveInfinity))
        {
            throw new ArgumentOutOfRangeException(
                nameof(airFuelRatio),
                airFuelRatio,
                string.Create(CultureInfo.InvariantCulture, $"Air-fuel ratio AFR = {Units.SiText.Number(airFuelRatio)} is outside the valid range AFR ≥ {minimum:0.#####} (finite) for {fuel.Name}, that is φ ≤ {fuel.MaximumEquivalenceRatio:0.#####}."));
        }

        return Burn(fuel, Math.Min(fuel.StoichiometricAirFuelRatio / airFuelRatio, fuel.MaximumEquivalenceRatio), datum);
    }

    /// <summary>φ = AFR_stoich/AFR (AFR in kg air per kg fuel, positive and finite).</summary>
    public static double EquivalenceRatio(Fuel fuel, double airFuelRatio)
    {
        ArgumentNullException.ThrowIfNull(fuel);
        if (!(airFuelRatio > 0 && airFuelRatio < double.PositiveInfinity))
        {
            throw new ArgumentOutOfRangeException(nameof(airFuelRatio), airFuelRatio, "Air-fuel ratio AFR must be a positive finite number (valid range AFR > 0), kg air per kg fuel.");
        }

        return fuel.StoichiometricAirFuelRatio / airFuelRatio;
    }

    /// <summary>AFR = AFR_stoich/φ, kg air per kg fuel (φ positive and finite).</summary>
    public static double AirFuelRatio(Fuel fuel, double equivalenceRatio)
    {
        ArgumentNullException.ThrowIfNull(fuel);
        if (!(equivalenceRatio > 0 && equivalenceRatio < double.PositiveInfinity))
        {
            throw new ArgumentOutOfRangeException(nameof(equivalenceRatio), equivalenceRatio, "Equivalence ratio φ must be a positive finite number (valid range φ > 0).");
        }

        return fuel.StoichiometricAirFuelRatio / equivalenceRatio;
    }

    private static void Add(List<(string, double)> moles, string species, double n)
    {
        if (n > 0)
        {
            moles.Add((species, n));
        }
    }

    private static double ComputeAirMolarMass()
    {
        double m = 0;
        foreach (var (s, x) in IdealGas.DryAirComposition)
        {
            m += x * GasSpecies.Get(s).MolarMass;
        }

        return m;
    }
}

/// <summary>The products of complete combustion of one fuel in dry air at one equivalence ratio.</summary>
public sealed class CombustionProducts
{
    internal CombustionProducts(Fuel fuel, double equivalenceRatio, double airFuelRatio, double airMoles, List<(string Species, double Moles)> moles, double totalMoles, IdealGasMixture gas)
    {
        Fuel = fuel;
        EquivalenceRatio = equivalenceRatio;
        AirFuelRatio = airFuelRatio;
        AirMolesPerFuelMole = airMoles;
        MolesPerFuelMole = moles.AsReadOnly();
        TotalMolesPerFuelMole = totalMoles;
        Gas = gas;
    }

    /// <summary>The fuel burnt.</summary>
    public Fuel Fuel { get; }

    /// <summary>Equivalence ratio φ.</summary>
    public double EquivalenceRatio { get; }

    /// <summary>Air-fuel ratio, kg dry air per kg fuel.</summary>
    public double AirFuelRatio { get; }

    /// <summary>Moles of dry air per mole of fuel.</summary>
    public double AirMolesPerFuelMole { get; }

    /// <summary>Moles of each product species per mole of fuel (species with zero moles are left out).</summary>
    public IReadOnlyList<(string Species, double Moles)> MolesPerFuelMole { get; }

    /// <summary>Total moles of products per mole of fuel.</summary>
    public double TotalMolesPerFuelMole { get; }

    /// <summary>Mass of products per mass of fuel: 1 + AFR.</summary>
    public double MassPerFuelMass => 1 + AirFuelRatio;

    /// <summary>The products as an ideal-gas mixture (NASA Glenn species, ideal mixing).</summary>
    public IdealGasMixture Gas { get; }

    /// <summary>Mole fraction of a product species (0 when absent).</summary>
    public double MoleFraction(string species)
    {
        foreach (var (s, n) in MolesPerFuelMole)
        {
            if (s == species)
            {
                return n / TotalMolesPerFuelMole;
            }
        }

        return 0;
    }
}
