using System.Globalization;
using NotebookCycles.Cycles;

namespace NotebookCycles.Rendering;

/// <summary>The unit system numbers are displayed in. Only the display changes: the computed SI numbers never do.</summary>
public enum DisplayUnits
{
    /// <summary>K, kPa, m³/kg, kJ/kg, kJ/(kg·K); heat rate in kJ/kWh, specific consumption in kg/kWh.</summary>
    Si,

    /// <summary>°C in tables and on axes (K inside relations), bar, m³/kg, kJ/kg, kJ/(kg·K).</summary>
    SiCelsiusBar,

    /// <summary>°F in tables and on axes (°R inside relations), psia, ft³/lbm, Btu/lbm, Btu/(lbm·R); heat rate in Btu/kWh, specific consumption in lbm/kWh.</summary>
    UsCustomary,
}

/// <summary>What a displayed number measures: the record's kinds plus the figures that have units of their own.</summary>
public enum DisplayQuantity
{
    /// <summary>A temperature in a table or on an axis: K, °C or °F.</summary>
    Temperature,

    /// <summary>An absolute temperature, as used inside relations: K or °R.</summary>
    AbsoluteTemperature,

    /// <summary>Pressure: kPa, bar or psia.</summary>
    Pressure,

    /// <summary>Specific volume: m³/kg or ft³/lbm.</summary>
    SpecificVolume,

    /// <summary>Specific energy (u, h, q, w): kJ/kg or Btu/lbm.</summary>
    SpecificEnergy,

    /// <summary>Specific entropy or specific heat: kJ/(kg·K) or Btu/(lbm·R).</summary>
    SpecificEntropy,

    /// <summary>A pure number.</summary>
    Dimensionless,

    /// <summary>Heat rate, heat in per net work: kJ/kWh or Btu/kWh.</summary>
    HeatRate,

    /// <summary>Specific consumption, mass per net work: kg/kWh or lbm/kWh.</summary>
    SpecificConsumption,
}

/// <summary>
/// Conversion of SI values to display units and their text, with significant digits chosen per quantity.
/// Invariant culture throughout; NaN shows as "—".
/// </summary>
/// <remarks>
/// Conversion factors (exact by definition): 1 psi = 6894.757293168 Pa; 1 ft³/lbm = 0.028316846592 m³ / 0.45359237 kg;
/// 1 Btu (International Table) = 1055.05585262 J, so 1 Btu/lbm = 2326 J/kg and 1 Btu/(lbm·R) = 4186.8 J/(kg·K);
/// 1 °R = 5/9 K.
/// </remarks>
public static class UnitText
{
    private const double PascalsPerPsi = 6894.757293168;
    private const double CubicMetresPerKilogramPerCubicFootPerPound = 0.028316846592 / 0.45359237;
    private const double JoulesPerKilogramPerBtuPerPound = 2326.0;
    private const double JoulesPerKilogramKelvinPerBtuPerPoundRankine = 4186.8;
    private const double JoulesPerBtu = 1055.05585262;
    private const double KilogramsPerPound = 0.45359237;

