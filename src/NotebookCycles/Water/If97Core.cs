using System.Runtime.CompilerServices;
using NotebookCycles.Numerics;
using NotebookCycles.Properties;
using NotebookCycles.Water.Backward;

namespace NotebookCycles.Water;

/// <summary>Where a requested value lies relative to what the formulation can reach at the other input.</summary>
internal enum Fit
{
    /// <summary>Solved.</summary>
    Ok,

    /// <summary>The value is below the reachable range.</summary>
    Below,

    /// <summary>The value is above the reachable range.</summary>
    Above,
}

/// <summary>
/// The solvers behind <see cref="IapwsIf97"/>, in the release's units (MPa, K, kJ/kg, kJ/(kg·K)), returning SI state
/// points. They do not validate inputs (the model does) and report unreachable values as <see cref="Fit"/>.
/// Each flash has one method taking a starting value: the seam where backward equations plug in.
/// </summary>
internal static class If97Core
{
    private const double T13 = IapwsIf97.T13;
    private const double T25 = IapwsIf97.T25;
    private const double TMin = IapwsIf97.TMin;
    private const double TMax = IapwsIf97.TMax;

    /// <summary>Boundary padding (K) of the bracketed solvers: adjacent regions' equations differ slightly on their common boundary.</summary>
    private const double Pad = 0.05;

    /// <summary>Relative residual the Newton polishing after a backward equation stops at.</summary>
    internal const double PolishTolerance = 1e-11;

    // ------------------------------------------------------------ forward equations

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Props Gibbs(int region, double t, double p) => region switch
    {
        1 => Region1.Properties(t, p),
        2 => Region2.Properties(t, p),
        _ => Region5.Properties(t, p),
    };

    /// <summary>Single-phase state at (T, p) with the region chosen by the release; on the saturation line the side is <paramref name="liquidSide"/>.</summary>
    internal static StatePoint SinglePhaseTP(double t, double p, bool liquidSide, double startRho = double.NaN)
    {
        int region = IapwsIf97.RegionOfTP(t, p);
        if (region == 4)
        {
            region = t <= T13 ? (liquidSide ? 1 : 2) : 3;
        }

        if (region == 3)
        {
            bool liquid = t < Region3.Tc && (p > Region4.SaturationPressure(t) || (liquidSide && IapwsIf97.OnSaturation(p, Region4.SaturationPressure(t))));
            return Region3TP(t, p, liquid, double.IsNaN(startRho) ? Region3StartRho(t, p) : startRho);
        }

        return Gibbs(region, t, p).ToStatePoint(IapwsIf97.PhaseOf(region, t, p, liquidSide));
    }

    /// <summary>Region-3 state from (T, p): density by Newton on eq. 28 from <paramref name="startRho"/> (kg/m³, 1 / SR5-05 v(p,T); NaN: none), bracketed Newton when the start is refused.</summary>
    internal static StatePoint Region3TP(double t, double p, bool liquidBranch, double startRho)
    {
        var branch = t >= Region3.Tc ? Region3Density.Branch.Single : (liquidBranch ? Region3Density.Branch.Liquid : Region3Density.Branch.Vapour);
        double rho = Region3Density.Solve(p, t, branch, startRho);
        if (double.IsNaN(rho))
        {
            throw new NonConvergenceException(FormattableString.Invariant($"IAPWS-IF97 region 3: no density found at T = {t} K, p = {p} MPa."));
        }

        // The density root reproduces p to about 1e-13; report the requested p itself.
        return Region3.Properties(rho, t).ToStatePoint(IapwsIf97.PhaseOf(3, t, p, liquidBranch)) with { P = p * 1e6 };
    }

    /// <summary>
    /// Starting density (kg/m³) for a region-3 (T, p) state: 1 / SR5-05 v3(p, T); NaN outside the range of that
    /// equation (p from psat(623.15 K) to 100 MPa, T from 623.15 K to TB23(p)).
    /// </summary>
    internal static double Region3StartRho(double t, double p) =>
        p >= Sr505.PMin && p <= Sr505.PMax && t >= Sr505.TMin && t <= Region3.TemperatureB23(p) ? 1.0 / Sr505.V3PT(p, t) : double.NaN;

    // ------------------------------------------------------------ saturation

    /// <summary>The saturated phases at T with saturation pressure p (MPa).</summary>
    internal static void SaturatedPhases(double t, double p, out Props liquid, out Props vapour)
    {
        if (t <= T13)
        {
            liquid = Region1.Properties(t, p);
            vapour = Region2.Properties(t, p);
            return;
        }

        if (t >= Region3.Tc)
        {
            liquid = Region3.Properties(Region3.RhoC, Region3.Tc);
            vapour = liquid;
            return;
        }

        double rl = Region3Density.Solve(p, t, Region3Density.Branch.Liquid);
        double rv = Region3Density.Solve(p, t, Region3Density.Branch.Vapour);
        if (double.IsNaN(rl) || double.IsNaN(rv))
        {
            throw new NonConvergenceException(FormattableString.Invariant($"IAPWS-IF97 region 3: saturated densities not found at T = {t} K, p = {p} MPa."));
        }

        if (rl < rv)
        {
            // Only within microkelvins of Tc, where a branch fell back to the isotherm's single root: one density for both.
            rl = rv = Region3Density.Solve(p, t, Region3Density.Branch.Single);
        }

        liquid = Region3.Properties(rl, t);
        vapour = Region3.Properties(rv, t);
    }

