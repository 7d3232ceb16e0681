using System.Text.Json.Nodes;
using Xunit;
using Xunit.Abstractions;

namespace NotebookCycles.Cli.Tests;

/// <summary>
/// The real Jupyter path: every demo memo executed by <c>jupyter nbconvert --execute</c> with the .NET Interactive
/// kernel (a local dotnet tool, project-local kernelspec under .ci/jupyter passing --http-local-only), the extension
/// restored from a local feed made by <c>dotnet pack</c>; then converted to HTML and opened in headless Chromium,
/// whose DOM must hold the state tables and SVG diagrams. Screenshots go to artifacts/e2e/.
/// </summary>
public sealed class JupyterEndToEndTests(ITestOutputHelper output)
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    private static readonly string[] ChromiumFlags = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic"];

    [JupyterFact]
    public void Every_demo_memo_executes_in_jupyter_and_renders_tables_and_diagrams_in_chromium()
    {
        var missing = JupyterFactAttribute.Missing();
        Assert.True(missing.Count == 0, "missing under CI: " + string.Join(", ", missing));
        string root = Cli.RepositoryRoot();
        using var work = new Cli.TempFolder();
        var env = new Dictionary<string, string>
        {
            ["JUPYTER_PATH"] = Path.Combine(root, ".ci", "jupyter"),
            ["JUPYTER_RUNTIME_DIR"] = work.File("runtime"),
            ["JUPYTER_CONFIG_DIR"] = work.File("config"),
            ["JUPYTER_DATA_DIR"] = work.File("data"),
            ["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1",
            ["DOTNET_INTERACTIVE_CLI_TELEMETRY_OPTOUT"] = "1",
            ["DOTNET_NOLOGO"] = "1",
        };
        var limit = TimeSpan.FromMinutes(4);
        string[] outputs = [];

        Step("dotnet", ["tool", "restore"], root, env, limit);

        // The package under a version of this run's own, in a feed of this run's own: the NuGet cache is shared by
        // everything on the machine, so a fixed version could be served from a copy another build put there.
        string version = "0.1.0-e2e" + DateTime.UtcNow.ToString("yyyyMMddHHmmssfff", System.Globalization.CultureInfo.InvariantCulture);
        string feed = work.File("feed");
        Step("dotnet", ["pack", Path.Combine(root, "src", "NotebookCycles.Interactive", "NotebookCycles.Interactive.csproj"), "-c", Configuration, "--no-build", "-p:BuildProjectReferences=false", "-p:PackageVersion=" + version, "-p:NuspecOutputPath=" + work.File("nuspec") + Path.DirectorySeparatorChar, "-o", feed, "-nologo"], root, env, limit);

        // The demo memos as committed, except that their package cell names this run's feed and version. The copies
        // live inside the repository so the kernelspec finds the local tool manifest from the notebooks' folder.
        var sources = Directory.GetFiles(Path.Combine(root, "notebooks-demo"), "*.ipynb").OrderBy(n => n, StringComparer.Ordinal).ToArray();
        Assert.True(sources.Length >= 4);
        string copies = Path.Combine(root, "artifacts", "e2e-notebooks-" + version);
        Directory.CreateDirectory(copies);
        var notebooks = new List<string>();
        try
        {
            foreach (string source in sources)
            {
                string text = File.ReadAllText(source);
                const string FeedExpression = "System.IO.Path.GetFullPath(System.IO.Path.Combine(\\\"..\\\", \\\"artifacts\\\", \\\"feed\\\"))";
                const string VersionText = "NotebookCycles.Interactive, 0.1.0";
                Assert.Contains(FeedExpression, text, StringComparison.Ordinal);
                Assert.Contains(VersionText, text, StringComparison.Ordinal);
                text = text.Replace(FeedExpression, "\\\"" + feed.Replace("\\", "/", StringComparison.Ordinal) + "\\\"", StringComparison.Ordinal)
                           .Replace(VersionText, "NotebookCycles.Interactive, " + version, StringComparison.Ordinal);
                string copy = Path.Combine(copies, Path.GetFileName(source));
                File.WriteAllText(copy, text);
                notebooks.Add(copy);
            }

            string executed = work.File("executed");
            Step("jupyter-nbconvert", ["--to", "notebook", "--execute", "--ExecutePreprocessor.timeout=180", "--output-dir", executed, .. notebooks], copies, env, limit);
            outputs = notebooks.Select(n => Path.Combine(executed, Path.GetFileName(n))).ToArray();
        }
        finally
        {
            Directory.Delete(copies, recursive: true);
            string cache = Environment.GetEnvironmentVariable("NUGET_PACKAGES") is { Length: > 0 } custom ? custom : Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".nuget", "packages");
            string cached = Path.Combine(cache, "notebookcycles.interactive", version);
            if (Directory.Exists(cached))
            {
                Directory.Delete(cached, recursive: true);
            }
        }

        foreach (string nb in outputs)
        {
            // Restored from this run's feed: the kernel lists the installed package with this run's version.
            Assert.Contains("NotebookCycles.Interactive, " + version, File.ReadAllText(nb), StringComparison.Ordinal);
            var cells = JsonNode.Parse(File.ReadAllText(nb))!["cells"]!.AsArray();
            var errors = cells.SelectMany(c => c!["outputs"]?.AsArray() ?? []).Where(o => (string?)o!["output_type"] == "error").Select(o => (string?)o!["evalue"]).ToList();
            Assert.True(errors.Count == 0, Path.GetFileName(nb) + ": " + string.Join("\n", errors));
        }

        Step("jupyter-nbconvert", ["--to", "html", "--output-dir", work.File("html"), .. outputs], root, env, limit);
        string shots = Path.Combine(root, "artifacts", "e2e");
        Directory.CreateDirectory(shots);
        foreach (string nb in outputs)
        {
            string name = Path.GetFileNameWithoutExtension(nb);
            string page = "file://" + work.File(Path.Combine("html", name + ".html"));
            var (_, dom, _) = Step("chromium", [.. ChromiumFlags, "--user-data-dir=" + work.File("chromium-" + name), "--dump-dom", page], root, env, TimeSpan.FromMinutes(2));
            Assert.Contains("class=\"nbc nbc-cycle\"", dom, StringComparison.Ordinal);
            Assert.Contains("<table", dom, StringComparison.Ordinal);
            Assert.Contains("State", dom, StringComparison.Ordinal);
            Assert.Contains("<svg", dom, StringComparison.Ordinal);
            Assert.Contains("T-s diagram", dom, StringComparison.Ordinal);
            Assert.Contains("NotebookCycles loaded", dom, StringComparison.Ordinal);
            string shot = Path.Combine(shots, name + ".png");
            Step("chromium", [.. ChromiumFlags, "--user-data-dir=" + work.File("chromium-shot-" + name), "--hide-scrollbars", "--window-size=1280,2400", "--screenshot=" + shot, page], root, env, TimeSpan.FromMinutes(2));
            Assert.True(new FileInfo(shot).Length > 10_000, "screenshot " + shot);
            output.WriteLine("screenshot: " + shot);
        }
    }

    private (int Exit, string Out, string Err) Step(string program, string[] args, string cwd, Dictionary<string, string> env, TimeSpan limit)
    {
        var started = DateTime.UtcNow;
        var result = ExternalProcess.Run(program, args, cwd, limit, env);
        output.WriteLine($"{program} {string.Join(' ', args.Take(4))}…: exit {result.Exit} in {(DateTime.UtcNow - started).TotalSeconds:F1} s");
        Assert.True(result.Exit == 0, $"{program} {string.Join(' ', args)} failed ({result.Exit}):\n{result.Out}\n{result.Err}");
        return result;
    }
}
