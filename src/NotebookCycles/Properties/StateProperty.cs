namespace NotebookCycles.Properties;

/// <summary>A property that can be given as one of the two independent inputs of a state.</summary>
public enum StateProperty
{
    /// <summary>Temperature, K.</summary>
    Temperature,

    /// <summary>Pressure, Pa.</summary>
    Pressure,

    /// <summary>Specific volume, m³/kg.</summary>
    SpecificVolume,

    /// <summary>Specific internal energy, J/kg.</summary>
    InternalEnergy,

    /// <summary>Specific enthalpy, J/kg.</summary>
    Enthalpy,

    /// <summary>Specific entropy, J/(kg·K).</summary>
    Entropy,

    /// <summary>Vapour quality (mass fraction of vapour), dimensionless, 0 to 1.</summary>
    Quality,
}

/// <summary>Symbols and SI units of <see cref="StateProperty"/> values, as used in messages and records.</summary>
public static class StatePropertyText
{
    /// <summary>The conventional symbol: T, p, v, u, h, s, x.</summary>
    public static string Symbol(this StateProperty property) => property switch
    {
        StateProperty.Temperature => "T",
        StateProperty.Pressure => "p",
        StateProperty.SpecificVolume => "v",
        StateProperty.InternalEnergy => "u",
        StateProperty.Enthalpy => "h",
        StateProperty.Entropy => "s",
        StateProperty.Quality => "x",
        _ => property.ToString(),
    };

    /// <summary>The SI unit the core computes in.</summary>
    public static string SiUnit(this StateProperty property) => property switch
    {
        StateProperty.Temperature => "K",
        StateProperty.Pressure => "Pa",
        StateProperty.SpecificVolume => "m³/kg",
        StateProperty.InternalEnergy => "J/kg",
        StateProperty.Enthalpy => "J/kg",
        StateProperty.Entropy => "J/(kg·K)",
        StateProperty.Quality => "",
        _ => "",
    };
}
