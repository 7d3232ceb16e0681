using System.Globalization;
using System.Text;
using NotebookCycles.Properties;

namespace NotebookCycles.Cli;

/// <summary>
/// Parses a state input written as text, <c>property=value unit</c> ("T=1200K", "p=20 bar", "h=3100kJ/kg",
/// "x=0.9"), into the property and its SI value. Temperatures: K, °C (C, degC), °F (F, degF), R (°R); pressures
/// (absolute): Pa, kPa, MPa, bar, mbar, atm, psi (psia); specific volume: m3/kg, L/kg, ft3/lb; specific energy:
/// J/kg, kJ/kg, MJ/kg, Btu/lb; specific entropy: J/kgK, kJ/kgK (also written kJ/(kg·K), kJ/kg-K), Btu/lbR; quality:
/// no unit or %.
/// </summary>
public static class QuantityText
{
    private const double PoundForcePerSquareInch = 6894.757293168361; // 1 lbf/in² in Pa (exact by the definitions of lb, lbf and in)
    private const double CubicFootPerPound = 0.028316846592 / 0.45359237; // m³/kg
    private const double BtuPerPound = 2326.0; // J/kg, International Table Btu per lb (exact)
    private const double BtuPerPoundRankine = 4186.8; // J/(kg·K), International Table (exact)

    private static readonly Dictionary<string, (Dimension Dimension, double Factor, double Offset)> Units = new(StringComparer.Ordinal)
    {
        ["k"] = (Dimension.Temperature, 1, 0),
        ["c"] = (Dimension.Temperature, 1, 273.15),
        ["degc"] = (Dimension.Temperature, 1, 273.15),
        ["f"] = (Dimension.Temperature, 5.0 / 9.0, 273.15 - 32 * 5.0 / 9.0),
        ["degf"] = (Dimension.Temperature, 5.0 / 9.0, 273.15 - 32 * 5.0 / 9.0),
        ["r"] = (Dimension.Temperature, 5.0 / 9.0, 0),
        ["degr"] = (Dimension.Temperature, 5.0 / 9.0, 0),
        ["pa"] = (Dimension.Pressure, 1, 0),
        ["kpa"] = (Dimension.Pressure, 1e3, 0),
        ["mpa"] = (Dimension.Pressure, 1e6, 0),
        ["bar"] = (Dimension.Pressure, 1e5, 0),
        ["mbar"] = (Dimension.Pressure, 100, 0),
        ["atm"] = (Dimension.Pressure, 101_325, 0),
        ["psi"] = (Dimension.Pressure, PoundForcePerSquareInch, 0),
        ["psia"] = (Dimension.Pressure, PoundForcePerSquareInch, 0),
        ["m3/kg"] = (Dimension.SpecificVolume, 1, 0),
        ["l/kg"] = (Dimension.SpecificVolume, 1e-3, 0),
        ["dm3/kg"] = (Dimension.SpecificVolume, 1e-3, 0),
        ["cm3/g"] = (Dimension.SpecificVolume, 1e-3, 0),
        ["ft3/lb"] = (Dimension.SpecificVolume, CubicFootPerPound, 0),
        ["ft3/lbm"] = (Dimension.SpecificVolume, CubicFootPerPound, 0),
        ["j/kg"] = (Dimension.SpecificEnergy, 1, 0),
        ["kj/kg"] = (Dimension.SpecificEnergy, 1e3, 0),
        ["mj/kg"] = (Dimension.SpecificEnergy, 1e6, 0),
        ["btu/lb"] = (Dimension.SpecificEnergy, BtuPerPound, 0),
        ["btu/lbm"] = (Dimension.SpecificEnergy, BtuPerPound, 0),
        ["j/kgk"] = (Dimension.SpecificEntropy, 1, 0),
        ["kj/kgk"] = (Dimension.SpecificEntropy, 1e3, 0),
        ["btu/lbr"] = (Dimension.SpecificEntropy, BtuPerPoundRankine, 0),
        ["btu/lbmr"] = (Dimension.SpecificEntropy, BtuPerPoundRankine, 0),
        ["%"] = (Dimension.Dimensionless, 0.01, 0),
    };

    private enum Dimension
    {
        Temperature,
        Pressure,
        SpecificVolume,
        SpecificEnergy,
        SpecificEntropy,
        Dimensionless,
    }

    /// <summary>Parses "property=value unit"; a bad property, number or unit raises <see cref="CliException"/> naming it and what is accepted.</summary>
    public static StateInput Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        int eq = text.IndexOf('=');
        if (eq <= 0)
        {
            throw new CliException($"'{text}' is not an input: write property=value with a unit, e.g. T=1200K or p=20bar.");
        }

