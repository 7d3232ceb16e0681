using System.Collections.Concurrent;
using NotebookCycles.Numerics;
using NotebookCycles.Properties;

namespace NotebookCycles.Refrigerants;

/// <summary>The two coexisting phases at one saturation temperature and pressure.</summary>
/// <param name="Liquid">The saturated liquid (x = 0).</param>
/// <param name="Vapour">The saturated vapour (x = 1).</param>
public readonly record struct SaturationProperties(StatePoint Liquid, StatePoint Vapour)
{
    /// <summary>Saturation temperature, K.</summary>
    public double T => Liquid.T;

    /// <summary>Saturation pressure, Pa.</summary>
    public double P => Vapour.P;

    /// <summary>Enthalpy of vaporisation h″ − h′, J/kg.</summary>
    public double EnthalpyOfVaporisation => Vapour.H - Liquid.H;
}

/// <summary>
/// A refrigerant described by a Helmholtz-energy equation of state α(δ, τ) = α°(δ, τ) + αʳ(δ, τ): every property from
/// the reduced Helmholtz energy and its analytic derivatives; saturation by true phase equilibrium (equal pressure and
/// Gibbs energy of the phases). Immutable and thread-safe.
/// </summary>
/// <remarks>
/// <para>
/// Fluids (<see cref="Names"/>): R-134a (Tillner-Roth and Baehr 1994), R-32 (Tillner-Roth and Yokozeki 1997),
/// R-1234yf (Richter, McLinden and Lemmon 2011), R-744 CO₂ (Span and Wagner 1996), R-717 ammonia (Gao et al. 2023; the
/// Tillner-Roth, Harms-Watzenberg and Baehr 1993 equation as "R717-1993"), R-290 propane (Lemmon, McLinden and Wagner
/// 2009). Each equation keeps its own gas constant, molar mass and reducing parameters.
/// </para>
/// <para>
/// Units: T in K, p in Pa, v in m³/kg, ρ in kg/m³, h and u in J/kg, s, cp, cv in J/(kg·K), w in m/s. Validity: from
/// the triple point to each equation's upper temperature, pressures above 1 µPa up to each equation's upper
/// pressure; saturation from the triple point to the critical point of the equation (computed from the equation,
/// (∂p/∂ρ)_T = 0 at its minimum). Two-phase states carry NaN for cp, cv and w.
/// </para>
/// <para>
/// NaN policy: NaN, infinite, non-positive or out-of-range inputs throw <see cref="StateOutOfRangeException"/> naming
/// the property and its range; a quality outside [0, 1] likewise. A (T, p) pair on the saturation line (within 1e-9
/// relative of p_sat) without a phase throws <see cref="AmbiguousStateException"/> unless <see cref="OnSaturation"/>
/// says which phase to take.
/// </para>
/// <para>
/// Iterative: density from (T, p) (Newton in ln ρ inside a bracket of the chosen branch); saturation at T (Newton on
/// the two densities), at p (Newton on T with the Clausius-Clapeyron slope); the other pairs by one-dimensional
/// bracketed solves over T or ρ. Starting values come from a table of saturation states computed from the equation
/// itself when the fluid is first used.
/// </para>
/// </remarks>
public sealed class Refrigerant : ISaturationModel
{
    private const double MinimumPressure = 1e-6;
    private static readonly ConcurrentDictionary<string, HelmholtzFluid> Fluids = new(StringComparer.Ordinal);
    private static readonly ConcurrentDictionary<(string Key, ReferenceState Reference), Refrigerant> Instances = new();
    private static readonly string[] NameList = ["R134a", "R32", "R1234yf", "R744", "R717", "R717-1993", "R290"];

    private readonly HelmholtzFluid _f;
    private readonly double _dh;
    private readonly double _ds;
    private readonly ValidityRange _tRange;
    private readonly ValidityRange _pRange;
    private readonly ValidityRange _tSatRange;
    private readonly ValidityRange _pSatRange;

    private Refrigerant(HelmholtzFluid fluid, string key, ReferenceState reference, SaturationPolicy policy)
    {
        _f = fluid;
        Key = key;
        Reference = reference;
        OnSaturation = policy;
        if (!fluid.Data.Offsets.TryGetValue(reference, out var offset))
        {
            throw new ArgumentException($"{fluid.Data.Fluid}: the reference state {reference} is not available ({(reference == ReferenceState.NormalBoilingPoint ? "no saturated liquid at 101.325 kPa" : "not defined")}).", nameof(reference));
        }

        (_dh, _ds) = offset;
        string display = fluid.Data.Fluid.StartsWith('R') ? "R-" + fluid.Data.Fluid[1..] : fluid.Data.Fluid;
        Fluid = display;
        Name = $"{display} ({fluid.Data.ShortSource})";
        _tRange = new ValidityRange(StateProperty.Temperature, fluid.Tt, fluid.Data.MaximumTemperature);
        _pRange = new ValidityRange(StateProperty.Pressure, MinimumPressure, fluid.Data.MaximumPressure);
        _tSatRange = new ValidityRange(StateProperty.Temperature, fluid.Tt, fluid.Tc);
        _pSatRange = new ValidityRange(StateProperty.Pressure, fluid.TriplePressure * (1 - 1e-12), fluid.Pc);
    }

    /// <summary>The names <see cref="Get"/> accepts.</summary>
    public static IReadOnlyList<string> Names { get; } = Array.AsReadOnly(NameList);

