using System.Globalization;
using System.Text.Json.Nodes;
using NotebookCycles.Units;
using Spectre.Console;

namespace NotebookCycles.Cli;

/// <summary>The outcome of a review.</summary>
/// <param name="Cells">One comparison per code cell, in order.</param>
/// <param name="Run">The re-run.</param>
public sealed record ReviewResult(IReadOnlyList<CellComparison> Cells, RunResult Run)
{
    /// <summary>True when every cell is unchanged.</summary>
    public bool Passed => Cells.All(c => c.Status == CellStatus.Unchanged);
}

/// <summary><c>nbcycles review</c>: re-execute a saved notebook and compare every output with the stored one.</summary>
public static class ReviewCommand
{
    /// <summary>Re-runs <paramref name="notebook"/> and compares its outputs with the stored ones.</summary>
    public static async Task<ReviewResult> ReviewAsync(Notebook notebook, double tolerance, IProgress<CellProgress>? progress = null, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(notebook);
        if (!(tolerance >= 0 && double.IsFinite(tolerance)))
        {
            throw new CliException($"--tolerance must be a finite number ≥ 0; got {tolerance.ToString(CultureInfo.InvariantCulture)}.");
        }

        var run = await NotebookRunner.RunAsync(notebook, progress, cancellation).ConfigureAwait(false);
        var done = run.Cells.ToDictionary(c => c.Number);
        var cells = new List<CellComparison>();
        foreach (var cell in notebook.Cells.Where(c => c.Kind == CellKind.Code))
        {
            if (!done.TryGetValue(cell.Number, out var rerun))
            {
                cells.Add(new CellComparison(cell.Number, CellStatus.Failed, [], ["not run: an earlier cell failed"]));
                continue;
            }

            if (rerun.Failed)
            {
                cells.Add(new CellComparison(cell.Number, CellStatus.Failed, [], [RunCommand.OneLine(rerun.Error)]));
                continue;
            }

            // The package cell's stored output depends on the front end that ran it (package restore messages): not compared.
            cells.Add(rerun.IsPackageCell
                ? new CellComparison(cell.Number, CellStatus.Unchanged, [], [])
                : OutputComparison.Compare(cell.Number, cell.Outputs, rerun.Outputs, tolerance));
        }

        return new ReviewResult(cells, run);
    }

    /// <summary>Runs the command; returns the exit code.</summary>
    public static async Task<int> ExecuteAsync(string notebookPath, double tolerance, TextWriter stdout, TextWriter stderr, CancellationToken cancellation)
    {
        var notebook = Notebook.Load(notebookPath);
        if (notebook.Cells.Where(c => c.Kind == CellKind.Code && !Notebook.IsPackageCell(c)).All(c => c.Outputs.Count == 0))
        {
            throw new CliException($"{notebookPath}: no stored outputs to review (run it first: nbcycles run {notebookPath} --output <executed.ipynb>).");
        }

        var result = await ReviewAsync(notebook, tolerance, null, cancellation).ConfigureAwait(false);
        var console = Terminal.For(stdout);
        int unchanged = result.Cells.Count(c => c.Status == CellStatus.Unchanged);
        int changed = result.Cells.Count(c => c.Status == CellStatus.Changed);
        int failed = result.Cells.Count(c => c.Status == CellStatus.Failed);
        console.MarkupLine($"[bold]nbcycles review[/] {Markup.Escape(notebookPath)} (relative tolerance {SiText.Number(tolerance)}, re-run {result.Run.Elapsed.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s)");
        console.MarkupLine($"{unchanged} cells unchanged, {changed} changed, {failed} failed");
        foreach (var cell in result.Cells.Where(c => c.Status != CellStatus.Unchanged))
        {
            string n = cell.Cell.ToString(CultureInfo.InvariantCulture);
            if (cell.Status == CellStatus.Failed)
            {
                console.MarkupLine($"[red]cell {n} failed[/]: {Markup.Escape(string.Join("; ", cell.TextChanges))}");
                continue;
            }

            console.MarkupLine($"[yellow]cell {n} changed[/]");
            foreach (var number in cell.Numbers)
            {
                console.MarkupLine($"  {Markup.Escape(number.Mime)}: {Markup.Escape(R(number.Before))} → {Markup.Escape(R(number.After))}  (in \"{Markup.Escape(number.Context)}\")");
            }

            foreach (var text in cell.TextChanges)
            {
                console.MarkupLine($"  {Markup.Escape(text)}");
            }
        }

        return result.Passed ? ExitCodes.Success : ExitCodes.CellFailedOrChanged;
    }

    private static string R(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    internal static JsonArray Empty => [];
}
