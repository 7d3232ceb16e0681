using System.Diagnostics.CodeAnalysis;
using System.Runtime.CompilerServices;

namespace NotebookCycles.Properties;

/// <summary>
/// The one place inputs are validated. Every range failure is worded the same way and carries the facts.
/// Fast paths are a comparison or two; the throwing paths are kept out of line.
/// </summary>
internal static class Check
{
    /// <summary>Throws unless <paramref name="value"/> is finite and inside <paramref name="range"/> (NaN fails).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void InRange(string model, in ValidityRange range, double value, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue)
    {
        if (!(value >= range.Minimum && value <= range.Maximum))
        {
            ThrowOutOfRange(model, range, value, firstInput, firstValue, secondInput, secondValue);
        }
    }

    /// <summary>
    /// As the two-input <see cref="InRange(string, in ValidityRange, double, StateProperty, double, StateProperty, double)"/>,
    /// for requests with one input (a property function of temperature, or a temperature from one property).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void InRange(string model, in ValidityRange range, double value, StateProperty input, double inputValue)
    {
        if (!(value >= range.Minimum && value <= range.Maximum))
        {
            ThrowOutOfRange(model, range, value, input, inputValue);
        }
    }

    /// <summary>Throws unless <paramref name="value"/> is finite and strictly positive (absolute temperature, pressure, volume).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Positive(string model, StateProperty property, double value, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue)
    {
        if (!(value > 0 && value < double.PositiveInfinity))
        {
            ThrowNotPositive(model, property, value, firstInput, firstValue, secondInput, secondValue);
        }
    }

    /// <summary>Throws unless <paramref name="value"/> is a finite number.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Finite(string model, StateProperty property, double value, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue)
    {
        if (!double.IsFinite(value))
        {
            ThrowOutOfRange(model, new ValidityRange(property, double.MinValue, double.MaxValue), value, firstInput, firstValue, secondInput, secondValue);
        }
    }

    /// <summary>Throws unless the quality is in [0, 1].</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Quality(string model, double quality, StateProperty firstInput, double firstValue)
    {
        if (!(quality >= 0 && quality <= 1))
        {
            ThrowOutOfRange(model, new ValidityRange(StateProperty.Quality, 0, 1), quality, firstInput, firstValue, StateProperty.Quality, quality);
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    [DoesNotReturn]
    public static void ThrowOutOfRange(string model, ValidityRange range, double value, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue, string? detail = null) =>
        throw new StateOutOfRangeException(model, [new StateInput(firstInput, firstValue), new StateInput(secondInput, secondValue)], range.Property, value, range, detail);

    [MethodImpl(MethodImplOptions.NoInlining)]
    [DoesNotReturn]
    public static void ThrowOutOfRange(string model, ValidityRange range, double value, StateProperty input, double inputValue, string? detail = null) =>
        throw new StateOutOfRangeException(model, [new StateInput(input, inputValue)], range.Property, value, range, detail);

    [MethodImpl(MethodImplOptions.NoInlining)]
    [DoesNotReturn]
    private static void ThrowNotPositive(string model, StateProperty property, double value, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue) =>
        throw new StateOutOfRangeException(
            model,
            [new StateInput(firstInput, firstValue), new StateInput(secondInput, secondValue)],
            property,
            value,
            new ValidityRange(property, double.Epsilon, double.MaxValue),
            $"{property.Symbol()} must be a positive finite number (absolute scale)");
}