    /// <summary>The SI value in display units.</summary>
    public static double Convert(double si, DisplayQuantity quantity, DisplayUnits units) => (quantity, units) switch
    {
        (DisplayQuantity.Temperature, DisplayUnits.Si) => si,
        (DisplayQuantity.Temperature, DisplayUnits.SiCelsiusBar) => si - 273.15,
        (DisplayQuantity.Temperature, DisplayUnits.UsCustomary) => si * 1.8 - 459.67,
        (DisplayQuantity.AbsoluteTemperature, DisplayUnits.UsCustomary) => si * 1.8,
        (DisplayQuantity.AbsoluteTemperature, _) => si,
        (DisplayQuantity.Pressure, DisplayUnits.Si) => si / 1000.0,
        (DisplayQuantity.Pressure, DisplayUnits.SiCelsiusBar) => si / 100_000.0,
        (DisplayQuantity.Pressure, DisplayUnits.UsCustomary) => si / PascalsPerPsi,
        (DisplayQuantity.SpecificVolume, DisplayUnits.UsCustomary) => si / CubicMetresPerKilogramPerCubicFootPerPound,
        (DisplayQuantity.SpecificVolume, _) => si,
        (DisplayQuantity.SpecificEnergy, DisplayUnits.UsCustomary) => si / JoulesPerKilogramPerBtuPerPound,
        (DisplayQuantity.SpecificEnergy, _) => si / 1000.0,
        (DisplayQuantity.SpecificEntropy, DisplayUnits.UsCustomary) => si / JoulesPerKilogramKelvinPerBtuPerPoundRankine,
        (DisplayQuantity.SpecificEntropy, _) => si / 1000.0,
        (DisplayQuantity.HeatRate, DisplayUnits.UsCustomary) => si * 3.6e6 / JoulesPerBtu,
        (DisplayQuantity.HeatRate, _) => si * 3600.0,
        (DisplayQuantity.SpecificConsumption, DisplayUnits.UsCustomary) => si * 3.6e6 / KilogramsPerPound,
        (DisplayQuantity.SpecificConsumption, _) => si * 3.6e6,
        _ => si,
    };

    /// <summary>The unit symbol of a quantity in a unit system ("" for pure numbers).</summary>
    public static string Unit(DisplayQuantity quantity, DisplayUnits units) => (quantity, units) switch
    {
        (DisplayQuantity.Temperature, DisplayUnits.Si) => "K",
        (DisplayQuantity.Temperature, DisplayUnits.SiCelsiusBar) => "°C",
        (DisplayQuantity.Temperature, DisplayUnits.UsCustomary) => "°F",
        (DisplayQuantity.AbsoluteTemperature, DisplayUnits.UsCustomary) => "°R",
        (DisplayQuantity.AbsoluteTemperature, _) => "K",
        (DisplayQuantity.Pressure, DisplayUnits.Si) => "kPa",
        (DisplayQuantity.Pressure, DisplayUnits.SiCelsiusBar) => "bar",
        (DisplayQuantity.Pressure, DisplayUnits.UsCustomary) => "psia",
        (DisplayQuantity.SpecificVolume, DisplayUnits.UsCustomary) => "ft³/lbm",
        (DisplayQuantity.SpecificVolume, _) => "m³/kg",
        (DisplayQuantity.SpecificEnergy, DisplayUnits.UsCustomary) => "Btu/lbm",
        (DisplayQuantity.SpecificEnergy, _) => "kJ/kg",
        (DisplayQuantity.SpecificEntropy, DisplayUnits.UsCustomary) => "Btu/(lbm·R)",
        (DisplayQuantity.SpecificEntropy, _) => "kJ/(kg·K)",
        (DisplayQuantity.HeatRate, DisplayUnits.UsCustomary) => "Btu/kWh",
        (DisplayQuantity.HeatRate, _) => "kJ/kWh",
        (DisplayQuantity.SpecificConsumption, DisplayUnits.UsCustomary) => "lbm/kWh",
        (DisplayQuantity.SpecificConsumption, _) => "kg/kWh",
        _ => "",
    };

    /// <summary>The display quantity of a record value: temperatures in relations stay absolute.</summary>
    public static DisplayQuantity Of(QuantityKind kind) => kind switch
    {
        QuantityKind.Temperature => DisplayQuantity.AbsoluteTemperature,
        QuantityKind.Pressure => DisplayQuantity.Pressure,
        QuantityKind.SpecificVolume => DisplayQuantity.SpecificVolume,
        QuantityKind.SpecificEnergy => DisplayQuantity.SpecificEnergy,
        QuantityKind.SpecificEntropy => DisplayQuantity.SpecificEntropy,
        _ => DisplayQuantity.Dimensionless,
    };

    /// <summary>The SI value converted and formatted, number only.</summary>
    public static string Number(double si, DisplayQuantity quantity, DisplayUnits units) =>
        quantity is DisplayQuantity.Temperature or DisplayQuantity.AbsoluteTemperature
            ? Fixed(Convert(si, quantity, units), 2)
            : Significant(Convert(si, quantity, units), Digits(quantity));