    /// <summary>R-134a, Tillner-Roth and Baehr (1994), IIR reference state.</summary>
    public static Refrigerant R134a => Get("R134a");

    /// <summary>R-32, Tillner-Roth and Yokozeki (1997), IIR reference state.</summary>
    public static Refrigerant R32 => Get("R32");

    /// <summary>R-1234yf, Richter, McLinden and Lemmon (2011), IIR reference state.</summary>
    public static Refrigerant R1234yf => Get("R1234yf");

    /// <summary>R-744 (carbon dioxide), Span and Wagner (1996), IIR reference state.</summary>
    public static Refrigerant R744 => Get("R744");

    /// <summary>R-717 (ammonia), Gao et al. (2023), IIR reference state.</summary>
    public static Refrigerant R717 => Get("R717");

    /// <summary>R-717 (ammonia), Tillner-Roth, Harms-Watzenberg and Baehr (1993), IIR reference state.</summary>
    public static Refrigerant R717TillnerRoth => Get("R717-1993");

    /// <summary>R-290 (propane), Lemmon, McLinden and Wagner (2009), IIR reference state.</summary>
    public static Refrigerant R290 => Get("R290");

    /// <summary>The fluid's key in <see cref="Names"/>.</summary>
    public string Key { get; }

    /// <summary>The refrigerant number, for example "R-134a".</summary>
    public string Fluid { get; }

    /// <summary>The chemical name, for example "1,1,1,2-tetrafluoroethane".</summary>
    public string ChemicalName => _f.Data.ChemicalName;

    /// <inheritdoc />
    public string Name { get; }

    /// <inheritdoc />
    public string Citation => _f.Data.Citation;

    /// <summary>The zero of enthalpy and entropy.</summary>
    public ReferenceState Reference { get; }

    /// <summary>What a (T, p) pair on the saturation line yields.</summary>
    public SaturationPolicy OnSaturation { get; }

    /// <summary>Molar mass of the equation, kg/mol.</summary>
    public double MolarMass => _f.Data.MolarMass;

    /// <summary>Specific gas constant of the equation R/M, J/(kg·K).</summary>
    public double GasConstant => _f.R;

    /// <summary>Triple-point temperature (the lower end of the range), K.</summary>
    public double TripleTemperature => _f.Tt;

    /// <summary>Saturation pressure at the triple-point temperature from the equation, Pa.</summary>
    public double TriplePressure => _f.TriplePressure;

    /// <inheritdoc />
    public ValidityRange TemperatureRange => _tRange;

    /// <inheritdoc />
    public ValidityRange PressureRange => _pRange;

    /// <inheritdoc />
    public bool HasSaturation => true;

    /// <inheritdoc />
    public StatePoint CriticalPoint => Point(_f.Evaluate(_f.Tc, _f.RhoC), Phase.Supercritical);

    /// <inheritdoc />
    public double SaturationTemperatureMinimum => _f.Tt;

    internal HelmholtzFluid Core => _f;

