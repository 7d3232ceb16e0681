using NotebookCycles.Numerics;
using NotebookCycles.Properties;

namespace NotebookCycles.Water;

/// <content>The state methods: one validation, then the solvers of <see cref="If97Core"/>.</content>
public sealed partial class IapwsIf97
{
    /// <inheritdoc />
    /// <remarks>
    /// Direct evaluation of the region's basic equation (region 3: density by Newton on eq. 28 from the SR5-05 v(p,T)
    /// backward value, bracketed Newton if that start is refused). On the
    /// saturation line (see <see cref="SaturationTolerance"/>) the <see cref="SaturationPolicy"/> applies.
    /// </remarks>
    public StatePoint FromTP(double temperature, double pressure)
    {
        ValidateTP(temperature, pressure);
        double p = pressure * 1e-6;
        int region = RegionOfTP(temperature, p);
        switch (region)
        {
            case 1:
                return Region1.Properties(temperature, p).ToStatePoint(Phase.Liquid);
            case 2:
            case 5:
                return If97Core.Gibbs(region, temperature, p).ToStatePoint(PhaseOf(region, temperature, p, false));
            case 3:
                return If97Core.Region3TP(temperature, p, temperature < Region3.Tc && p > Region4.SaturationPressure(temperature), If97Core.Region3StartRho(temperature, p));
            default:
                return SaturationPolicy switch
                {
                    SaturationPolicy.SaturatedLiquid => If97Core.SaturatedAtT(temperature, 0.0),
                    SaturationPolicy.SaturatedVapour => If97Core.SaturatedAtT(temperature, 1.0),
                    _ => throw new AmbiguousStateException(Name, [new StateInput(StateProperty.Temperature, temperature), new StateInput(StateProperty.Pressure, pressure)],
                        FormattableString.Invariant($"p lies on the saturation line (psat(T) = {Region4.SaturationPressure(temperature) * 1e6:G9} Pa by IAPWS-IF97 eq. 30, relative tolerance {SaturationTolerance:G2}); give a quality with FromTX or FromPX, or construct the model with another SaturationPolicy")),
                };
        }
    }

