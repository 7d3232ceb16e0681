using System.Globalization;
using System.Text;

namespace NotebookCycles.Rendering;

/// <summary>One polyline of a chart: display-unit values (a non-finite value breaks the line) and its element attributes.</summary>
/// <param name="X">Abscissae in display units.</param>
/// <param name="Y">Ordinates in display units; NaN leaves a gap.</param>
/// <param name="Attributes">Extra attributes of the path element, already encoded (e.g. <c> data-step="1→2"</c>).</param>
/// <param name="Tooltip">The path's title, plain text (encoded when written), or null.</param>
/// <param name="Dashed">Drawn dashed (a step whose path is not defined, only its ends).</param>
internal readonly record struct ChartLine(double[] X, double[] Y, string Attributes, string? Tooltip, bool Dashed = false);

/// <summary>A named group of lines drawn in one colour (a sweep curve, a cycle variant), with a legend entry.</summary>
/// <remarks>Markers go on every line vertex, or only on the points given (a cycle's states) when <c>MarkerX</c> is set.</remarks>
internal sealed record ChartSeries(string Name, int Colour, IReadOnlyList<ChartLine> Lines, bool Markers, double[]? MarkerX = null, double[]? MarkerY = null);

/// <summary>A marked point (an optimum) with its label.</summary>
internal readonly record struct ChartMark(double X, double Y, string Label);

/// <summary>What a line chart draws: title, axis labels, series, optional legend, marks and a grey background curve.</summary>
internal sealed class ChartSpec
{
    public required string Slug { get; init; }

    public required string Title { get; init; }

    public required string AriaLabel { get; init; }

    public required string XLabel { get; init; }

    public required string YLabel { get; init; }

    public required IReadOnlyList<ChartSeries> Series { get; init; }

    public bool Legend { get; init; }

    public string? LegendTitle { get; init; }

    public IReadOnlyList<ChartMark> Marks { get; init; } = [];

    public (double[] X, double[] Y)? Background { get; init; }

    public IReadOnlyList<string> Notes { get; init; } = [];
}

/// <summary>
/// The line charts of sweeps, optima and overlaid diagrams: the same frame, grid, ticks, palette and themes as the
/// cycle diagrams (<see cref="CycleSvg"/>), one path element per line, an optional legend at the right. Deterministic.
/// </summary>
internal static class LineChart
{
    private const double Height = 300, Left = 62, Top = 24, Bottom = 44, PlotWidth = 404, LegendWidth = 150;

    // Extra classes: marker fills per palette colour, the optimum mark, the legend.
    private const string ExtraStyle =
        "<style>.nbc-svg .nbc-f0{fill:var(--nbc-c0)}.nbc-svg .nbc-f1{fill:var(--nbc-c1)}.nbc-svg .nbc-f2{fill:var(--nbc-c2)}" +
        ".nbc-svg .nbc-f3{fill:var(--nbc-c3)}.nbc-svg .nbc-f4{fill:var(--nbc-c4)}.nbc-svg .nbc-f5{fill:var(--nbc-c5)}" +
        ".nbc-svg .nbc-curve{stroke-width:1.8;stroke-linejoin:round;stroke-linecap:round}.nbc-svg .nbc-long{stroke-dasharray:7 3}" +
        ".nbc-svg .nbc-mark{stroke:currentColor;stroke-width:1;stroke-dasharray:3 2}.nbc-svg .nbc-note{opacity:.75;font-size:10px}</style>";

    public static void Write(StringBuilder svg, ChartSpec spec)
    {
        double right = spec.Legend ? LegendWidth : 14;
        double width = Left + PlotWidth + right;
        var xs = new List<double>(256);
        var ys = new List<double>(256);
        foreach (var series in spec.Series)
        {
            foreach (var line in series.Lines)
            {
                for (int i = 0; i < line.X.Length; i++)
                {
                    if (double.IsFinite(line.X[i]) && double.IsFinite(line.Y[i]))
                    {
                        xs.Add(line.X[i]);
                        ys.Add(line.Y[i]);
                    }
                }
            }
        }

        foreach (var mark in spec.Marks)
        {
            xs.Add(mark.X);
            ys.Add(mark.Y);
        }

        if (spec.Background is { } bg)
        {
            xs.AddRange(bg.X);
            ys.AddRange(bg.Y);
        }

        var sx = CycleSvg.Scale.Fit(xs, false, Left, Left + PlotWidth);
        var sy = CycleSvg.Scale.Fit(ys, false, Height - Bottom, Top);
        double bottomExtra = 14 * spec.Notes.Count;
        double height = Height + bottomExtra;

        svg.Append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"nbc-svg nbc-").Append(spec.Slug)
           .Append("\" viewBox=\"0 0 ").Append(CycleSvg.N(width)).Append(' ').Append(CycleSvg.N(height))
           .Append("\" width=\"").Append(CycleSvg.N(width)).Append("\" height=\"").Append(CycleSvg.N(height))
           .Append("\" role=\"img\" aria-label=\"").Append(HtmlText.Encode(spec.AriaLabel)).Append("\" font-family=\"system-ui, sans-serif\" font-size=\"11\">");
        svg.Append(CycleSvg.Style).Append(ExtraStyle);
        svg.Append("<text class=\"nbc-ttl\" x=\"").Append(CycleSvg.N(Left)).Append("\" y=\"15\" fill=\"currentColor\">").Append(HtmlText.Encode(spec.Title)).Append("</text>");

