using System.Collections.Immutable;
using NotebookCycles.Cycles;

namespace NotebookCycles.Rendering;

/// <summary>How a result is rendered: the display units, whether diagrams are drawn, and how finely paths are sampled.</summary>
public sealed record RenderOptions
{
    /// <summary>SI units, diagrams on, 24 points per path, 40 sweep table rows.</summary>
    public static RenderOptions Default { get; } = new();

    /// <summary>The unit system of every displayed number (default SI).</summary>
    public DisplayUnits Units { get; init; } = DisplayUnits.Si;

    /// <summary>Draw the T-s and p-v diagrams (and h-s for models with saturation) in HTML reports; default true.</summary>
    public bool Diagrams { get; init; } = true;

    /// <summary>Points per process path on diagrams, both ends included, 2 to 200 (default 24).</summary>
    public int PathPoints { get; init; } = 24;

    /// <summary>Rows a sweep table shows at most, 4 to 10,000 (default 40): larger sweeps show their first and last rows with a note between; charts always use every point.</summary>
    public int TableRows { get; init; } = 40;

    /// <summary>These options with other units.</summary>
    public RenderOptions With(DisplayUnits units) => this with { Units = units };

    internal int CheckedPathPoints()
    {
        if (PathPoints is < 2 or > 200)
        {
            throw new ArgumentOutOfRangeException(nameof(PathPoints), PathPoints, "Points per path must lie in 2 to 200.");
        }

        return PathPoints;
    }

    internal int CheckedTableRows()
    {
        if (TableRows is < 4 or > 10_000)
        {
            throw new ArgumentOutOfRangeException(nameof(TableRows), TableRows, "Rows per sweep table must lie in 4 to 10,000.");
        }

        return TableRows;
    }
}

/// <summary>The calculation record of a cycle on its own: every step with its relations, numbers, assumptions and balances.</summary>
public sealed class CalculationRecord
{
    /// <summary>The record of <paramref name="cycle"/>.</summary>
    public CalculationRecord(CycleResult cycle)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        Cycle = cycle;
    }

    /// <summary>The cycle the record belongs to.</summary>
    public CycleResult Cycle { get; }

    /// <summary>The steps in order.</summary>
    public ImmutableArray<Step> Steps => Cycle.Steps;

    /// <inheritdoc />
    public override string ToString() => CycleText.Record(this);
}

/// <summary>Rendering shortcuts on the core types.</summary>
public static class RenderingExtensions
{
    /// <summary>The cycle's calculation record on its own.</summary>
    public static CalculationRecord Record(this CycleResult cycle) => new(cycle);

    /// <summary>This cycle compared with <paramref name="others"/> (this one is the baseline).</summary>
    public static CycleComparison CompareWith(this CycleResult cycle, params CycleResult[] others)
    {
        ArgumentNullException.ThrowIfNull(others);
        return CycleComparison.Of([cycle, .. others]);
    }

    /// <summary>The full HTML report of the cycle.</summary>
    public static string ToHtml(this CycleResult cycle, RenderOptions? options = null) => CycleHtml.Cycle(cycle, options);
}

/// <summary>One figure of merit ready for display.</summary>
internal readonly record struct Figure(string Name, double Value, DisplayQuantity Quantity);

internal static class FigureList
{
    /// <summary>Every figure, NaN where it does not apply, in a fixed order (so comparisons line up).</summary>
    public static Figure[] All(CycleResult r)
    {
        var f = r.Figures;
        return
        [
            new("Heat in", f.HeatIn, DisplayQuantity.SpecificEnergy),
            new("Heat out", f.HeatOut, DisplayQuantity.SpecificEnergy),
            new("Net work", f.NetWork, DisplayQuantity.SpecificEnergy),
            new("Expansion work", f.ExpansionWork, DisplayQuantity.SpecificEnergy),
            new("Compression work", f.CompressionWork, DisplayQuantity.SpecificEnergy),
            new("Thermal efficiency", f.ThermalEfficiency, DisplayQuantity.Dimensionless),
            new("Carnot efficiency between T_min and T_max", f.CarnotEfficiency, DisplayQuantity.Dimensionless),
            new("Lowest temperature", f.MinimumTemperature, DisplayQuantity.Temperature),
            new("Highest temperature", f.MaximumTemperature, DisplayQuantity.Temperature),
            new("Highest pressure", f.MaximumPressure, DisplayQuantity.Pressure),
            new("Mean effective pressure", f.MeanEffectivePressure, DisplayQuantity.Pressure),
            new("Back-work ratio", f.BackWorkRatio, DisplayQuantity.Dimensionless),
            new("Heat rate", f.HeatRate, DisplayQuantity.HeatRate),
            new("Specific consumption", f.SpecificConsumption, DisplayQuantity.SpecificConsumption),
            new("COP, cooling", f.CopCooling, DisplayQuantity.Dimensionless),
            new("COP, heating", f.CopHeating, DisplayQuantity.Dimensionless),
            new("Exergy destroyed", f.ExergyDestroyed, DisplayQuantity.SpecificEnergy),
        ];
    }

    /// <summary>The figures that apply (not NaN).</summary>
    public static List<Figure> Applicable(CycleResult r)
    {
        var list = new List<Figure>(17);
        foreach (var figure in All(r))
        {
            if (!double.IsNaN(figure.Value))
            {
                list.Add(figure);
            }
        }

        return list;
    }

    /// <summary>A difference of two figures in display units (temperatures as differences, not offsets).</summary>
    public static double Difference(Figure baseline, Figure other, DisplayUnits units)
    {
        var q = baseline.Quantity == DisplayQuantity.Temperature ? DisplayQuantity.AbsoluteTemperature : baseline.Quantity;
        return UnitText.Convert(other.Value, q, units) - UnitText.Convert(baseline.Value, q, units);
    }
}

/// <summary>The state table's columns.</summary>
internal static class StateColumns
{
    public static bool HasQuality(IReadOnlyList<NotebookCycles.Properties.State> states)
    {
        foreach (var s in states)
        {
            if (!double.IsNaN(s.Point.X))
            {
                return true;
            }
        }

        return false;
    }

    public static bool HasMassFractions(CycleResult? r)
    {
        if (r is null)
        {
            return false;
        }

        foreach (var m in r.StateMassFractions)
        {
            if (m != 1)
            {
                return true;
            }
        }

        return false;
    }

    public static string SystemText(CycleResult r) => r.Kind == SystemKind.Closed
        ? "closed system, per unit mass (q − w = Δu)"
        : "steady flow, per unit mass of the reference flow (q − w = Δh; kinetic and potential energy neglected)";
}
