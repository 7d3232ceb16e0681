namespace NotebookCycles.Cli;

/// <summary>The <c>nbcycles</c> entry point.</summary>
public static class Program
{
    /// <summary>Parses the command line and runs the command; returns the exit code.</summary>
    public static int Main(string[] args) => Run(args, Console.Out, Console.Error);

    /// <summary>Runs the command line with the given writers (used by tests); returns the exit code.</summary>
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        ArgumentNullException.ThrowIfNull(stderr);
        if (ReferenceEquals(stdout, Console.Out))
        {
            Console.OutputEncoding = System.Text.Encoding.UTF8;
        }

        var parse = Commands.Build(stdout, stderr).Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var error in parse.Errors)
            {
                stderr.WriteLine("nbcycles: " + error.Message);
            }

            stderr.WriteLine("nbcycles: see 'nbcycles --help'.");
            return ExitCodes.UsageOrInput;
        }

        return parse.Invoke(new System.CommandLine.InvocationConfiguration { Output = stdout, Error = stderr });
    }
}
