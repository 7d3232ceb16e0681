using System.Globalization;
using System.Text;

namespace NotebookCycles.Tests.Water.Backward;

/// <summary>
/// Reads ReferenceData/iapws_if97_supplementary_verification.csv: the computer-program verification values of
/// IAPWS SR2-01(2014), SR3-03(2014), SR4-04(2014) and SR5-05(2016) (and R7-97(2012) Table 18, which belongs to the
/// forward model and is left out here). Header lines start with '#'.
/// </summary>
internal static class SupplementaryVerificationData
{
    public const string FileName = "iapws_if97_supplementary_verification.csv";

    /// <summary>The rows of the four supplementary releases, in file order.</summary>
    public static IReadOnlyList<VerificationRow> Rows { get; } = Load();

    /// <summary>The rows as xunit theory data: release, table, inputs, quantity, unit, value (all strings, so each row is its own case).</summary>
    public static IEnumerable<object[]> Cases()
    {
        foreach (var row in Rows)
        {
            yield return [row.Release, row.Table, row.Inputs, row.Quantity, row.Unit, row.ValueText];
        }
    }

    /// <summary>The rows of one release (by tag, e.g. "SR5-05") as theory data.</summary>
    public static IEnumerable<object[]> CasesOf(string releaseTag)
    {
        foreach (var row in Rows)
        {
            if (row.ReleaseTag == releaseTag)
            {
                yield return [row.Release, row.Table, row.Inputs, row.Quantity, row.Unit, row.ValueText];
            }
        }
    }

    /// <summary>The rows of one release whose quantity names a subregion ("subregion 3a"), as theory data.</summary>
    public static IEnumerable<object[]> SubregionCasesOf(string releaseTag)
    {
        foreach (var row in Rows)
        {
            if (row.ReleaseTag == releaseTag && row.Quantity.Contains("subregion ", StringComparison.Ordinal))
            {
                yield return [row.Release, row.Table, row.Inputs, row.Quantity, row.Unit, row.ValueText];
            }
        }
    }

    private static List<VerificationRow> Load()
    {
        string path = Path.Combine(AppContext.BaseDirectory, "ReferenceData", FileName);
        var rows = new List<VerificationRow>();
        bool headerSeen = false;
        foreach (string line in File.ReadLines(path))
        {
            if (line.Length == 0 || line.StartsWith('#'))
            {
                continue;
            }

            var fields = SplitCsv(line);
            if (!headerSeen)
            {
                if (fields.Count < 6 || fields[0] != "release" || fields[2] != "inputs" || fields[3] != "quantity" || fields[5] != "value")
                {
                    throw new InvalidDataException($"{FileName}: unexpected header '{line}'.");
                }

                headerSeen = true;
                continue;
            }

            if (fields.Count < 6)
            {
                throw new InvalidDataException($"{FileName}: short row '{line}'.");
            }

            // R7-97(2012) Table 18 (metastable vapour) belongs to the forward model.
            if (fields[0].StartsWith("IAPWS R7-97", StringComparison.Ordinal))
            {
                continue;
            }

            rows.Add(new VerificationRow(fields[0], fields[1], fields[2], fields[3], fields[4], fields[5]));
        }

        return rows;
    }

    /// <summary>Splits one CSV line with RFC 4180 quoting (quoted fields may hold commas and doubled quotes).</summary>
    internal static List<string> SplitCsv(string line)
    {
        var fields = new List<string>();
        var current = new StringBuilder();
        bool quoted = false;
        for (int i = 0; i < line.Length; i++)
        {
            char c = line[i];
            if (quoted)
            {
                if (c == '"')
                {
                    if (i + 1 < line.Length && line[i + 1] == '"')
                    {
                        current.Append('"');
                        i++;
                    }
                    else
                    {
                        quoted = false;
                    }
                }
                else
                {
                    current.Append(c);
                }
            }
            else if (c == '"')
            {
                quoted = true;
            }
            else if (c == ',')
            {
                fields.Add(current.ToString());
                current.Clear();
            }
            else
            {
                current.Append(c);
            }
        }

        fields.Add(current.ToString());
        return fields;
    }
}

/// <summary>One verification value and the inputs it was computed from.</summary>
internal sealed record VerificationRow(string Release, string Table, string Inputs, string Quantity, string Unit, string ValueText)
{
    public double Value => double.Parse(ValueText, NumberStyles.Float, CultureInfo.InvariantCulture);

    /// <summary>The short release tag, e.g. "SR5-05".</summary>
    public string ReleaseTag => ReleaseTagOf(Release);

    public static string ReleaseTagOf(string release)
    {
        // "IAPWS SR5-05(2016)" -> "SR5-05"
        string s = release.StartsWith("IAPWS ", StringComparison.Ordinal) ? release[6..] : release;
        int paren = s.IndexOf('(', StringComparison.Ordinal);
        return paren > 0 ? s[..paren] : s;
    }
}

/// <summary>
/// The parsed inputs string of one row, e.g. "h=0.001 kJ/kg; s=0 kJ/(kg K)" or "p=50 MPa; T=630 K; subregion 3a".
/// Each part is "name=number unit"; a part "subregion 3x" names the subregion the release computed the value in.
/// </summary>
internal sealed class ParsedInputs
{
    private readonly Dictionary<string, double> _values = new(StringComparer.Ordinal);

    public ParsedInputs(string text)
    {
        foreach (string rawPart in text.Split(';'))
        {
            string part = rawPart.Trim();
            if (part.Length == 0)
            {
                continue;
            }

            int eq = part.IndexOf('=', StringComparison.Ordinal);
            if (eq < 0)
            {
                if (part.StartsWith("subregion ", StringComparison.Ordinal))
                {
                    Subregion = part["subregion ".Length..].Trim();
                    continue;
                }

                throw new FormatException($"Cannot read input part '{part}' of '{text}'.");
            }

            string name = part[..eq].Trim();
            string rest = part[(eq + 1)..].Trim();
            int end = 0;
            while (end < rest.Length && (char.IsDigit(rest[end]) || rest[end] is '.' or '-' or '+' or 'e' or 'E'))
            {
                // An 'e' followed by a letter would be a unit, not an exponent; units here start with a space.
                end++;
            }

            string number = rest[..end];
            if (!double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
            {
                throw new FormatException($"Cannot read a number from '{part}' of '{text}'.");
            }

            _values.Add(name, value);
        }
    }

    /// <summary>"3a", "2c" and so on when the inputs name one, else null.</summary>
    public string? Subregion { get; }

    public int Count => _values.Count;

    public double this[string name] => _values.TryGetValue(name, out double v)
        ? v
        : throw new KeyNotFoundException($"Input '{name}' is not in this row.");

    public bool Has(string name) => _values.ContainsKey(name);
}
