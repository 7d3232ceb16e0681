using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Rendering;

/// <summary>A figure of merit a sweep's table or chart can show.</summary>
public enum SweepFigure
{
    /// <summary>Thermal efficiency (pure number).</summary>
    ThermalEfficiency,

    /// <summary>Specific net work (specific energy).</summary>
    NetWork,

    /// <summary>Mean effective pressure (pressure); reciprocating cycles only.</summary>
    MeanEffectivePressure,

    /// <summary>Back-work ratio (pure number); flow cycles with compression and expansion.</summary>
    BackWorkRatio,

    /// <summary>Highest temperature of the cycle.</summary>
    PeakTemperature,

    /// <summary>Highest pressure of the cycle.</summary>
    PeakPressure,

    /// <summary>Specific heat added (specific energy).</summary>
    HeatIn,

    /// <summary>Coefficient of performance for cooling (pure number); refrigeration cycles only.</summary>
    CopCooling,

    /// <summary>Specific exergy destroyed (specific energy).</summary>
    ExergyDestroyed,
}

/// <summary>
/// Static SVG charts of sweeps and optimum scans: chosen figures against the first parameter, one curve per value of
/// the second parameter, every point used, failed points left as gaps; themed like the cycle diagrams. Deterministic.
/// </summary>
public static class SweepSvg
{
    /// <summary>Points per curve above which markers are left off (the curve alone reads better).</summary>
    private const int MarkerLimit = 60;

    /// <summary>The figures shown when none are chosen: thermal efficiency (or COP for refrigeration) and net work, when they apply.</summary>
    public static IReadOnlyList<SweepFigure> DefaultFigures(SweepResult sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var list = new List<SweepFigure>(2);
        if (Applies(sweep, SweepFigure.ThermalEfficiency))
        {
            list.Add(SweepFigure.ThermalEfficiency);
        }
        else if (Applies(sweep, SweepFigure.CopCooling))
        {
            list.Add(SweepFigure.CopCooling);
        }

        if (Applies(sweep, SweepFigure.NetWork))
        {
            list.Add(SweepFigure.NetWork);
        }

        return list;
    }

    /// <summary>True when at least one successful point has a value of <paramref name="figure"/> (not NaN).</summary>
    public static bool Applies(SweepResult sweep, SweepFigure figure)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        foreach (var p in sweep.Points)
        {
            if (p.Figures is { } f && !double.IsNaN(SweepFigures.Get(figure, f)))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>
    /// One figure against the first parameter as an &lt;svg&gt; element: one path per curve (for a two-parameter sweep
    /// one per value of the second parameter, with a legend), in display units.
    /// </summary>
    public static string Chart(SweepResult sweep, SweepFigure figure, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var svg = new StringBuilder(8000);
        LineChart.Write(svg, Spec(sweep, figure, (options ?? RenderOptions.Default).Units, null));
        return svg.ToString();
    }

    /// <summary>
    /// The optimum's coarse scan: <paramref name="figure"/> (default: the figure the objective equals at the optimum,
    /// else thermal efficiency) against the parameter, with the optimum marked.
    /// </summary>
    public static string Scan(OptimumResult optimum, SweepFigure? figure = null, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        var f = figure ?? ObjectiveFigure(optimum);
        var u = (options ?? RenderOptions.Default).Units;
        double y = UnitText.Convert(SweepFigures.Get(f, optimum.Cycle.Figures), SweepFigures.Quantity(f), u);
        var mark = new ChartMark(optimum.Value, y, "optimum " + optimum.Value.ToString("G6", CultureInfo.InvariantCulture));
        var svg = new StringBuilder(8000);
        LineChart.Write(svg, Spec(optimum.Scan, f, u, mark));
        return svg.ToString();
    }

    /// <summary>The figure an optimum's objective equals at the optimum (efficiency when none does).</summary>
    public static SweepFigure ObjectiveFigure(OptimumResult optimum)
    {
        ArgumentNullException.ThrowIfNull(optimum);
        foreach (var f in Enum.GetValues<SweepFigure>())
        {
            if (SweepFigures.Get(f, optimum.Cycle.Figures) == optimum.Objective)
            {
                return f;
            }
        }

        return SweepFigure.ThermalEfficiency;
    }

    /// <summary>
    /// The curves a chart of <paramref name="figure"/> draws, in display units: one for a one-parameter sweep (Second NaN),
    /// one per value of the second parameter otherwise, in sweep order; a failed point's Y is NaN.
    /// </summary>
    public static IReadOnlyList<(double Second, double[] X, double[] Y)> Curves(SweepResult sweep, SweepFigure figure, DisplayUnits units)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var q = SweepFigures.Quantity(figure);
        var curves = new List<(double Second, double[] X, double[] Y)>();
        if (sweep.YName is null)
        {
            var x = new double[sweep.Points.Length];
            var y = new double[sweep.Points.Length];
            for (int i = 0; i < x.Length; i++)
            {
                var p = sweep.Points[i];
                x[i] = p.X;
                y[i] = p.Figures is { } f ? UnitText.Convert(SweepFigures.Get(figure, f), q, units) : double.NaN;
            }

            curves.Add((double.NaN, x, y));
            return curves;
        }

        // The second parameter varies fastest: the points sharing the first point's X hold every second-parameter value once.
        var seconds = new List<double>();
        foreach (var p in sweep.Points)
        {
            if (!p.X.Equals(sweep.Points[0].X))
            {
                break;
            }

            seconds.Add(p.Y);
        }

        int n2 = Math.Max(1, seconds.Count), n1 = sweep.Points.Length / n2;
        for (int j = 0; j < n2; j++)
        {
            var x = new double[n1];
            var y = new double[n1];
            for (int i = 0; i < n1; i++)
            {
                var p = sweep.Points[i * n2 + j];
                x[i] = p.X;
                y[i] = p.Figures is { } f ? UnitText.Convert(SweepFigures.Get(figure, f), q, units) : double.NaN;
            }

            curves.Add((seconds[j], x, y));
        }

        return curves;
    }