    /// <summary>
    /// State from the supplementary equation for the metastable-vapour region (IAPWS R7-97(2012) eq. 18): supercooled
    /// (supersaturated) steam between the saturated-vapour line and the 5 % equilibrium-moisture line, p ≤ 10 MPa.
    /// Never chosen by the other methods.
    /// </summary>
    /// <param name="temperature">K; at most Tsat(p), and not below the 5 % equilibrium-moisture line.</param>
    /// <param name="pressure">Pa; from psat(273.15 K) to 10 MPa.</param>
    /// <returns>A single-phase vapour state (X is NaN).</returns>
    public StatePoint MetastableVapourFromTP(double temperature, double pressure)
    {
        ValidateTP(temperature, pressure);
        double p = pressure * 1e-6;
        Check.InRange(Name, new ValidityRange(StateProperty.Pressure, PSatMin * 1e6, 10e6), pressure, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure);
        double ts = Region4.SaturationTemperature(p);
        double tLow = MetastableLowestTemperature(p, ts);
        if (!(temperature >= tLow && temperature <= ts))
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.Temperature, tLow, ts), temperature, StateProperty.Temperature, temperature, StateProperty.Pressure, pressure,
                "The metastable-vapour equation covers the region from the saturated-vapour line down to the 5 % equilibrium-moisture line.");
        }

        return Region2.MetastableProperties(temperature, p).ToStatePoint(Phase.Vapour);
    }

    private struct MoistureGap : IScalarFunction
    {
        public double P;
        public double HLiquid;
        public double HVapour;

        public readonly double Evaluate(double t) => (Region2.MetastableProperties(t, P).H - HLiquid) / (HVapour - HLiquid) - 0.95;
    }

    private static double MetastableLowestTemperature(double p, double ts)
    {
        var f = new MoistureGap { P = p, HLiquid = Region1.Properties(ts, p).H, HVapour = Region2.Properties(ts, p).H };
        double lo = Math.Max(TMin, ts - 150.0);
        return f.Evaluate(lo) > 0 ? lo : (Brent.TrySolve(ref f, lo, ts, out double t, 1e-9) ? t : ts);
    }

    /// <inheritdoc />
    public StatePoint FromTX(double temperature, double quality)
    {
        CheckSaturationTemperature(temperature, StateProperty.Temperature, temperature, StateProperty.Quality, quality);
        Check.Quality(Name, quality, StateProperty.Temperature, temperature);
        return If97Core.SaturatedAtT(temperature, quality);
    }

    /// <inheritdoc />
    public StatePoint FromPX(double pressure, double quality)
    {
        CheckSaturationPressure(pressure, StateProperty.Pressure, pressure, StateProperty.Quality, quality);
        Check.Quality(Name, quality, StateProperty.Pressure, pressure);
        return If97Core.SaturatedAtP(pressure * 1e-6, quality);
    }

    /// <inheritdoc />
    /// <remarks>
    /// Regions 1 and 2: the release's backward equation T(p,h), then Newton steps on the forward equation until h
    /// reproduces the input to 1e-11 relative (usually one or two steps). Region 3: the SR3-03 backward T and v, then
    /// Newton in (ρ, T) on the forward equation (bracketed Newton in T if the start is refused). Region 5: bracketed
    /// Newton on the forward equation. Two-phase: lever rule between the saturated phases at Tsat(p) (eq. 31).
    /// </remarks>
    public StatePoint FromPH(double pressure, double enthalpy) => FromPY(pressure, enthalpy, StateProperty.Enthalpy);

    /// <inheritdoc />
    /// <remarks>As <see cref="FromPH"/>, with the backward equations T(p,s).</remarks>
    public StatePoint FromPS(double pressure, double entropy) => FromPY(pressure, entropy, StateProperty.Entropy);

    private StatePoint FromPY(double pressure, double y, StateProperty property)
    {
        ValidatePressure(pressure, property, y);
        Check.Finite(Name, property, y, StateProperty.Pressure, pressure, property, y);
        double p = pressure * 1e-6;
        bool entropy = property == StateProperty.Entropy;
        var fit = If97Core.SolvePY(p, y * 1e-3, entropy, out var state);
        if (fit != Fit.Ok)
        {
            double lo = Value(p <= PSatMin ? Region2.Properties(TMin, p) : Region1.Properties(TMin, p), entropy);
            double hi = Value(p <= PMax5 ? Region5.Properties(TMax, p) : Region2.Properties(T25, p), entropy);
            Check.ThrowOutOfRange(Name, new ValidityRange(property, lo * 1e3, hi * 1e3), y, StateProperty.Pressure, pressure, property, y,
                FormattableString.Invariant($"At this pressure the formulation covers {TMin} K to {(p <= PMax5 ? TMax : T25)} K."));
        }

        return state;
    }

    private static double Value(in Props pr, bool entropy) => entropy ? pr.S : pr.H;

    /// <inheritdoc />
    /// <remarks>Brent iteration in ln p on s(T, p) (two-phase: lever rule at psat(T)).</remarks>
    public StatePoint FromTS(double temperature, double entropy)
    {
        ValidateTemperature(temperature, StateProperty.Entropy, entropy);
        Check.Finite(Name, StateProperty.Entropy, entropy, StateProperty.Temperature, temperature, StateProperty.Entropy, entropy);
        if (If97Core.SolveTY(temperature, entropy * 1e-3, false, out var state) != Fit.Ok)
        {
            ThrowIsotherm(temperature, entropy, StateProperty.Entropy);
        }

        return state;
    }

    /// <inheritdoc />
    /// <remarks>Region 3 directly from eq. 28 when (ρ, T) lies there; otherwise Brent iteration in ln p (two-phase: lever rule at psat(T)).</remarks>
    public StatePoint FromTV(double temperature, double specificVolume)
    {
        ValidateTemperature(temperature, StateProperty.SpecificVolume, specificVolume);
        Check.Positive(Name, StateProperty.SpecificVolume, specificVolume, StateProperty.Temperature, temperature, StateProperty.SpecificVolume, specificVolume);
        if (If97Core.SolveTY(temperature, specificVolume, true, out var state) != Fit.Ok)
        {
            ThrowIsotherm(temperature, specificVolume, StateProperty.SpecificVolume);
        }

        return state;
    }

    private void ThrowIsotherm(double t, double y, StateProperty property)
    {
        double pMax = t > T25 ? PMax5 : PMax;
        var a = If97Core.SinglePhaseTP(t, pMax, true);
        var b = If97Core.SinglePhaseTP(t, PSearchMin, false);
        double ya = property == StateProperty.Entropy ? a.S : a.V, yb = property == StateProperty.Entropy ? b.S : b.V;
        Check.ThrowOutOfRange(Name, new ValidityRange(property, Math.Min(ya, yb), Math.Max(ya, yb)), y, StateProperty.Temperature, t, property, y,
            FormattableString.Invariant($"Along this isotherm the formulation covers {PSearchMin * 1e6} Pa to {pMax} MPa."));
    }

    /// <inheritdoc />
    /// <remarks>Brent iteration in T on v(T, p) (two-phase: lever rule at Tsat(p)). Liquid near its density maximum (about 277 K) has two temperatures for one v; the higher one is returned.</remarks>
    public StatePoint FromPV(double pressure, double specificVolume)
    {
        ValidatePressure(pressure, StateProperty.SpecificVolume, specificVolume);
        Check.Positive(Name, StateProperty.SpecificVolume, specificVolume, StateProperty.Pressure, pressure, StateProperty.SpecificVolume, specificVolume);
        double p = pressure * 1e-6;
        if (If97Core.SolvePV(p, specificVolume, out var state) != Fit.Ok)
        {
            double vMin = double.MaxValue;
            for (double t = TMin; t <= 300.0; t += 0.25)
            {
                vMin = Math.Min(vMin, If97Core.SinglePhaseTP(t, p, true).V);
            }

            double vMax = If97Core.SinglePhaseTP(p > PMax5 ? T25 : TMax, p, false).V;
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.SpecificVolume, vMin, vMax), specificVolume, StateProperty.Pressure, pressure, StateProperty.SpecificVolume, specificVolume,
                FormattableString.Invariant($"At this pressure the formulation covers {TMin} K to {(p > PMax5 ? T25 : TMax)} K."));
        }

        return state;
    }

    /// <inheritdoc />
    /// <remarks>
    /// Start p from the SR2-01/SR4-04 backward equations (region chosen by the SR4-04 boundary lines), then Newton in ln p
    /// on s(p, h) with each step a (p,h) state; Brent iteration in ln p where no backward equation applies.
    /// </remarks>
    public StatePoint FromHS(double enthalpy, double entropy)
    {
        Check.Finite(Name, StateProperty.Enthalpy, enthalpy, StateProperty.Enthalpy, enthalpy, StateProperty.Entropy, entropy);
        Check.Finite(Name, StateProperty.Entropy, entropy, StateProperty.Enthalpy, enthalpy, StateProperty.Entropy, entropy);
        double h = enthalpy * 1e-3, s = entropy * 1e-3;
        if (If97Core.SolveHS(h, s, If97Core.BackwardPressureHS(h, s), out var state))
        {
            return state;
        }

        // Unreachable: report the entropy range this enthalpy reaches, or the enthalpy range if it reaches none.
        double sMin = double.MaxValue, sMax = double.MinValue;
        double lnLo = Math.Log(PSearchMin), lnHi = Math.Log(PMax);
        for (int k = 0; k <= 400; k++)
        {
            if (If97Core.SolvePY(Math.Exp(lnLo + (lnHi - lnLo) * k / 400.0), h, false, out var st) == Fit.Ok)
            {
                sMin = Math.Min(sMin, st.S);
                sMax = Math.Max(sMax, st.S);
            }
        }

        if (sMin > sMax)
        {
            double hLo = Region1.Properties(TMin, PSatMin).H, hHi = Region5.Properties(TMax, PSearchMin).H;
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.Enthalpy, hLo * 1e3, hHi * 1e3), enthalpy, StateProperty.Enthalpy, enthalpy, StateProperty.Entropy, entropy);
        }

        Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.Entropy, sMin, sMax), entropy, StateProperty.Enthalpy, enthalpy, StateProperty.Entropy, entropy,
            "The range is that of states with this enthalpy (sampled over the pressure range).");
        return state;
    }

    /// <inheritdoc />
    /// <remarks>Brent iteration in T on u(T, v), each step a (T, v) state.</remarks>
    public StatePoint FromVU(double specificVolume, double internalEnergy) => FromVY(specificVolume, internalEnergy, StateProperty.InternalEnergy);

    /// <inheritdoc />
    /// <remarks>Brent iteration in T on s(T, v), each step a (T, v) state.</remarks>
    public StatePoint FromVS(double specificVolume, double entropy) => FromVY(specificVolume, entropy, StateProperty.Entropy);

    private StatePoint FromVY(double v, double y, StateProperty property)
    {
        Check.Positive(Name, StateProperty.SpecificVolume, v, StateProperty.SpecificVolume, v, property, y);
        Check.Finite(Name, property, y, StateProperty.SpecificVolume, v, property, y);
        bool entropy = property == StateProperty.Entropy;
        if (If97Core.SolveVY(v, y * 1e-3, entropy, out var state))
        {
            return state;
        }

        double yMin = double.MaxValue, yMax = double.MinValue;
        for (int k = 0; k <= 400; k++)
        {
            double t = TMin + (TMax - TMin) * k / 400.0;
            if (If97Core.SolveTY(t, v, true, out var st) == Fit.Ok)
            {
                double val = entropy ? st.S : st.U;
                yMin = Math.Min(yMin, val);
                yMax = Math.Max(yMax, val);
            }
        }

        if (yMin > yMax)
        {
            Check.ThrowOutOfRange(Name, new ValidityRange(StateProperty.SpecificVolume, Region1.Properties(277.0, PMax).V, Region5.Properties(TMax, PSearchMin).V), v, StateProperty.SpecificVolume, v, property, y);
        }

        Check.ThrowOutOfRange(Name, new ValidityRange(property, yMin, yMax), y, StateProperty.SpecificVolume, v, property, y,
            "The range is that of states with this specific volume (sampled over the temperature range).");
        return state;
    }
}
