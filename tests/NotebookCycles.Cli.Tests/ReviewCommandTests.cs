using System.Text.RegularExpressions;
using Xunit;

namespace NotebookCycles.Cli.Tests;

public sealed class ReviewCommandTests
{
    private static string Executed(Cli.TempFolder dir)
    {
        string nb = dir.File("memo.ipynb");
        File.WriteAllText(nb, Cli.SmallNotebook());
        var (exit, _, stderr) = Cli.Run("run", nb, "--output", dir.File("executed.ipynb"));
        Assert.True(exit == 0, stderr);
        return dir.File("executed.ipynb");
    }

    [Fact]
    public void An_unchanged_notebook_passes()
    {
        using var dir = new Cli.TempFolder();
        var (exit, stdout, stderr) = Cli.Run("review", Executed(dir));
        Assert.True(exit == 0, stdout + stderr);
        Assert.Contains("3 cells unchanged, 0 changed, 0 failed", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void An_edited_stored_number_fails_and_the_report_names_the_cell_and_the_numbers()
    {
        using var dir = new Cli.TempFolder();
        string executed = Executed(dir);
        string text = File.ReadAllText(executed);
        var eta = Regex.Match(text, @"eta = (0\.\d{6})");
        Assert.True(eta.Success);
        string edited = eta.Groups[1].Value == "0.600000" ? "0.610000" : "0.600000";
        File.WriteAllText(executed, text.Replace(eta.Value, "eta = " + edited, StringComparison.Ordinal));

        var (exit, stdout, _) = Cli.Run("review", executed);
        Assert.Equal(1, exit);
        Assert.Contains("2 cells unchanged, 1 changed, 0 failed", stdout, StringComparison.Ordinal);
        Assert.Contains("cell 4 changed", stdout, StringComparison.Ordinal);
        Assert.Contains($"{double.Parse(edited, System.Globalization.CultureInfo.InvariantCulture).ToString("R", System.Globalization.CultureInfo.InvariantCulture)} → {double.Parse(eta.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture).ToString("R", System.Globalization.CultureInfo.InvariantCulture)}", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void A_change_within_the_tolerance_passes()
    {
        using var dir = new Cli.TempFolder();
        string executed = Executed(dir);
        string text = File.ReadAllText(executed);
        var eta = Regex.Match(text, @"eta = (0\.\d{6})");
        double stored = double.Parse(eta.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
        // Move the stored value by 1e-6 (relative about 2e-6): fails at the default 1e-6, passes at 1e-5.
        string moved = (stored + 1e-6).ToString("F6", System.Globalization.CultureInfo.InvariantCulture);
        File.WriteAllText(executed, text.Replace(eta.Value, "eta = " + moved, StringComparison.Ordinal));
        Assert.Equal(1, Cli.Run("review", executed).Exit);
        Assert.Equal(0, Cli.Run("review", executed, "--tolerance", "1e-5").Exit);
    }

    [Fact]
    public void A_cell_that_now_fails_is_reported_as_failed()
    {
        using var dir = new Cli.TempFolder();
        string executed = Executed(dir);
        string text = File.ReadAllText(executed);
        File.WriteAllText(executed, text.Replace("100.Kilopascals(), 8,", "100.Kilopascals(), 0.5,", StringComparison.Ordinal));
        var (exit, stdout, _) = Cli.Run("review", executed);
        Assert.Equal(1, exit);
        Assert.Contains("cell 3 failed", stdout, StringComparison.Ordinal);
        Assert.Contains("2 failed", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void A_notebook_without_stored_outputs_is_refused()
    {
        using var dir = new Cli.TempFolder();
        File.WriteAllText(dir.File("memo.ipynb"), Cli.SmallNotebook());
        var (exit, _, stderr) = Cli.Run("review", dir.File("memo.ipynb"));
        Assert.Equal(2, exit);
        Assert.Contains("no stored outputs", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void A_negative_tolerance_is_refused()
    {
        using var dir = new Cli.TempFolder();
        var (exit, _, stderr) = Cli.Run("review", Executed(dir), "--tolerance", "-1");
        Assert.Equal(2, exit);
        Assert.Contains("--tolerance", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_committed_demo_memo_passes_review()
    {
        string demos = Path.Combine(Cli.RepositoryRoot(), "notebooks-demo");
        var notebooks = Directory.GetFiles(demos, "*.ipynb");
        Assert.True(notebooks.Length >= 4, "at least four demo memos");
        foreach (string nb in notebooks)
        {
            var (exit, stdout, stderr) = Cli.Run("review", nb);
            Assert.True(exit == 0, $"{Path.GetFileName(nb)}:\n{stdout}\n{stderr}");
        }
    }
}
