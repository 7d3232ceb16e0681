namespace NotebookCycles.Cli;

/// <summary><c>nbcycles state</c> (placeholder until written).</summary>
public static class StateCommand
{
    /// <summary>Known models.</summary>
    public static IReadOnlyList<string> ModelNames { get; } = ["air"];

    /// <summary>Runs the command.</summary>
    public static int Execute(string model, string[] inputs, bool json, TextWriter stdout) => throw new NotImplementedException();
}
