namespace NotebookCycles.Refrigerants;

/// <summary>
/// The zero of enthalpy and entropy of a refrigerant. Only differences are physical; tables of different origin use
/// different zeros, so compare a table with the model only in the table's own reference state.
/// </summary>
public enum ReferenceState
{
    /// <summary>IIR: h = 200 kJ/kg and s = 1 kJ/(kg·K) for the saturated liquid at 0 °C (the default).</summary>
    Iir,

    /// <summary>ASHRAE: h = 0 and s = 0 for the saturated liquid at −40 °C.</summary>
    Ashrae,

    /// <summary>Normal boiling point: h = 0 and s = 0 for the saturated liquid at 101.325 kPa (not for CO₂, whose triple-point pressure is higher).</summary>
    NormalBoilingPoint,

    /// <summary>The equation's own constants as published (for example the ideal gas at 298.15 K and 101.325 kPa for CO₂).</summary>
    Equation,
}
