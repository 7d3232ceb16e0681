namespace NotebookCycles.Cli;

/// <summary><c>nbcycles review</c> (placeholder until written).</summary>
public static class ReviewCommand
{
    /// <summary>Runs the command.</summary>
    public static Task<int> ExecuteAsync(string notebookPath, double tolerance, TextWriter stdout, TextWriter stderr, CancellationToken cancellation) => throw new NotImplementedException();
}
