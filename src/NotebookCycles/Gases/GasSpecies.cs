using System.Globalization;
using System.Reflection;

namespace NotebookCycles.Gases;

/// <summary>
/// One gas species of the NASA Glenn 9-coefficient database (B.J. McBride, M.J. Zehe, S. Gordon, NASA/TP-2002-211556,
/// 2002; thermo.inp dated 9/09/04): molar mass, enthalpy of formation and the two fitted temperature intervals
/// 200 K to 1000 K and 1000 K to 6000 K.
/// </summary>
/// <remarks>
/// The fits are written in the database's own gas constant <see cref="UniversalGasConstant"/> = 8.314510 J/(mol·K):
/// cp/R = a1/T² + a2/T + a3 + a4·T + a5·T² + a6·T³ + a7·T⁴, with H/R and S/R from the integration constants b1, b2.
/// Species are shipped as an embedded copy of the reference file (Gases/Data/nasa_glenn_9coeff.csv, header kept).
/// The interval above 6000 K is not loaded: the models are limited to 200 K to 6000 K.
/// </remarks>
public sealed class GasSpecies
{
    /// <summary>The molar gas constant the NASA Glenn fits were made with, J/(mol·K) (NASA/TP-2002-211556).</summary>
    public const double UniversalGasConstant = 8.314510;

    /// <summary>Lowest temperature of the fits, K.</summary>
    public const double MinimumTemperature = 200.0;

    /// <summary>The temperature where the two fitted intervals meet, K.</summary>
    public const double IntervalBreak = 1000.0;

    /// <summary>Highest temperature the models use, K (the fits continue to 20000 K for some species; not loaded).</summary>
    public const double MaximumTemperature = 6000.0;

    private const string ResourceName = "NotebookCycles.Gases.Data.nasa_glenn_9coeff.csv";

    private static readonly Lazy<IReadOnlyDictionary<string, GasSpecies>> Database = new(Load);

    private GasSpecies(string name, string referenceCode, double molarMass, double enthalpyOfFormation, double enthalpyAbove0K, double[] low, double[] high)
    {
        Name = name;
        ReferenceCode = referenceCode;
        MolarMass = molarMass;
        EnthalpyOfFormation = enthalpyOfFormation;
        EnthalpyAboveZeroKelvin = enthalpyAbove0K;
        Low = low;
        High = high;
    }

    /// <summary>The database name: N2, O2, Ar, CO2, H2O, CO, or Air (the database's dry-air pseudo-species).</summary>
    public string Name { get; }

    /// <summary>The database's reference-date code of the fit (for example "tpis78").</summary>
    public string ReferenceCode { get; }

    /// <summary>Molar mass, kg/mol.</summary>
    public double MolarMass { get; }

    /// <summary>Enthalpy of formation at 298.15 K, J/mol (zero for the elements' reference forms).</summary>
    public double EnthalpyOfFormation { get; }

    /// <summary>H(298.15 K) − H(0 K), J/mol: the sensible enthalpy at 298.15 K.</summary>
    public double EnthalpyAboveZeroKelvin { get; }

    /// <summary>The species names in the shipped database.</summary>
    public static IReadOnlyCollection<string> Names => (IReadOnlyCollection<string>)Database.Value.Keys;

    /// <summary>a1..a7, b1, b2 of 200 K to 1000 K.</summary>
    internal double[] Low { get; }

    /// <summary>a1..a7, b1, b2 of 1000 K to 6000 K.</summary>
    internal double[] High { get; }

    /// <summary>
    /// The species of that name (case-sensitive database spelling, for example "CO2"). Throws
    /// <see cref="ArgumentException"/> naming the known species for an unknown name.
    /// </summary>
    public static GasSpecies Get(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (Database.Value.TryGetValue(name, out GasSpecies? species))
        {
            return species;
        }

        throw new ArgumentException(
            $"Unknown gas species \"{name}\"; the NASA Glenn database shipped here has: {string.Join(", ", Database.Value.Keys)}.",
            nameof(name));
    }

    /// <summary>True when the database has a species of that name.</summary>
    public static bool Contains(string name) => name is not null && Database.Value.ContainsKey(name);

    /// <inheritdoc />
    public override string ToString() => Name;

    private static Dictionary<string, GasSpecies> Load()
    {
        using Stream stream = typeof(GasSpecies).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"Embedded resource {ResourceName} is missing from {typeof(GasSpecies).Assembly.GetName().Name}.");
        using var reader = new StreamReader(stream);
        var rows = new Dictionary<string, (string Code, double M, double Hf, double H0, double[]? Low, double[]? High)>(StringComparer.Ordinal);
        var order = new List<string>();
        bool headerSeen = false;
        while (reader.ReadLine() is { } line)
        {
            if (line.Length == 0 || line[0] == '#')
            {
                continue;
            }

            if (!headerSeen)
            {
                headerSeen = true;
                continue;
            }

            string[] f = line.Split(',');
            if (f.Length != 16)
            {
                throw new InvalidDataException($"{ResourceName}: expected 16 fields, found {f.Length} in \"{line}\".");
            }

            string name = f[0];
            double tlo = Parse(f[5]);
            double thi = Parse(f[6]);
            var coefficients = new double[9];
            for (int k = 0; k < 9; k++)
            {
                coefficients[k] = Parse(f[7 + k]);
            }

            if (!rows.TryGetValue(name, out var row))
            {
                row = (f[1], Parse(f[2]) / 1000.0, Parse(f[3]), Parse(f[4]), null, null);
                order.Add(name);
            }

            if (tlo == MinimumTemperature && thi == IntervalBreak)
            {
                row.Low = coefficients;
            }
            else if (tlo == IntervalBreak && thi == MaximumTemperature)
            {
                row.High = coefficients;
            }

            rows[name] = row;
        }

        var result = new Dictionary<string, GasSpecies>(StringComparer.Ordinal);
        foreach (string name in order)
        {
            var row = rows[name];
            if (row.Low is null || row.High is null)
            {
                throw new InvalidDataException($"{ResourceName}: species {name} lacks the 200-1000 K or the 1000-6000 K interval.");
            }

            result.Add(name, new GasSpecies(name, row.Code, row.M, row.Hf, row.H0, row.Low, row.High));
        }

        return result;
    }

    private static double Parse(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}
