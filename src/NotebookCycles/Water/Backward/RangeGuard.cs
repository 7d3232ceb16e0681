using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Runtime.CompilerServices;

namespace NotebookCycles.Water.Backward;

/// <summary>
/// Range checks of the backward and boundary equations, in the releases' own units. These equations are internal
/// building blocks: the water model validates a state first and reports it with its own exceptions; an input that
/// still reaches one of them outside its stated range is a programming error, reported as
/// <see cref="ArgumentOutOfRangeException"/> naming the equation, the input, its value and the valid range.
/// </summary>
internal static class RangeGuard
{
    /// <summary>Throws unless <paramref name="value"/> lies in [min, max] (NaN fails).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Require(string equation, string input, double value, double min, double max, string unit)
    {
        if (!(value >= min && value <= max))
        {
            Throw(equation, input, value, min, max, unit, null);
        }
    }

    /// <summary>Throws unless <paramref name="value"/> lies in [min, max]; <paramref name="boundDescription"/> says where a bound comes from.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Require(string equation, string input, double value, double min, double max, string unit, string boundDescription)
    {
        if (!(value >= min && value <= max))
        {
            Throw(equation, input, value, min, max, unit, boundDescription);
        }
    }

    [DoesNotReturn]
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void Throw(string equation, string input, double value, double min, double max, string unit, string? boundDescription)
    {
        string shown = double.IsNaN(value) ? "NaN" : value.ToString("R", CultureInfo.InvariantCulture);
        string message = string.Create(
            CultureInfo.InvariantCulture,
            $"{equation}: {input} = {shown} {unit} is outside the valid range {min:R} {unit} to {max:R} {unit}");
        if (boundDescription is not null)
        {
            message += " (" + boundDescription + ")";
        }

        throw new ArgumentOutOfRangeException(input, value, message + ".");
    }
}
