using System.Collections.Immutable;

namespace NotebookCycles.Cycles;

/// <summary>Named cycle variants side by side: their figures of merit, with differences against the first (the baseline).</summary>
public sealed class CycleComparison
{
    private CycleComparison(string title, ImmutableArray<(string Name, CycleResult Cycle)> variants)
    {
        Title = title;
        Variants = variants;
    }

    /// <summary>The comparison's title.</summary>
    public string Title { get; }

    /// <summary>The variants in the order given; the first is the baseline.</summary>
    public ImmutableArray<(string Name, CycleResult Cycle)> Variants { get; }

    /// <summary>The cycles in variant order, baseline first.</summary>
    public ImmutableArray<CycleResult> Cycles => Variants.Select(v => v.Cycle).ToImmutableArray();

    /// <summary>The variant names in order, baseline first.</summary>
    public ImmutableArray<string> Names => Variants.Select(v => v.Name).ToImmutableArray();

    /// <summary>Compares cycles named by their titles (a repeated title gets " (2)", " (3)" …); the first is the baseline.</summary>
    public static CycleComparison Of(params CycleResult[] cycles)
    {
        ArgumentNullException.ThrowIfNull(cycles);
        var used = new HashSet<string>(StringComparer.Ordinal);
        var variants = new (string, CycleResult)[cycles.Length];
        for (int i = 0; i < cycles.Length; i++)
        {
            ArgumentNullException.ThrowIfNull(cycles[i], nameof(cycles));
            string name = cycles[i].Title;
            for (int n = 2; !used.Add(name); n++)
            {
                name = $"{cycles[i].Title} ({n})";
            }

            variants[i] = (name, cycles[i]);
        }

        return Of("Comparison", variants);
    }

    /// <summary>Compares named variants (at least one); the first is the baseline.</summary>
    public static CycleComparison Of(string title, params (string Name, CycleResult Cycle)[] variants)
    {
        ArgumentNullException.ThrowIfNull(variants);
        if (variants.Length < 1)
        {
            throw new ArgumentException("A comparison needs at least one cycle; the first is the baseline.", nameof(variants));
        }

        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (name, cycle) in variants)
        {
            ArgumentException.ThrowIfNullOrWhiteSpace(name);
            ArgumentNullException.ThrowIfNull(cycle);
            if (!names.Add(name))
            {
                throw new ArgumentException($"The variant name '{name}' is used twice.", nameof(variants));
            }
        }

        return new CycleComparison(title, [.. variants]);
    }

    /// <summary>The figures compared: name, SI value per variant, and whether a difference is meaningful as a ratio.</summary>
    public ImmutableArray<ComparisonRow> Rows
    {
        get
        {
            var rows = ImmutableArray.CreateBuilder<ComparisonRow>();
            foreach (var (name, unit, get) in Figures)
            {
                var values = Variants.Select(v => get(v.Cycle.Figures)).ToImmutableArray();
                if (values.All(double.IsNaN))
                {
                    continue;
                }

                rows.Add(new ComparisonRow(name, unit, values));
            }

            return rows.ToImmutable();
        }
    }

    internal static readonly (string Name, string Unit, Func<FiguresOfMerit, double> Get)[] Figures =
    [
        ("Heat in", "J/kg", f => f.HeatIn),
        ("Heat out", "J/kg", f => f.HeatOut),
        ("Net work", "J/kg", f => f.NetWork),
        ("Thermal efficiency", "", f => f.ThermalEfficiency),
        ("Carnot efficiency", "", f => f.CarnotEfficiency),
        ("Mean effective pressure", "Pa", f => f.MeanEffectivePressure),
        ("Back-work ratio", "", f => f.BackWorkRatio),
        ("Heat rate", "J/J", f => f.HeatRate),
        ("COP, cooling", "", f => f.CopCooling),
        ("Peak temperature", "K", f => f.MaximumTemperature),
        ("Peak pressure", "Pa", f => f.MaximumPressure),
        ("Exergy destroyed", "J/kg", f => f.ExergyDestroyed),
    ];
}

/// <summary>One figure across the variants of a comparison (SI values).</summary>
/// <param name="Name">The figure.</param>
/// <param name="Unit">Its SI unit ("" for a pure number).</param>
/// <param name="Values">One value per variant, in variant order.</param>
public sealed record ComparisonRow(string Name, string Unit, ImmutableArray<double> Values)
{
    /// <summary>Value minus the baseline's, per variant (0 for the baseline).</summary>
    public double Difference(int variant) => Values[variant] - Values[0];

    /// <summary>Relative difference from the baseline, per variant (NaN when the baseline is 0).</summary>
    public double RelativeDifference(int variant) => Values[0] == 0 ? double.NaN : (Values[variant] - Values[0]) / Math.Abs(Values[0]);
}
