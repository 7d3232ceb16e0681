using System.CommandLine;

namespace NotebookCycles.Cli;

/// <summary>The command tree: run, review, state.</summary>
public static class Commands
{
    /// <summary>Builds the root command.</summary>
    public static RootCommand Build(TextWriter? stdout = null, TextWriter? stderr = null)
    {
        var output = stdout ?? Console.Out;
        var error = stderr ?? Console.Error;
        var root = new RootCommand("Runs and reviews NotebookCycles design memos headlessly, and looks up single states.");

        var runNotebook = new Argument<string>("notebook") { Description = "The memo notebook to execute (.ipynb or .dib)." };
        var html = new Option<string?>("--html") { Description = "Write a standalone, offline HTML memo to this file." };
        var executed = new Option<string?>("--output", "-o") { Description = "Write the executed notebook (.ipynb, outputs stored as a front end stores them) to this file." };
        var json = new Option<string?>("--json") { Description = "Write every cycle, state and sweep the notebook displayed as JSON (SI units) to this file." };
        var run = new Command("run", "Execute every code cell of a notebook in an in-process C# kernel with the NotebookCycles extension loaded.") { runNotebook, html, executed, json };
        run.SetAction((parse, cancel) => Guard(error, () => RunCommand.ExecuteAsync(parse.GetValue(runNotebook)!, parse.GetValue(html), parse.GetValue(executed), parse.GetValue(json), output, error, cancel)));
        root.Add(run);

        var reviewNotebook = new Argument<string>("notebook") { Description = "The executed notebook to check (.ipynb with stored outputs)." };
        var tolerance = new Option<double>("--tolerance") { Description = "Relative tolerance for numbers (default 1e-6).", DefaultValueFactory = _ => 1e-6 };
        var review = new Command("review", "Re-execute a saved notebook and compare every output with the stored one; non-zero exit when anything changed.") { reviewNotebook, tolerance };
        review.SetAction((parse, cancel) => Guard(error, () => ReviewCommand.ExecuteAsync(parse.GetValue(reviewNotebook)!, parse.GetValue(tolerance), output, error, cancel)));
        root.Add(review);

        var model = new Argument<string>("model") { Description = "The property model: " + string.Join(", ", StateCommand.ModelNames) + "." };
        var inputs = new Argument<string[]>("inputs") { Description = "Two inputs as property=value with a unit, e.g. T=1200K p=20bar (properties T, p, v, u, h, s, x).", Arity = ArgumentArity.OneOrMore };
        var stateJson = new Option<bool>("--json") { Description = "Print the state as JSON (T_K, p_kPa, v_m3_per_kg, u_kJ_per_kg, h_kJ_per_kg, s_kJ_per_kgK, x, phase)." };
        var state = new Command("state", "Look up one state of a property model from two properties.") { model, inputs, stateJson };
        state.SetAction(parse => GuardSync(error, () => StateCommand.Execute(parse.GetValue(model)!, parse.GetValue(inputs) ?? [], parse.GetValue(stateJson), output)));
        root.Add(state);
        return root;
    }

    private static async Task<int> Guard(TextWriter error, Func<Task<int>> action)
    {
        try
        {
            return await action().ConfigureAwait(false);
        }
        catch (CliException e)
        {
            await error.WriteLineAsync("nbcycles: " + e.Message).ConfigureAwait(false);
            return e.ExitCode;
        }
    }

    private static int GuardSync(TextWriter error, Func<int> action)
    {
        try
        {
            return action();
        }
        catch (CliException e)
        {
            error.WriteLine("nbcycles: " + e.Message);
            return e.ExitCode;
        }
    }
}
