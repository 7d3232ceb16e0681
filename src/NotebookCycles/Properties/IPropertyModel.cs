namespace NotebookCycles.Properties;

/// <summary>
/// A property model: given two independent properties, the full state, or a typed error naming the model,
/// the inputs and the valid range. Implementations: ideal gases with temperature-dependent cp, the
/// cold-air-standard model, IAPWS-IF97 water and steam.
/// </summary>
/// <remarks>
/// All values are SI doubles: K, Pa, m³/kg, J/kg, J/(kg·K). Every method validates its inputs once and throws
/// <see cref="StateOutOfRangeException"/> for NaN, infinity, non-positive absolute temperature, pressure or
/// volume, and for any state outside the model's range; nothing is clamped. Pairs a model cannot use raise
/// <see cref="UnsupportedInputPairException"/>. Implementations are immutable and thread-safe.
/// </remarks>
public interface IPropertyModel
{
    /// <summary>A short name, used in records and messages (for example "Dry air (NASA Glenn, variable cp)").</summary>
    string Name { get; }

    /// <summary>The published source of the model's equations and coefficients.</summary>
    string Citation { get; }

    /// <summary>The temperature range the model is valid in.</summary>
    ValidityRange TemperatureRange { get; }

    /// <summary>The pressure range the model is valid in.</summary>
    ValidityRange PressureRange { get; }

    /// <summary>True when the model has a liquid-vapour saturation region (water, refrigerants).</summary>
    bool HasSaturation { get; }

    /// <summary>
    /// How closely the model's equations agree with each other, relative: for example how well its saturation line
    /// satisfies the Clausius relation h_fg = T·s_fg. Balance checks (entropy generated ≥ 0) allow this much before
    /// calling a result impossible. 1e-9 for models that are exactly consistent (ideal gases).
    /// </summary>
    double ConsistencyTolerance => 1e-9;

    /// <summary>State from temperature (K) and pressure (Pa).</summary>
    StatePoint FromTP(double temperature, double pressure);

    /// <summary>State from temperature (K) and specific volume (m³/kg).</summary>
    StatePoint FromTV(double temperature, double specificVolume);

    /// <summary>State from pressure (Pa) and specific volume (m³/kg).</summary>
    StatePoint FromPV(double pressure, double specificVolume);

    /// <summary>State from pressure (Pa) and specific enthalpy (J/kg).</summary>
    StatePoint FromPH(double pressure, double enthalpy);

    /// <summary>State from pressure (Pa) and specific entropy (J/(kg·K)).</summary>
    StatePoint FromPS(double pressure, double entropy);

    /// <summary>State from specific volume (m³/kg) and specific internal energy (J/kg).</summary>
    StatePoint FromVU(double specificVolume, double internalEnergy);

    /// <summary>State from specific volume (m³/kg) and specific entropy (J/(kg·K)).</summary>
    StatePoint FromVS(double specificVolume, double entropy);

    /// <summary>State from temperature (K) and specific entropy (J/(kg·K)).</summary>
    StatePoint FromTS(double temperature, double entropy);

    /// <summary>State from specific enthalpy (J/kg) and specific entropy (J/(kg·K)).</summary>
    StatePoint FromHS(double enthalpy, double entropy) =>
        throw new UnsupportedInputPairException(Name, StateProperty.Enthalpy, StateProperty.Entropy);

    /// <summary>Saturated state from temperature (K) and quality (0 to 1).</summary>
    StatePoint FromTX(double temperature, double quality) =>
        throw new UnsupportedInputPairException(Name, StateProperty.Temperature, StateProperty.Quality, "the model has no liquid-vapour region");

    /// <summary>Saturated state from pressure (Pa) and quality (0 to 1).</summary>
    StatePoint FromPX(double pressure, double quality) =>
        throw new UnsupportedInputPairException(Name, StateProperty.Pressure, StateProperty.Quality, "the model has no liquid-vapour region");
}

/// <summary>A model with a liquid-vapour saturation line: water and refrigerants.</summary>
public interface ISaturationModel : IPropertyModel
{
    /// <summary>The critical point.</summary>
    StatePoint CriticalPoint { get; }

    /// <summary>Lowest saturation temperature the model covers (the triple point or the range's lower end), K.</summary>
    double SaturationTemperatureMinimum { get; }

    /// <summary>Saturation pressure (Pa) at temperature (K).</summary>
    double SaturationPressure(double temperature);

    /// <summary>Saturation temperature (K) at pressure (Pa).</summary>
    double SaturationTemperature(double pressure);
}

/// <summary>Solving a state from any supported pair of properties, for callers that hold the pair as data (the CLI, the chain).</summary>
public static class PropertyModelExtensions
{
    /// <summary>
    /// State from two independent properties given in either order, SI units. Throws
    /// <see cref="UnsupportedInputPairException"/> when the pair is not independent or not supported by the model.
    /// </summary>
    public static StatePoint Solve(this IPropertyModel model, StateProperty first, double firstValue, StateProperty second, double secondValue)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (Order(first) > Order(second))
        {
            (first, second) = (second, first);
            (firstValue, secondValue) = (secondValue, firstValue);
        }

        return (first, second) switch
        {
            (StateProperty.Temperature, StateProperty.Pressure) => model.FromTP(firstValue, secondValue),
            (StateProperty.Temperature, StateProperty.SpecificVolume) => model.FromTV(firstValue, secondValue),
            (StateProperty.Temperature, StateProperty.Entropy) => model.FromTS(firstValue, secondValue),
            (StateProperty.Temperature, StateProperty.Quality) => model.FromTX(firstValue, secondValue),
            (StateProperty.Pressure, StateProperty.SpecificVolume) => model.FromPV(firstValue, secondValue),
            (StateProperty.Pressure, StateProperty.Enthalpy) => model.FromPH(firstValue, secondValue),
            (StateProperty.Pressure, StateProperty.Entropy) => model.FromPS(firstValue, secondValue),
            (StateProperty.Pressure, StateProperty.Quality) => model.FromPX(firstValue, secondValue),
            (StateProperty.SpecificVolume, StateProperty.InternalEnergy) => model.FromVU(firstValue, secondValue),
            (StateProperty.SpecificVolume, StateProperty.Entropy) => model.FromVS(firstValue, secondValue),
            (StateProperty.Enthalpy, StateProperty.Entropy) => model.FromHS(firstValue, secondValue),
            _ => throw new UnsupportedInputPairException(model.Name, first, second),
        };
    }

    private static int Order(StateProperty property) => property switch
    {
        StateProperty.Temperature => 0,
        StateProperty.Pressure => 1,
        StateProperty.SpecificVolume => 2,
        StateProperty.InternalEnergy => 3,
        StateProperty.Enthalpy => 4,
        StateProperty.Entropy => 5,
        StateProperty.Quality => 6,
        _ => 7,
    };
}
