using System.Text.Json;
using System.Text.Json.Nodes;
using NotebookCycles.Cycles;
using Xunit;

namespace NotebookCycles.Cli.Tests;

public sealed class RunCommandTests
{
    [Fact]
    public void Run_writes_the_executed_notebook_the_offline_memo_and_the_json()
    {
        using var dir = new Cli.TempFolder();
        string nb = dir.File("memo.ipynb");
        File.WriteAllText(nb, Cli.SmallNotebook());
        var (exit, stdout, stderr) = Cli.Run("run", nb, "--html", dir.File("memo.html"), "--output", dir.File("executed.ipynb"), "--json", dir.File("memo.json"));
        Assert.True(exit == 0, stderr + stdout);
        Assert.Contains("[2/3] cell 3 ok", stdout, StringComparison.Ordinal);

        // The executed notebook stores outputs as a front end does: display data and execute results with text/html and text/plain.
        var executed = JsonNode.Parse(File.ReadAllText(dir.File("executed.ipynb")))!;
        var cells = executed["cells"]!.AsArray();
        var cycleOutput = cells[2]!["outputs"]!.AsArray().Single()!;
        Assert.Equal("execute_result", (string?)cycleOutput["output_type"]);
        Assert.Equal(2, (int?)cells[2]!["execution_count"]);
        Assert.Contains("nbc-cycle", Notebook.JoinText(cycleOutput["data"]!["text/html"]), StringComparison.Ordinal);
        Assert.Contains("Otto cycle", Notebook.JoinText(cycleOutput["data"]!["text/plain"]), StringComparison.Ordinal);
        var stateCell = cells[3]!["outputs"]!.AsArray();
        Assert.Equal("display_data", (string?)stateCell[0]!["output_type"]);
        Assert.Equal("stream", (string?)stateCell[1]!["output_type"]);
        Assert.StartsWith("eta = 0.5", Notebook.JoinText(stateCell[1]!["text"]), StringComparison.Ordinal);

        // The memo: Markdown rendered, caution, version and time of the run, no scripts or remote resources.
        string html = File.ReadAllText(dir.File("memo.html"));
        Assert.Contains("<h1 id=\"small-memo\">Small memo</h1>", html, StringComparison.Ordinal);
        Assert.Contains("<strong>check</strong>", html, StringComparison.Ordinal);
        Assert.Contains("<table>", html, StringComparison.Ordinal);
        Assert.Contains(System.Net.WebUtility.HtmlEncode(CycleResult.Caution), html, StringComparison.Ordinal);
        Assert.Contains(MemoHtml.LibraryVersion, html, StringComparison.Ordinal);
        Assert.Matches(@"run at <time datetime=""\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ"">", html);
        Assert.Contains("<svg", html, StringComparison.Ordinal);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotMatch(@"(src|href)\s*=\s*[""']?(https?:)?//", html);

        // The JSON: the cycle and the state the notebook displayed, SI units, the core's keys.
        using var json = JsonDocument.Parse(File.ReadAllText(dir.File("memo.json")));
        var values = json.RootElement.GetProperty("values");
        Assert.Equal(2, values.GetArrayLength());
        var cycle = values[0].GetProperty("value");
        Assert.Equal(3, values[0].GetProperty("cell").GetInt32());
        Assert.Equal("cycle", cycle.GetProperty("kind").GetString());
        Assert.Equal(300.0, cycle.GetProperty("states")[0].GetProperty("T_K").GetDouble());
        Assert.Equal(100_000.0, cycle.GetProperty("states")[0].GetProperty("p_Pa").GetDouble());
        // 1800 kJ/kg added, as given in the notebook, written in J/kg.
        Assert.Equal(1_800_000.0, cycle.GetProperty("figures").GetProperty("heat_in_J_per_kg").GetDouble(), 6);
        var state = values[1].GetProperty("value");
        Assert.Equal("state", state.GetProperty("kind").GetString());
        Assert.Equal("3", state.GetProperty("label").GetString());
        Assert.Equal(JsonValueKind.Null, state.GetProperty("x").ValueKind);
    }