    /// <summary>The two-phase mixture of quality x (cp, cv, w NaN).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static StatePoint Mix(in Props liquid, in Props vapour, double x, double t, double p)
    {
        double v = liquid.V + x * (vapour.V - liquid.V);
        double u = liquid.U + x * (vapour.U - liquid.U);
        double h = liquid.H + x * (vapour.H - liquid.H);
        double s = liquid.S + x * (vapour.S - liquid.S);
        return new StatePoint(t, p * 1e6, v, u * 1e3, h * 1e3, s * 1e3, double.NaN, double.NaN, double.NaN, x, Phase.TwoPhase);
    }

    /// <summary>Saturated state of quality x at T (K).</summary>
    internal static StatePoint SaturatedAtT(double t, double x)
    {
        double p = t >= Region3.Tc ? Region3.Pc : Region4.SaturationPressure(t);
        SaturatedPhases(t, p, out var liquid, out var vapour);
        return Mix(liquid, vapour, x, t, p);
    }

    /// <summary>Saturated state of quality x at p (MPa).</summary>
    internal static StatePoint SaturatedAtP(double p, double x)
    {
        double t = p >= Region3.Pc ? Region3.Tc : Region4.SaturationTemperature(p);
        SaturatedPhases(t, p, out var liquid, out var vapour);
        return Mix(liquid, vapour, x, t, p);
    }

    // ------------------------------------------------------------ (p,h) and (p,s)

    private struct GibbsGap : IDifferentiableFunction
    {
        public int Region;
        public double P;
        public double Target;
        public bool Entropy;

        public readonly double Evaluate(double t, out double derivative)
        {
            var pr = Gibbs(Region, t, P);
            derivative = Entropy ? pr.Cp / t : pr.Cp;
            return (Entropy ? pr.S : pr.H) - Target;
        }
    }

    private struct Region3Gap : IDifferentiableFunction
    {
        public double P;
        public double Target;
        public bool Entropy;
        public bool LiquidSide;
        public double Rho;

        public double Evaluate(double t, out double derivative)
        {
            var branch = t >= Region3.Tc ? Region3Density.Branch.Single : (LiquidSide ? Region3Density.Branch.Liquid : Region3Density.Branch.Vapour);
            double rho = Region3Density.Solve(P, t, branch, Rho);
            if (double.IsNaN(rho))
            {
                derivative = double.NaN;
                return double.NaN;
            }

            Rho = rho;
            var pr = Region3.Properties(rho, t);
            derivative = Entropy ? pr.Cp / t : pr.Cp;
            return (Entropy ? pr.S : pr.H) - Target;
        }
    }

    /// <summary>
    /// State from (p MPa, h kJ/kg) or, with <paramref name="entropy"/>, from (p MPa, s kJ/(kg·K)). Regions 1 and 2: backward
    /// equation, then Newton on the forward equation; region 3 and 5: bracketed Newton; the dome: lever rule.
    /// </summary>
    internal static Fit SolvePY(double p, double y, bool entropy, out StatePoint state)
    {
        if (p < IapwsIf97.PSat13)
        {
            if (p >= IapwsIf97.PSatMin)
            {
                double ts = Region4.SaturationTemperature(p);

                // Fast path: when the backward equation lands clearly on one side of Tsat, polish there first. The
                // polished T is exact for the region's forward equation, and h and s rise with T, so T below Tsat
                // (region 1) or above it (region 2) proves the phase without evaluating the saturated states.
                if (y < (entropy ? 4.5 : 2000.0))
                {
                    double t1 = entropy ? Region1.TemperaturePS(p, y) : Region1.TemperaturePH(p, y);
                    if (t1 < ts - 0.05 && t1 > TMin && TryPolish(1, p, y, entropy, t1, TMin, ts, out var fast) && fast.T < ts)
                    {
                        state = fast.ToStatePoint(Phase.Liquid);
                        return Fit.Ok;
                    }
                }
                else
                {
                    double t2 = entropy ? Region2.TemperaturePS(p, y) : Region2.TemperaturePH(p, y);
                    if (t2 > ts + 0.05 && t2 < T25 - 2.0 && TryPolish(2, p, y, entropy, t2, ts, T25, out var fast) && fast.T > ts && fast.T <= T25)
                    {
                        state = fast.ToStatePoint(IapwsIf97.PhaseOf(2, fast.T, p, false));
                        return Fit.Ok;
                    }
                }

                if (y < (entropy ? 4.5 : 2000.0))
                {
                    var liquid = Region1.Properties(ts, p);
                    if (y < Value(liquid, entropy))
                    {
                        return Liquid1(p, y, entropy, ts, out state);
                    }

                    var vapour = Region2.Properties(ts, p);
                    if (y <= Value(vapour, entropy))
                    {
                        state = Mix(liquid, vapour, Quality(liquid, vapour, y, entropy), ts, p);
                        return Fit.Ok;
                    }

                    return Vapour25(p, y, entropy, ts, out state);
                }
                else
                {
                    var vapour = Region2.Properties(ts, p);
                    if (y > Value(vapour, entropy))
                    {
                        return Vapour25(p, y, entropy, ts, out state);
                    }

                    var liquid = Region1.Properties(ts, p);
                    if (y >= Value(liquid, entropy))
                    {
                        state = Mix(liquid, vapour, Quality(liquid, vapour, y, entropy), ts, p);
                        return Fit.Ok;
                    }

                    return Liquid1(p, y, entropy, ts, out state);
                }
            }

            return Vapour25(p, y, entropy, TMin, out state);
        }

        if (y <= Value(Region1.Properties(T13, p), entropy))
        {
            return Liquid1(p, y, entropy, T13, out state);
        }

        double tb = Region3.TemperatureB23(p);
        if (y >= Value(Region2.Properties(tb, p), entropy))
        {
            return Vapour25(p, y, entropy, tb, out state);
        }

        return Region3PY(p, y, entropy, Region3StartT(p, y, entropy), out state);
    }

