namespace NotebookCycles.Cli;

/// <summary>An error the command line reports as one line on stderr with a non-zero exit code.</summary>
public sealed class CliException : Exception
{
    /// <summary>Creates the error with its one-line message and exit code (default 2).</summary>
    public CliException(string message, int exitCode = ExitCodes.UsageOrInput, Exception? inner = null)
        : base(message, inner)
    {
        ExitCode = exitCode;
    }

    /// <summary>The process exit code to return.</summary>
    public int ExitCode { get; }
}

/// <summary>The exit codes of <c>nbcycles</c>.</summary>
public static class ExitCodes
{
    /// <summary>Everything ran; for review, nothing changed.</summary>
    public const int Success = 0;

    /// <summary>A cell failed (run), or outputs changed or failed (review).</summary>
    public const int CellFailedOrChanged = 1;

    /// <summary>Bad input: a missing or malformed file, an unknown model or property, a unit of the wrong dimension.</summary>
    public const int UsageOrInput = 2;
}
