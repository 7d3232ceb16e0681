using System.Globalization;
using NotebookCycles.Properties;

namespace NotebookCycles.Gases;

/// <summary>
/// The cold-air-standard model: an ideal gas with constant cp and k, set by the user, so a cycle can be compared
/// with the variable-cp model on identical inputs.
/// </summary>
/// <remarks>
/// Reference state: h = cp·T and u = cv·T (zero at 0 K, as in the textbook closed forms);
/// s = cp·ln(T/T0) − R·ln(p/p0) with T0 = 298.15 K, p0 = 100 kPa. Valid by construction at any temperature,
/// but limited to the same 200 K to 6000 K and 1 Pa to 100 MPa as the variable-cp gases so comparisons
/// cover the same ground; both limits can be set.
/// </remarks>
public sealed class ColdAirStandard : IPropertyModel
{
    private const double T0 = 298.15;
    private const double P0 = 100_000.0;
    private readonly double _cp;
    private readonly double _cv;
    private readonly double _r;
    private readonly double _k;
    private readonly ValidityRange _t;
    private readonly ValidityRange _p;

    /// <summary>
    /// Creates the model from cp (J/(kg·K)) and k = cp/cv. Defaults: cp = 1005 J/(kg·K), k = 1.4 (room-temperature
    /// air; common practice, no source).
    /// </summary>
    public ColdAirStandard(double cp = 1005.0, double k = 1.4, double minimumTemperature = 200.0, double maximumTemperature = 6000.0, double minimumPressure = 1.0, double maximumPressure = 1.0e8)
    {
        if (!(cp > 0 && double.IsFinite(cp)))
        {
            throw new ArgumentOutOfRangeException(nameof(cp), cp, "cp must be a positive finite number in J/(kg·K).");
        }

        if (!(k > 1 && k <= 5.0 / 3.0 + 1e-12))
        {
            throw new ArgumentOutOfRangeException(nameof(k), k, "k = cp/cv must lie in (1, 5/3] for an ideal gas.");
        }

        if (!(minimumTemperature > 0 && maximumTemperature > minimumTemperature && double.IsFinite(maximumTemperature)))
        {
            throw new ArgumentOutOfRangeException(nameof(minimumTemperature), "The temperature range must be positive, finite and non-empty.");
        }

        if (!(minimumPressure > 0 && maximumPressure > minimumPressure && double.IsFinite(maximumPressure)))
        {
            throw new ArgumentOutOfRangeException(nameof(minimumPressure), "The pressure range must be positive, finite and non-empty.");
        }

        _cp = cp;
        _k = k;
        _cv = cp / k;
        _r = _cp - _cv;
        _t = new ValidityRange(StateProperty.Temperature, minimumTemperature, maximumTemperature);
        _p = new ValidityRange(StateProperty.Pressure, minimumPressure, maximumPressure);
        Name = string.Create(CultureInfo.InvariantCulture, $"Cold-air-standard (cp = {cp / 1000.0:0.####} kJ/(kg·K), k = {k:0.####})");
    }

    /// <summary>Air with cp = 1.005 kJ/(kg·K) and k = 1.4.</summary>
    public static ColdAirStandard Air { get; } = new();

    /// <inheritdoc />
    public string Name { get; }

    /// <inheritdoc />
    public string Citation => "Ideal gas with constant specific heats (cold-air-standard assumption); cp and k set by the user.";

    /// <inheritdoc />
    public ValidityRange TemperatureRange => _t;

    /// <inheritdoc />
    public ValidityRange PressureRange => _p;

    /// <inheritdoc />
    public bool HasSaturation => false;

    /// <summary>cp, J/(kg·K).</summary>
    public double Cp => _cp;

    /// <summary>cv, J/(kg·K).</summary>
    public double Cv => _cv;

    /// <summary>Gas constant R = cp − cv, J/(kg·K).</summary>
    public double R => _r;

    /// <summary>k = cp/cv.</summary>
    public double K => _k;

