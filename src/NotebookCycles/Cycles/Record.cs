using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using NotebookCycles.Units;

namespace NotebookCycles.Cycles;

/// <summary>What a number in the record measures, so a renderer can show it in the user's unit system.</summary>
public enum QuantityKind
{
    /// <summary>Absolute temperature, K.</summary>
    Temperature,

    /// <summary>Pressure, Pa.</summary>
    Pressure,

    /// <summary>Specific volume, m³/kg.</summary>
    SpecificVolume,

    /// <summary>Specific energy (u, h, q, w), J/kg.</summary>
    SpecificEnergy,

    /// <summary>Specific entropy or specific heat, J/(kg·K).</summary>
    SpecificEntropy,

    /// <summary>A pure number (ratios, exponents, efficiencies, qualities, mass fractions).</summary>
    Dimensionless,
}

/// <summary>A number in the record with its kind; SI value.</summary>
/// <param name="Value">The SI value.</param>
/// <param name="Kind">What it measures.</param>
public readonly record struct RecordValue(double Value, QuantityKind Kind)
{
    /// <summary>The value in the record's default engineering units (K, kPa, m³/kg, kJ/kg, kJ/(kg·K)), number only.</summary>
    public string ToNumberText() => SiText.Number(ToDefaultUnits());

    /// <summary>The value in the default engineering units.</summary>
    public double ToDefaultUnits() => Kind switch
    {
        QuantityKind.Pressure => Value / 1000.0,
        QuantityKind.SpecificEnergy or QuantityKind.SpecificEntropy => Value / 1000.0,
        _ => Value,
    };

    /// <summary>The unit of <see cref="ToDefaultUnits"/>.</summary>
    public string DefaultUnit => Kind switch
    {
        QuantityKind.Temperature => "K",
        QuantityKind.Pressure => "kPa",
        QuantityKind.SpecificVolume => "m³/kg",
        QuantityKind.SpecificEnergy => "kJ/kg",
        QuantityKind.SpecificEntropy => "kJ/(kg·K)",
        _ => "",
    };
}

/// <summary>
/// One line of the calculation record: the relation used, the relation with the numbers substituted, and the result.
/// For example Target "u3", Relation "u2 + q23", Substitution "{0} + {1}" with values (512.3 kJ/kg, 1650 kJ/kg),
/// Result 2162.3 kJ/kg: read as "u3 = u2 + q23 = 512.3 + 1650 = 2162.3 kJ/kg".
/// </summary>
/// <param name="Target">The symbol computed ("u3", "T3", "q23").</param>
/// <param name="Relation">The relation in symbols, right-hand side ("u2 + q23"); empty for a property look-up.</param>
/// <param name="Substitution">The relation with numbered placeholders {0}, {1}… for <paramref name="Values"/>.</param>
/// <param name="Values">The substituted numbers.</param>
/// <param name="Result">The result.</param>
/// <param name="Note">How the result was obtained when it is not arithmetic (for example "by the NASA Glenn polynomials").</param>
public sealed record RecordLine(string Target, string Relation, string Substitution, ImmutableArray<RecordValue> Values, RecordValue Result, string? Note = null)
{
    /// <summary>The line in the record's default engineering units.</summary>
    public override string ToString() => Format(static v => v.ToNumberText(), static v => v.ToNumberText() + (v.DefaultUnit.Length > 0 ? " " + v.DefaultUnit : ""));

    /// <summary>
    /// The line with numbers formatted by the caller (a renderer's unit system): <paramref name="number"/> formats a
    /// substituted value without its unit, <paramref name="result"/> the result with its unit.
    /// </summary>
    public string Format(Func<RecordValue, string> number, Func<RecordValue, string> result)
    {
        ArgumentNullException.ThrowIfNull(number);
        ArgumentNullException.ThrowIfNull(result);
        var text = new StringBuilder();
        text.Append(Target).Append(" = ");
        if (Relation.Length > 0)
        {
            text.Append(Relation).Append(" = ");
        }

        if (Substitution.Length > 0)
        {
            var args = new object[Values.Length];
            for (int i = 0; i < args.Length; i++)
            {
                args[i] = number(Values[i]);
            }

            text.Append(string.Format(CultureInfo.InvariantCulture, Substitution, args)).Append(" = ");
        }

        text.Append(result(Result));
        if (Note is not null)
        {
            text.Append(' ').Append(Note);
        }

        return text.ToString();
    }
}