    /// <summary>The SI value converted and formatted with its unit ("26.85 °C", "1.0000 bar").</summary>
    public static string WithUnit(double si, DisplayQuantity quantity, DisplayUnits units)
    {
        string unit = Unit(quantity, units);
        return unit.Length == 0 ? Number(si, quantity, units) : Number(si, quantity, units) + " " + unit;
    }

    /// <summary>A record value, number only, in display units (absolute temperatures).</summary>
    public static string Number(RecordValue value, DisplayUnits units) => Number(value.Value, Of(value.Kind), units);

    /// <summary>A record value with its unit, in display units (absolute temperatures).</summary>
    public static string WithUnit(RecordValue value, DisplayUnits units) => WithUnit(value.Value, Of(value.Kind), units);

    /// <summary>A record line with its numbers in display units; temperatures inside relations stay absolute (K or °R).</summary>
    public static string Line(RecordLine line, DisplayUnits units)
    {
        ArgumentNullException.ThrowIfNull(line);
        return line.Format(v => Number(v, units), v => WithUnit(v, units));
    }

    /// <summary>The name of a unit system as shown to users.</summary>
    public static string Describe(DisplayUnits units) => units switch
    {
        DisplayUnits.Si => "SI (K, kPa, m³/kg, kJ/kg, kJ/(kg·K))",
        DisplayUnits.SiCelsiusBar => "SI with °C and bar (°C, bar, m³/kg, kJ/kg, kJ/(kg·K); K inside relations)",
        DisplayUnits.UsCustomary => "US customary (°F, psia, ft³/lbm, Btu/lbm, Btu/(lbm·R); °R inside relations)",
        _ => units.ToString(),
    };

    private static int Digits(DisplayQuantity quantity) => quantity switch
    {
        DisplayQuantity.Pressure => 5,
        DisplayQuantity.SpecificVolume => 5,
        DisplayQuantity.SpecificEnergy => 5,
        DisplayQuantity.SpecificEntropy => 5,
        DisplayQuantity.HeatRate => 5,
        DisplayQuantity.SpecificConsumption => 4,
        _ => 4,
    };

    /// <summary><paramref name="value"/> with a fixed number of decimals, invariant culture; NaN as "—".</summary>
    internal static string Fixed(double value, int decimals)
    {
        if (!double.IsFinite(value))
        {
            return NonFinite(value);
        }

        string text = value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return IsNegativeZero(text) ? text[1..] : text;
    }

    /// <summary><paramref name="value"/> to <paramref name="digits"/> significant digits, without an exponent for ordinary magnitudes.</summary>
    internal static string Significant(double value, int digits)
    {
        if (!double.IsFinite(value))
        {
            return NonFinite(value);
        }

        // Round-off residue of a zero (an isentrope's Δs, a reversible step's s_gen) reads as zero.
        if (Math.Abs(value) < 1e-9)
        {
            return "0";
        }

        double magnitude = Math.Abs(value);
        if (magnitude < 1e-4 || magnitude >= 1e9)
        {
            return value.ToString("0." + new string('0', digits - 1) + "E+0", CultureInfo.InvariantCulture);
        }

        int exponent = (int)Math.Floor(Math.Log10(magnitude));
        int decimals = Math.Clamp(digits - 1 - exponent, 0, 12);
        double rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        if (rounded != 0 && (int)Math.Floor(Math.Log10(Math.Abs(rounded))) > exponent && decimals > 0)
        {
            decimals--;
        }

        string text = value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return IsNegativeZero(text) ? text[1..] : text;
    }

    private static bool IsNegativeZero(string text) => text.Length > 1 && text[0] == '-' && text.AsSpan(1).Trim("0.").IsEmpty;

    private static string NonFinite(double value) => double.IsNaN(value) ? "—" : value > 0 ? "+∞" : "−∞";
}