    /// <inheritdoc />
    public StatePoint FromTP(double temperature, double pressure)
    {
        Input(StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        return Build(temperature, pressure, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
    }

    /// <inheritdoc />
    public StatePoint FromTV(double temperature, double specificVolume)
    {
        Input(StateProperty.Temperature, temperature, StateProperty.SpecificVolume, specificVolume);
        return Build(temperature, _r * temperature / specificVolume, StateProperty.Temperature, temperature, StateProperty.SpecificVolume, specificVolume);
    }

    /// <inheritdoc />
    public StatePoint FromPV(double pressure, double specificVolume)
    {
        Input(StateProperty.Pressure, pressure, StateProperty.SpecificVolume, specificVolume);
        return Build(pressure * specificVolume / _r, pressure, StateProperty.Pressure, pressure, StateProperty.SpecificVolume, specificVolume);
    }

    /// <inheritdoc />
    public StatePoint FromPH(double pressure, double enthalpy)
    {
        Input(StateProperty.Pressure, pressure, StateProperty.Enthalpy, enthalpy);
        return Build(enthalpy / _cp, pressure, StateProperty.Pressure, pressure, StateProperty.Enthalpy, enthalpy);
    }

    /// <inheritdoc />
    public StatePoint FromPS(double pressure, double entropy)
    {
        Input(StateProperty.Pressure, pressure, StateProperty.Entropy, entropy);
        double t = T0 * Math.Exp((entropy + _r * Math.Log(pressure / P0)) / _cp);
        return Build(t, pressure, StateProperty.Pressure, pressure, StateProperty.Entropy, entropy);
    }

    /// <inheritdoc />
    public StatePoint FromVU(double specificVolume, double internalEnergy)
    {
        Input(StateProperty.SpecificVolume, specificVolume, StateProperty.InternalEnergy, internalEnergy);
        double t = internalEnergy / _cv;
        return Build(t, _r * t / specificVolume, StateProperty.SpecificVolume, specificVolume, StateProperty.InternalEnergy, internalEnergy);
    }

    /// <inheritdoc />
    public StatePoint FromVS(double specificVolume, double entropy)
    {
        Input(StateProperty.SpecificVolume, specificVolume, StateProperty.Entropy, entropy);
        double lnT = (entropy + _cp * Math.Log(T0) + _r * Math.Log(_r) - _r * Math.Log(specificVolume) - _r * Math.Log(P0)) / _cv;
        double t = Math.Exp(lnT);
        return Build(t, _r * t / specificVolume, StateProperty.SpecificVolume, specificVolume, StateProperty.Entropy, entropy);
    }

    /// <inheritdoc />
    public StatePoint FromTS(double temperature, double entropy)
    {
        Input(StateProperty.Temperature, temperature, StateProperty.Entropy, entropy);
        double p = P0 * Math.Exp((_cp * Math.Log(temperature / T0) - entropy) / _r);
        return Build(temperature, p, StateProperty.Temperature, temperature, StateProperty.Entropy, entropy);
    }

    /// <inheritdoc />
    public override string ToString() => Name;

    private void Input(StateProperty a, double va, StateProperty b, double vb)
    {
        Validate(a, va, a, va, b, vb);
        Validate(b, vb, a, va, b, vb);
    }

    private void Validate(StateProperty property, double value, StateProperty a, double va, StateProperty b, double vb)
    {
        if (property is StateProperty.Temperature or StateProperty.Pressure or StateProperty.SpecificVolume)
        {
            Check.Positive(Name, property, value, a, va, b, vb);
        }
        else
        {
            Check.Finite(Name, property, value, a, va, b, vb);
        }
    }

    private StatePoint Build(double t, double p, StateProperty a, double va, StateProperty b, double vb)
    {
        Check.InRange(Name, _t, t, a, va, b, vb);
        Check.InRange(Name, _p, p, a, va, b, vb);
        double s = _cp * Math.Log(t / T0) - _r * Math.Log(p / P0);
        return new StatePoint(t, p, _r * t / p, _cv * t, _cp * t, s, _cp, _cv, Math.Sqrt(_k * _r * t), double.NaN, Phase.IdealGas);
    }
}