    /// <summary>
    /// Starting temperature (K) for a region-3 (p, h) or (p, s) state: SR3-03 T3(p,h) or T3(p,s); NaN outside the
    /// bounding box those equations accept.
    /// </summary>
    internal static double Region3StartT(double p, double y, bool entropy) =>
        !InRegion3Box(p, y, entropy) ? double.NaN : entropy ? Sr303.T3PS(p, y) : Sr303.T3PH(p, y);

    /// <summary>Whether (p, h or s) lies in the bounding box the SR3-03 equations accept.</summary>
    private static bool InRegion3Box(double p, double y, bool entropy) =>
        p >= Sr303.Region3PMin && p <= Sr303.Region3PMax
        && (entropy ? y >= Sr303.Region3SMin && y <= Sr303.Region3SMax : y >= Sr303.Region3HMin && y <= Sr303.Region3HMax);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Value(in Props pr, bool entropy) => entropy ? pr.S : pr.H;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Quality(in Props liquid, in Props vapour, double y, bool entropy)
    {
        double x = (y - Value(liquid, entropy)) / (Value(vapour, entropy) - Value(liquid, entropy));
        return Math.Clamp(x, 0.0, 1.0); // rounding only: y is already known to lie between the two values
    }

    /// <summary>Region 1 from (p, h or s) below <paramref name="tHigh"/> (Tsat or 623.15 K).</summary>
    private static Fit Liquid1(double p, double y, bool entropy, double tHigh, out StatePoint state)
    {
        double t0 = entropy ? Region1.TemperaturePS(p, y) : Region1.TemperaturePH(p, y);
        if (TryPolish(1, p, y, entropy, t0, TMin, tHigh, out var pr))
        {
            state = pr.ToStatePoint(Phase.Liquid);
            return Fit.Ok;
        }

        // The value is below h (or s) at 273.15 K, the only way region 1 fails once y is below the saturated liquid.
        state = default;
        return Fit.Below;
    }

    /// <summary>Regions 2 and 5 from (p, h or s) above <paramref name="tLow"/> (Tsat, TB23(p) or 273.15 K).</summary>
    private static Fit Vapour25(double p, double y, bool entropy, double tLow, out StatePoint state)
    {
        // The backward equations are not valid beyond region 2 and extrapolate wildly: a start above 1073.15 K means
        // region 5, and a polish that finds no root in region 2 means region 5 too (or below 273.15 K at p < 611 Pa).
        double t0 = entropy ? Region2.TemperaturePS(p, y) : Region2.TemperaturePH(p, y);
        bool region2Tried = !(t0 > T25 + 2.0);
        if (region2Tried && TryPolish(2, p, y, entropy, t0, tLow, T25, out var pr))
        {
            state = pr.ToStatePoint(IapwsIf97.PhaseOf(2, pr.T, p, false));
            return Fit.Ok;
        }

        if (tLow == TMin && y < Value(Region2.Properties(TMin, p), entropy))
        {
            state = default;
            return Fit.Below;
        }

        var fit = Region5PY(p, y, entropy, double.NaN, out state);
        if (fit == Fit.Below && !region2Tried)
        {
            // Below region 5 after all: the backward start (outside its range below 611 Pa) was misleading.
            double start = Math.Min(t0, T25);
            if (TryPolish(2, p, y, entropy, start, tLow, T25, out pr))
            {
                state = pr.ToStatePoint(IapwsIf97.PhaseOf(2, pr.T, p, false));
                return Fit.Ok;
            }
        }

        return fit;
    }

    /// <summary>
    /// Newton polishing on the forward Gibbs equation of <paramref name="region"/> from the backward value
    /// <paramref name="t0"/>, until h (or s) reproduces the input to <see cref="PolishTolerance"/> (usually one or two
    /// steps); falls back to bracketed Newton-bisection on [lo, hi] (padded) if a step leaves the bracket. False when
    /// the region holds no root in [lo, hi].
    /// </summary>
    private static bool TryPolish(int region, double p, double y, bool entropy, double t0, double lo, double hi, out Props result)
    {
        double tol = PolishTolerance * Math.Max(Math.Abs(y), entropy ? 0.01 : 1.0);
        double t = t0;
        if (t > lo - Pad && t < hi + Pad && region != 5)
        {
            // First step: Halley's method on the τ-derivatives alone (cubic convergence from the backward value),
            // so the full property evaluation that follows usually meets the tolerance at once.
            double h, s, cp, dcp;
            if (region == 1)
            {
                Region1.TemperatureDerivatives(t, p, out h, out s, out cp, out dcp);
            }
            else
            {
                Region2.TemperatureDerivatives(t, p, out h, out s, out cp, out dcp);
            }

            double r0 = (entropy ? s : h) - y;
            double d1 = entropy ? cp / t : cp;
            double d2 = entropy ? (dcp - cp / t) / t : dcp;
            t -= 2.0 * r0 * d1 / (2.0 * d1 * d1 - r0 * d2);
        }

        for (int i = 0; i < 4; i++)
        {
            if (!(t > lo - Pad && t < hi + Pad))
            {
                break;
            }

            var pr = Gibbs(region, t, p);
            double r = Value(pr, entropy) - y;
            if (Math.Abs(r) <= tol)
            {
                result = pr;
                return true;
            }

            t -= r / (entropy ? pr.Cp / t : pr.Cp);
        }

        var f = new GibbsGap { Region = region, P = p, Target = y, Entropy = entropy };
        if (NewtonBisection.TrySolve(ref f, lo - Pad, hi + Pad, t0, out double root, 1e-14))
        {
            result = Gibbs(region, root, p);
            return true;
        }

        result = default;
        return false;
    }

