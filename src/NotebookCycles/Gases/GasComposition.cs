namespace NotebookCycles.Gases;

/// <summary>Where the enthalpy (and internal energy) of an ideal gas is zero.</summary>
public enum EnthalpyDatum
{
    /// <summary>
    /// Sensible enthalpy: h = 0 at 0 K. Per species h(T) = [H(T) − ΔHf(298.15 K) + (H(298.15 K) − H(0 K))]/M, so
    /// u = h − R·T is also zero at 0 K. The convention of the printed ideal-gas air table; the default for cycle work.
    /// </summary>
    Sensible,

    /// <summary>
    /// The NASA/JANAF datum: h(298.15 K) equals the enthalpy of formation (zero for N2, O2, Ar). Needed for
    /// combustion energy balances, where reactants and products must share one datum.
    /// </summary>
    Formation,
}

/// <summary>How the fractions of a mixture are given.</summary>
public enum CompositionBasis
{
    /// <summary>Mole (volume) fractions.</summary>
    Mole,

    /// <summary>Mass fractions.</summary>
    Mass,
}

/// <summary>One species of a mixture with its mole and mass fraction (each in [0, 1]).</summary>
/// <param name="Species">The NASA Glenn species.</param>
/// <param name="MoleFraction">Mole fraction.</param>
/// <param name="MassFraction">Mass fraction.</param>
public readonly record struct GasComponent(GasSpecies Species, double MoleFraction, double MassFraction);
