using System.Numerics;
using UnitsNet;
using UnitsNet.Units;

namespace NotebookCycles.Units.Literals;

/// <summary>
/// Opt-in literal helpers for the quantities a cycle memo uses: <c>310.Kelvins()</c>, <c>0.98.Bars()</c>,
/// <c>1.45.MegajoulesPerKilogram()</c>. Kept in their own namespace so nobody gets them by accident.
/// </summary>
public static class QuantityLiterals
{
    private static double D<T>(T value)
        where T : INumber<T> => double.CreateChecked(value);

    /// <summary>Temperature in K.</summary>
    public static Temperature Kelvins<T>(this T value) where T : INumber<T> => Temperature.FromKelvins(D(value));

    /// <summary>Temperature in °C.</summary>
    public static Temperature DegreesCelsius<T>(this T value) where T : INumber<T> => Temperature.FromDegreesCelsius(D(value));

    /// <summary>Temperature in °F.</summary>
    public static Temperature DegreesFahrenheit<T>(this T value) where T : INumber<T> => Temperature.FromDegreesFahrenheit(D(value));

    /// <summary>Temperature in °R.</summary>
    public static Temperature DegreesRankine<T>(this T value) where T : INumber<T> => Temperature.FromDegreesRankine(D(value));

    /// <summary>Temperature difference in K.</summary>
    public static TemperatureDelta KelvinsDifference<T>(this T value) where T : INumber<T> => TemperatureDelta.FromKelvins(D(value));

    /// <summary>Pressure in Pa.</summary>
    public static Pressure Pascals<T>(this T value) where T : INumber<T> => Pressure.FromPascals(D(value));

    /// <summary>Pressure in kPa.</summary>
    public static Pressure Kilopascals<T>(this T value) where T : INumber<T> => Pressure.FromKilopascals(D(value));

    /// <summary>Pressure in MPa.</summary>
    public static Pressure Megapascals<T>(this T value) where T : INumber<T> => Pressure.FromMegapascals(D(value));

    /// <summary>Pressure in bar.</summary>
    public static Pressure Bars<T>(this T value) where T : INumber<T> => Pressure.FromBars(D(value));

    /// <summary>Pressure in psi (absolute).</summary>
    public static Pressure PoundsPerSquareInch<T>(this T value) where T : INumber<T> => Pressure.From(D(value), PressureUnit.PoundForcePerSquareInch);

    /// <summary>Specific volume in m³/kg.</summary>
    public static SpecificVolume CubicMetersPerKilogram<T>(this T value) where T : INumber<T> => SpecificVolume.FromCubicMetersPerKilogram(D(value));

    /// <summary>Specific energy in J/kg.</summary>
    public static SpecificEnergy JoulesPerKilogram<T>(this T value) where T : INumber<T> => SpecificEnergy.FromJoulesPerKilogram(D(value));

    /// <summary>Specific energy in kJ/kg.</summary>
    public static SpecificEnergy KilojoulesPerKilogram<T>(this T value) where T : INumber<T> => SpecificEnergy.FromKilojoulesPerKilogram(D(value));

    /// <summary>Specific energy in MJ/kg.</summary>
    public static SpecificEnergy MegajoulesPerKilogram<T>(this T value) where T : INumber<T> => SpecificEnergy.FromMegajoulesPerKilogram(D(value));

    /// <summary>Specific energy in Btu/lb.</summary>
    public static SpecificEnergy BtuPerPound<T>(this T value) where T : INumber<T> => SpecificEnergy.From(D(value), SpecificEnergyUnit.BtuPerPound);

    /// <summary>Specific entropy in kJ/(kg·K).</summary>
    public static SpecificEntropy KilojoulesPerKilogramKelvin<T>(this T value) where T : INumber<T> => SpecificEntropy.FromKilojoulesPerKilogramKelvin(D(value));
}
