using System.Globalization;
using System.Runtime.CompilerServices;
using System.Text;
using NotebookCycles.Properties;

namespace NotebookCycles.Gases;

/// <summary>
/// An ideal gas with temperature-dependent cp from the NASA Glenn 9-coefficient polynomials: one species or a fixed
/// mixture of species. Immutable and thread-safe.
/// </summary>
/// <remarks>
/// <para>
/// Because cp/R is linear in the coefficients, the species' coefficients are combined once, per temperature interval,
/// weighted by mole fraction and divided by the mixture molar mass: a mixture costs exactly what one species costs.
/// </para>
/// <para>
/// Units: T in K, p in Pa, v in m³/kg, h and u in J/kg, s, cp, cv in J/(kg·K). Validity: 200 K to 6000 K (the range of
/// the fits) and 1 Pa to 100 MPa. The ideal-gas equation of state pv = RT is assumed throughout: at high pressure,
/// most near and below room temperature, real gases depart from it (check the compressibility factor above about
/// 10 MPa), and no dissociation is modelled, so above about 2500 K the fixed composition is itself an approximation.
/// </para>
/// <para>
/// Enthalpy datum: <see cref="EnthalpyDatum.Sensible"/> (h = 0 at 0 K) or <see cref="EnthalpyDatum.Formation"/>
/// (h(298.15 K) = enthalpy of formation); see <see cref="Datum"/>. Entropy: s°(T) is the third-law standard entropy at
/// p° = 1 bar of the fits, mole-fraction weighted; s(T, p) = s°(T) − R·ln(p/p°) + s_mix with the ideal entropy of
/// mixing s_mix = −R·Σ xᵢ·ln xᵢ.
/// </para>
/// <para>
/// Relative pressure and relative volume: pr(T) = exp[(s°(T) − s°(T_ref))/R] and vr(T) = (T/T_ref)/pr(T) with
/// T_ref = 298.15 K, so both are 1 at 298.15 K. Only ratios are meaningful (p₂/p₁ = pr₂/pr₁ and v₂/v₁ = vr₂/vr₁ along
/// an isentrope); printed tables use other normalisations.
/// </para>
/// <para>
/// NaN policy: NaN, infinite or non-positive inputs, and inputs whose implied temperature or pressure lies outside the
/// range, throw <see cref="StateOutOfRangeException"/> naming the property and its valid range; nothing is clamped.
/// The one allowance: a derived quantity (p from T and v, T from p and v, the entropy target of (p, s) or (v, s))
/// that misses a range end by rounding only (1e-12 relative) is taken as that end.
/// </para>
/// </remarks>
public sealed class IdealGasMixture : IPropertyModel, IRelativePressureModel
{
    /// <summary>The standard-state pressure of the fits, Pa (1 bar).</summary>
    public const double StandardPressure = 100_000.0;

    /// <summary>The temperature at which <see cref="RelativePressure"/> and <see cref="RelativeVolume"/> are 1, K.</summary>
    public const double RelativeReferenceTemperature = 298.15;

    private const double TMin = GasSpecies.MinimumTemperature;
    private const double TMax = GasSpecies.MaximumTemperature;
    private const double TBreak = GasSpecies.IntervalBreak;

    private static readonly ValidityRange TRange = new(StateProperty.Temperature, TMin, TMax);
    private static readonly ValidityRange PRange = new(StateProperty.Pressure, 1.0, 1.0e8);

    private readonly Segment _low;
    private readonly Segment _high;
    private readonly double _r;
    private readonly double _sMix;
    private readonly double _s0Ref;
    private readonly double _lnTRef;
    private readonly ValidityRange _hRange;
    private readonly ValidityRange _uRange;
    private readonly InverseTable _hTable;
    private readonly InverseTable _uTable;
    private readonly InverseTable _s0Table;
    private readonly InverseTable _qTable;
    private readonly GasComponent[] _components;
    private readonly IReadOnlyList<GasComponent> _componentsView;
    private readonly double _prMin;
    private readonly double _prMax;
    private readonly double _vrMin;
    private readonly double _vrMax;

