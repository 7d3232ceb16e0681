using System.Globalization;
using NotebookCycles.Properties;

namespace NotebookCycles.Units;

/// <summary>
/// Engineering text for SI values in messages and records: K, kPa (MPa above 10 MPa), m³/kg, kJ/kg, kJ/(kg·K).
/// Formatting only; nothing here changes a computed number.
/// </summary>
public static class SiText
{
    /// <summary>Formats an SI value of <paramref name="property"/> with its engineering unit and six significant digits.</summary>
    public static string Format(StateProperty property, double siValue) => property switch
    {
        StateProperty.Temperature => Number(siValue) + " K",
        StateProperty.Pressure => Pressure(siValue),
        StateProperty.SpecificVolume => Number(siValue) + " m³/kg",
        StateProperty.InternalEnergy or StateProperty.Enthalpy => Number(siValue / 1000.0) + " kJ/kg",
        StateProperty.Entropy => Number(siValue / 1000.0) + " kJ/(kg·K)",
        StateProperty.Quality => Number(siValue),
        _ => Number(siValue),
    };

    /// <summary>A pressure in Pa as kPa, or MPa when at least 10 MPa.</summary>
    public static string Pressure(double pascals) =>
        Math.Abs(pascals) >= 1.0e7 ? Number(pascals / 1.0e6) + " MPa" : Number(pascals / 1000.0) + " kPa";

    /// <summary>Six significant digits, invariant culture, no exponent for ordinary magnitudes.</summary>
    public static string Number(double value)
    {
        if (double.IsNaN(value))
        {
            return "NaN";
        }

        if (double.IsInfinity(value))
        {
            return value > 0 ? "+∞" : "−∞";
        }

        double magnitude = Math.Abs(value);
        if (magnitude != 0 && (magnitude < 1e-4 || magnitude >= 1e9))
        {
            return value.ToString("0.#####E+0", CultureInfo.InvariantCulture);
        }

        return value.ToString("G6", CultureInfo.InvariantCulture);
    }
}