    /// <summary>A refrigerant by name (see <see cref="Names"/>; "R-134a", "CO2", "NH3", "ammonia", "propane" also accepted).</summary>
    public static Refrigerant Get(string name, ReferenceState reference = ReferenceState.Iir)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        string key = name.Trim().Replace(" ", "", StringComparison.Ordinal).ToUpperInvariant() switch
        {
            "R134A" or "R-134A" => "R134a",
            "R32" or "R-32" => "R32",
            "R1234YF" or "R-1234YF" => "R1234yf",
            "R744" or "R-744" or "CO2" or "CARBONDIOXIDE" => "R744",
            "R717" or "R-717" or "NH3" or "AMMONIA" => "R717",
            "R717-1993" or "R-717-1993" => "R717-1993",
            "R290" or "R-290" or "PROPANE" => "R290",
            _ => throw new ArgumentException($"Unknown refrigerant '{name}'; known: {string.Join(", ", NameList)}.", nameof(name)),
        };
        // One instance per fluid and reference state, so states and cycles built from separate calls share the model.
        return Instances.GetOrAdd((key, reference), k =>
        {
            string file = k.Key == "R717" ? "R717_Gao2023" : k.Key == "R717-1993" ? "R717" : k.Key;
            var fluid = Fluids.GetOrAdd(file, f => new HelmholtzFluid(RefrigerantData.Load(f)));
            return new Refrigerant(fluid, k.Key, k.Reference, SaturationPolicy.Throw);
        });
    }

    /// <summary>The same fluid in another reference state (the shared instance when the saturation policy is the default).</summary>
    public Refrigerant WithReference(ReferenceState reference) =>
        OnSaturation == SaturationPolicy.Throw ? Get(Key, reference) : new(_f, Key, reference, OnSaturation);

    /// <summary>The same fluid with another rule for (T, p) pairs on the saturation line.</summary>
    public Refrigerant WithSaturationPolicy(SaturationPolicy policy) => new(_f, Key, Reference, policy);

    /// <summary>Single-phase or two-phase state from temperature (K) and density (kg/m³).</summary>
    public StatePoint FromTRho(double temperature, double density)
    {
        Check.InRange(Name, _tRange, temperature, StateProperty.Temperature, temperature, StateProperty.SpecificVolume, 1 / density);
        Check.Positive(Name, StateProperty.SpecificVolume, 1 / density, StateProperty.Temperature, temperature, StateProperty.SpecificVolume, 1 / density);
        return FromTVChecked(temperature, density);
    }

    /// <inheritdoc />
    public StatePoint FromTV(double temperature, double specificVolume)
    {
        Check.InRange(Name, _tRange, temperature, StateProperty.Temperature, temperature, StateProperty.SpecificVolume, specificVolume);
        Check.Positive(Name, StateProperty.SpecificVolume, specificVolume, StateProperty.Temperature, temperature, StateProperty.SpecificVolume, specificVolume);
        return FromTVChecked(temperature, 1 / specificVolume);
    }

    /// <inheritdoc />
    public StatePoint FromTP(double temperature, double pressure) => FromTP(temperature, pressure, null);

    /// <summary>
    /// State from temperature (K) and pressure (Pa) on the branch <paramref name="phase"/> asks for
    /// (<see cref="Phase.Liquid"/> or <see cref="Phase.Vapour"/>; null chooses by comparison with the saturation pressure).
    /// Below Tc a liquid needs p ≥ p_sat(T) and a vapour p ≤ p_sat(T); on the line the saturated phase asked for is returned.
    /// </summary>
    public StatePoint FromTP(double temperature, double pressure, Phase? phase)
    {
        Check.InRange(Name, _tRange, temperature, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        Check.InRange(Name, _pRange, pressure, StateProperty.Pressure, pressure, StateProperty.Temperature, temperature);
        if (phase is not null and not Phase.Liquid and not Phase.Vapour)
        {
            throw new ArgumentException($"{Name}: a (T, p) state takes phase Liquid or Vapour (or none), not {phase}.", nameof(phase));
        }

        var f = _f;
        if (temperature >= f.Tc)
        {
            return Single(temperature, DensityAt(temperature, pressure, Branch.Single, 0));
        }

        f.Estimate(temperature, out double pe, out _, out _);
        bool near = temperature > f.Tc - 2;
        if (!near && pressure > pe * 1.001)
        {
            RefuseVapour(phase, temperature, pressure, pe);
            return Single(temperature, DensityAt(temperature, pressure, Branch.Liquid, 0));
        }

        if (!near && pressure < pe * 0.999)
        {
            RefuseLiquid(phase, temperature, pressure, pe);
            return Single(temperature, DensityAt(temperature, pressure, Branch.Vapour, 0));
        }

        var sat = SaturationRaw(temperature, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        double rel = (pressure - sat.P) / sat.P;
        if (Math.Abs(rel) <= 1e-9)
        {
            var choice = phase switch
            {
                Phase.Liquid => SaturationPolicy.SaturatedLiquid,
                Phase.Vapour => SaturationPolicy.SaturatedVapour,
                _ => OnSaturation,
            };
            if (choice == SaturationPolicy.Throw)
            {
                throw new AmbiguousStateException(Name, [new StateInput(StateProperty.Temperature, temperature), new StateInput(StateProperty.Pressure, pressure)],
                    $"the pair lies on the saturation line (p_sat = {Units.SiText.Pressure(sat.P)}); give the quality, a phase, or a SaturationPolicy.");
            }

            return Mix(sat, choice == SaturationPolicy.SaturatedLiquid ? 0 : 1);
        }

        if (rel > 0)
        {
            RefuseVapour(phase, temperature, pressure, sat.P);
            return Single(temperature, DensityAt(temperature, pressure, Branch.Liquid, 0, sat));
        }

        RefuseLiquid(phase, temperature, pressure, sat.P);
        return Single(temperature, DensityAt(temperature, pressure, Branch.Vapour, 0, sat));
    }

    /// <summary>Saturated liquid and vapour at temperature T (K), Tt ≤ T ≤ Tc.</summary>
    public SaturationProperties Saturation(double temperature)
    {
        var s = SaturationRaw(temperature, StateProperty.Temperature, temperature, StateProperty.Quality, double.NaN);
        return new SaturationProperties(Mix(s, 0), Mix(s, 1));
    }

    /// <summary>Saturated liquid and vapour at pressure p (Pa), p_triple ≤ p ≤ pc.</summary>
    public SaturationProperties SaturationAtPressure(double pressure)
    {
        var s = SaturationRawP(pressure, StateProperty.Pressure, pressure, StateProperty.Quality, double.NaN);
        return new SaturationProperties(Mix(s, 0), Mix(s, 1));
    }

    /// <inheritdoc />
    public double SaturationPressure(double temperature) =>
        SaturationRaw(temperature, StateProperty.Temperature, temperature, StateProperty.Quality, double.NaN).P;

    /// <inheritdoc />
    public double SaturationTemperature(double pressure) =>
        SaturationRawP(pressure, StateProperty.Pressure, pressure, StateProperty.Quality, double.NaN).T;

    /// <inheritdoc />
    public StatePoint FromTX(double temperature, double quality)
    {
        Check.Quality(Name, quality, StateProperty.Temperature, temperature);
        return Mix(SaturationRaw(temperature, StateProperty.Temperature, temperature, StateProperty.Quality, quality), quality);
    }

    /// <inheritdoc />
    public StatePoint FromPX(double pressure, double quality)
    {
        Check.Quality(Name, quality, StateProperty.Pressure, pressure);
        return Mix(SaturationRawP(pressure, StateProperty.Pressure, pressure, StateProperty.Quality, quality), quality);
    }

    /// <inheritdoc />
    public StatePoint FromPH(double pressure, double enthalpy) => AtPressure(pressure, StateProperty.Enthalpy, enthalpy);

    /// <inheritdoc />
    public StatePoint FromPS(double pressure, double entropy) => AtPressure(pressure, StateProperty.Entropy, entropy);

    /// <inheritdoc />
    public StatePoint FromPV(double pressure, double specificVolume)
    {
        Check.Positive(Name, StateProperty.SpecificVolume, specificVolume, StateProperty.Pressure, pressure, StateProperty.SpecificVolume, specificVolume);
        return AtPressure(pressure, StateProperty.SpecificVolume, specificVolume);
    }

    /// <inheritdoc />
    public StatePoint FromTS(double temperature, double entropy) => AtTemperature(temperature, StateProperty.Entropy, entropy);

    /// <summary>
    /// State from temperature (K) and specific enthalpy (J/kg). Where an isotherm crosses the enthalpy twice (dense
    /// liquid at high pressure), the root of lower pressure is returned.
    /// </summary>
    public StatePoint FromTH(double temperature, double enthalpy) => AtTemperature(temperature, StateProperty.Enthalpy, enthalpy);

    /// <inheritdoc />
    public StatePoint FromVU(double specificVolume, double internalEnergy) => AtVolume(specificVolume, StateProperty.InternalEnergy, internalEnergy);

    /// <inheritdoc />
    public StatePoint FromVS(double specificVolume, double entropy) => AtVolume(specificVolume, StateProperty.Entropy, entropy);

    /// <inheritdoc />
    public override string ToString() => Name;

    // ---- internals -------------------------------------------------------------------------------------------

    internal enum Branch
    {
        Liquid,
        Vapour,
        Single,
    }

    internal StatePoint Point(in RawState r, Phase phase) =>
        new(r.T, r.P, 1 / r.Rho, r.U + _dh, r.H + _dh, r.S + _ds, r.Cp, r.Cv, r.W, double.NaN, phase);

    private double Raw(StateProperty property, double value) => property switch
    {
        StateProperty.Enthalpy or StateProperty.InternalEnergy => value - _dh,
        StateProperty.Entropy => value - _ds,
        _ => value,
    };

    private static double Pick(in RawState r, StateProperty property) => property switch
    {
        StateProperty.Enthalpy => r.H,
        StateProperty.Entropy => r.S,
        StateProperty.InternalEnergy => r.U,
        StateProperty.SpecificVolume => 1 / r.Rho,
        _ => r.P,
    };

    private StatePoint Single(double t, double rho)
    {
        var r = _f.Evaluate(t, rho);
        Phase phase = t >= _f.Tc ? (r.P >= _f.Pc ? Phase.Supercritical : Phase.Vapour) : (rho >= _f.RhoC ? Phase.Liquid : Phase.Vapour);
        return Point(r, phase);
    }

    private StatePoint Mix(in SaturationPoint s, double x)
    {
        var l = _f.Evaluate(s.T, s.RhoLiquid);
        var v = _f.Evaluate(s.T, s.RhoVapour);
        return Mix(s, x, l, v);
    }

    private StatePoint Mix(in SaturationPoint s, double x, in RawState l, in RawState v)
    {
        double vol = 1 / s.RhoLiquid + x * (1 / s.RhoVapour - 1 / s.RhoLiquid);
        double h = l.H + x * (v.H - l.H);
        double sEnt = l.S + x * (v.S - l.S);
        double u = h - s.P * vol;
        if (x == 0 || x == 1)
        {
            var e = x == 0 ? l : v;
            return new StatePoint(s.T, s.P, 1 / e.Rho, e.H - s.P / e.Rho + _dh, e.H + _dh, e.S + _ds, e.Cp, e.Cv, e.W, x, Phase.TwoPhase);
        }

        return new StatePoint(s.T, s.P, vol, u + _dh, h + _dh, sEnt + _ds, double.NaN, double.NaN, double.NaN, x, Phase.TwoPhase);
    }

    private void RefuseVapour(Phase? phase, double t, double p, double psat)
    {
        if (phase == Phase.Vapour)
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.Pressure, MinimumPressure, psat), p, StateProperty.Temperature, t, StateProperty.Pressure, p,
                $"a vapour at this temperature exists only up to the saturation pressure");
        }
    }

    private void RefuseLiquid(Phase? phase, double t, double p, double psat)
    {
        if (phase == Phase.Liquid)
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.Pressure, psat, _pRange.Maximum), p, StateProperty.Temperature, t, StateProperty.Pressure, p,
                $"a liquid at this temperature exists only from the saturation pressure up");
        }
    }

    internal SaturationPoint SaturationRaw(double t, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue)
    {
        Check.InRange(Name, _tSatRange, t, firstInput, firstValue, secondInput, secondValue);
        if (t >= _f.Tc)
        {
            return new SaturationPoint(_f.Tc, _f.Pc, _f.RhoC, _f.RhoC);
        }

        if (_f.TrySaturationAtTemperature(t, out var s) || _f.TrySaturationNearCritical(t, out s))
        {
            return s;
        }

        return NearCritical(t);
    }

    internal SaturationPoint SaturationRawP(double p, StateProperty firstInput, double firstValue, StateProperty secondInput, double secondValue)
    {
        Check.InRange(Name, _pSatRange, p, firstInput, firstValue, secondInput, secondValue);
        if (p >= _f.Pc)
        {
            return new SaturationPoint(_f.Tc, _f.Pc, _f.RhoC, _f.RhoC);
        }

        if (_f.TrySaturationAtPressure(p, out var s))
        {
            return s;
        }

        // Bisection on T with the phase-equilibrium solve at each T (slow, certain).
        double lo = _f.Tt, hi = _f.Tc;
        for (int i = 0; i < 200 && hi - lo > 1e-13 * hi; i++)
        {
            double m = 0.5 * (lo + hi);
            if (SaturationRaw(m, firstInput, firstValue, secondInput, secondValue).P > p)
            {
                hi = m;
            }
            else
            {
                lo = m;
            }
        }

        return SaturationRaw(0.5 * (lo + hi), firstInput, firstValue, secondInput, secondValue);
    }

    /// <summary>
    /// Very close to Tc, where the Newton iteration on the densities loses its conditioning: equal Gibbs energy by
    /// bisection on the pressure, each phase's density from its own branch of the isotherm.
    /// </summary>
    private SaturationPoint NearCritical(double t)
    {
        _f.Estimate(t, out double pe, out double rl, out double rv);
        double lo = pe * (1 - 1e-3), hi = Math.Min(pe * (1 + 1e-3), _f.Pc);
        double gl = 0, gv = 0, rhoL = rl, rhoV = rv, p = pe;
        for (int i = 0; i < 200; i++)
        {
            p = 0.5 * (lo + hi);
            if (!_f.TryDensity(t, p, 0.5 * (_f.RhoC + rl), _f.RhoMax, rl, out rhoL) || !_f.TryDensity(t, p, 0, 0.5 * (_f.RhoC + rv), rv, out rhoV))
            {
                break;
            }

            gl = _f.Evaluate(t, rhoL).G;
            gv = _f.Evaluate(t, rhoV).G;
            if (gl > gv)
            {
                hi = p; // the liquid is less stable: lower the pressure
            }
            else
            {
                lo = p;
            }

            if (hi - lo < 1e-14 * p)
            {
                return new SaturationPoint(t, p, rhoL, rhoV);
            }
        }

        throw new NonConvergenceException($"{Name}: saturation at T = {t} K (within {_f.Tc - t:G3} K of the critical point) did not converge.");
    }

    internal double DensityAt(double t, double p, Branch branch, double guess, SaturationPoint? sat = null)
    {
        var f = _f;
        if (t >= f.Tc || branch == Branch.Single)
        {
            double g = guess > 0 ? guess : p / (f.R * t);
            if (f.TryDensity(t, p, 0, f.RhoMax, g, out double r0))
            {
                return r0;
            }

            throw new NonConvergenceException($"{Name}: density at T = {t} K, p = {p} Pa did not converge.");
        }

        bool near = t > f.Tc - 2;
        double lo, hi, rho;
        if (sat is null && !near)
        {
            f.Estimate(t, out double pe, out double rl, out double rv);
            if (branch == Branch.Liquid)
            {
                lo = rl * (1 - 2e-3);
                hi = f.RhoMax;
                if (f.TryDensity(t, p, lo, hi, guess > 0 ? guess : f.GuessDensity(t, p, true, pe, rl, rv), out rho) && rho >= lo * (1 + 1e-12))
                {
                    return rho;
                }
            }
            else
            {
                lo = 0;
                hi = rv * (1 + 2e-3);
                if (f.TryDensity(t, p, lo, hi, guess > 0 ? guess : f.GuessDensity(t, p, false, pe, rl, rv), out rho) && rho <= hi * (1 - 1e-12))
                {
                    return rho;
                }
            }
        }

        var s = sat ?? SaturationRaw(t, StateProperty.Temperature, t, StateProperty.Pressure, p);
        if (branch == Branch.Liquid)
        {
            if (f.TryDensity(t, p, s.RhoLiquid * (1 - 1e-12), f.RhoMax, guess > 0 ? guess : s.RhoLiquid, out rho))
            {
                return rho;
            }
        }
        else if (f.TryDensity(t, p, 0, s.RhoVapour * (1 + 1e-12), guess > 0 ? guess : Math.Min(p / (f.R * t), s.RhoVapour), out rho))
        {
            return rho;
        }

        throw new NonConvergenceException($"{Name}: density at T = {t} K, p = {p} Pa on the {branch.ToString().ToLowerInvariant()} branch did not converge.");
    }

    private StatePoint FromTVChecked(double t, double rho)
    {
        var f = _f;
        if (t < f.Tc)
        {
            f.Estimate(t, out _, out double rl, out double rv);
            bool clear = t < f.Tc - 2 && (rho > rl * 1.001 || rho < rv * 0.999);
            if (!clear)
            {
                var s = SaturationRaw(t, StateProperty.Temperature, t, StateProperty.SpecificVolume, 1 / rho);
                if (rho < s.RhoLiquid && rho > s.RhoVapour)
                {
                    double x = (1 / rho - 1 / s.RhoLiquid) / (1 / s.RhoVapour - 1 / s.RhoLiquid);
                    return Mix(s, x);
                }
            }
        }

        var point = Single(t, rho);
        Check.InRange(Name, _pRange, point.P, StateProperty.Temperature, t, StateProperty.SpecificVolume, 1 / rho);
        return point;
    }

    private StatePoint AtPressure(double p, StateProperty property, double value)
    {
        Check.InRange(Name, _pRange, p, StateProperty.Pressure, p, property, value);
        Check.Finite(Name, property, value, StateProperty.Pressure, p, property, value);
        double raw = Raw(property, value);
        var f = _f;
        double tLo = f.Tt, tHi = f.Data.MaximumTemperature;
        Branch branch = Branch.Single;
        SaturationPoint? sat = null;
        if (p < f.Pc && p >= _pSatRange.Minimum)
        {
            var s = SaturationRawP(p, StateProperty.Pressure, p, property, value);
            sat = s;
            var l = f.Evaluate(s.T, s.RhoLiquid);
            var v = f.Evaluate(s.T, s.RhoVapour);
            double yl = Pick(l, property), yv = Pick(v, property);
            // A saturated end recomputed from its own p: rounding, and next to Tc the equilibrium's own resolution.
            double slack = 1e-12 * (Math.Abs(yl) + Math.Abs(yv)) + (s.T > 0.999 * f.Tc ? 1e-7 : 1e-10) * Math.Abs(yv - yl);
            if (raw >= yl - slack && raw <= yv + slack)
            {
                return Mix(s, Math.Clamp((raw - yl) / (yv - yl), 0, 1), l, v);
            }

            if (raw < yl)
            {
                branch = Branch.Liquid;
                tHi = s.T;
            }
            else
            {
                branch = Branch.Vapour;
                tLo = s.T;
            }
        }
        else if (p < _pSatRange.Minimum)
        {
            branch = Branch.Vapour;
        }

        var fn = new IsobarFunction(this, p, property, raw, branch);
        double fLo = double.NaN, fHi = double.NaN, t;
        if (sat is { } ss)
        {
            // The saturation end of the bracket is known already; Newton starts from it with its own slope.
            var end = f.Evaluate(ss.T, branch == Branch.Liquid ? ss.RhoLiquid : ss.RhoVapour);
            double fEnd = Pick(end, property) - raw;
            double slope = IsobarFunction.Slope(end, property, p);
            fn.Seed(ss.T, end.Rho);
            if (branch == Branch.Liquid)
            {
                fHi = fEnd;
            }
            else
            {
                fLo = fEnd;
            }

            t = ss.T - fEnd / slope;
            if (!(t > tLo && t < tHi))
            {
                t = branch == Branch.Liquid ? Math.Max(0.5 * (tLo + tHi), ss.T - 5) : Math.Min(0.5 * (tLo + tHi), ss.T + 5);
            }
        }
        else
        {
            fLo = fn.Evaluate(tLo, out _);
            fHi = fn.Evaluate(tHi, out _);
            double slack = Slack(property, raw, value);
            if (fLo > 0 && fLo <= slack)
            {
                fLo = 0;
            }

            if (fHi < 0 && fHi >= -slack)
            {
                fHi = 0;
            }

            if (fLo == 0 || fHi == 0)
            {
                double tEnd = fLo == 0 ? tLo : tHi;
                fn.Evaluate(tEnd, out _);
                return Single(tEnd, fn.LastRho);
            }

            if (!(fLo <= 0 && fHi >= 0))
            {
                RefuseIsobar(p, property, value, raw, branch, tLo, tHi, fLo, fHi);
            }

            t = 0.5 * (tLo + tHi);
        }

        double lo = tLo, hi = tHi;
        bool converged = false;
        for (int it = 0; it < 200; it++)
        {
            double fx = fn.Evaluate(t, out double d);
            if (fx < 0)
            {
                lo = t;
            }
            else
            {
                hi = t;
            }

            double next = t - fx / d;
            if (d > 0 && Math.Abs(next - t) < 1e-11 * t && next >= lo && next <= hi)
            {
                t = next;
                converged = true;
                break;
            }

            if (!(d > 0 && next > lo && next < hi))
            {
                // Leaving the bracket: confirm the far end's sign once (out of range otherwise), then bisect.
                double slack = Slack(property, raw, value);
                if (double.IsNaN(fLo) && lo == tLo)
                {
                    fLo = fn.Evaluate(tLo, out _);
                    if (fLo > slack)
                    {
                        RefuseIsobar(p, property, value, raw, branch, tLo, tHi, fLo, fx);
                    }

                    if (fLo >= 0)
                    {
                        return Single(tLo, fn.LastRho);
                    }
                }

                if (double.IsNaN(fHi) && hi == tHi)
                {
                    fHi = fn.Evaluate(tHi, out _);
                    if (fHi < -slack)
                    {
                        RefuseIsobar(p, property, value, raw, branch, tLo, tHi, fx, fHi);
                    }

                    if (fHi <= 0)
                    {
                        return Single(tHi, fn.LastRho);
                    }
                }

                next = 0.5 * (lo + hi);
            }

            if (hi - lo <= 1e-14 * hi)
            {
                t = next;
                converged = true;
                break;
            }

            t = next;
        }

        if (!converged)
        {
            throw new NonConvergenceException($"{Name}: T at p = {p} Pa, {property.Symbol()} = {value} did not converge.");
        }

        var bAt = t >= f.Tc ? Branch.Single : (branch == Branch.Single ? Branch.Liquid : branch);
        return Single(t, DensityAt(t, p, bAt, fn.LastRho));
    }

    /// <summary>Rounding allowance for a value at a range end recomputed through the reference-state offset.</summary>
    private static double Slack(StateProperty property, double raw, double value) =>
        1e-11 * (Math.Abs(raw) + Math.Abs(value) + property switch
        {
            StateProperty.Enthalpy or StateProperty.InternalEnergy => 1e3,
            StateProperty.Entropy => 1,
            _ => 0,
        });

    [System.Diagnostics.CodeAnalysis.DoesNotReturn]
    private void RefuseIsobar(double p, StateProperty property, double value, double raw, Branch branch, double tLo, double tHi, double fLo, double fHi)
    {
        var range = new ValidityRange(property, Cooked(property, Math.Min(fLo, fHi) + raw), Cooked(property, Math.Max(fLo, fHi) + raw));
        Check.ThrowOutOfRange(Name, range, value, StateProperty.Pressure, p, property, value,
            $"at this pressure the {(branch == Branch.Liquid ? "liquid" : branch == Branch.Vapour ? "vapour" : "fluid")} spans T = {Units.SiText.Format(StateProperty.Temperature, tLo)} to {Units.SiText.Format(StateProperty.Temperature, tHi)}");
    }

    private double Cooked(StateProperty property, double raw) => property switch
    {
        StateProperty.Enthalpy or StateProperty.InternalEnergy => raw + _dh,
        StateProperty.Entropy => raw + _ds,
        _ => raw,
    };

    private struct IsobarFunction(Refrigerant owner, double p, StateProperty property, double target, Branch branch) : IDifferentiableFunction
    {
        public double LastRho;
        private double _lastT;

        public static double Slope(in RawState r, StateProperty property, double p) => property switch
        {
            StateProperty.Enthalpy => r.Cp,
            StateProperty.Entropy => r.Cp / r.T,
            StateProperty.SpecificVolume => r.DvDT,
            _ => r.Cp - p * r.DvDT,
        };

        public void Seed(double t, double rho)
        {
            _lastT = t;
            LastRho = rho;
        }

        public double Evaluate(double t, out double derivative)
        {
            var b = t >= owner._f.Tc ? Branch.Single : (branch == Branch.Single ? Branch.Liquid : branch);
            // Warm start: the last density, scaled like an ideal gas on the vapour side.
            double guess = LastRho > 0 ? (b == Branch.Liquid ? LastRho : LastRho * _lastT / t) : 0;
            double rho = owner.DensityAt(t, p, b, guess);
            LastRho = rho;
            _lastT = t;
            var r = owner._f.Evaluate(t, rho);
            derivative = Slope(r, property, p);
            return Pick(r, property) - target;
        }
    }

    private StatePoint AtTemperature(double t, StateProperty property, double value)
    {
        Check.InRange(Name, _tRange, t, StateProperty.Temperature, t, property, value);
        Check.Finite(Name, property, value, StateProperty.Temperature, t, property, value);
        double raw = Raw(property, value);
        var f = _f;
        double rLo = 1e-12 * f.ReducingDensity, rHi = f.RhoMax;
        if (t < f.Tc)
        {
            var s = SaturationRaw(t, StateProperty.Temperature, t, property, value);
            var l = f.Evaluate(t, s.RhoLiquid);
            var v = f.Evaluate(t, s.RhoVapour);
            double yl = Pick(l, property), yv = Pick(v, property);
            double slack = 1e-12 * (Math.Abs(yl) + Math.Abs(yv)) + (t > 0.999 * f.Tc ? 1e-7 : 1e-10) * Math.Abs(yv - yl);
            if (raw >= Math.Min(yl, yv) - slack && raw <= Math.Max(yl, yv) + slack)
            {
                return Mix(s, Math.Clamp((raw - yl) / (yv - yl), 0, 1), l, v);
            }

            // Entropy and enthalpy of the vapour exceed those of the liquid: the vapour side is the low-density branch.
            if (raw > Math.Max(yl, yv))
            {
                rHi = s.RhoVapour;
            }
            else
            {
                rLo = s.RhoLiquid;
            }
        }

        var fn = new IsothermFunction(f, t, property, raw);
        // Scan for the first sign change from the saturation side (the lowest-pressure root).
        const int steps = 24;
        double xa = Math.Log(rLo), xb = Math.Log(rHi);
        bool vapourSide = t < f.Tc && rHi < f.RhoMax;
        double prevX = vapourSide ? xb : xa;
        double prevF = fn.Evaluate(prevX, out _);
        double a = double.NaN, b = double.NaN;
        for (int i = 1; i <= steps; i++)
        {
            double x = vapourSide ? xb - (xb - xa) * i / steps : xa + (xb - xa) * i / steps;
            double fx = fn.Evaluate(x, out _);
            if (prevF == 0 || Math.Sign(fx) != Math.Sign(prevF))
            {
                a = prevX;
                b = x;
                break;
            }

            prevX = x;
            prevF = fx;
        }

        if (double.IsNaN(a))
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(property, Cooked(property, Math.Min(fn.Evaluate(xa, out _), fn.Evaluate(xb, out _)) + raw), Cooked(property, Math.Max(fn.Evaluate(xa, out _), fn.Evaluate(xb, out _)) + raw)), value,
                StateProperty.Temperature, t, property, value, "no single-phase state at this temperature has that value");
        }

        double root = NewtonBisection.Solve(ref fn, Math.Min(a, b), Math.Max(a, b), 0.5 * (a + b), $"ρ at T = {t} K, {property} = {value}", 1e-15);
        var point = Single(t, Math.Exp(root));
        Check.InRange(Name, _pRange, point.P, StateProperty.Temperature, t, property, value);
        return point;
    }

    private readonly struct IsothermFunction(HelmholtzFluid f, double t, StateProperty property, double target) : IDifferentiableFunction
    {
        public double Evaluate(double x, out double derivative)
        {
            double rho = Math.Exp(x);
            double delta = rho / f.ReducingDensity, tau = f.ReducingTemperature / t;
            var id = f.Equation.Ideal(delta, tau);
            var r = f.Equation.Residual(delta, tau);
            var s = f.Compose(t, rho, id, r);
            derivative = property switch
            {
                StateProperty.Entropy => -f.R * (1 + r.D - r.DT),
                StateProperty.Enthalpy => f.R * t * (r.D + r.DD + r.DT),
                _ => -1 / rho,
            };
            return Pick(s, property) - target;
        }
    }

    private StatePoint AtVolume(double v, StateProperty property, double value)
    {
        Check.Positive(Name, StateProperty.SpecificVolume, v, StateProperty.SpecificVolume, v, property, value);
        Check.Finite(Name, property, value, StateProperty.SpecificVolume, v, property, value);
        double raw = Raw(property, value);
        var f = _f;
        double rho = 1 / v;
        double tLo = f.Tt, tHi = f.Data.MaximumTemperature;
        var sTriple = SaturationRaw(f.Tt, StateProperty.SpecificVolume, v, property, value);
        if (rho < sTriple.RhoLiquid && rho > sTriple.RhoVapour)
        {
            // Inside the dome at the triple point: find where the isochore leaves it, T_b.
            double a = f.Tt, b = f.Tc;
            for (int i = 0; i < 80 && b - a > 1e-12 * b; i++)
            {
                double m = 0.5 * (a + b);
                var s = SaturationRaw(m, StateProperty.SpecificVolume, v, property, value);
                bool inside = rho < s.RhoLiquid && rho > s.RhoVapour;
                if (inside)
                {
                    a = m;
                }
                else
                {
                    b = m;
                }
            }

            double tb = a;
            var sb = SaturationRaw(tb, StateProperty.SpecificVolume, v, property, value);
            double MixValue(double tt, out SaturationPoint sp)
            {
                sp = SaturationRaw(tt, StateProperty.SpecificVolume, v, property, value);
                double x = (1 / rho - 1 / sp.RhoLiquid) / (1 / sp.RhoVapour - 1 / sp.RhoLiquid);
                var l = f.Evaluate(tt, sp.RhoLiquid);
                var vv = f.Evaluate(tt, sp.RhoVapour);
                double yl = property == StateProperty.Entropy ? l.S : l.U, yv = property == StateProperty.Entropy ? vv.S : vv.U;
                return yl + x * (yv - yl);
            }

            double atB = MixValue(tb, out _);
            double atT = MixValue(f.Tt, out _);
            if (raw >= atT && raw <= atB)
            {
                double lo = f.Tt, hi = tb;
                SaturationPoint sp = sb;
                for (int i = 0; i < 100 && hi - lo > 1e-13 * hi; i++)
                {
                    double m = 0.5 * (lo + hi);
                    if (MixValue(m, out sp) > raw)
                    {
                        hi = m;
                    }
                    else
                    {
                        lo = m;
                    }
                }

                double tm = 0.5 * (lo + hi);
                MixValue(tm, out sp);
                double xq = (1 / rho - 1 / sp.RhoLiquid) / (1 / sp.RhoVapour - 1 / sp.RhoLiquid);
                return Mix(sp, Math.Clamp(xq, 0, 1));
            }

            if (raw < atT)
            {
                Check.ThrowOutOfRange(Name, new ValidityRange(property, Cooked(property, atT), double.MaxValue), value, StateProperty.SpecificVolume, v, property, value,
                    "below the triple-point temperature");
            }

            tLo = tb;
        }

        var fn = new IsochoreFunction(f, rho, property, raw);
        double yLo = fn.Evaluate(tLo, out _), yHi = fn.Evaluate(tHi, out _);
        if (!(yLo <= 0 && yHi >= 0))
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(property, Cooked(property, yLo + raw), Cooked(property, yHi + raw)), value, StateProperty.SpecificVolume, v, property, value,
                $"at this volume the fluid spans T = {Units.SiText.Format(StateProperty.Temperature, tLo)} to {Units.SiText.Format(StateProperty.Temperature, tHi)}");
        }

        double t = NewtonBisection.Solve(ref fn, tLo, tHi, 0.5 * (tLo + tHi), $"T at v = {v} m³/kg, {property} = {value}", 1e-13);
        var point = Single(t, rho);
        Check.InRange(Name, _pRange, point.P, StateProperty.SpecificVolume, v, property, value);
        return point;
    }

    private readonly struct IsochoreFunction(HelmholtzFluid f, double rho, StateProperty property, double target) : IDifferentiableFunction
    {
        public double Evaluate(double t, out double derivative)
        {
            var s = f.Evaluate(t, rho);
            derivative = property == StateProperty.Entropy ? s.Cv / t : s.Cv;
            return Pick(s, property) - target;
        }
    }
}