        svg.Append("<g class=\"nbc-axes\" fill=\"currentColor\" stroke=\"none\">");
        svg.Append("<rect class=\"nbc-frame\" x=\"").Append(CycleSvg.N(Left)).Append("\" y=\"").Append(CycleSvg.N(Top)).Append("\" width=\"").Append(CycleSvg.N(PlotWidth)).Append("\" height=\"").Append(CycleSvg.N(Height - Top - Bottom)).Append("\" fill=\"none\" stroke=\"currentColor\"/>");
        foreach (var (t, labelled) in sx.Ticks())
        {
            double px = sx.Map(t);
            svg.Append("<path class=\"nbc-grid\" d=\"M").Append(CycleSvg.N(px)).Append(' ').Append(CycleSvg.N(Top)).Append('V').Append(CycleSvg.N(Height - Bottom)).Append("\"/>");
            if (labelled)
            {
                svg.Append("<text x=\"").Append(CycleSvg.N(px)).Append("\" y=\"").Append(CycleSvg.N(Height - Bottom + 14)).Append("\" text-anchor=\"middle\">").Append(CycleSvg.Tick(t)).Append("</text>");
            }
        }

        foreach (var (t, labelled) in sy.Ticks())
        {
            double py = sy.Map(t);
            svg.Append("<path class=\"nbc-grid\" d=\"M").Append(CycleSvg.N(Left)).Append(' ').Append(CycleSvg.N(py)).Append('H').Append(CycleSvg.N(Left + PlotWidth)).Append("\"/>");
            if (labelled)
            {
                svg.Append("<text x=\"").Append(CycleSvg.N(Left - 5)).Append("\" y=\"").Append(CycleSvg.N(py + 3.5)).Append("\" text-anchor=\"end\">").Append(CycleSvg.Tick(t)).Append("</text>");
            }
        }

        svg.Append("<text x=\"").Append(CycleSvg.N(Left + PlotWidth / 2)).Append("\" y=\"").Append(CycleSvg.N(Height - 8)).Append("\" text-anchor=\"middle\">").Append(HtmlText.Encode(spec.XLabel)).Append("</text>");
        svg.Append("<text transform=\"translate(14 ").Append(CycleSvg.N((Top + Height - Bottom) / 2)).Append(") rotate(-90)\" text-anchor=\"middle\">").Append(HtmlText.Encode(spec.YLabel)).Append("</text>");
        for (int i = 0; i < spec.Notes.Count; i++)
        {
            svg.Append("<text class=\"nbc-note\" x=\"").Append(CycleSvg.N(Left)).Append("\" y=\"").Append(CycleSvg.N(Height + 4 + 14 * i)).Append("\">").Append(HtmlText.Encode(spec.Notes[i])).Append("</text>");
        }

        svg.Append("</g>");

        if (spec.Background is { } dome)
        {
            svg.Append("<path class=\"nbc-dome\" data-curve=\"saturation\" fill=\"none\" d=\"");
            AppendBroken(svg, dome.X, dome.Y, sx, sy);
            svg.Append("\"/>");
        }

