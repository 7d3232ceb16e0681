using System.Globalization;

namespace NotebookCycles.Tests.Refrigerants;

/// <summary>One row of ReferenceData/refrigerants/refrigerant_verification.csv (published check values, each naming its table).</summary>
public sealed record RefrigerantRow(int Line, string Fluid, string Kind, double T, double P, double RhoMolar, string Reference, string Quantity, string Published, string Source, string PText)
{
    /// <summary>The published value.</summary>
    public double Value => double.Parse(Published, CultureInfo.InvariantCulture);

    /// <summary>Half a unit of the last printed digit.</summary>
    public double HalfUnit
    {
        get
        {
            string s = Published.TrimStart('-');
            int dot = s.IndexOf('.', StringComparison.Ordinal);
            int decimals = dot < 0 ? 0 : s.Length - dot - 1;
            return 0.5 * Math.Pow(10, -decimals);
        }
    }

    /// <summary>Half a unit of the last printed digit of the input pressure (it is printed rounded in some rows), Pa.</summary>
    public double PressureHalfUnit
    {
        get
        {
            string s = PText;
            int e = s.IndexOfAny(['e', 'E']);
            string mantissa = e < 0 ? s : s[..e];
            int exponent = e < 0 ? 0 : int.Parse(s[(e + 1)..], CultureInfo.InvariantCulture);
            int dot = mantissa.IndexOf('.', StringComparison.Ordinal);
            int decimals = dot < 0 ? 0 : mantissa.Length - dot - 1;
            return 0.5 * Math.Pow(10, exponent - decimals);
        }
    }

    /// <inheritdoc />
    public override string ToString() => $"line {Line}: {Fluid} {Kind} T={T} p={P} rho={RhoMolar} {Quantity}";

    /// <summary>All rows of the file.</summary>
    public static IReadOnlyList<RefrigerantRow> All { get; } = Read();

    private static List<RefrigerantRow> Read()
    {
        string path = Path.Combine(AppContext.BaseDirectory, "ReferenceData", "refrigerants", "refrigerant_verification.csv");
        var rows = new List<RefrigerantRow>();
        int line = 0;
        foreach (string raw in File.ReadLines(path))
        {
            line++;
            if (raw.StartsWith('#') || raw.StartsWith("fluid,", StringComparison.Ordinal) || raw.Length == 0)
            {
                continue;
            }

            var cells = NotebookCycles.Tests.Water.ReferenceCsv.Split(raw);
            static double D(string s) => s.Length == 0 ? double.NaN : double.Parse(s, CultureInfo.InvariantCulture);
            rows.Add(new RefrigerantRow(line, cells[0], cells[1], D(cells[2]), D(cells[3]), D(cells[4]), cells[5], cells[6], cells[7], cells[8], cells[3]));
        }

        return rows;
    }
}
