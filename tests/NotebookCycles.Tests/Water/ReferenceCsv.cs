using System.Globalization;

namespace NotebookCycles.Tests.Water;

/// <summary>Reads the reference CSV files (comment lines start with '#'; one header row; fields may be double-quoted).</summary>
internal static class ReferenceCsv
{
    public static IEnumerable<Dictionary<string, string>> Read(string file)
    {
        string path = Path.Combine(AppContext.BaseDirectory, "ReferenceData", file);
        string[]? header = null;
        foreach (string line in File.ReadLines(path))
        {
            if (line.Length == 0 || line.StartsWith('#'))
            {
                continue;
            }

            var fields = Split(line);
            if (header is null)
            {
                header = fields.ToArray();
                continue;
            }

            var row = new Dictionary<string, string>(StringComparer.Ordinal);
            for (int i = 0; i < header.Length && i < fields.Count; i++)
            {
                row[header[i]] = fields[i];
            }

            yield return row;
        }
    }

    public static List<string> Split(string line)
    {
        var fields = new List<string>();
        var current = new System.Text.StringBuilder();
        bool quoted = false;
        foreach (char c in line)
        {
            if (c == '"')
            {
                quoted = !quoted;
            }
            else if (c == ',' && !quoted)
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

    /// <summary>Parses "T=300 K, p=3 MPa" (or ';'-separated) into name → number (units are those of the file header).</summary>
    public static Dictionary<string, double> Inputs(string text)
    {
        var result = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (string part in text.Split([',', ';'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            int eq = part.IndexOf('=', StringComparison.Ordinal);
            string name = part[..eq].Trim();
            string number = part[(eq + 1)..].Trim().Split(' ')[0];
            result[name] = double.Parse(number, CultureInfo.InvariantCulture);
        }

        return result;
    }

    public static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}