    internal IdealGasMixture(string name, GasComponent[] components, EnthalpyDatum datum)
    {
        _components = components;
        _componentsView = Array.AsReadOnly(components);
        Datum = datum;
        double molarMass = 0;
        foreach (GasComponent c in components)
        {
            molarMass += c.MoleFraction * c.Species.MolarMass;
        }

        MolarMass = molarMass;
        _r = GasSpecies.UniversalGasConstant / molarMass;
        var low = new double[9];
        var high = new double[9];
        double sMix = 0;
        foreach (GasComponent c in components)
        {
            double x = c.MoleFraction;
            if (x == 0)
            {
                continue;
            }

            double offset = datum == EnthalpyDatum.Sensible
                ? (c.Species.EnthalpyAboveZeroKelvin - c.Species.EnthalpyOfFormation) / GasSpecies.UniversalGasConstant
                : 0.0;
            for (int k = 0; k < 9; k++)
            {
                low[k] += x * (c.Species.Low[k] + (k == 7 ? offset : 0.0));
                high[k] += x * (c.Species.High[k] + (k == 7 ? offset : 0.0));
            }

            sMix -= x * Math.Log(x);
        }

        _low = new Segment(low, _r);
        _high = new Segment(high, _r);
        _sMix = _r * sMix;
        Name = datum == EnthalpyDatum.Formation ? name + ", formation-enthalpy datum" : name;

        _s0Ref = StandardEntropyCore(RelativeReferenceTemperature);
        _lnTRef = Math.Log(RelativeReferenceTemperature);
        _hTable = InverseTable.Create(new EnthalpyFunction(this), TMin, TMax);
        _uTable = InverseTable.Create(new InternalEnergyFunction(this), TMin, TMax);
        _s0Table = InverseTable.Create(new StandardEntropyFunction(this), TMin, TMax);
        _qTable = InverseTable.Create(new VolumeFunction(this), TMin, TMax);
        _hRange = new ValidityRange(StateProperty.Enthalpy, _hTable.ValueMin, _hTable.ValueMax);
        _uRange = new ValidityRange(StateProperty.InternalEnergy, _uTable.ValueMin, _uTable.ValueMax);
        _prMin = RelativePressureAt(TMin);
        _prMax = RelativePressureAt(TMax);
        _vrMin = TMax / RelativeReferenceTemperature / _prMax;
        _vrMax = TMin / RelativeReferenceTemperature / _prMin;
    }

    /// <inheritdoc />
    public string Name { get; }

    /// <inheritdoc />
    public string Citation =>
        "B.J. McBride, M.J. Zehe, S. Gordon, NASA Glenn Coefficients for Calculating Thermodynamic Properties of Individual Species, NASA/TP-2002-211556 (2002); ideal-gas mixing.";

    /// <inheritdoc />
    public ValidityRange TemperatureRange => TRange;

    /// <inheritdoc />
    public ValidityRange PressureRange => PRange;

    /// <inheritdoc />
    public bool HasSaturation => false;

    /// <summary>The species with their mole and mass fractions.</summary>
    public IReadOnlyList<GasComponent> Components => _componentsView;

    /// <summary>The enthalpy datum of <see cref="Enthalpy"/>, <see cref="InternalEnergy"/> and every state.</summary>
    public EnthalpyDatum Datum { get; }

    /// <summary>Molar mass of the mixture, kg/mol.</summary>
    public double MolarMass { get; }

    /// <summary>Specific gas constant R = 8.314510 J/(mol·K) / M, J/(kg·K).</summary>
    public double GasConstant => _r;

    /// <summary>The ideal entropy of mixing −R·Σ xᵢ·ln xᵢ, J/(kg·K), included in every s(T, p) (zero for one species).</summary>
    public double EntropyOfMixing => _sMix;

    /// <summary>Enthalpy range over 200 K to 6000 K, J/kg (the valid enthalpy inputs).</summary>
    public ValidityRange EnthalpyRange => _hRange;

    /// <summary>Internal-energy range over 200 K to 6000 K, J/kg (the valid internal-energy inputs).</summary>
    public ValidityRange InternalEnergyRange => _uRange;