    /// <summary>Region 5 from (p, h or s). Seam: <paramref name="startT"/> (NaN: interpolated start).</summary>
    private static Fit Region5PY(double p, double y, bool entropy, double startT, out StatePoint state)
    {
        state = default;
        if (p > IapwsIf97.PMax5)
        {
            return Fit.Above;
        }

        var low = Region5.Properties(T25, p);
        var high = Region5.Properties(TMax, p);
        if (y > Value(high, entropy))
        {
            return Fit.Above;
        }

        double yl = Value(low, entropy), yh = Value(high, entropy);
        if (y < yl)
        {
            // Below region 5; within the boundary sliver (region 2 and 5 differ slightly at 1073.15 K) solve on region 5 padded.
            var edge = new GibbsGap { Region = 5, P = p, Target = y, Entropy = entropy };
            if (!(edge.Evaluate(T25 - Pad, out _) <= 0))
            {
                return Fit.Below;
            }
        }

        double guess = double.IsNaN(startT) ? T25 + (TMax - T25) * (y - yl) / (yh - yl) : startT;
        var f = new GibbsGap { Region = 5, P = p, Target = y, Entropy = entropy };
        double t = NewtonBisection.Solve(ref f, T25 - Pad, TMax, guess, "IAPWS-IF97 region 5 T(p, h or s)", 1e-14);
        state = Region5.Properties(t, p).ToStatePoint(IapwsIf97.PhaseOf(5, t, p, false));
        return Fit.Ok;
    }

    /// <summary>
    /// Region 3 from (p, h or s), p ≥ psat(623.15 K): bracketed Newton in T on the forward Helmholtz equation, with the
    /// density solved at each T. Seam: <paramref name="startT"/> (an SR3-03 T3(p,h) or T3(p,s) value; NaN: none).
    /// </summary>
    internal static Fit Region3PY(double p, double y, bool entropy, double startT, out StatePoint state)
    {
        double tb = Region3.TemperatureB23(p);
        if (!double.IsNaN(startT) && InRegion3Box(p, y, entropy))
        {
            double v0 = entropy ? Sr303.V3PS(p, y) : Sr303.V3PH(p, y);
            if (TryRegion3Direct(p, y, entropy, startT, 1.0 / v0, T13 - Pad, tb + Pad, out state))
            {
                return Fit.Ok;
            }
        }

        double lo = T13 - Pad, hi = tb + Pad;
        bool liquidSide = true;
        if (p < Region3.Pc)
        {
            double ts = Region4.SaturationTemperature(p);
            SaturatedPhases(ts, p, out var liquid, out var vapour);
            double yl = Value(liquid, entropy), yv = Value(vapour, entropy);
            if (y >= yl && y <= yv)
            {
                state = Mix(liquid, vapour, Quality(liquid, vapour, y, entropy), ts, p);
                return Fit.Ok;
            }

            if (y < yl)
            {
                hi = ts;
            }
            else
            {
                lo = ts;
                liquidSide = false;
            }
        }

        var f = new Region3Gap { P = p, Target = y, Entropy = entropy, LiquidSide = liquidSide, Rho = double.NaN };
        double guess = double.IsNaN(startT) ? 0.5 * (lo + hi) : startT;
        double t = NewtonBisection.Solve(ref f, lo, hi, guess, "IAPWS-IF97 region 3 T(p, h or s)", 1e-14);
        state = Region3TP(t, p, liquidSide, f.Rho);
        return Fit.Ok;
    }