        svg.Append("<g class=\"nbc-paths\" fill=\"none\">");
        for (int s = 0; s < spec.Series.Count; s++)
        {
            var series = spec.Series[s];
            string cls = Colour(series.Colour);
            foreach (var line in series.Lines)
            {
                svg.Append("<path class=\"nbc-curve nbc-c").Append(cls).Append(series.Colour >= 6 ? " nbc-long" : "").Append(line.Dashed ? " nbc-dashed" : "").Append('"').Append(line.Attributes).Append(" d=\"");
                AppendBroken(svg, line.X, line.Y, sx, sy);
                svg.Append('"');
                if (line.Tooltip is null)
                {
                    svg.Append("/>");
                }
                else
                {
                    svg.Append("><title>").Append(HtmlText.Encode(line.Tooltip)).Append("</title></path>");
                }
            }
        }

        svg.Append("</g>");

        for (int s = 0; s < spec.Series.Count; s++)
        {
            var series = spec.Series[s];
            if (!series.Markers)
            {
                continue;
            }

            svg.Append("<g class=\"nbc-markers nbc-f").Append(Colour(series.Colour)).Append("\">");
            var points = series.MarkerX is { } mx && series.MarkerY is { } my ? [new ChartLine(mx, my, "", null)] : series.Lines;
            foreach (var line in points)
            {
                for (int i = 0; i < line.X.Length; i++)
                {
                    if (double.IsFinite(line.X[i]) && double.IsFinite(line.Y[i]))
                    {
                        svg.Append("<circle cx=\"").Append(CycleSvg.N(sx.Map(line.X[i]))).Append("\" cy=\"").Append(CycleSvg.N(sy.Map(line.Y[i]))).Append("\" r=\"2.2\"/>");
                    }
                }
            }

            svg.Append("</g>");
        }

        foreach (var mark in spec.Marks)
        {
            double px = sx.Map(mark.X), py = sy.Map(mark.Y);
            svg.Append("<g class=\"nbc-optimum\" fill=\"currentColor\"><path class=\"nbc-mark\" fill=\"none\" d=\"M").Append(CycleSvg.N(px)).Append(' ').Append(CycleSvg.N(Top)).Append('V').Append(CycleSvg.N(Height - Bottom)).Append("\"/>")
               .Append("<circle cx=\"").Append(CycleSvg.N(px)).Append("\" cy=\"").Append(CycleSvg.N(py)).Append("\" r=\"4\" fill=\"none\" stroke=\"currentColor\" stroke-width=\"1.6\"/>")
               .Append("<text class=\"nbc-lbl\" x=\"").Append(CycleSvg.N(px + 6)).Append("\" y=\"").Append(CycleSvg.N(Top + 12)).Append("\">").Append(HtmlText.Encode(mark.Label)).Append("</text></g>");
        }

        if (spec.Legend)
        {
            double lx = Left + PlotWidth + 12, ly = Top + 4;
            svg.Append("<g class=\"nbc-legend\" fill=\"currentColor\">");
            if (spec.LegendTitle is { } legendTitle)
            {
                svg.Append("<text x=\"").Append(CycleSvg.N(lx)).Append("\" y=\"").Append(CycleSvg.N(ly + 4)).Append("\" font-weight=\"600\">").Append(HtmlText.Encode(legendTitle)).Append("</text>");
                ly += 16;
            }

            foreach (var series in spec.Series)
            {
                svg.Append("<path class=\"nbc-curve nbc-c").Append(Colour(series.Colour)).Append(series.Colour >= 6 ? " nbc-long" : "").Append("\" fill=\"none\" d=\"M").Append(CycleSvg.N(lx)).Append(' ').Append(CycleSvg.N(ly)).Append("h18\"/>")
                   .Append("<text x=\"").Append(CycleSvg.N(lx + 24)).Append("\" y=\"").Append(CycleSvg.N(ly + 3.5)).Append("\">").Append(HtmlText.Encode(series.Name)).Append("</text>");
                ly += 15;
            }

            svg.Append("</g>");
        }

        svg.Append("</svg>");
    }

    private static string Colour(int index) => (index % 6).ToString(CultureInfo.InvariantCulture);

    /// <summary>Path data through the finite points; a non-finite point ends the current piece.</summary>
    private static void AppendBroken(StringBuilder svg, double[] x, double[] y, CycleSvg.Scale sx, CycleSvg.Scale sy)
    {
        bool pen = false;
        for (int i = 0; i < x.Length; i++)
        {
            if (!(double.IsFinite(x[i]) && double.IsFinite(y[i])))
            {
                pen = false;
                continue;
            }

            svg.Append(pen ? 'L' : 'M').Append(CycleSvg.N(sx.Map(x[i]))).Append(' ').Append(CycleSvg.N(sy.Map(y[i])));
            pen = true;
        }
    }
}
