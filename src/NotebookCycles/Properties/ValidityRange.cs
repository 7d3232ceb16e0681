namespace NotebookCycles.Properties;

/// <summary>The closed interval [Minimum, Maximum] in which one property of a model is valid, in SI units.</summary>
/// <param name="Property">The property the range bounds.</param>
/// <param name="Minimum">Lowest valid value (inclusive), SI.</param>
/// <param name="Maximum">Highest valid value (inclusive), SI.</param>
public readonly record struct ValidityRange(StateProperty Property, double Minimum, double Maximum)
{
    /// <summary>True when <paramref name="value"/> lies within the range (NaN never does).</summary>
    public bool Contains(double value) => value >= Minimum && value <= Maximum;

    /// <summary>The range as an engineer reads it, for example "200 K to 6000 K".</summary>
    public override string ToString() => (Minimum, Maximum) switch
    {
        (double.MinValue, double.MaxValue) => "any finite number",
        (double.Epsilon, double.MaxValue) => "any positive finite number",
        _ => Units.SiText.Format(Property, Minimum) + " to " + Units.SiText.Format(Property, Maximum),
    };
}
