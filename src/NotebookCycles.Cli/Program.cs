using System.CommandLine;

namespace NotebookCycles.Cli;

/// <summary>The <c>nbcycles</c> entry point.</summary>
public static class Program
{
    /// <summary>Parses the command line and runs the command; returns the exit code.</summary>
    public static int Main(string[] args)
    {
        Console.OutputEncoding = System.Text.Encoding.UTF8;
        return Commands.Build().Parse(args).Invoke();
    }
}
