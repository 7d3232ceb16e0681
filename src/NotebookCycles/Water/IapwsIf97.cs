using NotebookCycles.Properties;

namespace NotebookCycles.Water;

/// <summary>
/// Water and steam by the IAPWS Industrial Formulation 1997, main release IAPWS R7-97(2012): regions 1, 2, 3, 5 and
/// the saturation line (region 4), the boundary equations B23 and B2bc, and the release's backward equations
/// T(p,h) and T(p,s) for regions 1 and 2, each followed by Newton polishing on the forward equation.
/// </summary>
/// <remarks>
/// <para>Validity: 273.15 K ≤ T ≤ 1073.15 K at 0 &lt; p ≤ 100 MPa, and 1073.15 K &lt; T ≤ 2273.15 K at 0 &lt; p ≤ 50 MPa.
/// Every input outside, NaN or infinite raises <see cref="StateOutOfRangeException"/> naming the inputs, the property
/// and its range; nothing is clamped or extrapolated.</para>
/// <para>Units are SI at the surface (K, Pa, m³/kg, J/kg, J/(kg·K), m/s); the equations run in the release's units.
/// Reference state of the formulation: u = s = 0 for saturated liquid at the triple point.</para>
/// <para>Two-phase states (region 4) mix the saturated phases by quality: v, u, h, s are lever-rule averages, while
/// cp, cv and w are NaN (not defined for a mixture in equilibrium).</para>
/// <para>(T, p) exactly on the saturation line (|p − psat(T)| ≤ <see cref="SaturationTolerance"/>·psat(T), psat from
/// eq. 30) does not fix a state; <see cref="SaturationPolicy"/> decides (default: throw <see cref="AmbiguousStateException"/>).</para>
/// <para>The metastable-vapour equation (eq. 18) is never chosen silently: call <see cref="MetastableVapourFromTP"/>.</para>
/// The class is immutable and thread-safe; state methods do not allocate.
/// </remarks>
public sealed partial class IapwsIf97 : ISaturationModel
{
    /// <summary>Relative tolerance on eq. 30 within which a (T, p) input counts as lying on the saturation line: 1e-9.</summary>
    public const double SaturationTolerance = 1e-9;

    // Release units (MPa, K, kJ/kg).
    internal const double TMin = 273.15;
    internal const double T13 = 623.15;
    internal const double TB23Max = 863.15;
    internal const double T25 = 1073.15;
    internal const double TMax = 2273.15;
    internal const double PMax = 100.0;
    internal const double PMax5 = 50.0;

    /// <summary>psat(273.15 K) by eq. 30, MPa: the lowest pressure of the saturation line in the validity range.</summary>
    internal static readonly double PSatMin = Region4.SaturationPressure(TMin);

    /// <summary>psat(623.15 K) by eq. 30, MPa: above it the saturation line lies in region 3.</summary>
    internal static readonly double PSat13 = Region4.SaturationPressure(T13);

    /// <summary>The lowest pressure the iterative solvers search, MPa (1 mPa).</summary>
    internal const double PSearchMin = 1e-9;

    private static readonly ValidityRange TRange = new(StateProperty.Temperature, TMin, TMax);
    private static readonly ValidityRange PRange = new(StateProperty.Pressure, 0.0, PMax * 1e6);

    /// <summary>Creates the model; <paramref name="saturationPolicy"/> decides what a (T, p) input on the saturation line means.</summary>
    public IapwsIf97(SaturationPolicy saturationPolicy = SaturationPolicy.Throw)
    {
        if (!Enum.IsDefined(saturationPolicy))
        {
            throw new ArgumentOutOfRangeException(nameof(saturationPolicy), saturationPolicy, "Unknown saturation policy.");
        }

        SaturationPolicy = saturationPolicy;
        var c = Region3.Properties(Region3.RhoC, Region3.Tc);
        CriticalPoint = new StatePoint(Region3.Tc, Region3.Pc * 1e6, 1.0 / Region3.RhoC, c.U * 1e3, c.H * 1e3, c.S * 1e3, double.NaN, c.Cv * 1e3, c.W, double.NaN, Phase.Supercritical);
    }

    /// <summary>The model with the default saturation policy (<see cref="SaturationPolicy.Throw"/>).</summary>
    public static IapwsIf97 Default { get; } = new();

    /// <summary>What a (T, p) input on the saturation line means (chosen at construction).</summary>
    public SaturationPolicy SaturationPolicy { get; }

    /// <inheritdoc />
    public string Name => "Water and steam (IAPWS-IF97)";

    /// <inheritdoc />
    public string Citation => "IAPWS R7-97(2012): Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam, The International Association for the Properties of Water and Steam.";

    /// <inheritdoc />
    /// <remarks>273.15 K to 2273.15 K; above 1073.15 K only up to 50 MPa (region 5).</remarks>
    public ValidityRange TemperatureRange => TRange;

    /// <inheritdoc />
    /// <remarks>0 (exclusive) to 100 MPa; above 1073.15 K only up to 50 MPa.</remarks>
    public ValidityRange PressureRange => PRange;

    /// <inheritdoc />
    public bool HasSaturation => true;

    /// <summary>
    /// 5e-5: IF97's saturation-pressure equation (eq. 30) and the Gibbs equations of regions 1 and 2 meet the
    /// phase-equilibrium condition only approximately, so along the saturation line h_fg/T − s_fg is about 1.4e-6 of
    /// s_fg at condenser pressures and up to 2.6e-5 near the critical point (measured over 273.16 K to 647 K with
    /// python3-iapws 1.5.3, which evaluates the same equations). An isothermal condensation therefore shows an
    /// entropy generation of that relative size, positive or negative; the balance checks allow it.
    /// </summary>
    public double ConsistencyTolerance => 5e-5;

