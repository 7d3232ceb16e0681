namespace NotebookCycles.Cycles;

/// <summary>
/// A cycle that cannot be built as stated: a bad process input (a compression ratio ≤ 1, an efficiency outside (0, 1],
/// heat "added" that is negative), a state outside the model's range reached mid-cycle, a label reused or unknown,
/// a cycle that does not close, or a step that would destroy entropy. The message names the step and the state label.
/// </summary>
public sealed class CycleDefinitionException : Exception
{
    /// <summary>Creates the exception.</summary>
    public CycleDefinitionException(string cycle, string step, string? stateLabel, string message, Exception? inner = null)
        : base($"{cycle}, {step}{(stateLabel is null ? "" : $" (state {stateLabel})")}: {message}", inner)
    {
        Cycle = cycle;
        StepDescription = step;
        StateLabel = stateLabel;
    }

    /// <summary>The cycle's title.</summary>
    public string Cycle { get; }

    /// <summary>The step, for example "step 3, heat addition at constant volume 2→3".</summary>
    public string StepDescription { get; }

    /// <summary>The label of the state the step was computing, if any.</summary>
    public string? StateLabel { get; }
}