    [Fact]
    public void A_dib_notebook_runs_and_gets_an_ipynb_with_a_kernelspec()
    {
        using var dir = new Cli.TempFolder();
        string nb = dir.File("memo.dib");
        File.WriteAllText(nb, "#!markdown\n\n# Dib memo\n\n#!csharp\n\nvar s = ColdAirStandard.Air.FromTP(300, 1e5);\ns.T\n");
        var (exit, _, stderr) = Cli.Run("run", nb, "--output", dir.File("out.ipynb"));
        Assert.True(exit == 0, stderr);
        var root = JsonNode.Parse(File.ReadAllText(dir.File("out.ipynb")))!;
        Assert.Equal(".net-csharp", (string?)root["metadata"]!["kernelspec"]!["name"]);
        Assert.Equal("300", Notebook.JoinText(root["cells"]![1]!["outputs"]![0]!["data"]!["text/plain"]));
    }

    [Fact]
    public void A_failing_cell_gives_exit_1_with_the_cell_number_and_error_and_leaves_the_old_memo_alone()
    {
        using var dir = new Cli.TempFolder();
        string nb = dir.File("memo.ipynb");
        // Compression ratio 0.5 is rejected by the chain: the cell fails.
        File.WriteAllText(nb, Cli.SmallNotebook("AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 0.5, heatAdded: 1800.KilojoulesPerKilogram())"));
        File.WriteAllText(dir.File("memo.html"), "good memo");
        var (exit, _, stderr) = Cli.Run("run", nb, "--html", dir.File("memo.html"));
        Assert.Equal(1, exit);
        Assert.StartsWith("nbcycles: cell 3 failed: ", stderr, StringComparison.Ordinal);
        Assert.Single(stderr.Trim().Split('\n'));
        Assert.Equal("good memo", File.ReadAllText(dir.File("memo.html")));
        Assert.Empty(Directory.GetFiles(dir.Path, "*.tmp"));
    }

    [Fact]
    public void A_compile_error_names_the_cell()
    {
        using var dir = new Cli.TempFolder();
        string nb = dir.File("memo.ipynb");
        File.WriteAllText(nb, Cli.SmallNotebook("NoSuchThing.Build()"));
        var (exit, _, stderr) = Cli.Run("run", nb);
        Assert.Equal(1, exit);
        Assert.Contains("cell 3 failed", stderr, StringComparison.Ordinal);
        Assert.Contains("NoSuchThing", stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("missing.ipynb", "notebook not found")]
    [InlineData("notes.txt", "not a notebook")]
    public void Missing_or_wrong_files_get_one_line_and_exit_2(string name, string message)
    {
        using var dir = new Cli.TempFolder();
        if (name.EndsWith(".txt", StringComparison.Ordinal))
        {
            File.WriteAllText(dir.File(name), "hello");
        }

        var (exit, _, stderr) = Cli.Run("run", dir.File(name));
        Assert.Equal(2, exit);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
        Assert.Single(stderr.Trim().Split('\n'));
    }

    [Theory]
    [InlineData("{ not json", "not valid JSON")]
    [InlineData("{\"nbformat\": 4}", "no \"cells\" array")]
    [InlineData("{\"cells\": [{\"cell_type\": \"widget\", \"source\": \"\"}]}", "cell 1 has cell_type \"widget\"")]
    [InlineData("{\"cells\": [{\"cell_type\": \"code\", \"source\": 42}]}", "cell 1 has a source that is neither")]
    [InlineData("{\"cells\": [], \"nbformat\": 3}", "nbformat 3 is not supported")]
    public void Malformed_notebooks_get_one_line_and_exit_2(string content, string message)
    {
        using var dir = new Cli.TempFolder();
        File.WriteAllText(dir.File("bad.ipynb"), content);
        var (exit, _, stderr) = Cli.Run("run", dir.File("bad.ipynb"));
        Assert.Equal(2, exit);
        Assert.Contains("malformed notebook", stderr, StringComparison.Ordinal);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
        Assert.Single(stderr.Trim().Split('\n'));
    }

    [Fact]
    public void A_cell_in_another_language_is_refused()
    {
        using var dir = new Cli.TempFolder();
        File.WriteAllText(dir.File("fs.ipynb"), "{\"cells\": [{\"cell_type\": \"code\", \"metadata\": {\"dotnet_interactive\": {\"language\": \"fsharp\"}}, \"source\": \"1 + 1\", \"outputs\": []}]}");
        var (exit, _, stderr) = Cli.Run("run", dir.File("fs.ipynb"));
        Assert.Equal(2, exit);
        Assert.Contains("cell 1 is in fsharp", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Usage_errors_exit_2()
    {
        var (exit, _, stderr) = Cli.Run("run");
        Assert.Equal(2, exit);
        Assert.Contains("nbcycles:", stderr, StringComparison.Ordinal);
    }
}
