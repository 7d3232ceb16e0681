using System.Globalization;
using Spectre.Console;

namespace NotebookCycles.Cli;

/// <summary><c>nbcycles run</c>: execute a notebook and write the executed notebook, the HTML memo and the JSON record.</summary>
public static class RunCommand
{
    /// <summary>Runs the command; returns the exit code.</summary>
    public static async Task<int> ExecuteAsync(string notebookPath, string? htmlPath, string? outputPath, string? jsonPath, TextWriter stdout, TextWriter stderr, CancellationToken cancellation)
    {
        var notebook = Notebook.Load(notebookPath);
        var console = Terminal.For(stdout);
        console.MarkupLine($"[bold]nbcycles run[/] {Markup.Escape(notebookPath)}: {notebook.Cells.Count(c => c.Kind == CellKind.Code)} code cells");
        var run = await NotebookRunner.RunAsync(notebook, new Progress(console), cancellation).ConfigureAwait(false);
        if (run.FirstFailure is { } failed)
        {
            await stderr.WriteLineAsync($"nbcycles: cell {failed.Number.ToString(CultureInfo.InvariantCulture)} failed: {OneLine(failed.Error)} (no outputs written)").ConfigureAwait(false);
            return ExitCodes.CellFailedOrChanged;
        }

        if (outputPath is not null)
        {
            AtomicFile.WriteAllText(outputPath, notebook.ToIpynb(run.Executed));
            console.MarkupLine($"executed notebook: {Markup.Escape(outputPath)}");
        }

        if (htmlPath is not null)
        {
            AtomicFile.WriteAllText(htmlPath, MemoHtml.Render(run));
            console.MarkupLine($"HTML memo: {Markup.Escape(htmlPath)}");
        }

        if (jsonPath is not null)
        {
            AtomicFile.WriteAllText(jsonPath, CaptureJson.Render(run));
            console.MarkupLine($"JSON ({run.Values.Count.ToString(CultureInfo.InvariantCulture)} values): {Markup.Escape(jsonPath)}");
        }

        console.MarkupLine($"[green]done[/] in {run.Elapsed.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s");
        return ExitCodes.Success;
    }

    /// <summary>The first line of an error message, for one-line reports.</summary>
    internal static string OneLine(string? message)
    {
        if (string.IsNullOrWhiteSpace(message))
        {
            return "(no message)";
        }

        var lines = message.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        return lines.Length == 0 ? message.Trim() : lines[0];
    }

    private sealed class Progress(IAnsiConsole console) : IProgress<CellProgress>
    {
        public void Report(CellProgress value)
        {
            string at = $"[{value.Index.ToString(CultureInfo.InvariantCulture)}/{value.Count.ToString(CultureInfo.InvariantCulture)}] cell {value.Cell.ToString(CultureInfo.InvariantCulture)}";
            if (value.Done is not { } done)
            {
                return;
            }

            string seconds = done.Elapsed.TotalSeconds.ToString("0.00", CultureInfo.InvariantCulture) + " s";
            if (done.Failed)
            {
                console.MarkupLine($"{Markup.Escape(at)} [red]failed[/] ({seconds}): {Markup.Escape(OneLine(done.Error))}");
            }
            else
            {
                console.MarkupLine($"{Markup.Escape(at)} [green]ok[/] ({seconds}){(done.IsPackageCell ? " — extension loaded in-process" : "")}");
            }
        }
    }
}

/// <summary>Spectre consoles over a given writer (colours only on a real terminal).</summary>
internal static class Terminal
{
    public static IAnsiConsole For(TextWriter writer)
    {
        bool terminal = ReferenceEquals(writer, Console.Out) && !Console.IsOutputRedirected;
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Out = new AnsiConsoleOutput(writer),
            Ansi = terminal ? AnsiSupport.Detect : AnsiSupport.No,
            ColorSystem = terminal ? ColorSystemSupport.Detect : ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.No,
        });
        console.Profile.Width = 240;
        return console;
    }
}