    /// <inheritdoc />
    /// <remarks>Tc = 647.096 K, pc = 22.064 MPa, ρc = 322 kg/m³ (R7-97(2012) eqs. 2 to 4); u, h, s from region 3; cp is NaN (diverges).</remarks>
    public StatePoint CriticalPoint { get; }

    /// <inheritdoc />
    public double SaturationTemperatureMinimum => TMin;

    /// <inheritdoc />
    /// <remarks>Eq. 30; valid 273.15 K to 647.096 K.</remarks>
    public double SaturationPressure(double temperature)
    {
        CheckSaturationTemperature(temperature, StateProperty.Temperature, temperature, StateProperty.Temperature, temperature);
        return Region4.SaturationPressure(temperature) * 1e6;
    }

    /// <inheritdoc />
    /// <remarks>Eq. 31; valid 611.213 Pa to 22.064 MPa.</remarks>
    public double SaturationTemperature(double pressure)
    {
        CheckSaturationPressure(pressure, StateProperty.Pressure, pressure, StateProperty.Pressure, pressure);
        return Region4.SaturationTemperature(pressure * 1e-6);
    }

    /// <summary>
    /// The IF97 region of a (T, p) input: 1 (liquid), 2 (vapour), 3 (near-critical), 5 (high-temperature steam), or 4 when
    /// (T, p) lies on the saturation line within <see cref="SaturationTolerance"/>.
    /// </summary>
    /// <param name="temperature">K.</param>
    /// <param name="pressure">Pa.</param>
    public int Region(double temperature, double pressure)
    {
        ValidateTP(temperature, pressure);
        return RegionOfTP(temperature, pressure * 1e-6);
    }

    /// <summary>The IF97 region a computed state lies in: 4 for two-phase states, else as <see cref="Region(double, double)"/>.</summary>
    public int Region(in StatePoint state)
    {
        if (state.Phase == Phase.TwoPhase)
        {
            return 4;
        }

        ValidateTP(state.T, state.P);
        int region = RegionOfTP(state.T, state.P * 1e-6);
        return region == 4 ? (state.Phase == Phase.Liquid ? (state.T <= T13 ? 1 : 3) : (state.T <= T13 ? 2 : 3)) : region;
    }

    /// <inheritdoc />
    public override string ToString() => Name;

    // ---------------------------------------------------------------- validation

    private void ValidateTP(double t, double p)
    {
        Check.Positive(Name, StateProperty.Temperature, t, StateProperty.Temperature, t, StateProperty.Pressure, p);
        Check.Positive(Name, StateProperty.Pressure, p, StateProperty.Temperature, t, StateProperty.Pressure, p);
        Check.InRange(Name, TRange, t, StateProperty.Temperature, t, StateProperty.Pressure, p);
        Check.InRange(Name, PRange, p, StateProperty.Temperature, t, StateProperty.Pressure, p);
        if (t > T25 && p > PMax5 * 1e6)
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.Pressure, 0.0, PMax5 * 1e6), p, StateProperty.Temperature, t, StateProperty.Pressure, p, "Above 1073.15 K (region 5) the formulation is valid only up to 50 MPa.");
        }
    }

    private void ValidatePressure(double p, StateProperty second, double secondValue)
    {
        Check.Positive(Name, StateProperty.Pressure, p, StateProperty.Pressure, p, second, secondValue);
        Check.InRange(Name, PRange, p, StateProperty.Pressure, p, second, secondValue);
    }

    private void ValidateTemperature(double t, StateProperty second, double secondValue)
    {
        Check.Positive(Name, StateProperty.Temperature, t, StateProperty.Temperature, t, second, secondValue);
        Check.InRange(Name, TRange, t, StateProperty.Temperature, t, second, secondValue);
    }

    private void CheckSaturationTemperature(double t, StateProperty a, double va, StateProperty b, double vb)
    {
        Check.Positive(Name, StateProperty.Temperature, t, a, va, b, vb);
        Check.InRange(Name, new ValidityRange(StateProperty.Temperature, TMin, Region3.Tc), t, a, va, b, vb);
    }

    private void CheckSaturationPressure(double p, StateProperty a, double va, StateProperty b, double vb)
    {
        Check.Positive(Name, StateProperty.Pressure, p, a, va, b, vb);
        Check.InRange(Name, new ValidityRange(StateProperty.Pressure, PSatMin * 1e6, Region3.Pc * 1e6), p, a, va, b, vb);
    }

    // ---------------------------------------------------------------- phase and region rules

    /// <summary>Region of (T K, p MPa), inputs already validated; 4 on the saturation line.</summary>
    internal static int RegionOfTP(double t, double p)
    {
        if (t <= T13)
        {
            double ps = Region4.SaturationPressure(t);
            return OnSaturation(p, ps) ? 4 : (p > ps ? 1 : 2);
        }

        if (t <= TB23Max && p > Region3.PressureB23(t))
        {
            return t < Region3.Tc && OnSaturation(p, Region4.SaturationPressure(t)) ? 4 : 3;
        }

        return t <= T25 ? 2 : 5;
    }

    internal static bool OnSaturation(double p, double ps) => Math.Abs(p - ps) <= SaturationTolerance * ps;

    /// <summary>Phase label of a single-phase state of <paramref name="region"/> at (T K, p MPa); <paramref name="liquidBranch"/> for region 3 below Tc.</summary>
    internal static Phase PhaseOf(int region, double t, double p, bool liquidBranch)
    {
        if (region == 1)
        {
            return Phase.Liquid;
        }

        if (t >= Region3.Tc && p > Region3.Pc)
        {
            return Phase.Supercritical;
        }

        return region == 3 && t < Region3.Tc && liquidBranch ? Phase.Liquid : Phase.Vapour;
    }
}
