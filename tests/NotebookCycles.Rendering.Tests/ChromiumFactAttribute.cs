using Xunit;

namespace NotebookCycles.Rendering.Tests;

/// <summary>
/// A fact that needs headless Chromium (Debian's chromium package). Without it the test is skipped with the reason,
/// except under CI=true, where the browser is part of the machine (.ci/run installs it) and its absence must fail.
/// </summary>
public sealed class ChromiumFactAttribute : FactAttribute
{
    /// <summary>Sets <see cref="FactAttribute.Skip"/> when no browser is found and CI is not "true".</summary>
    public ChromiumFactAttribute()
    {
        Skip = SkipReason(Browser.Find(), Environment.GetEnvironmentVariable("CI"));
    }

    /// <summary>Why the test is skipped, or null when it runs: it runs when a browser was found, and always under CI=true.</summary>
    internal static string? SkipReason(string? browser, string? ci) =>
        browser is null && !string.Equals(ci, "true", StringComparison.OrdinalIgnoreCase)
            ? "Headless Chromium not found (install Debian's chromium package, or set NBC_CHROMIUM to its path); required when CI=true."
            : null;
}

/// <summary>Finding and running the headless browser, offline.</summary>
internal static class Browser
{
    public static string? Find()
    {
        var custom = Environment.GetEnvironmentVariable("NBC_CHROMIUM");
        if (!string.IsNullOrEmpty(custom) && File.Exists(custom))
        {
            return custom;
        }

        foreach (var dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator))
        {
            foreach (var name in new[] { "chromium", "chromium-browser" })
            {
                string path = Path.Combine(dir, name);
                if (dir.Length > 0 && File.Exists(path))
                {
                    return path;
                }
            }
        }

        return null;
    }

    /// <summary>Runs the browser headless on <paramref name="url"/> with a fresh profile; returns standard output.</summary>
    public static string Run(string url, params string[] extra)
    {
        string exe = Find() ?? throw new InvalidOperationException("Headless Chromium was not found (CI=true requires it; .ci/run installs Debian's chromium package).");
        string profile = Path.Combine(Path.GetTempPath(), "nbc-chromium-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(profile);
        try
        {
            var info = new System.Diagnostics.ProcessStartInfo(exe)
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            foreach (var arg in new[] { "--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic", "--user-data-dir=" + profile })
            {
                info.ArgumentList.Add(arg);
            }

            foreach (var arg in extra)
            {
                info.ArgumentList.Add(arg);
            }

            info.ArgumentList.Add(url);
            using var process = System.Diagnostics.Process.Start(info)!;
            var stdout = process.StandardOutput.ReadToEndAsync();
            var stderr = process.StandardError.ReadToEndAsync();
            if (!process.WaitForExit(120_000))
            {
                process.Kill(entireProcessTree: true);
                throw new TimeoutException("Headless Chromium did not finish within 120 s.");
            }

            process.WaitForExit();
            if (process.ExitCode != 0)
            {
                throw new InvalidOperationException($"Headless Chromium exited with {process.ExitCode}: {stderr.Result}");
            }

            return stdout.Result;
        }
        finally
        {
            try
            {
                Directory.Delete(profile, recursive: true);
            }
            catch (IOException)
            {
                // A profile file still held by an exiting helper process; the temporary folder is cleaned later.
            }
        }
    }
}
