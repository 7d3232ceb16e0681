using UnitsNet;

namespace NotebookCycles.Properties;

/// <summary>
/// An immutable, labelled thermodynamic state, created through a property model. Quantities with units at the
/// surface; <see cref="Point"/> holds the SI doubles.
/// </summary>
public sealed class State
{
    /// <summary>Creates a state from a point the <paramref name="model"/> computed.</summary>
    public State(string label, IPropertyModel model, StatePoint point, IReadOnlyList<string>? warnings = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(label);
        ArgumentNullException.ThrowIfNull(model);
        Label = label;
        Model = model;
        Point = point;
        Warnings = warnings ?? [];
    }

    /// <summary>The engineer's label: "1", "2s", "3".</summary>
    public string Label { get; }

    /// <summary>The property model that computed the state.</summary>
    public IPropertyModel Model { get; }

    /// <summary>The state as SI doubles.</summary>
    public StatePoint Point { get; }

    /// <summary>Warnings attached to the state (for example a metastable region), shown in every record.</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>Temperature.</summary>
    public Temperature Temperature => Temperature.FromKelvins(Point.T);

    /// <summary>Pressure.</summary>
    public Pressure Pressure => Pressure.FromPascals(Point.P);

    /// <summary>Specific volume.</summary>
    public SpecificVolume SpecificVolume => SpecificVolume.FromCubicMetersPerKilogram(Point.V);

    /// <summary>Density.</summary>
    public Density Density => Density.FromKilogramsPerCubicMeter(Point.Rho);

    /// <summary>Specific internal energy (relative to the model's reference state).</summary>
    public SpecificEnergy InternalEnergy => SpecificEnergy.FromJoulesPerKilogram(Point.U);

    /// <summary>Specific enthalpy (relative to the model's reference state).</summary>
    public SpecificEnergy Enthalpy => SpecificEnergy.FromJoulesPerKilogram(Point.H);

    /// <summary>Specific entropy (relative to the model's reference state).</summary>
    public SpecificEntropy Entropy => SpecificEntropy.FromJoulesPerKilogramKelvin(Point.S);

    /// <summary>Specific heat at constant pressure.</summary>
    public SpecificEntropy Cp => SpecificEntropy.FromJoulesPerKilogramKelvin(Point.Cp);

    /// <summary>Specific heat at constant volume.</summary>
    public SpecificEntropy Cv => SpecificEntropy.FromJoulesPerKilogramKelvin(Point.Cv);

    /// <summary>Speed of sound.</summary>
    public Speed SpeedOfSound => Speed.FromMetersPerSecond(Point.W);

    /// <summary>Vapour quality for a two-phase state; null for a single-phase state.</summary>
    public double? Quality => double.IsNaN(Point.X) ? null : Point.X;

    /// <summary>The phase or region.</summary>
    public Phase Phase => Point.Phase;

    /// <summary>The same state under another label.</summary>
    public State WithLabel(string label) => new(label, Model, Point, Warnings);

    /// <inheritdoc />
    public override string ToString() =>
        $"State {Label}: T = {Units.SiText.Format(StateProperty.Temperature, Point.T)}, p = {Units.SiText.Pressure(Point.P)}, " +
        $"v = {Units.SiText.Format(StateProperty.SpecificVolume, Point.V)}, h = {Units.SiText.Format(StateProperty.Enthalpy, Point.H)}, " +
        $"s = {Units.SiText.Format(StateProperty.Entropy, Point.S)}" + (Quality is { } x ? $", x = {Units.SiText.Number(x)}" : "") + $" ({Model.Name})";
}
