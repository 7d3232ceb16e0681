namespace NotebookCycles.Gases;

/// <summary>
/// The front door to the ideal gases with temperature-dependent cp (NASA Glenn polynomials): dry air, single species
/// and mixtures by mole or mass fractions. Every model returned is an immutable <see cref="IdealGasMixture"/>.
/// </summary>
public static class IdealGas
{
    /// <summary>Mole fractions of dry air as the NASA Glenn database states them for its Air record: N2, O2, Ar, CO2.</summary>
    public static IReadOnlyList<(string Species, double MoleFraction)> DryAirComposition { get; } =
    [
        ("N2", 0.78084),
        ("O2", 0.209476),
        ("Ar", 0.009365),
        ("CO2", 0.000319),
    ];

    private static readonly Lazy<IdealGasMixture> DryAirModel = new(() =>
        Build("Dry air (NASA Glenn, variable cp)", DryAirComposition, CompositionBasis.Mole, EnthalpyDatum.Sensible));

    /// <summary>
    /// Dry air as a mixture of N2 78.084, O2 20.9476, Ar 0.9365, CO2 0.0319 mole % (the composition the NASA Glenn
    /// database, NASA/TP-2002-211556, states for its Air record), sensible-enthalpy datum (h = 0 at 0 K).
    /// M = 28.9651 g/mol, R = 287.05 J/(kg·K).
    /// </summary>
    public static IdealGasMixture DryAir => DryAirModel.Value;

    /// <summary>
    /// One species of the NASA Glenn database: "N2", "O2", "Ar", "CO2", "H2O", "CO", or "Air" (the database's own
    /// dry-air record, a single fitted pseudo-species; useful as a cross-check of <see cref="DryAir"/>).
    /// Throws <see cref="ArgumentException"/> naming the known species for another name.
    /// </summary>
    public static IdealGasMixture Species(string name, EnthalpyDatum datum = EnthalpyDatum.Sensible)
    {
        GasSpecies species = GasSpecies.Get(name);
        return new IdealGasMixture(species.Name + " (NASA Glenn, variable cp)", [new GasComponent(species, 1.0, 1.0)], datum);
    }

    /// <summary>
    /// A mixture of NASA Glenn species by mole or mass fractions. Fractions must be finite, in [0, 1], and sum to 1
    /// within 1e-6 (they are then rescaled to sum exactly to 1); each species may appear once.
    /// Throws <see cref="ArgumentException"/> (or <see cref="ArgumentOutOfRangeException"/> for a fraction outside
    /// [0, 1]) naming the species, the fraction and the valid range.
    /// </summary>
    public static IdealGasMixture Mixture(IEnumerable<(string Species, double Fraction)> composition, CompositionBasis basis = CompositionBasis.Mole, EnthalpyDatum datum = EnthalpyDatum.Sensible, string? name = null)
    {
        ArgumentNullException.ThrowIfNull(composition);
        var list = composition.ToList();
        return Build(name, list, basis, datum);
    }

    /// <summary>A mixture by mole fractions, for example <c>IdealGas.Mixture(("N2", 0.79), ("O2", 0.21))</c>.</summary>
    public static IdealGasMixture Mixture(params (string Species, double MoleFraction)[] moleFractions) =>
        Mixture(moleFractions, CompositionBasis.Mole);

    internal static IdealGasMixture Build(string? name, IReadOnlyList<(string Species, double Fraction)> composition, CompositionBasis basis, EnthalpyDatum datum)
    {
        string kind = basis == CompositionBasis.Mole ? "mole fraction" : "mass fraction";
        if (composition.Count == 0)
        {
            throw new ArgumentException("A gas mixture needs at least one species.", nameof(composition));
        }

        var species = new GasSpecies[composition.Count];
        var fractions = new double[composition.Count];
        double sum = 0;
        for (int i = 0; i < composition.Count; i++)
        {
            (string n, double f) = composition[i];
            species[i] = GasSpecies.Get(n);
            for (int j = 0; j < i; j++)
            {
                if (ReferenceEquals(species[j], species[i]))
                {
                    throw new ArgumentException($"Species {n} appears twice in the mixture; give each species once.", nameof(composition));
                }
            }

            if (!(f >= 0 && f <= 1))
            {
                throw new ArgumentOutOfRangeException(nameof(composition), f, $"The {kind} of {n} = {Units.SiText.Number(f)} is outside the valid range 0 to 1.");
            }

            fractions[i] = f;
            sum += f;
        }

        if (!(Math.Abs(sum - 1.0) <= 1e-6))
        {
            throw new ArgumentException($"The {kind}s sum to {Units.SiText.Number(sum)}; they must sum to 1 (valid range 1 ± 1e-6).", nameof(composition));
        }

        var components = new GasComponent[composition.Count];
        if (basis == CompositionBasis.Mole)
        {
            double m = 0;
            for (int i = 0; i < fractions.Length; i++)
            {
                m += fractions[i] / sum * species[i].MolarMass;
            }

            for (int i = 0; i < fractions.Length; i++)
            {
                double x = fractions[i] / sum;
                components[i] = new GasComponent(species[i], x, x * species[i].MolarMass / m);
            }
        }
        else
        {
            double moles = 0;
            for (int i = 0; i < fractions.Length; i++)
            {
                moles += fractions[i] / sum / species[i].MolarMass;
            }

            for (int i = 0; i < fractions.Length; i++)
            {
                double w = fractions[i] / sum;
                components[i] = new GasComponent(species[i], w / species[i].MolarMass / moles, w);
            }
        }

        name ??= (components.Length == 1 ? components[0].Species.Name : "Gas mixture (" + IdealGasMixture.Describe(components) + ")") + " (NASA Glenn, variable cp)";
        return new IdealGasMixture(name, components, datum);
    }
}