    /// <summary>
    /// Region 3 from (p, h or s) by a two-dimensional Newton iteration in (ρ, T) on the forward Helmholtz equation from
    /// the SR3-03 backward values (T0, ρ0). Accepted only when the result is provably the state the bracketed solver
    /// finds: T within [lo, hi], ∂p/∂ρ &gt; 0, and below Tc the density on the side of ρc that the phase requires (T below
    /// Tsat(p): liquid; above: vapour; p ≥ pc: liquid) with ρc inside the van der Waals loop. h and s rise with T along
    /// the isobar, so a liquid root below Tsat(p) (vapour root above it) also proves the state is not two-phase.
    /// False (the caller then brackets) if the iteration leaves the region, stalls, or any check fails.
    /// </summary>
    private static bool TryRegion3Direct(double p, double y, bool entropy, double t0, double rho0, double lo, double hi, out StatePoint state)
    {
        state = default;
        double t = t0, rho = rho0;
        double tolY = PolishTolerance * Math.Max(Math.Abs(y), entropy ? 0.01 : 1.0);
        bool converged = false;
        double dpdr = 0;
        for (int i = 0; i < 10 && !converged; i++)
        {
            if (!(t > lo && t < hi && rho > Region3Density.RhoLow && rho < Region3Density.RhoHigh))
            {
                return false;
            }

            Region3.Sums(rho, t, out double phi, out double dPd, out double d2Pdd, out double tPt, out double t2Ptt, out double dtPdt);
            double rt = Props.R * t;
            double rp = rho * rt * dPd * 1e-3 - p;
            dpdr = rt * (2 * dPd + d2Pdd) * 1e-3;
            double dpdt = rho * Props.R * (dPd - dtPdt) * 1e-3;
            double ry, dydr, dydt;
            if (entropy)
            {
                ry = Props.R * (tPt - phi) - y;
                dydr = Props.R * (dtPdt - dPd) / rho;
                dydt = -Props.R * t2Ptt / t;
            }
            else
            {
                ry = rt * (tPt + dPd) - y;
                dydr = rt * (dtPdt + dPd + d2Pdd) / rho;
                dydt = Props.R * (dPd - t2Ptt - dtPdt);
            }

            double det = dpdr * dydt - dpdt * dydr;
            double dr = (rp * dydt - ry * dpdt) / det;
            double dt = (dpdr * ry - dydr * rp) / det;
            if (double.IsNaN(dr) || double.IsNaN(dt))
            {
                return false;
            }

            rho -= dr;
            t -= dt;
            converged = Math.Abs(dr) <= 1e-13 * rho && Math.Abs(dt) <= 1e-13 * t && Math.Abs(ry) <= tolY;
        }

        if (!converged || !(dpdr > 0) || !(t > lo && t < hi))
        {
            return false;
        }

        bool liquidSide = true;
        if (p < Region3.Pc)
        {
            liquidSide = t < Region4.SaturationTemperature(p);
        }

        if (t < Region3.Tc)
        {
            Region3.Pressure(Region3.RhoC, t, out double slopeC);
            if (!(slopeC < 0) || (liquidSide ? rho <= Region3.RhoC : rho >= Region3.RhoC))
            {
                return false;
            }
        }

        var pr = Region3.Properties(rho, t);
        if (!(Math.Abs(Value(pr, entropy) - y) <= tolY))
        {
            return false;
        }

        state = pr.ToStatePoint(IapwsIf97.PhaseOf(3, t, p, liquidSide)) with { P = p * 1e6 };
        return true;
    }

    // ------------------------------------------------------------ (T, y) with y = s or v, by iteration in ln p

    private struct IsothermGap : IScalarFunction
    {
        public double T;
        public double Target;
        public bool Volume;
        public bool LiquidSide;

        public readonly double Evaluate(double lnp)
        {
            var st = SinglePhaseTP(T, Math.Exp(lnp), LiquidSide);
            return Volume ? Math.Log(st.V) - Target : st.S * 1e-3 - Target;
        }
    }

    /// <summary>State from (T K, s kJ/(kg·K)) or (T K, v m³/kg) with <paramref name="volume"/>.</summary>
    internal static Fit SolveTY(double t, double y, bool volume, out StatePoint state)
    {
        double pMax = t > T25 ? IapwsIf97.PMax5 : IapwsIf97.PMax;
        double pLo = IapwsIf97.PSearchMin, pHi = pMax;
        bool liquidSide = false;
        if (t <= Region3.Tc)
        {
            double ps = t >= Region3.Tc ? Region3.Pc : Region4.SaturationPressure(t);
            SaturatedPhases(t, ps, out var liquid, out var vapour);
            double yl = volume ? liquid.V : liquid.S, yv = volume ? vapour.V : vapour.S;
            if (y >= yl && y <= yv)
            {
                double x = yv == yl ? 0.0 : Math.Clamp((y - yl) / (yv - yl), 0.0, 1.0);
                state = Mix(liquid, vapour, x, t, ps);
                return Fit.Ok;
            }

            if (y < yl)
            {
                pLo = ps;
                liquidSide = true;
            }
            else
            {
                pHi = ps;
            }

            if (volume && t > T13 && t < Region3.Tc)
            {
                double p3 = Region3.Pressure(1.0 / y, t, out _);
                if (p3 >= Region3.PressureB23(t) && p3 <= pMax)
                {
                    state = Region3.Properties(1.0 / y, t).ToStatePoint(IapwsIf97.PhaseOf(3, t, p3, liquidSide));
                    return Fit.Ok;
                }
            }
        }
        else if (volume && t <= IapwsIf97.TB23Max)
        {
            double p3 = Region3.Pressure(1.0 / y, t, out double slope);
            if (slope > 0 && p3 >= Region3.PressureB23(t) && p3 <= pMax)
            {
                state = Region3.Properties(1.0 / y, t).ToStatePoint(IapwsIf97.PhaseOf(3, t, p3, false));
                return Fit.Ok;
            }
        }

        var f = new IsothermGap { T = t, Target = volume ? Math.Log(y) : y, Volume = volume, LiquidSide = liquidSide };
        double fLo = f.Evaluate(Math.Log(pLo)), fHi = f.Evaluate(Math.Log(pHi));

        // s and v both fall as p rises along an isotherm (liquid water below about 277 K aside, where s rises with p).
        double endTol = volume ? 1e-12 : 1e-12 * Math.Max(Math.Abs(y), 1.0);
        if (!(fLo * fHi <= 0) && Math.Min(Math.Abs(fLo), Math.Abs(fHi)) <= endTol)
        {
            state = SinglePhaseTP(t, Math.Abs(fLo) < Math.Abs(fHi) ? pLo : pHi, liquidSide);
            return Fit.Ok;
        }

        if (!(fLo * fHi <= 0))
        {
            state = default;
            bool belowAll = volume ? f.Target < Math.Min(Math.Log(SinglePhaseTP(t, pHi, liquidSide).V), Math.Log(SinglePhaseTP(t, pLo, liquidSide).V))
                : y < Math.Min(SinglePhaseTP(t, pHi, liquidSide).S, SinglePhaseTP(t, pLo, liquidSide).S) * 1e-3;
            return belowAll ? Fit.Below : Fit.Above;
        }

        if (!Brent.TrySolve(ref f, Math.Log(pLo), Math.Log(pHi), out double lnp, 1e-14))
        {
            throw new NonConvergenceException("IAPWS-IF97: p(T, s or v) did not converge.");
        }

        state = SinglePhaseTP(t, Math.Exp(lnp), liquidSide);
        return Fit.Ok;
    }

