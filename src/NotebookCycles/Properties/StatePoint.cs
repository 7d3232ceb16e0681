namespace NotebookCycles.Properties;

/// <summary>
/// One thermodynamic state as SI doubles: the allocation-free value the property models return on hot paths.
/// Public code usually works with <see cref="State"/>, which adds a label, the model and quantities with units.
/// </summary>
/// <remarks>
/// Units: <see cref="T"/> K, <see cref="P"/> Pa, <see cref="V"/> m³/kg, <see cref="U"/> and <see cref="H"/> J/kg,
/// <see cref="S"/>, <see cref="Cp"/> and <see cref="Cv"/> J/(kg·K), <see cref="W"/> m/s.
/// <see cref="X"/> is the vapour quality for two-phase states and NaN for single-phase states.
/// Enthalpy, internal energy and entropy are relative to the model's reference state: combine differences.
/// </remarks>
public readonly record struct StatePoint(
    double T,
    double P,
    double V,
    double U,
    double H,
    double S,
    double Cp,
    double Cv,
    double W,
    double X,
    Phase Phase)
{
    /// <summary>Density, kg/m³.</summary>
    public double Rho => 1.0 / V;

    /// <summary>Ratio of specific heats cp/cv (for two-phase states NaN).</summary>
    public double K => Cp / Cv;

    /// <summary>True when the state is a saturated mixture with a defined quality.</summary>
    public bool IsTwoPhase => Phase == Phase.TwoPhase;

    /// <summary>The value of one property by its kind.</summary>
    public double Get(StateProperty property) => property switch
    {
        StateProperty.Temperature => T,
        StateProperty.Pressure => P,
        StateProperty.SpecificVolume => V,
        StateProperty.InternalEnergy => U,
        StateProperty.Enthalpy => H,
        StateProperty.Entropy => S,
        StateProperty.Quality => X,
        _ => throw new ArgumentOutOfRangeException(nameof(property), property, "Unknown state property."),
    };
}
