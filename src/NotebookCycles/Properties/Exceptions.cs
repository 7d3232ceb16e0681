using NotebookCycles.Units;

namespace NotebookCycles.Properties;

/// <summary>One named input of a state request, kept on exceptions so callers can read the facts, not only the message.</summary>
/// <param name="Property">Which property.</param>
/// <param name="Value">Its value in SI units.</param>
public readonly record struct StateInput(StateProperty Property, double Value)
{
    /// <summary>For example "T = 150 K".</summary>
    public override string ToString() => Property.Symbol() + " = " + SiText.Format(Property, Value);

    internal static string Describe(IReadOnlyList<StateInput> inputs) => string.Join(", ", inputs);
}

/// <summary>Base of every error a property model raises for a state it cannot or will not compute.</summary>
public class PropertyModelException : ArgumentException
{
    /// <summary>Creates the exception.</summary>
    public PropertyModelException(string model, IReadOnlyList<StateInput> inputs, string message)
        : base(message)
    {
        Model = model;
        Inputs = inputs;
    }

    /// <summary>The property model's name.</summary>
    public string Model { get; }

    /// <summary>The inputs of the rejected request, SI units.</summary>
    public IReadOnlyList<StateInput> Inputs { get; }
}

/// <summary>
/// A state request outside the model's validity range, or with an input that is not a finite number or not physical
/// (zero or negative absolute temperature, pressure or volume). Nothing is clamped or extrapolated.
/// </summary>
public sealed class StateOutOfRangeException : PropertyModelException
{
    /// <summary>Creates the exception; the message is composed from the facts.</summary>
    public StateOutOfRangeException(string model, IReadOnlyList<StateInput> inputs, StateProperty property, double value, ValidityRange range, string? detail = null)
        : base(model, inputs, Compose(model, inputs, property, value, range, detail))
    {
        Property = property;
        Value = value;
        Range = range;
    }

    /// <summary>The property that is out of range (an input, or a property the inputs imply).</summary>
    public StateProperty Property { get; }

    /// <summary>The offending value, SI.</summary>
    public double Value { get; }

    /// <summary>The valid range of <see cref="Property"/>.</summary>
    public ValidityRange Range { get; }

    private static string Compose(string model, IReadOnlyList<StateInput> inputs, StateProperty property, double value, ValidityRange range, string? detail)
    {
        string what = double.IsNaN(value) ? "is not a number"
            : double.IsInfinity(value) ? "is infinite"
            : "= " + SiText.Format(property, value) + " is outside the valid range";
        string message = $"{model}: {property.Symbol()} {what}; valid {property.Symbol()} is {range}";
        if (inputs.Count > 0)
        {
            message += $" (inputs: {StateInput.Describe(inputs)})";
        }

        return detail is null ? message + "." : message + ". " + detail;
    }
}

/// <summary>A state request that does not determine one state: for example (T, p) exactly on the saturation line without a quality.</summary>
public sealed class AmbiguousStateException : PropertyModelException
{
    /// <summary>Creates the exception.</summary>
    public AmbiguousStateException(string model, IReadOnlyList<StateInput> inputs, string reason)
        : base(model, inputs, $"{model}: the inputs {StateInput.Describe(inputs)} do not fix one state: {reason}")
    {
    }
}

/// <summary>A pair of inputs the model cannot use (for example a quality given to an ideal gas).</summary>
public sealed class UnsupportedInputPairException : PropertyModelException
{
    /// <summary>Creates the exception.</summary>
    public UnsupportedInputPairException(string model, StateProperty first, StateProperty second, string? reason = null)
        : base(model, [], $"{model} cannot fix a state from ({first.Symbol()}, {second.Symbol()}){(reason is null ? "." : ": " + reason)}")
    {
        First = first;
        Second = second;
    }

    /// <summary>The first input property.</summary>
    public StateProperty First { get; }

    /// <summary>The second input property.</summary>
    public StateProperty Second { get; }
}