    // ------------------------------------------------------------ (p, v) by iteration in T

    private struct IsobarVolumeGap : IScalarFunction
    {
        public double P;
        public double LnV;
        public bool LiquidSide;

        public readonly double Evaluate(double t) => Math.Log(SinglePhaseTP(t, P, LiquidSide).V) - LnV;
    }

    /// <summary>State from (p MPa, v m³/kg).</summary>
    internal static Fit SolvePV(double p, double v, out StatePoint state)
    {
        double tHi = p > IapwsIf97.PMax5 ? T25 : TMax;
        double tLo = TMin;
        bool liquidSide = false;
        if (p >= IapwsIf97.PSatMin && p <= Region3.Pc)
        {
            double ts = p >= Region3.Pc ? Region3.Tc : Region4.SaturationTemperature(p);
            SaturatedPhases(ts, p, out var liquid, out var vapour);
            if (v >= liquid.V && v <= vapour.V)
            {
                double x = vapour.V == liquid.V ? 0.0 : Math.Clamp((v - liquid.V) / (vapour.V - liquid.V), 0.0, 1.0);
                state = Mix(liquid, vapour, x, ts, p);
                return Fit.Ok;
            }

            if (v < liquid.V)
            {
                tHi = ts;
                liquidSide = true;
            }
            else
            {
                tLo = ts;
            }
        }

        var f = new IsobarVolumeGap { P = p, LnV = Math.Log(v), LiquidSide = liquidSide };
        double fLo = f.Evaluate(tLo), fHi = f.Evaluate(tHi);
        if (!(fLo * fHi <= 0) && Math.Min(Math.Abs(fLo), Math.Abs(fHi)) <= 1e-12)
        {
            state = SinglePhaseTP(Math.Abs(fLo) < Math.Abs(fHi) ? tLo : tHi, p, liquidSide);
            return Fit.Ok;
        }
        if (!(fLo * fHi <= 0))
        {
            // Liquid near its density maximum (about 277 K): v(T) is not monotonic; look for the root above the maximum.
            bool found = false;
            if (liquidSide || tLo == TMin)
            {
                double prev = fLo, tPrev = tLo, tEnd = Math.Min(tHi, 320.0);
                for (double tk = tLo + 1.0; tk <= tEnd; tk += 1.0)
                {
                    double fk = f.Evaluate(tk);
                    if (prev * fk <= 0)
                    {
                        tLo = tPrev;
                        tHi = tk;
                        found = true;
                    }

                    prev = fk;
                    tPrev = tk;
                }

                if (tPrev < tEnd && prev * f.Evaluate(tEnd) <= 0)
                {
                    tLo = tPrev;
                    tHi = tEnd;
                    found = true;
                }
            }

            if (!found)
            {
                state = default;
                return fLo > 0 && fHi > 0 ? Fit.Below : Fit.Above;
            }
        }

        if (!Brent.TrySolve(ref f, tLo, tHi, out double t, 1e-12))
        {
            throw new NonConvergenceException("IAPWS-IF97: T(p, v) did not converge.");
        }

        // As for the isochores: at the region 2/5 boundary (1073.15 K) v jumps slightly, so a second root can sit just
        // above it; prefer the region-2 state when region 2 reaches the volume.
        if (t > T25 && t < T25 + 1.0 && tLo < T25 && f.Evaluate(T25) >= 0 && Brent.TrySolve(ref f, tLo, T25, out double below, 1e-12))
        {
            t = below;
        }

        state = SinglePhaseTP(t, p, liquidSide);
        return Fit.Ok;
    }

    // ------------------------------------------------------------ (h, s), (v, u), (v, s): nested iteration

    private struct HsGap : IScalarFunction
    {
        public double H;
        public double S;

        public readonly double Evaluate(double lnp)
        {
            double p = Math.Exp(lnp);
            return SolvePY(p, H, false, out var st) switch
            {
                Fit.Ok => st.S * 1e-3 - S,
                Fit.Below when p < IapwsIf97.PSatMin => 1e3,
                _ => -1e3,
            };
        }
    }

