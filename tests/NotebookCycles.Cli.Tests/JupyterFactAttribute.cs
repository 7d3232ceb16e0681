using Xunit;

namespace NotebookCycles.Cli.Tests;

/// <summary>
/// A fact that needs Jupyter's nbconvert with nbclient and headless Chromium (Debian packages jupyter-nbconvert,
/// python3-nbclient, jupyter-client, chromium). Without them it reports itself skipped with the reason; under CI
/// (CI=true) it always runs, so a missing tool fails it.
/// </summary>
public sealed class JupyterFactAttribute : FactAttribute
{
    /// <summary>Sets <see cref="FactAttribute.Skip"/> when a tool is missing and CI is not true.</summary>
    public JupyterFactAttribute()
    {
        if (UnderCi)
        {
            return;
        }

        var missing = Missing();
        if (missing.Count > 0)
        {
            Skip = "needs " + string.Join(", ", missing) + " (Debian packages jupyter-nbconvert python3-nbclient jupyter-client chromium); it always runs under CI=true";
        }
    }

    /// <summary>True when the variable CI is "true".</summary>
    public static bool UnderCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>The tools that are not installed.</summary>
    public static IReadOnlyList<string> Missing()
    {
        var missing = new List<string>();
        string? nbconvert = ExternalProcess.OnPath("jupyter-nbconvert");
        if (nbconvert is null)
        {
            missing.Add("jupyter-nbconvert");
        }

        if (ExternalProcess.OnPath("chromium") is null)
        {
            missing.Add("chromium");
        }

        // nbconvert's own interpreter (its script's first line) must have nbclient.
        if (Interpreter(nbconvert) is not { } python || !HasModule(python, "nbclient"))
        {
            missing.Add("python3-nbclient");
        }

        return missing;
    }

    private static string? Interpreter(string? script)
    {
        if (script is null)
        {
            return ExternalProcess.OnPath("python3");
        }

        string first = File.ReadLines(script).FirstOrDefault() ?? "";
        if (!first.StartsWith("#!", StringComparison.Ordinal))
        {
            return ExternalProcess.OnPath("python3");
        }

        var parts = first[2..].Trim().Split(' ', StringSplitOptions.RemoveEmptyEntries);
        return parts.Length == 0 ? null : parts[0].EndsWith("/env", StringComparison.Ordinal) && parts.Length > 1 ? ExternalProcess.OnPath(parts[1]) : parts[0];
    }

    private static bool HasModule(string python, string module)
    {
        try
        {
            return ExternalProcess.Run(python, ["-c", "import " + module], Path.GetTempPath(), TimeSpan.FromSeconds(30)).Exit == 0;
        }
        catch (Exception e) when (e is System.ComponentModel.Win32Exception or TimeoutException or InvalidOperationException)
        {
            return false;
        }
    }
}