    private static ChartSpec Spec(SweepResult sweep, SweepFigure figure, DisplayUnits u, ChartMark? mark)
    {
        var curves = Curves(sweep, figure, u);
        var series = new List<ChartSeries>(curves.Count);
        for (int c = 0; c < curves.Count; c++)
        {
            var (second, x, y) = curves[c];
            // Under the legend's title (the second parameter's name) each entry is the value alone.
            string name = sweep.YName is null ? SweepFigures.Name(figure) : second.ToString("G6", CultureInfo.InvariantCulture);
            string tooltip = sweep.YName is null ? name : sweep.YName + " = " + name;
            string attributes = sweep.YName is null ? "" : " data-second=\"" + second.ToString("R", CultureInfo.InvariantCulture) + "\"";
            series.Add(new ChartSeries(name, c, [new ChartLine(x, y, " data-figure=\"" + figure + "\"" + attributes, tooltip)], x.Length <= MarkerLimit));
        }

        int failed = 0;
        foreach (var p in sweep.Points)
        {
            failed += p.Succeeded ? 0 : 1;
        }

        var notes = new List<string>(1);
        if (failed > 0)
        {
            notes.Add(failed.ToString(CultureInfo.InvariantCulture) + " of " + sweep.Points.Length.ToString(CultureInfo.InvariantCulture) + " points failed (gaps in the curve); the table gives the reasons.");
        }

        string unit = UnitText.Unit(SweepFigures.Quantity(figure), u);
        string yLabel = unit.Length == 0 ? SweepFigures.Name(figure) : SweepFigures.Name(figure) + ", " + unit;
        return new ChartSpec
        {
            Slug = "sweepchart",
            Title = SweepFigures.Name(figure) + " against " + sweep.XName,
            AriaLabel = sweep.Title + ": " + SweepFigures.Name(figure) + " against " + sweep.XName,
            XLabel = sweep.XName,
            YLabel = yLabel,
            Series = series,
            Legend = sweep.YName is not null,
            LegendTitle = sweep.YName,
            Marks = mark is { } m ? [m] : [],
            Notes = notes,
        };
    }
}

/// <summary>Names, display quantities and values of the sweep figures.</summary>
public static class SweepFigures
{
    /// <summary>The table's figures, in column order.</summary>
    internal static readonly SweepFigure[] TableOrder =
    [
        SweepFigure.ThermalEfficiency, SweepFigure.CopCooling, SweepFigure.NetWork, SweepFigure.MeanEffectivePressure,
        SweepFigure.BackWorkRatio, SweepFigure.PeakTemperature, SweepFigure.PeakPressure,
    ];

    /// <summary>The figure's SI value in <paramref name="f"/> (NaN where it does not apply).</summary>
    public static double Get(SweepFigure figure, FiguresOfMerit f) => figure switch
    {
        SweepFigure.ThermalEfficiency => f.ThermalEfficiency,
        SweepFigure.NetWork => f.NetWork,
        SweepFigure.MeanEffectivePressure => f.MeanEffectivePressure,
        SweepFigure.BackWorkRatio => f.BackWorkRatio,
        SweepFigure.PeakTemperature => f.MaximumTemperature,
        SweepFigure.PeakPressure => f.MaximumPressure,
        SweepFigure.HeatIn => f.HeatIn,
        SweepFigure.CopCooling => f.CopCooling,
        SweepFigure.ExergyDestroyed => f.ExergyDestroyed,
        _ => throw new ArgumentOutOfRangeException(nameof(figure), figure, "Unknown sweep figure."),
    };

    /// <summary>What the figure measures, for unit conversion (<see cref="UnitText.Convert"/>).</summary>
    public static DisplayQuantity Quantity(SweepFigure figure) => figure switch
    {
        SweepFigure.NetWork or SweepFigure.HeatIn or SweepFigure.ExergyDestroyed => DisplayQuantity.SpecificEnergy,
        SweepFigure.MeanEffectivePressure or SweepFigure.PeakPressure => DisplayQuantity.Pressure,
        SweepFigure.PeakTemperature => DisplayQuantity.Temperature,
        _ => DisplayQuantity.Dimensionless,
    };

    /// <summary>The figure's name as shown ("Thermal efficiency").</summary>
    public static string Name(SweepFigure figure) => figure switch
    {
        SweepFigure.ThermalEfficiency => "Thermal efficiency",
        SweepFigure.NetWork => "Net work",
        SweepFigure.MeanEffectivePressure => "Mean effective pressure",
        SweepFigure.BackWorkRatio => "Back-work ratio",
        SweepFigure.PeakTemperature => "Peak temperature",
        SweepFigure.PeakPressure => "Peak pressure",
        SweepFigure.HeatIn => "Heat in",
        SweepFigure.CopCooling => "COP, cooling",
        SweepFigure.ExergyDestroyed => "Exergy destroyed",
        _ => figure.ToString(),
    };

    /// <summary>The table's figures that apply to the sweep.</summary>
    internal static List<SweepFigure> ForTable(SweepResult sweep)
    {
        var list = new List<SweepFigure>(TableOrder.Length);
        foreach (var f in TableOrder)
        {
            if (SweepSvg.Applies(sweep, f))
            {
                list.Add(f);
            }
        }

        return list;
    }

    /// <summary>A parameter value as shown (six significant digits, invariant).</summary>
    internal static string Parameter(double v) => double.IsNaN(v) ? "—" : v.ToString("G6", CultureInfo.InvariantCulture);
}