    /// <summary>
    /// State from (h kJ/kg, s kJ/(kg·K)) on s(p, h), which falls monotonically with p (∂s/∂p at constant h is −v/T):
    /// from <paramref name="startP"/> (MPa, a <see cref="BackwardPressureHS"/> value) Newton in ln p; without a start
    /// (NaN), or when the Newton iteration cannot finish, Brent in ln p over the whole pressure range.
    /// </summary>
    internal static bool SolveHS(double h, double s, double startP, out StatePoint state)
    {
        if (startP > 0 && TryNewtonHS(h, s, Math.Clamp(startP, IapwsIf97.PSearchMin, IapwsIf97.PMax), out state))
        {
            return true;
        }

        var f = new HsGap { H = h, S = s };
        double lo = Math.Log(IapwsIf97.PSearchMin), hi = Math.Log(IapwsIf97.PMax);
        if (!double.IsNaN(startP) && startP > IapwsIf97.PSearchMin && startP < IapwsIf97.PMax)
        {
            // Narrow the bracket around the starting value when it holds a sign change.
            double a = Math.Log(startP * 0.999), b = Math.Log(Math.Min(startP * 1.001, IapwsIf97.PMax));
            if (f.Evaluate(a) * f.Evaluate(b) <= 0)
            {
                lo = a;
                hi = b;
            }
        }

        state = default;
        double fHi = f.Evaluate(hi);
        double lnp;
        if (Math.Abs(fHi) <= 1e-12 * Math.Max(Math.Abs(s), 1.0))
        {
            lnp = hi;
        }
        else if (!Brent.TrySolve(ref f, lo, hi, out lnp, 1e-15))
        {
            return false;
        }

        if (SolvePY(Math.Exp(lnp), h, false, out state) != Fit.Ok)
        {
            return false;
        }

        return Math.Abs(state.S * 1e-3 - s) <= 1e-9 * Math.Max(Math.Abs(s), 1.0);
    }

    /// <summary>
    /// (h, s) by Newton's method in ln p on s(p, h) − s from a backward start, each step a (p, h) state; the exact
    /// derivative is ∂s/∂ln p at constant h = −p·v/T (dome included). s(p, h) falls monotonically with p, so the root
    /// is unique and any root found is the state the bracketed solver finds; the sign of each residual narrows a
    /// bracket, and a step leaving it or a (p, h) state that does not exist hands over to the bracketed solver.
    /// </summary>
    private static bool TryNewtonHS(double h, double s, double p0, out StatePoint state)
    {
        double lo = Math.Log(IapwsIf97.PSearchMin), hi = Math.Log(IapwsIf97.PMax);
        double x = Math.Log(p0);
        double scale = Math.Max(Math.Abs(s), 1.0);
        for (int i = 0; i < 8; i++)
        {
            if (SolvePY(Math.Exp(x), h, false, out state) != Fit.Ok)
            {
                return false;
            }

            double g = state.S * 1e-3 - s;
            if (g > 0)
            {
                lo = x; // s too high: p is too low
            }
            else
            {
                hi = x;
            }

            double step = g / (state.P * state.V / state.T * 1e-3);
            if (Math.Abs(step) <= 1e-14 || Math.Abs(g) <= 2e-15 * scale)
            {
                return Math.Abs(g) <= 1e-9 * scale;
            }

            double next = x + step;
            if (!(next >= lo && next <= hi))
            {
                break;
            }

            x = next;
        }

        // Stalled at the noise floor of s(p, h) (compressed liquid at low p, where s hardly depends on p): accept
        // the last state if it meets the (p, h) polishing tolerance, as the bracketed solver would.
        return SolvePY(Math.Exp(x), h, false, out state) == Fit.Ok && Math.Abs(state.S * 1e-3 - s) <= PolishTolerance * scale;
    }

    /// <summary>
    /// Starting pressure (MPa) for an (h kJ/kg, s kJ/(kg·K)) state from the supplementary backward equations, with the
    /// region chosen by the SR4-04 boundary lines at s: h'1(s) and h'3a(s) (saturated liquid), h''2ab(s) and h''2c3b(s)
    /// (saturated vapour), hB13(s) (regions 1/3), TB23(h, s) with pB23 (regions 2/3). Region 1: SR2-01 p1(h,s);
    /// region 2: p2(h,s); region 3: SR4-04 p3(h,s); wet steam: psat(Tsat(h,s)) of SR4-04. NaN where no backward equation
    /// applies (region 5, wet steam with s below s''(623.15 K), outside the bounding boxes): the caller then brackets.
    /// </summary>
    internal static double BackwardPressureHS(double h, double s)
    {
        if (double.IsNaN(h) || double.IsNaN(s))
        {
            return double.NaN;
        }

        if (s <= Sr303.SSatLiquid623)
        {
            // At a given s, h rises with p (dh = v·dp): wet states lie below the saturated-liquid line. Within 1 kJ/kg
            // of it (compressed liquid at low p is that close) the region-1 start is still the better guess.
            if (s >= Sr404.SSatLiquid273 && h < Sr404.HSatLiquid1(s) - 1.0)
            {
                return WetStartWithoutBackward;
            }

            if (s >= Sr303.Region3SMin && h > Sr404.HB13(s))
            {
                return Region3PressureHS(h, s);
            }

            return h >= Sr201.Region1HMin && h <= Sr201.Region1HMax && s >= Sr201.Region1SMin ? Sr201.P1HS(h, s) : double.NaN;
        }

        if (s <= Sr303.SCritical)
        {
            return h < Sr404.HSatLiquid3a(s) - 1.0 ? WetStartWithoutBackward : Region3PressureHS(h, s);
        }

        if (s <= Sr404.S2bc)
        {
            double hv = Sr404.HSatVapour2c3b(s);
            if (h < hv)
            {
                return WetPressureHS(h, s, hv);
            }

            if (s >= Sr404.SB23Min && s <= Sr404.SB23Max && h >= Sr404.HB23Min && h <= Sr404.HB23Max)
            {
                double pb = Region3.PressureB23(Sr404.TB23(h, s));
                double p2 = Sr201.P2cHS(h, s);
                return p2 > pb ? Region3PressureHS(h, s) : p2;
            }

            return s < Sr404.SB23Min ? Region3PressureHS(h, s) : Region2PressureHS(h, s);
        }

        if (s <= Sr404.SSatVapour273)
        {
            double hv = Sr404.HSatVapour2ab(s);
            if (h < hv)
            {
                return WetPressureHS(h, s, hv);
            }
        }

        return Region2PressureHS(h, s);
    }

