using System.Globalization;
using System.Text;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;

namespace NotebookCycles.Rendering;

/// <summary>The diagrams a renderer can draw.</summary>
public enum DiagramKind
{
    /// <summary>Temperature over specific entropy (linear axes).</summary>
    TemperatureEntropy,

    /// <summary>Pressure over specific volume (logarithmic axes).</summary>
    PressureVolume,

    /// <summary>Specific enthalpy over specific entropy (linear axes), for models with a saturation dome.</summary>
    EnthalpyEntropy,

    /// <summary>Pressure (logarithmic) over specific enthalpy, with the dome and isotherms: the refrigeration engineer's diagram.</summary>
    PressureEnthalpy,
}

/// <summary>
/// Process diagrams as self-contained inline SVG: one path element per step along its real path
/// (<see cref="Step.SamplePath"/>), state labels, axes in the display units, and for models with saturation the dome.
/// No script, no external resources, no ids; colours come from CSS variables with a dark-theme block, text uses currentColor.
/// </summary>
public static class CycleSvg
{
    private const double Width = 380, Height = 280, Left = 62, Right = 14, Top = 24, Bottom = 44;
    private const int DomePoints = 48;

    /// <summary>The diagrams a cycle gets: T-s and p-v always, h-s as well when the model has saturation.</summary>
    public static IReadOnlyList<DiagramKind> DiagramsFor(CycleResult cycle)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        return cycle.Model switch
        {
            NotebookCycles.Refrigerants.Refrigerant => [DiagramKind.PressureEnthalpy, DiagramKind.TemperatureEntropy],
            ISaturationModel => [DiagramKind.TemperatureEntropy, DiagramKind.EnthalpyEntropy, DiagramKind.PressureVolume],
            _ => [DiagramKind.TemperatureEntropy, DiagramKind.PressureVolume],
        };
    }

    /// <summary>The T-s diagram (with the saturation dome for models that have one).</summary>
    public static string TemperatureEntropy(CycleResult cycle, RenderOptions? options = null) => Diagram(cycle, DiagramKind.TemperatureEntropy, options);

    /// <summary>The p-v diagram, log p over log v.</summary>
    public static string PressureVolume(CycleResult cycle, RenderOptions? options = null) => Diagram(cycle, DiagramKind.PressureVolume, options);

    /// <summary>The log p-h diagram with the saturation dome and isotherms.</summary>
    public static string PressureEnthalpy(CycleResult cycle, RenderOptions? options = null) => Diagram(cycle, DiagramKind.PressureEnthalpy, options);

    /// <summary>The h-s diagram (with the saturation dome for models that have one).</summary>
    public static string EnthalpyEntropy(CycleResult cycle, RenderOptions? options = null) => Diagram(cycle, DiagramKind.EnthalpyEntropy, options);

    /// <summary>One diagram of the cycle as an &lt;svg&gt; element.</summary>
    public static string Diagram(CycleResult cycle, DiagramKind kind, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        options ??= RenderOptions.Default;
        var svg = new StringBuilder(6000);
        Write(svg, cycle, kind, options);
        return svg.ToString();
    }

    /// <summary>
    /// The variants of a comparison overlaid on one T-s (or h-s) diagram: one colour per variant with a legend, one path
    /// element per step along its real path (<see cref="Step.SamplePath"/>), state markers, and the saturation dome of the
    /// baseline's model when it has one. The p-v diagram is not overlaid (its logarithmic axes are drawn per cycle).
    /// </summary>
    public static string Overlay(CycleComparison comparison, DiagramKind kind = DiagramKind.TemperatureEntropy, RenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        if (kind is DiagramKind.PressureVolume or DiagramKind.PressureEnthalpy)
        {
            throw new ArgumentOutOfRangeException(nameof(kind), kind, "Overlaid diagrams are drawn for T-s and h-s only.");
        }

        options ??= RenderOptions.Default;
        int count = options.CheckedPathPoints();
        var axes = Axes.For(kind, options.Units);
        var series = new List<ChartSeries>(comparison.Variants.Length);
        for (int v = 0; v < comparison.Variants.Length; v++)
        {
            var (name, cycle) = comparison.Variants[v];
            var lines = new List<ChartLine>(cycle.Steps.Length);
            string variant = " data-variant=\"" + HtmlText.Encode(name) + "\"";
            foreach (var step in cycle.Steps)
            {
                var points = step.SamplePath(count);
                var x = new double[points.Count];
                var y = new double[points.Count];
                for (int i = 0; i < points.Count; i++)
                {
                    x[i] = axes.X(points[i]);
                    y[i] = axes.Y(points[i]);
                }

                lines.Add(new ChartLine(x, y, variant + " data-step=\"" + HtmlText.Encode(step.Name) + "\"", name + ": " + step.Index.ToString(CultureInfo.InvariantCulture) + ". " + step.Name + " " + step.Process, step.Law == PathLaw.Undefined));
            }

            var sx = new double[cycle.States.Length];
            var sy = new double[cycle.States.Length];
            for (int i = 0; i < sx.Length; i++)
            {
                sx[i] = axes.X(cycle.States[i].Point);
                sy[i] = axes.Y(cycle.States[i].Point);
            }


            series.Add(new ChartSeries(name, v, lines, true, sx, sy));
        }

        var svg = new StringBuilder(12_000);
        LineChart.Write(svg, new ChartSpec
        {
            Slug = axes.Slug + " nbc-overlay",
            Title = axes.Title + ": " + comparison.Title,
            AriaLabel = axes.Title + ", overlaid: " + string.Join(", ", comparison.Names),
            XLabel = axes.XLabel,
            YLabel = axes.YLabel,
            Series = series,
            Legend = true,
            Background = Dome(comparison.Variants[0].Cycle.Model, axes),
        });
        return svg.ToString();
    }

    internal static void Write(StringBuilder svg, CycleResult cycle, DiagramKind kind, RenderOptions options)
    {
        var units = options.Units;
        int count = options.CheckedPathPoints();
        var axes = Axes.For(kind, units);

        // Paths along each step's real law, in display units.
        var paths = new List<(Step Step, double[] X, double[] Y)>(cycle.Steps.Length);
        var xs = new List<double>(64);
        var ys = new List<double>(64);
        foreach (var step in cycle.Steps)
        {
            var points = step.SamplePath(count);
            var x = new double[points.Count];
            var y = new double[points.Count];
            for (int i = 0; i < points.Count; i++)
            {
                x[i] = axes.X(points[i]);
                y[i] = axes.Y(points[i]);
                xs.Add(x[i]);
                ys.Add(y[i]);
            }

            paths.Add((step, x, y));
        }

        foreach (var state in cycle.States)
        {
            xs.Add(axes.X(state.Point));
            ys.Add(axes.Y(state.Point));
        }

        // The saturation dome: liquid line up to the critical point and back down the vapour line.
        (double[] X, double[] Y)? dome = kind == DiagramKind.PressureVolume ? null : Dome(cycle.Model, axes);
        if (kind == DiagramKind.PressureEnthalpy && dome is { } full)
        {
            // On log p the dome runs down to the triple point; draw only the part near the cycle's pressures.
            double floor = double.MaxValue;
            foreach (var st in cycle.States)
            {
                floor = Math.Min(floor, axes.Y(st.Point));
            }

            floor /= 3;
            var keepX = new List<double>(full.X.Length);
            var keepY = new List<double>(full.Y.Length);
            for (int i = 0; i < full.X.Length; i++)
            {
                if (full.Y[i] >= floor)
                {
                    keepX.Add(full.X[i]);
                    keepY.Add(full.Y[i]);
                }
            }

            dome = keepX.Count >= 3 ? ([.. keepX], [.. keepY]) : null;
        }

        if (dome is { } d)
        {
            xs.AddRange(d.X);
            ys.AddRange(d.Y);
        }

        var isotherms = kind == DiagramKind.PressureEnthalpy ? Isotherms(cycle, axes) : [];
        foreach (var (_, _, ix, iy) in isotherms)
        {
            xs.AddRange(ix);
            ys.AddRange(iy);
        }

        var sx = Scale.Fit(xs, axes.LogX, Left, Width - Right);
        var sy = Scale.Fit(ys, axes.LogY, Height - Bottom, Top);

        svg.Append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"nbc-svg nbc-").Append(axes.Slug)
           .Append("\" viewBox=\"0 0 ").Append(N(Width)).Append(' ').Append(N(Height))
           .Append("\" width=\"").Append(N(Width)).Append("\" height=\"").Append(N(Height))
           .Append("\" role=\"img\" aria-label=\"").Append(HtmlText.Encode(axes.Title + ": " + cycle.Title)).Append("\" font-family=\"system-ui, sans-serif\" font-size=\"11\">");
        svg.Append(Style);
        svg.Append("<text class=\"nbc-ttl\" x=\"").Append(N(Left)).Append("\" y=\"15\" fill=\"currentColor\">").Append(HtmlText.Encode(axes.Title)).Append("</text>");

        // Frame, grid and ticks.
        svg.Append("<g class=\"nbc-axes\" fill=\"currentColor\" stroke=\"none\">");
        svg.Append("<rect class=\"nbc-frame\" x=\"").Append(N(Left)).Append("\" y=\"").Append(N(Top)).Append("\" width=\"").Append(N(Width - Left - Right)).Append("\" height=\"").Append(N(Height - Top - Bottom)).Append("\" fill=\"none\" stroke=\"currentColor\"/>");
        foreach (var (t, labelled) in sx.Ticks())
        {
            double px = sx.Map(t);
            svg.Append("<path class=\"nbc-grid\" d=\"M").Append(N(px)).Append(' ').Append(N(Top)).Append("V").Append(N(Height - Bottom)).Append("\"/>");
            if (labelled)
            {
                svg.Append("<text x=\"").Append(N(px)).Append("\" y=\"").Append(N(Height - Bottom + 14)).Append("\" text-anchor=\"middle\">").Append(Tick(t)).Append("</text>");
            }
        }

        foreach (var (t, labelled) in sy.Ticks())
        {
            double py = sy.Map(t);
            svg.Append("<path class=\"nbc-grid\" d=\"M").Append(N(Left)).Append(' ').Append(N(py)).Append("H").Append(N(Width - Right)).Append("\"/>");
            if (labelled)
            {
                svg.Append("<text x=\"").Append(N(Left - 5)).Append("\" y=\"").Append(N(py + 3.5)).Append("\" text-anchor=\"end\">").Append(Tick(t)).Append("</text>");
            }
        }

        svg.Append("<text x=\"").Append(N((Left + Width - Right) / 2)).Append("\" y=\"").Append(N(Height - 8)).Append("\" text-anchor=\"middle\">").Append(HtmlText.Encode(axes.XLabel)).Append("</text>");
        svg.Append("<text transform=\"translate(14 ").Append(N((Top + Height - Bottom) / 2)).Append(") rotate(-90)\" text-anchor=\"middle\">").Append(HtmlText.Encode(axes.YLabel)).Append("</text>");
        svg.Append("</g>");

        if (dome is { } dm)
        {
            svg.Append("<path class=\"nbc-dome\" data-curve=\"saturation\" fill=\"none\" d=\"");
            AppendPath(svg, dm.X, dm.Y, sx, sy);
            svg.Append("\"/>");
        }

        foreach (var (label, labelAt, ix, iy) in isotherms)
        {
            svg.Append("<path class=\"nbc-iso\" data-curve=\"isotherm\" fill=\"none\" stroke=\"currentColor\" stroke-opacity=\"0.35\" stroke-dasharray=\"2 3\" d=\"");
            AppendPath(svg, ix, iy, sx, sy);
            svg.Append("\"/><text class=\"nbc-isolbl\" fill=\"currentColor\" fill-opacity=\"0.6\" font-size=\"9\" x=\"").Append(N(sx.Map(ix[labelAt]) + 3)).Append("\" y=\"").Append(N(sy.Map(iy[labelAt]) - 3)).Append("\">").Append(HtmlText.Encode(label)).Append("</text>");
        }

        // One path element per step.
        svg.Append("<g class=\"nbc-paths\" fill=\"none\">");
        for (int i = 0; i < paths.Count; i++)
        {
            var (step, x, y) = paths[i];
            bool dashed = step.Law == PathLaw.Undefined;
            svg.Append("<path class=\"nbc-step nbc-c").Append((i % 6).ToString(CultureInfo.InvariantCulture)).Append(dashed ? " nbc-dashed" : "")
               .Append("\" data-step=\"").Append(HtmlText.Encode(step.Name)).Append("\" d=\"");
            AppendPath(svg, x, y, sx, sy);
            svg.Append("\"><title>").Append(HtmlText.Encode(step.Index.ToString(CultureInfo.InvariantCulture) + ". " + step.Name + " " + step.Process)).Append("</title></path>");
        }

        svg.Append("</g>");

        // State markers and labels, pushed away from the centre of the states.
        double cx = 0, cy = 0;
        foreach (var state in cycle.States)
        {
            cx += sx.Map(axes.X(state.Point));
            cy += sy.Map(axes.Y(state.Point));
        }

        cx /= Math.Max(1, cycle.States.Length);
        cy /= Math.Max(1, cycle.States.Length);
        svg.Append("<g class=\"nbc-states\" fill=\"currentColor\">");
        foreach (var state in cycle.States)
        {
            double px = sx.Map(axes.X(state.Point)), py = sy.Map(axes.Y(state.Point));
            double dx = px - cx, dy = py - cy, len = Math.Sqrt(dx * dx + dy * dy);
            if (len < 1e-9)
            {
                (dx, dy, len) = (1, -1, Math.Sqrt(2));
            }

            double lx = px + 9 * dx / len, ly = py + 9 * dy / len + 4;
            svg.Append("<circle cx=\"").Append(N(px)).Append("\" cy=\"").Append(N(py)).Append("\" r=\"2.6\"/>");
            svg.Append("<text class=\"nbc-lbl\" data-state=\"").Append(HtmlText.Encode(state.Label)).Append("\" x=\"").Append(N(lx)).Append("\" y=\"").Append(N(ly))
               .Append("\" text-anchor=\"").Append(dx < -0.3 * len ? "end" : dx > 0.3 * len ? "start" : "middle").Append("\">").Append(HtmlText.Encode(state.Label)).Append("</text>");
        }

        svg.Append("</g></svg>");
    }

    /// <summary>
    /// A few isotherms across the cycle's temperature span for the p-h diagram: compressed liquid down to saturation,
    /// across the dome at constant pressure, then vapour down to the lowest pressure drawn.
    /// </summary>
    private static List<(string Label, int LabelAt, double[] X, double[] Y)> Isotherms(CycleResult cycle, Axes axes)
    {
        var curves = new List<(string, int, double[], double[])>();
        if (cycle.Model is not ISaturationModel sat)
        {
            return curves;
        }

        double tLo = double.MaxValue, tHi = 0, pLo = double.MaxValue, pHi = 0;
        foreach (var st in cycle.States)
        {
            tLo = Math.Min(tLo, st.Point.T);
            tHi = Math.Max(tHi, st.Point.T);
            pLo = Math.Min(pLo, st.Point.P);
            pHi = Math.Max(pHi, st.Point.P);
        }

        pLo /= 1.4;
        pHi *= 1.4;
        double step = Math.Max(10, Math.Ceiling((tHi - tLo) / 4 / 10) * 10);
        for (double t = Math.Ceiling(tLo / step) * step; t <= tHi + 1e-9; t += step)
        {
            var x = new List<double>(40);
            var y = new List<double>(40);
            int labelAt = -1;
            void Add(StatePoint p)
            {
                x.Add(axes.X(p));
                y.Add(axes.Y(p));
            }

            try
            {
                bool subcritical = t < sat.CriticalPoint.T;
                double ps = subcritical ? sat.SaturationPressure(t) : double.NaN;
                const int n = 14;
                bool crossed = false;
                for (int i = 0; i <= n; i++)
                {
                    double p = pHi * Math.Pow(pLo / pHi, (double)i / n);
                    if (subcritical && !crossed && p < ps)
                    {
                        crossed = true;
                        if (ps <= pHi)
                        {
                            Add(sat.FromTX(t, 0));
                            Add(sat.FromTX(t, 1));
                            labelAt = x.Count - 1;
                        }
                    }

                    if (subcritical && Math.Abs(p - ps) < 1e-6 * ps)
                    {
                        continue;
                    }

                    Add(cycle.Model.FromTP(t, p));
                }
            }
            catch (PropertyModelException)
            {
                // An isotherm that leaves the model's range is drawn only as far as it is valid.
            }

            if (x.Count >= 2)
            {
                curves.Add((UnitText.Number(t, DisplayQuantity.Temperature, axes.Units) + " " + UnitText.Unit(DisplayQuantity.Temperature, axes.Units), labelAt >= 0 ? labelAt : x.Count - 1, [.. x], [.. y]));
            }
        }

        return curves;
    }

    internal static (double[] X, double[] Y)? Dome(IPropertyModel model, Axes axes)
    {
        if (model is not ISaturationModel sat)
        {
            return null;
        }

        double tMin = sat.SaturationTemperatureMinimum, tCrit = sat.CriticalPoint.T;
        if (!(tCrit > tMin))
        {
            return null;
        }

        var x = new List<double>(2 * DomePoints + 1);
        var y = new List<double>(2 * DomePoints + 1);
        var liquid = new List<StatePoint>(DomePoints);
        var vapour = new List<StatePoint>(DomePoints);
        for (int i = 0; i < DomePoints; i++)
        {
            // Denser towards the critical point, where the dome turns.
            double f = (double)i / DomePoints;
            double t = tMin + (tCrit - tMin) * (1 - (1 - f) * (1 - f));
            try
            {
                liquid.Add(sat.FromTX(t, 0));
                vapour.Add(sat.FromTX(t, 1));
            }
            catch (PropertyModelException)
            {
                // A point the model declines (very near its limits) is left out of the drawing only.
            }
        }

        foreach (var p in liquid)
        {
            x.Add(axes.X(p));
            y.Add(axes.Y(p));
        }

        x.Add(axes.X(sat.CriticalPoint));
        y.Add(axes.Y(sat.CriticalPoint));
        for (int i = vapour.Count - 1; i >= 0; i--)
        {
            x.Add(axes.X(vapour[i]));
            y.Add(axes.Y(vapour[i]));
        }

        return x.Count < 3 ? null : (x.ToArray(), y.ToArray());
    }

    internal static void AppendPath(StringBuilder svg, double[] x, double[] y, Scale sx, Scale sy)
    {
        for (int i = 0; i < x.Length; i++)
        {
            svg.Append(i == 0 ? 'M' : 'L').Append(N(sx.Map(x[i]))).Append(' ').Append(N(sy.Map(y[i])));
        }
    }

    internal static string N(double v) => UnitText.Fixed(Math.Round(v, 1), 1);

    internal static string Tick(double v)
    {
        double m = Math.Abs(v);
        return m == 0 || (m >= 1e-4 && m < 1e7)
            ? v.ToString("0.#####", CultureInfo.InvariantCulture)
            : v.ToString("0.##E+0", CultureInfo.InvariantCulture);
    }

    // Self-contained styles: palette from CSS variables (light, dark and print), text and axes in currentColor.
    internal const string Style =
        "<style>" +
        ".nbc-svg{--nbc-c0:#1f65a8;--nbc-c1:#c2410c;--nbc-c2:#2f7d32;--nbc-c3:#be185d;--nbc-c4:#7c3aed;--nbc-c5:#0e7490;--nbc-dome:#6b7280;overflow:visible}" +
        "@media (prefers-color-scheme:dark){.nbc-svg{--nbc-c0:#7cb8f2;--nbc-c1:#fb9a6a;--nbc-c2:#86d38a;--nbc-c3:#f9a8d4;--nbc-c4:#c4b5fd;--nbc-c5:#67d3e8;--nbc-dome:#a1a7b3}}" +
        "@media print{.nbc-svg{--nbc-c0:#000;--nbc-c1:#333;--nbc-c2:#000;--nbc-c3:#333;--nbc-c4:#000;--nbc-c5:#333;--nbc-dome:#555}}" +
        ".nbc-svg .nbc-frame{stroke-opacity:.7}.nbc-svg .nbc-grid{stroke:currentColor;stroke-opacity:.14;stroke-width:.6}" +
        ".nbc-svg .nbc-step{stroke-width:2;stroke-linejoin:round;stroke-linecap:round}.nbc-svg .nbc-dashed{stroke-dasharray:5 3}" +
        ".nbc-svg .nbc-c0{stroke:var(--nbc-c0)}.nbc-svg .nbc-c1{stroke:var(--nbc-c1)}.nbc-svg .nbc-c2{stroke:var(--nbc-c2)}" +
        ".nbc-svg .nbc-c3{stroke:var(--nbc-c3)}.nbc-svg .nbc-c4{stroke:var(--nbc-c4)}.nbc-svg .nbc-c5{stroke:var(--nbc-c5)}" +
        ".nbc-svg .nbc-dome{stroke:var(--nbc-dome);stroke-width:1.2;stroke-dasharray:2 2}.nbc-svg .nbc-ttl{font-weight:600}.nbc-svg .nbc-lbl{font-weight:600;font-size:12px}" +
        "</style>";

    /// <summary>The quantities a diagram plots and their labels.</summary>
    internal sealed class Axes
    {
        private readonly DisplayQuantity _x, _y;
        private readonly Func<StatePoint, double> _xs, _ys;
        private readonly DisplayUnits _units;

        public DisplayUnits Units => _units;

        private Axes(string title, string slug, DisplayQuantity x, Func<StatePoint, double> xs, DisplayQuantity y, Func<StatePoint, double> ys, bool logX, bool logY, string xSymbol, string ySymbol, DisplayUnits units)
        {
            Title = title;
            Slug = slug;
            _x = x;
            _y = y;
            _xs = xs;
            _ys = ys;
            LogX = logX;
            LogY = logY;
            _units = units;
            XLabel = xSymbol + ", " + UnitText.Unit(x, units) + (logX ? " (log)" : "");
            YLabel = ySymbol + ", " + UnitText.Unit(y, units) + (logY ? " (log)" : "");
        }

        public string Title { get; }

        public string Slug { get; }

        public bool LogX { get; }

        public bool LogY { get; }

        public string XLabel { get; }

        public string YLabel { get; }

        public double X(StatePoint p) => UnitText.Convert(_xs(p), _x, _units);

        public double Y(StatePoint p) => UnitText.Convert(_ys(p), _y, _units);

        public static Axes For(DiagramKind kind, DisplayUnits units) => kind switch
        {
            DiagramKind.TemperatureEntropy => new("T-s diagram", "ts", DisplayQuantity.SpecificEntropy, static p => p.S, DisplayQuantity.Temperature, static p => p.T, false, false, "s", "T", units),
            DiagramKind.EnthalpyEntropy => new("h-s diagram", "hs", DisplayQuantity.SpecificEntropy, static p => p.S, DisplayQuantity.SpecificEnergy, static p => p.H, false, false, "s", "h", units),
            DiagramKind.PressureEnthalpy => new("log p-h diagram", "ph", DisplayQuantity.SpecificEnergy, static p => p.H, DisplayQuantity.Pressure, static p => p.P, false, true, "h", "p", units),
            DiagramKind.PressureVolume => new("p-v diagram", "pv", DisplayQuantity.SpecificVolume, static p => p.V, DisplayQuantity.Pressure, static p => p.P, true, true, "v", "p", units),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown diagram."),
        };
    }

    /// <summary>A linear or logarithmic map from data to pixels, with round ticks.</summary>
    internal sealed class Scale
    {
        private readonly double _lo, _hi, _p0, _p1;
        private readonly bool _log;

        private Scale(double lo, double hi, double p0, double p1, bool log)
        {
            _lo = lo;
            _hi = hi;
            _p0 = p0;
            _p1 = p1;
            _log = log;
        }

        public static Scale Fit(List<double> values, bool log, double p0, double p1)
        {
            double lo = double.PositiveInfinity, hi = double.NegativeInfinity;
            foreach (double v in values)
            {
                if (!double.IsFinite(v) || (log && v <= 0))
                {
                    continue;
                }

                double t = log ? Math.Log10(v) : v;
                lo = Math.Min(lo, t);
                hi = Math.Max(hi, t);
            }

            if (!double.IsFinite(lo))
            {
                (lo, hi) = (0, 1);
            }

            double span = hi - lo;
            if (span < 1e-9)
            {
                span = log ? 0.2 : Math.Max(Math.Abs(lo) * 0.1, 1);
                lo -= span / 2;
                hi += span / 2;
            }

            double pad = 0.06 * (hi - lo);
            return new Scale(lo - pad, hi + pad, p0, p1, log);
        }

        public double Map(double v)
        {
            double t = _log ? Math.Log10(v) : v;
            return _p0 + (t - _lo) / (_hi - _lo) * (_p1 - _p0);
        }

        public List<(double Value, bool Labelled)> Ticks()
        {
            var ticks = new List<(double Value, bool Labelled)>(12);
            if (_log)
            {
                int first = (int)Math.Floor(_lo), last = (int)Math.Ceiling(_hi);
                foreach (double[] mantissas in new[] { new[] { 1.0 }, [1.0, 2, 5], [1.0, 2, 3, 4, 5, 6, 7, 8, 9] })
                {
                    ticks.Clear();
                    for (int e = first; e <= last; e++)
                    {
                        foreach (double m in mantissas)
                        {
                            double v = m * Math.Pow(10, e);
                            double t = Math.Log10(v);
                            if (t >= _lo && t <= _hi)
                            {
                                // With every mantissa gridded, label only 1, 2, 3 and 5 so the labels do not run together.
                                bool labelled = mantissas.Length < 9 || m is 1 or 2 or 3 or 5;
                                ticks.Add((double.Parse(v.ToString("G6", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture), labelled));
                            }
                        }
                    }

                    if (ticks.Count >= 3)
                    {
                        break;
                    }
                }

                return ticks;
            }

            double raw = (_hi - _lo) / 5;
            double mag = Math.Pow(10, Math.Floor(Math.Log10(raw)));
            double step = (raw / mag) switch { < 1.5 => mag, < 3 => 2 * mag, < 7 => 5 * mag, _ => 10 * mag };
            for (double v = Math.Ceiling(_lo / step) * step; v <= _hi + 1e-9 * step; v += step)
            {
                ticks.Add((Math.Abs(v) < 1e-9 * step ? 0 : Math.Round(v, 10), true));
            }

            return ticks;
        }
    }
}
