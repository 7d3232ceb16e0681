namespace NotebookCycles.Properties;

/// <summary>The phase (or region of the property surface) a state lies in.</summary>
public enum Phase
{
    /// <summary>An ideal gas: no condensed phase is modelled.</summary>
    IdealGas,

    /// <summary>Compressed (subcooled) liquid.</summary>
    Liquid,

    /// <summary>Superheated vapour.</summary>
    Vapour,

    /// <summary>Saturated liquid-vapour mixture; the quality x is in [0, 1].</summary>
    TwoPhase,

    /// <summary>Above the critical pressure and temperature.</summary>
    Supercritical,
}

/// <summary>
/// What to do when a state's inputs land exactly on the saturation line without a quality:
/// the pair (T, p) on the line does not say how much of the fluid is liquid.
/// </summary>
public enum SaturationPolicy
{
    /// <summary>Throw <see cref="AmbiguousStateException"/> (the default).</summary>
    Throw,

    /// <summary>Treat the state as saturated liquid (x = 0).</summary>
    SaturatedLiquid,

    /// <summary>Treat the state as saturated vapour (x = 1).</summary>
    SaturatedVapour,
}