    /// <summary>
    /// Start (MPa) for wet steam with s below s''(623.15 K), where SR4-04 gives no Tsat(h,s): a fixed mid-dome pressure;
    /// s(p, h) is smooth and nearly linear in ln p across the dome, so Newton needs a few more steps but no bracket.
    /// </summary>
    private const double WetStartWithoutBackward = 1.0;

    /// <summary>Lowest pressure (MPa) the region-2 start below SR2-01's entropy range aims at (dilute steam).</summary>
    private const double DiluteSteamStart = 1e-3;

    private static double Region2PressureHS(double h, double s)
    {
        if (h >= Sr201.Region2HMin && h <= Sr201.Region2HMax && s >= Sr201.Region2SMin && s <= Sr201.Region2SMax)
        {
            return Sr201.P2HS(h, s);
        }

        // Beyond SR2-01's entropy range the steam is dilute and nearly ideal: s falls by R per unit of ln p at constant h,
        // so scale a low reference pressure by exp(−(s − s_max)/R).
        return s > Sr201.Region2SMax && h >= Sr201.Region2HMin && h <= Sr201.Region2HMax
            ? DiluteSteamStart * Math.Exp(-(s - Sr201.Region2SMax) / Props.R)
            : double.NaN;
    }

    private static double Region3PressureHS(double h, double s) =>
        h >= Sr303.Region3HMin && h <= Sr303.Region3HMax && s >= Sr303.Region3SMin && s <= Sr303.Region3SMax ? Sr404.P3HS(h, s) : double.NaN;

    private static double WetPressureHS(double h, double s, double hVapour)
    {
        double hTriple = Sr404.HSatLiquid273 + TMin * (s - Sr404.SSatLiquid273);
        if (!(h >= hTriple && h <= hVapour))
        {
            return double.NaN;
        }

        if (s < Sr303.SSatVapour623)
        {
            return WetStartWithoutBackward;
        }

        double t = Sr404.TsatHS(h, s);
        return t >= TMin && t <= T13 ? Region4.SaturationPressure(t) : double.NaN;
    }

    private struct IsochoreGap : IScalarFunction
    {
        public double V;
        public double Target;
        public bool Entropy;

        public readonly double Evaluate(double t) => SolveTY(t, V, true, out var st) switch
        {
            Fit.Ok => (Entropy ? st.S : st.U) * 1e-3 - Target,
            Fit.Below => 1e6, // v below what T reaches at the highest pressure: T is too high
            _ => -1e6,
        };
    }

    /// <summary>State from (v, u kJ/kg) or (v, s kJ/(kg·K)): Brent in T on u(T, v) or s(T, v), which rise with T.</summary>
    internal static bool SolveVY(double v, double y, bool entropy, out StatePoint state)
    {
        var f = new IsochoreGap { V = v, Target = y, Entropy = entropy };
        state = default;
        double endTol = 1e-12 * Math.Max(Math.Abs(y), 1.0);
        double t;
        if (Math.Abs(f.Evaluate(TMin)) <= endTol)
        {
            t = TMin;
        }
        else if (Math.Abs(f.Evaluate(TMax)) <= endTol)
        {
            t = TMax;
        }
        else if (!Brent.TrySolve(ref f, TMin, TMax, out t, 1e-11))
        {
            return false;
        }

        // Regions 2 and 5 meet at 1073.15 K with slightly different u and s, so just above the boundary the isochore
        // can fall back below a value that region 2 reaches just below it: two roots within about 0.02 K. The state in
        // the region that covers the lower temperature is the one the forward (T, p) model gives; prefer it.
        if (t > T25 && t < T25 + 1.0 && f.Evaluate(T25) >= 0 && Brent.TrySolve(ref f, TMin, T25, out double below, 1e-11))
        {
            t = below;
        }

        if (SolveTY(t, v, true, out state) != Fit.Ok)
        {
            return false;
        }

        double got = (entropy ? state.S : state.U) * 1e-3;
        return Math.Abs(got - y) <= 1e-8 * Math.Max(Math.Abs(y), entropy ? 0.01 : 1.0);
    }
}