        string name = text[..eq].Trim();
        var property = Property(name) ?? throw new CliException($"unknown property '{name}' in '{text}': use T, p, v, u, h, s or x.");
        string rest = text[(eq + 1)..].Trim();
        int end = NumberEnd(rest);
        if (end == 0 || !double.TryParse(rest[..end], NumberStyles.Float, CultureInfo.InvariantCulture, out double number))
        {
            throw new CliException($"'{text}': '{rest}' does not start with a number.");
        }

        string unitText = rest[end..].Trim();
        var want = DimensionOf(property);
        if (unitText.Length == 0)
        {
            if (want == Dimension.Dimensionless)
            {
                return new StateInput(property, number);
            }

            throw new CliException($"'{text}': give the unit of {property.Symbol()} ({Accepted(want)}).");
        }

        string key = Key(unitText);
        if (key is "psig" or "barg" or "kpag")
        {
            throw new CliException($"'{text}': {unitText} is a gauge pressure; give the absolute pressure ({Accepted(Dimension.Pressure)}).");
        }

        if (!Units.TryGetValue(key, out var unit))
        {
            throw new CliException($"'{text}': unknown unit '{unitText}'; {property.Symbol()} takes {Accepted(want)}.");
        }

        if (unit.Dimension != want)
        {
            throw new CliException($"'{text}': {unitText} is a unit of {Describe(unit.Dimension)}, but {property.Symbol()} is a {Describe(want)} ({Accepted(want)}).");
        }

        return new StateInput(property, number * unit.Factor + unit.Offset);
    }

    private static StateProperty? Property(string name) => name switch
    {
        "T" or "t" => StateProperty.Temperature,
        "p" or "P" => StateProperty.Pressure,
        "v" or "V" => StateProperty.SpecificVolume,
        "u" or "U" => StateProperty.InternalEnergy,
        "h" or "H" => StateProperty.Enthalpy,
        "s" or "S" => StateProperty.Entropy,
        "x" or "X" => StateProperty.Quality,
        _ => null,
    };

    private static Dimension DimensionOf(StateProperty property) => property switch
    {
        StateProperty.Temperature => Dimension.Temperature,
        StateProperty.Pressure => Dimension.Pressure,
        StateProperty.SpecificVolume => Dimension.SpecificVolume,
        StateProperty.InternalEnergy or StateProperty.Enthalpy => Dimension.SpecificEnergy,
        StateProperty.Entropy => Dimension.SpecificEntropy,
        _ => Dimension.Dimensionless,
    };

    private static string Describe(Dimension d) => d switch
    {
        Dimension.Temperature => "temperature",
        Dimension.Pressure => "pressure",
        Dimension.SpecificVolume => "specific volume",
        Dimension.SpecificEnergy => "specific energy",
        Dimension.SpecificEntropy => "specific entropy",
        _ => "pure number",
    };

    private static string Accepted(Dimension d) => d switch
    {
        Dimension.Temperature => "K, °C, °F, R",
        Dimension.Pressure => "Pa, kPa, MPa, bar, mbar, atm, psi",
        Dimension.SpecificVolume => "m3/kg, L/kg, ft3/lb",
        Dimension.SpecificEnergy => "J/kg, kJ/kg, MJ/kg, Btu/lb",
        Dimension.SpecificEntropy => "J/kgK, kJ/kgK, Btu/lbR",
        _ => "no unit, or %",
    };

    private static int NumberEnd(string s)
    {
        int i = 0;
        if (i < s.Length && (s[i] == '-' || s[i] == '+'))
        {
            i++;
        }

        while (i < s.Length && (char.IsAsciiDigit(s[i]) || s[i] == '.'))
        {
            i++;
        }

        if (i < s.Length && (s[i] == 'e' || s[i] == 'E') && i + 1 < s.Length && (char.IsAsciiDigit(s[i + 1]) || ((s[i + 1] == '-' || s[i + 1] == '+') && i + 2 < s.Length && char.IsAsciiDigit(s[i + 2]))))
        {
            i += 2;
            while (i < s.Length && char.IsAsciiDigit(s[i]))
            {
                i++;
            }
        }

        return i;
    }

    /// <summary>The lookup key of a unit: lower case, no spaces, brackets, degree signs or product marks; ³ as 3.</summary>
    private static string Key(string unit)
    {
        var sb = new StringBuilder(unit.Length);
        foreach (char c in unit)
        {
            switch (c)
            {
                case ' ' or '(' or ')' or '·' or '*' or '⋅' or '°' or '-' or '.':
                    break;
                case '³':
                    sb.Append('3');
                    break;
                default:
                    sb.Append(char.ToLowerInvariant(c));
                    break;
            }
        }

        string key = sb.ToString();
        return key.StartsWith("deg", StringComparison.Ordinal) && key.Length == 4 ? key : key;
    }
}