    /// <summary>The same gas with another enthalpy datum.</summary>
    public IdealGasMixture WithDatum(EnthalpyDatum datum)
    {
        if (datum == Datum)
        {
            return this;
        }

        string baseName = Datum == EnthalpyDatum.Formation ? Name[..Name.LastIndexOf(", formation-enthalpy datum", StringComparison.Ordinal)] : Name;
        return new IdealGasMixture(baseName, _components, datum);
    }

    // ---- property functions of temperature -------------------------------------------------------------------------

    /// <summary>cp(T), J/(kg·K); T in K, 200 K to 6000 K.</summary>
    public double Cp(double temperature)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature);
        return CpCore(temperature);
    }

    /// <summary>cv(T) = cp − R, J/(kg·K); T in K, 200 K to 6000 K.</summary>
    public double Cv(double temperature) => Cp(temperature) - _r;

    /// <summary>k(T) = cp/cv; T in K, 200 K to 6000 K.</summary>
    public double K(double temperature)
    {
        double cp = Cp(temperature);
        return cp / (cp - _r);
    }

    /// <summary>Speed of sound √(k·R·T), m/s; T in K, 200 K to 6000 K.</summary>
    public double SpeedOfSound(double temperature)
    {
        double cp = Cp(temperature);
        return Math.Sqrt(cp / (cp - _r) * _r * temperature);
    }

    /// <summary>h(T), J/kg, on the model's <see cref="Datum"/>; T in K, 200 K to 6000 K.</summary>
    public double Enthalpy(double temperature)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature);
        return EnthalpyCore(temperature);
    }

    /// <summary>u(T) = h(T) − R·T, J/kg, on the model's <see cref="Datum"/>; T in K, 200 K to 6000 K.</summary>
    public double InternalEnergy(double temperature)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature);
        return EnthalpyCore(temperature) - _r * temperature;
    }

    /// <summary>Standard entropy s°(T) at 1 bar without the entropy of mixing, J/(kg·K); T in K, 200 K to 6000 K.</summary>
    public double StandardEntropy(double temperature)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature);
        return StandardEntropyCore(temperature);
    }

    /// <summary>s(T, p) = s°(T) − R·ln(p/1 bar) + s_mix, J/(kg·K); T in K (200 K to 6000 K), p in Pa (1 Pa to 100 MPa).</summary>
    public double Entropy(double temperature, double pressure)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        Check.InRange(Name, PRange, pressure, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        return StandardEntropyCore(temperature) + _sMix - _r * Math.Log(pressure * (1.0 / StandardPressure));
    }

    /// <summary>Relative pressure pr(T) = exp[(s°(T) − s°(298.15 K))/R], 1 at 298.15 K; only ratios are meaningful.</summary>
    public double RelativePressure(double temperature)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature);
        return RelativePressureAt(temperature);
    }

    /// <summary>Relative volume vr(T) = (T/298.15 K)/pr(T), 1 at 298.15 K; only ratios are meaningful.</summary>
    public double RelativeVolume(double temperature)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature);
        return temperature / RelativeReferenceTemperature / RelativePressureAt(temperature);
    }

    // ---- inversions ------------------------------------------------------------------------------------------------

    /// <summary>T (K) from h (J/kg, on the model's datum); h must lie in <see cref="EnthalpyRange"/>.</summary>
    public double TemperatureFromEnthalpy(double enthalpy)
    {
        Check.InRange(Name, _hRange, enthalpy, StateProperty.Enthalpy, enthalpy);
        return SolveEnthalpy(enthalpy);
    }

    /// <summary>T (K) from u (J/kg, on the model's datum); u must lie in <see cref="InternalEnergyRange"/>.</summary>
    public double TemperatureFromInternalEnergy(double internalEnergy)
    {
        Check.InRange(Name, _uRange, internalEnergy, StateProperty.InternalEnergy, internalEnergy);
        var f = new InternalEnergyFunction(this) { Target = internalEnergy };
        return _uTable.Solve(ref f);
    }

    /// <summary>T (K) from the standard entropy s° (J/(kg·K), without mixing entropy) between s°(200 K) and s°(6000 K).</summary>
    public double TemperatureFromStandardEntropy(double standardEntropy)
    {
        var range = new ValidityRange(StateProperty.Entropy, _s0Table.ValueMin, _s0Table.ValueMax);
        Check.InRange(Name, range, standardEntropy, StateProperty.Entropy, standardEntropy);
        var f = new StandardEntropyFunction(this) { Target = standardEntropy };
        return _s0Table.Solve(ref f);
    }

    /// <summary>
    /// T (K) from the relative pressure pr (normalised to 1 at 298.15 K) between pr(200 K) and pr(6000 K).
    /// Throws <see cref="ArgumentOutOfRangeException"/> naming pr and that range otherwise (NaN included).
    /// </summary>
    public double TemperatureFromRelativePressure(double relativePressure)
    {
        if (!(relativePressure >= _prMin && relativePressure <= _prMax))
        {
            ThrowRelative("relative pressure pr", nameof(relativePressure), relativePressure, _prMin, _prMax);
        }

        // pr is inside [pr(200 K), pr(6000 K)]; the clamp only absorbs the rounding of exp and log at the two ends.
        double s0 = Math.Clamp(_s0Ref + _r * Math.Log(relativePressure), _s0Table.ValueMin, _s0Table.ValueMax);
        var f = new StandardEntropyFunction(this) { Target = s0 };
        return _s0Table.Solve(ref f);
    }

    /// <summary>
    /// T (K) from the relative volume vr (normalised to 1 at 298.15 K) between vr(6000 K) and vr(200 K).
    /// Throws <see cref="ArgumentOutOfRangeException"/> naming vr and that range otherwise (NaN included).
    /// </summary>
    public double TemperatureFromRelativeVolume(double relativeVolume)
    {
        if (!(relativeVolume >= _vrMin && relativeVolume <= _vrMax))
        {
            ThrowRelative("relative volume vr", nameof(relativeVolume), relativeVolume, _vrMin, _vrMax);
        }

        // vr is inside [vr(6000 K), vr(200 K)]; the clamp only absorbs the rounding of exp and log at the two ends.
        double q = Math.Clamp(-Math.Log(relativeVolume), _qTable.ValueMin, _qTable.ValueMax);
        var f = new VolumeFunction(this) { Target = q };
        return _qTable.Solve(ref f);
    }

    // ---- states ----------------------------------------------------------------------------------------------------

    /// <inheritdoc />
    public StatePoint FromTP(double temperature, double pressure)
    {
        Check.InRange(Name, TRange, temperature, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        Check.InRange(Name, PRange, pressure, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        return Build(temperature, pressure);
    }

    /// <inheritdoc />
    public StatePoint FromTV(double temperature, double specificVolume)
    {
        const StateProperty a = StateProperty.Temperature, b = StateProperty.SpecificVolume;
        Check.InRange(Name, TRange, temperature, a, temperature, b, specificVolume);
        Check.Positive(Name, b, specificVolume, a, temperature, b, specificVolume);
        double p = Snap(_r * temperature / specificVolume, PRange);
        Check.InRange(Name, PRange, p, a, temperature, b, specificVolume);
        return Build(temperature, p);
    }

    /// <inheritdoc />
    public StatePoint FromPV(double pressure, double specificVolume)
    {
        const StateProperty a = StateProperty.Pressure, b = StateProperty.SpecificVolume;
        Check.InRange(Name, PRange, pressure, a, pressure, b, specificVolume);
        Check.Positive(Name, b, specificVolume, a, pressure, b, specificVolume);
        double t = Snap(pressure * specificVolume / _r, TRange);
        Check.InRange(Name, TRange, t, a, pressure, b, specificVolume);
        return Build(t, pressure);
    }

    /// <inheritdoc />
    public StatePoint FromPH(double pressure, double enthalpy)
    {
        const StateProperty a = StateProperty.Pressure, b = StateProperty.Enthalpy;
        Check.InRange(Name, PRange, pressure, a, pressure, b, enthalpy);
        Check.InRange(Name, _hRange, enthalpy, a, pressure, b, enthalpy);
        return Build(SolveEnthalpy(enthalpy), pressure);
    }

    /// <inheritdoc />
    public StatePoint FromPS(double pressure, double entropy)
    {
        const StateProperty a = StateProperty.Pressure, b = StateProperty.Entropy;
        Check.InRange(Name, PRange, pressure, a, pressure, b, entropy);
        Check.Finite(Name, b, entropy, a, pressure, b, entropy);
        double shift = _sMix - _r * Math.Log(pressure / StandardPressure);
        double s0 = Snap(entropy - shift, _s0Table.ValueMin, _s0Table.ValueMax);
        if (!(s0 >= _s0Table.ValueMin && s0 <= _s0Table.ValueMax))
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(b, _s0Table.ValueMin + shift, _s0Table.ValueMax + shift), entropy, a, pressure, b, entropy, "At this pressure s must lie between s(200 K) and s(6000 K).");
        }

        var f = new StandardEntropyFunction(this) { Target = s0 };
        return Build(_s0Table.Solve(ref f), pressure);
    }

    /// <inheritdoc />
    public StatePoint FromVU(double specificVolume, double internalEnergy)
    {
        const StateProperty a = StateProperty.SpecificVolume, b = StateProperty.InternalEnergy;
        Check.Positive(Name, a, specificVolume, a, specificVolume, b, internalEnergy);
        Check.InRange(Name, _uRange, internalEnergy, a, specificVolume, b, internalEnergy);
        var f = new InternalEnergyFunction(this) { Target = internalEnergy };
        double t = _uTable.Solve(ref f);
        double p = Snap(_r * t / specificVolume, PRange);
        Check.InRange(Name, PRange, p, a, specificVolume, b, internalEnergy);
        return Build(t, p);
    }

    /// <inheritdoc />
    public StatePoint FromVS(double specificVolume, double entropy)
    {
        const StateProperty a = StateProperty.SpecificVolume, b = StateProperty.Entropy;
        Check.Positive(Name, a, specificVolume, a, specificVolume, b, entropy);
        Check.Finite(Name, b, entropy, a, specificVolume, b, entropy);

        // s = s°(T) + s_mix − R·ln(R·T/(v·p°)), and q(T) = (s°(T) − s°_ref)/R − ln(T/T_ref), so
        // q = (s − s_mix − s°_ref)/R + ln(R/(v·p°)) + ln T_ref: the relative-volume function inverts it.
        double q = Snap((entropy - _sMix - _s0Ref) / _r + Math.Log(_r / (specificVolume * StandardPressure)) + _lnTRef, _qTable.ValueMin, _qTable.ValueMax);
        if (!(q >= _qTable.ValueMin && q <= _qTable.ValueMax))
        {
            double shift = _sMix + _s0Ref - _r * Math.Log(_r / (specificVolume * StandardPressure)) - _r * _lnTRef;
            Check.ThrowOutOfRange(Name, new ValidityRange(b, _r * _qTable.ValueMin + shift, _r * _qTable.ValueMax + shift), entropy, a, specificVolume, b, entropy, "At this specific volume s must lie between s(200 K) and s(6000 K).");
        }

        var f = new VolumeFunction(this) { Target = q };
        double t = _qTable.Solve(ref f);
        double p = Snap(_r * t / specificVolume, PRange);
        Check.InRange(Name, PRange, p, a, specificVolume, b, entropy);
        return Build(t, p);
    }

    /// <inheritdoc />
    public StatePoint FromTS(double temperature, double entropy)
    {
        const StateProperty a = StateProperty.Temperature, b = StateProperty.Entropy;
        Check.InRange(Name, TRange, temperature, a, temperature, b, entropy);
        Check.Finite(Name, b, entropy, a, temperature, b, entropy);
        double p = Snap(StandardPressure * Math.Exp((StandardEntropyCore(temperature) + _sMix - entropy) / _r), PRange);
        Check.InRange(Name, PRange, p, a, temperature, b, entropy);
        return Build(temperature, p);
    }

    /// <summary>State from specific enthalpy (J/kg) and specific entropy (J/(kg·K)): h fixes T, then s fixes p.</summary>
    public StatePoint FromHS(double enthalpy, double entropy)
    {
        const StateProperty a = StateProperty.Enthalpy, b = StateProperty.Entropy;
        Check.InRange(Name, _hRange, enthalpy, a, enthalpy, b, entropy);
        Check.Finite(Name, b, entropy, a, enthalpy, b, entropy);
        double t = SolveEnthalpy(enthalpy);
        double p = Snap(StandardPressure * Math.Exp((StandardEntropyCore(t) + _sMix - entropy) / _r), PRange);
        Check.InRange(Name, PRange, p, a, enthalpy, b, entropy);
        return Build(t, p);
    }

    /// <inheritdoc />
    public override string ToString() => Name;

    /// <summary>A readable composition, for example "N2 0.78084, O2 0.209476".</summary>
    internal static string Describe(GasComponent[] components)
    {
        var text = new StringBuilder();
        foreach (GasComponent c in components)
        {
            if (text.Length > 0)
            {
                text.Append(", ");
            }

            text.Append(c.Species.Name).Append(' ').Append(c.MoleFraction.ToString("0.######", CultureInfo.InvariantCulture));
        }

        return text.ToString();
    }

    // ---- kernels (no validation) -----------------------------------------------------------------------------------

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double CpCore(double t)
    {
        ref readonly Segment g = ref (t < TBreak ? ref _low : ref _high);
        double inv = 1.0 / t;
        return (g.C1 * inv + g.C2) * inv + g.C3 + t * (g.C4 + t * (g.C5 + t * (g.C6 + t * g.C7)));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double EnthalpyCore(double t)
    {
        ref readonly Segment g = ref (t < TBreak ? ref _low : ref _high);
        return -g.C1 / t + g.C2 * Math.Log(t) + t * (g.C3 + t * (g.H4 + t * (g.H5 + t * (g.H6 + t * g.H7)))) + g.HB;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double EnthalpyCore(double t, out double cp)
    {
        ref readonly Segment g = ref (t < TBreak ? ref _low : ref _high);
        double inv = 1.0 / t;
        cp = (g.C1 * inv + g.C2) * inv + g.C3 + t * (g.C4 + t * (g.C5 + t * (g.C6 + t * g.C7)));
        return -g.C1 * inv + g.C2 * Math.Log(t) + t * (g.C3 + t * (g.H4 + t * (g.H5 + t * (g.H6 + t * g.H7)))) + g.HB;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double StandardEntropyCore(double t)
    {
        ref readonly Segment g = ref (t < TBreak ? ref _low : ref _high);
        double inv = 1.0 / t;
        return (g.S1 * inv - g.C2) * inv + g.C3 * Math.Log(t) + t * (g.C4 + t * (g.S5 + t * (g.S6 + t * g.S7))) + g.SB;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double StandardEntropyCore(double t, out double cp)
    {
        ref readonly Segment g = ref (t < TBreak ? ref _low : ref _high);
        double inv = 1.0 / t;
        cp = (g.C1 * inv + g.C2) * inv + g.C3 + t * (g.C4 + t * (g.C5 + t * (g.C6 + t * g.C7)));
        return (g.S1 * inv - g.C2) * inv + g.C3 * Math.Log(t) + t * (g.C4 + t * (g.S5 + t * (g.S6 + t * g.S7))) + g.SB;
    }

    /// <summary>
    /// A derived quantity (not a user input) that lies beyond a range end by no more than rounding, 1e-12 relative,
    /// is taken as that end, so a state exactly at 200 K, 6000 K, 1 Pa or 100 MPa solves from any input pair.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Snap(double value, double min, double max)
    {
        if (value < min && value >= min - 1e-12 * Math.Abs(min))
        {
            return min;
        }

        if (value > max && value <= max + 1e-12 * Math.Abs(max))
        {
            return max;
        }

        return value;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Snap(double value, in ValidityRange range) => Snap(value, range.Minimum, range.Maximum);

    private double SolveEnthalpy(double enthalpy)
    {
        var f = new EnthalpyFunction(this) { Target = enthalpy };
        return _hTable.Solve(ref f);
    }

    private double RelativePressureAt(double t) => Math.Exp((StandardEntropyCore(t) - _s0Ref) / _r);

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void ThrowRelative(string what, string parameter, double value, double min, double max) =>
        throw new ArgumentOutOfRangeException(
            parameter,
            value,
            string.Create(CultureInfo.InvariantCulture, $"{Name}: {what} = {Units.SiText.Number(value)} is outside the valid range {Units.SiText.Number(min)} to {Units.SiText.Number(max)} (its values at 200 K and 6000 K; normalised to 1 at 298.15 K)."));

    private StatePoint Build(double t, double p)
    {
        ref readonly Segment g = ref (t < TBreak ? ref _low : ref _high);
        double inv = 1.0 / t;
        double lnT = Math.Log(t);
        double cp = (g.C1 * inv + g.C2) * inv + g.C3 + t * (g.C4 + t * (g.C5 + t * (g.C6 + t * g.C7)));
        double h = -g.C1 * inv + g.C2 * lnT + t * (g.C3 + t * (g.H4 + t * (g.H5 + t * (g.H6 + t * g.H7)))) + g.HB;
        double s0 = (g.S1 * inv - g.C2) * inv + g.C3 * lnT + t * (g.C4 + t * (g.S5 + t * (g.S6 + t * g.S7))) + g.SB;
        double rt = _r * t;
        double cv = cp - _r;
        double s = s0 + _sMix - _r * Math.Log(p * (1.0 / StandardPressure));
        return new StatePoint(t, p, rt / p, h - rt, h, s, cp, cv, Math.Sqrt(cp / cv * rt), double.NaN, Phase.IdealGas);
    }

    /// <summary>One temperature interval's coefficients, already multiplied by R (J/(kg·K)) and divided for h and s°.</summary>
    private readonly struct Segment
    {
        public readonly double C1, C2, C3, C4, C5, C6, C7;
        public readonly double H4, H5, H6, H7, HB;
        public readonly double S1, S5, S6, S7, SB;

        public Segment(double[] a, double r)
        {
            C1 = r * a[0];
            C2 = r * a[1];
            C3 = r * a[2];
            C4 = r * a[3];
            C5 = r * a[4];
            C6 = r * a[5];
            C7 = r * a[6];
            H4 = C4 / 2;
            H5 = C5 / 3;
            H6 = C6 / 4;
            H7 = C7 / 5;
            HB = r * a[7];
            S1 = -C1 / 2;
            S5 = C5 / 2;
            S6 = C6 / 3;
            S7 = C7 / 4;
            SB = r * a[8];
        }
    }

    private struct EnthalpyFunction(IdealGasMixture gas) : ITemperatureFunction
    {
        public double Target { get; set; }

        public readonly double Evaluate(double x, out double derivative) => gas.EnthalpyCore(x, out derivative) - Target;
    }

    private struct InternalEnergyFunction(IdealGasMixture gas) : ITemperatureFunction
    {
        public double Target { get; set; }

        public readonly double Evaluate(double x, out double derivative)
        {
            double h = gas.EnthalpyCore(x, out double cp);
            derivative = cp - gas._r;
            return h - gas._r * x - Target;
        }
    }

    private struct StandardEntropyFunction(IdealGasMixture gas) : ITemperatureFunction
    {
        public double Target { get; set; }

        public readonly double Evaluate(double x, out double derivative)
        {
            double s0 = gas.StandardEntropyCore(x, out double cp);
            derivative = cp / x;
            return s0 - Target;
        }
    }

    /// <summary>q(T) = −ln vr(T) = (s°(T) − s°_ref)/R − ln(T/T_ref), increasing (dq/dT = cv/(R·T)).</summary>
    private struct VolumeFunction(IdealGasMixture gas) : ITemperatureFunction
    {
        public double Target { get; set; }

        public readonly double Evaluate(double x, out double derivative)
        {
            double s0 = gas.StandardEntropyCore(x, out double cp);
            derivative = (cp - gas._r) / (gas._r * x);
            return (s0 - gas._s0Ref) / gas._r - Math.Log(x) + gas._lnTRef - Target;
        }
    }
}
