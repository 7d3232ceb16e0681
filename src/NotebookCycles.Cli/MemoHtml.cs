using System.Globalization;
using System.Net;
using System.Reflection;
using System.Text;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using Markdig;
using NotebookCycles.Cycles;

namespace NotebookCycles.Cli;

/// <summary>
/// The standalone HTML memo of a run: Markdown cells as HTML, each code cell folded away above its outputs, the
/// caution, the library version and the time of the run in the footer. Offline: no scripts or styles from elsewhere.
/// </summary>
public static partial class MemoHtml
{
    private static readonly MarkdownPipeline Markdown = new MarkdownPipelineBuilder().UsePipeTables().UseEmphasisExtras().UseAutoIdentifiers().DisableHtml().Build();

    /// <summary>The library version the memo names (the core assembly's informational version).</summary>
    public static string LibraryVersion
    {
        get
        {
            var assembly = typeof(CycleResult).Assembly;
            string? v = assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion;
            return v ?? assembly.GetName().Version?.ToString() ?? "unknown";
        }
    }

    /// <summary>Renders Markdown text as HTML (raw HTML in the Markdown is shown as text).</summary>
    public static string MarkdownToHtml(string markdown) => Markdig.Markdown.ToHtml(markdown ?? "", Markdown);

    /// <summary>The memo of <paramref name="run"/> as one HTML document.</summary>
    public static string Render(RunResult run)
    {
        ArgumentNullException.ThrowIfNull(run);
        var outputs = run.Cells.ToDictionary(c => c.Number);
        string title = Title(run.Notebook);
        string when = run.Started.ToString("yyyy-MM-dd HH:mm:ss 'UTC'", CultureInfo.InvariantCulture);
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        html.Append("<meta name=\"generator\" content=\"nbcycles ").Append(Encode(LibraryVersion)).Append("\">\n");
        html.Append("<title>").Append(Encode(title)).Append("</title>\n<style>\n").Append(Style).Append("</style>\n</head>\n<body>\n<main class=\"memo\">\n");
        foreach (var cell in run.Notebook.Cells)
        {
            switch (cell.Kind)
            {
                case CellKind.Markdown:
                    html.Append("<section class=\"text\">\n").Append(MarkdownToHtml(cell.Source)).Append("</section>\n");
                    break;
                case CellKind.Raw:
                    html.Append("<pre class=\"raw\">").Append(Encode(cell.Source)).Append("</pre>\n");
                    break;
                case CellKind.Code when outputs.TryGetValue(cell.Number, out var done):
                    if (done.IsPackageCell)
                    {
                        break;
                    }

                    html.Append("<section class=\"cell\" id=\"cell-").Append(cell.Number.ToString(CultureInfo.InvariantCulture)).Append("\">\n");
                    html.Append("<details class=\"code\"><summary>Calculation, cell ").Append(cell.Number.ToString(CultureInfo.InvariantCulture)).Append("</summary>\n<pre><code>").Append(Encode(cell.Source)).Append("</code></pre></details>\n");
                    foreach (var output in done.Outputs)
                    {
                        AppendOutput(html, output as JsonObject);
                    }

                    html.Append("</section>\n");
                    break;
                case CellKind.Code:
                    html.Append("<section class=\"cell not-run\"><p>Cell ").Append(cell.Number.ToString(CultureInfo.InvariantCulture)).Append(" was not run.</p></section>\n");
                    break;
            }
        }

        html.Append("</main>\n<footer class=\"memo-footer\">\n<p class=\"caution\"><strong>Caution.</strong> ").Append(Encode(CycleResult.Caution)).Append("</p>\n");
        html.Append("<p class=\"provenance\">Computed with NotebookCycles <span class=\"version\">").Append(Encode(LibraryVersion)).Append("</span> from <code>")
            .Append(Encode(Path.GetFileName(run.Notebook.Path))).Append("</code>; run at <time datetime=\"")
            .Append(run.Started.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture)).Append("\">").Append(when).Append("</time>.</p>\n</footer>\n</body>\n</html>\n");
        return html.ToString();
    }

    /// <summary>The memo's title: the first level-1 heading of the first Markdown cell, else the file name.</summary>
    public static string Title(Notebook notebook)
    {
        ArgumentNullException.ThrowIfNull(notebook);
        foreach (var cell in notebook.Cells)
        {
            if (cell.Kind != CellKind.Markdown)
            {
                continue;
            }

            foreach (var line in cell.Source.Split('\n'))
            {
                if (line.StartsWith("# ", StringComparison.Ordinal))
                {
                    return line[2..].Trim();
                }
            }
        }

        return Path.GetFileNameWithoutExtension(notebook.Path);
    }

    private static void AppendOutput(StringBuilder html, JsonObject? output)
    {
        if (output is null)
        {
            return;
        }

        switch ((string?)output["output_type"])
        {
            case "display_data" or "execute_result":
                var data = output["data"] as JsonObject;
                if (data?["text/html"] is { } h)
                {
                    html.Append("<div class=\"output\">").Append(Offline(Notebook.JoinText(h))).Append("</div>\n");
                }
                else if (data?["text/markdown"] is { } md)
                {
                    html.Append("<div class=\"output\">").Append(MarkdownToHtml(Notebook.JoinText(md))).Append("</div>\n");
                }
                else if (data?["text/plain"] is { } t)
                {
                    html.Append("<pre class=\"output\">").Append(Encode(Notebook.JoinText(t))).Append("</pre>\n");
                }

                break;
            case "stream":
                html.Append("<pre class=\"output stream\">").Append(Encode(Notebook.JoinText(output["text"]))).Append("</pre>\n");
                break;
            case "error":
                html.Append("<pre class=\"output error\">").Append(Encode((string?)output["ename"] ?? "Error")).Append(": ").Append(Encode((string?)output["evalue"] ?? "")).Append("</pre>\n");
                break;
        }
    }

    /// <summary>Removes what would reach the network: scripts, and stylesheets or scripts loaded from elsewhere.</summary>
    internal static string Offline(string html)
    {
        string noScripts = ScriptElement().Replace(html, "");
        return RemoteLink().Replace(noScripts, "");
    }

    [GeneratedRegex(@"<script\b[^>]*>.*?</script\s*>", RegexOptions.IgnoreCase | RegexOptions.Singleline)]
    private static partial Regex ScriptElement();

    [GeneratedRegex(@"<link\b[^>]*\bhref\s*=\s*[""']?(https?:)?//[^>]*>", RegexOptions.IgnoreCase)]
    private static partial Regex RemoteLink();

    private static string Encode(string text) => WebUtility.HtmlEncode(text);

    private const string Style = """
        body { font-family: system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; color: #1d2329; background: #fff; margin: 0; }
        main.memo { max-width: 60rem; margin: 0 auto; padding: 1.5rem 1.5rem 0.5rem; line-height: 1.5; }
        h1 { font-size: 1.7rem; border-bottom: 2px solid #2b5d8a; padding-bottom: .3rem; }
        h2 { font-size: 1.3rem; margin-top: 2rem; color: #2b5d8a; }
        h3 { font-size: 1.1rem; }
        table { border-collapse: collapse; margin: .6rem 0; font-size: .92rem; }
        th, td { border: 1px solid #c9d1d9; padding: .2rem .5rem; text-align: right; }
        th { background: #eef3f8; }
        section.text td:first-child, section.text th:first-child { text-align: left; }
        details.code { margin: .8rem 0 .3rem; }
        details.code summary { cursor: pointer; color: #57606a; font-size: .85rem; }
        pre { background: #f6f8fa; padding: .6rem; overflow-x: auto; font-size: .85rem; }
        pre.error { background: #fde8e8; color: #8a1c1c; }
        div.output { margin: .4rem 0 1rem; overflow-x: auto; }
        svg { max-width: 100%; height: auto; }
        footer.memo-footer { max-width: 60rem; margin: 1.5rem auto; padding: .8rem 1.5rem; border-top: 1px solid #c9d1d9; font-size: .85rem; color: #57606a; }
        p.caution { color: #7a4b00; }
        @media print { details.code { display: none; } }

        """;
}
