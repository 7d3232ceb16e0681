using System.Diagnostics;

namespace NotebookCycles.Cli.Tests;

/// <summary>Runs an external program with a time limit and captures its output.</summary>
internal static class ExternalProcess
{
    public static (int Exit, string Out, string Err) Run(string program, IEnumerable<string> args, string workingDirectory, TimeSpan limit, IDictionary<string, string>? environment = null)
    {
        var info = new ProcessStartInfo(program) { WorkingDirectory = workingDirectory, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        if (environment is not null)
        {
            foreach (var (k, v) in environment)
            {
                info.Environment[k] = v;
            }
        }

        using var process = Process.Start(info) ?? throw new InvalidOperationException("could not start " + program);
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(limit))
        {
            process.Kill(entireProcessTree: true);
            process.WaitForExit();
            throw new TimeoutException($"{program} {string.Join(' ', info.ArgumentList)} did not finish within {limit.TotalSeconds} s.\n{stdout.Result}\n{stderr.Result}");
        }

        process.WaitForExit();
        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    /// <summary>The full path of a program on PATH, or null.</summary>
    public static string? OnPath(string program)
    {
        foreach (var dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
        {
            string candidate = Path.Combine(dir, program);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        return null;
    }
}
