namespace NotebookCycles.Refrigerants;

/// <summary>Properties at one (T, ρ) from the Helmholtz energy, in the equation's own reference state, SI per unit mass.</summary>
internal readonly record struct RawState(double T, double Rho, double P, double U, double H, double S, double Cv, double Cp, double W, double DvDT)
{
    /// <summary>Gibbs energy g = h − T·s, J/kg.</summary>
    public double G => H - T * S;
}

/// <summary>A converged saturation state: temperature, pressure and the densities of the two coexisting phases.</summary>
internal readonly record struct SaturationPoint(double T, double P, double RhoLiquid, double RhoVapour);

/// <summary>
/// The numerics of one Helmholtz-energy equation: properties at (T, ρ), density at (T, p) on a chosen branch,
/// saturation by phase equilibrium at T or at p. Raw values (the equation's own reference state).
/// </summary>
internal sealed class HelmholtzFluid
{
    private const int Nodes = 121;
    private readonly HelmholtzEquation _eq;
    private readonly double _tr;
    private readonly double _rhor;
    private readonly double _uMax;
    private readonly double _du;
    private readonly Spline _lnP;
    private readonly Spline _lnDeltaL;
    private readonly Spline _lnDeltaV;
    private readonly Spline _stiffnessL;

    public HelmholtzFluid(RefrigerantData data)
    {
        Data = data;
        _eq = new HelmholtzEquation(data.Terms);
        R = data.MolarGasConstant / data.MolarMass;
        _tr = data.ReducingTemperature;
        _rhor = data.ReducingDensity;
        (Tc, RhoC) = RefineCriticalPoint(data.CriticalTemperature, data.CriticalDensity);
        Pc = Pressure(Tc, RhoC);
        Tt = data.TripleTemperature;
        RhoMax = 6 * _rhor;
        _uMax = Math.Cbrt(1 - Tt / Tc);
        _du = _uMax / (Nodes - 1);
        var lnP = new double[Nodes];
        var lnL = new double[Nodes];
        var lnV = new double[Nodes];
        var kL = new double[Nodes];
        BuildTable(lnP, lnL, lnV, kL);
        _lnP = new Spline(lnP, _du);
        _lnDeltaL = new Spline(lnL, _du);
        _lnDeltaV = new Spline(lnV, _du);
        _stiffnessL = new Spline(kL, _du);
        TriplePressure = TrySaturationAtTemperature(Tt, out var triple) ? triple.P : Math.Exp(lnP[Nodes - 1]);
    }

    public RefrigerantData Data { get; }

    public HelmholtzEquation Equation => _eq;

    /// <summary>Specific gas constant R/M, J/(kg·K).</summary>
    public double R { get; }

    public double Tc { get; }

    public double RhoC { get; }

    public double Pc { get; }

    public double Tt { get; }

    public double TriplePressure { get; }

    public double RhoMax { get; }

    public double ReducingTemperature => _tr;

    public double ReducingDensity => _rhor;

    /// <summary>All properties at (T, ρ).</summary>
    public RawState Evaluate(double t, double rho)
    {
        double delta = rho / _rhor, tau = _tr / t;
        var id = _eq.Ideal(delta, tau);
        var r = _eq.Residual(delta, tau);
        return Compose(t, rho, in id, in r);
    }

    public RawState Compose(double t, double rho, in IdealParts id, in ResidualParts r)
    {
        double rt = R * t;
        double p = rho * rt * (1 + r.D);
        double tauA = id.T + r.T;
        double u = rt * tauA;
        double h = rt * (1 + tauA + r.D);
        double s = R * (tauA - id.A - r.A);
        double tt = id.TT + r.TT;
        double cv = -R * tt;
        double num = 1 + r.D - r.DT;
        double den = 1 + 2 * r.D + r.DD;
        double cp = cv + R * num * num / den;
        double w2 = rt * (den - num * num / tt);
        double dvdt = rho * R * num / (rho * rho * rt * den); // (∂v/∂T)_p = (∂p/∂T)_ρ / (ρ²·(∂p/∂ρ)_T)
        return new RawState(t, rho, p, u, h, s, cv, cp, w2 > 0 ? Math.Sqrt(w2) : double.NaN, dvdt);
    }

    /// <summary>Pressure at (T, ρ), Pa.</summary>
    public double Pressure(double t, double rho)
    {
        var r = _eq.Residual(rho / _rhor, _tr / t);
        return rho * R * t * (1 + r.D);
    }

    /// <summary>Saturation estimate from the table built at construction (starting values only).</summary>
    public void Estimate(double t, out double p, out double rhoL, out double rhoV)
    {
        double u = Math.Cbrt(Math.Max(0, 1 - t / Tc));
        p = Math.Exp(_lnP.At(u));
        rhoL = Math.Exp(_lnDeltaL.At(u)) * _rhor;
        rhoV = Math.Exp(_lnDeltaV.At(u)) * _rhor;
    }

    /// <summary>A starting density at (T, p) on a branch below Tc: the liquid by the saturated liquid's (∂p/∂ρ)_T, the vapour by Z linear in p.</summary>
    public double GuessDensity(double t, double p, bool liquid, double pSat, double rhoL, double rhoV)
    {
        if (liquid)
        {
            double u = Math.Cbrt(Math.Max(0, 1 - t / Tc));
            double dpdrho = R * t * _stiffnessL.At(u);
            return dpdrho > 0 ? rhoL + (p - pSat) / dpdrho : rhoL;
        }

        double zSat = pSat / (rhoV * R * t);
        double z = 1 + (zSat - 1) * p / pSat;
        return Math.Min(p / (z * R * t), rhoV);
    }

    /// <summary>Saturation temperature estimate at pressure p from the table.</summary>
    public double EstimateTemperature(double p) => Tc * (1 - Math.Pow(_lnP.InverseDecreasing(Math.Log(p)), 3));

    /// <summary>
    /// Saturation at T by equal pressure and Gibbs energy of the phases (the method of Akasaka, 2008: Newton on
    /// δ′, δ″ for J(δ) = δ(1 + δαʳ_δ) and K(δ) = δαʳ_δ + αʳ + ln δ). Tt ≤ T &lt; Tc.
    /// </summary>
    public bool TrySaturationAtTemperature(double t, out SaturationPoint sat)
    {
        Estimate(t, out _, out double rl, out double rv);
        return TrySaturationAtTemperature(t, rl / _rhor, rv / _rhor, out sat, out _, out _);
    }

    /// <summary>
    /// Close to Tc: continuation along the saturation line from a temperature twice as far from Tc (where Newton
    /// converges), halving the distance each step and scaling the density differences by 2^(−0.35) (the critical
    /// exponent β ≈ 0.35) for the next start.
    /// </summary>
    public bool TrySaturationNearCritical(double t, out SaturationPoint sat)
    {
        double d = Tc - t;
        double dc = RhoC / _rhor;
        int k = 1;
        SaturationPoint s = default;
        for (; k < 30; k++)
        {
            if (Tc - d * Math.Pow(2, k) > Tt && TrySaturationAtTemperature(Tc - d * Math.Pow(2, k), out s))
            {
                break;
            }
        }

        if (k == 30)
        {
            sat = default;
            return false;
        }

        double factor = Math.Pow(2, -0.35);
        for (int j = k - 1; j >= 0; j--)
        {
            double tj = Tc - d * Math.Pow(2, j);
            double gl = dc + (s.RhoLiquid / _rhor - dc) * factor;
            double gv = dc + (s.RhoVapour / _rhor - dc) * factor;
            if (!TrySaturationAtTemperature(tj, gl, gv, out s, out _, out _))
            {
                sat = default;
                return false;
            }
        }

        sat = s;
        return true;
    }

    private bool TrySaturationAtTemperature(double t, double dl, double dv, out SaturationPoint sat, out ResidualParts rlOut, out ResidualParts rvOut)
    {
        double tau = _tr / t;
        ResidualParts rl = default, rv = default;
        bool converged = false;
        double pSat = double.NaN;
        double bestResidual = double.PositiveInfinity, bestL = double.NaN, bestV = double.NaN, bestP = double.NaN;
        for (int it = 0; it < 60; it++)
        {
            rl = _eq.Residual(dl, tau);
            rv = _eq.Residual(dv, tau);
            double jl = dl * (1 + rl.D), jv = dv * (1 + rv.D);
            double kl = rl.D + rl.A + Math.Log(dl), kv = rv.D + rv.A + Math.Log(dv);
            double jdl = 1 + 2 * rl.D + rl.DD, jdv = 1 + 2 * rv.D + rv.DD;
            double kdl = jdl / dl, kdv = jdv / dv;
            double det = jdv * kdl - jdl * kdv;
            double f1 = jv - jl, f2 = kv - kl;
            double stepL = (f2 * jdv - f1 * kdv) / det;
            double stepV = (f2 * jdl - f1 * kdl) / det;
            if (!double.IsFinite(stepL) || !double.IsFinite(stepV))
            {
                break;
            }

            double lambda = 1;
            while ((dv + lambda * stepV <= 0 || dl + lambda * stepL <= dv + lambda * stepV) && lambda > 1e-3)
            {
                lambda *= 0.5;
            }

            if (lambda == 1 && Math.Abs(stepL) <= 1e-10 * dl && Math.Abs(stepV) <= 1e-10 * dv)
            {
                // Quadratic convergence: after this step the error is of the order of its square. The pressure
                // follows to first order from the last evaluation.
                pSat = _rhor * R * t * (dv * (1 + rv.D) + (1 + 2 * rv.D + rv.DD) * stepV);
                dl += stepL;
                dv += stepV;
                converged = true;
                break;
            }

            // Within millikelvins of Tc the equations J″ = J′, K″ = K′ reach their rounding floor while the
            // ill-conditioned steps still jitter at up to 1e-6 of δ: keep the iterate of smallest residual and accept
            // it below (at most 1e-12 relative).
            double residual = Math.Abs(f1) / Math.Max(1, jv) + Math.Abs(f2) / Math.Max(1, Math.Abs(kv));
            if (t > 0.999 * Tc && residual < bestResidual)
            {
                bestResidual = residual;
                bestL = dl;
                bestV = dv;
                bestP = dv * _rhor * R * t * (1 + rv.D);
            }

            dl += lambda * stepL;
            dv += lambda * stepV;
        }

        if (!converged && bestResidual < 1e-12)
        {
            (dl, dv, pSat) = (bestL, bestV, bestP);
            converged = true;
        }

        rlOut = rl;
        rvOut = rv;
        if (!converged || !(dl > dv * (1 + 1e-9)) || dv <= 0)
        {
            sat = default;
            return false;
        }

        sat = new SaturationPoint(t, pSat, dl * _rhor, dv * _rhor);
        return true;
    }

    /// <summary>
    /// Saturation at pressure p, p_triple ≤ p &lt; pc: Newton on (T, δ′, δ″) together; next to pc, and should that
    /// fail, Newton on T with the Clausius-Clapeyron slope d ln p/dT = Δs/(p·Δv), each step a phase-equilibrium solve
    /// at T warm-started from the last.
    /// </summary>
    public bool TrySaturationAtPressure(double p, out SaturationPoint sat) =>
        (p < 0.995 * Pc && TrySaturationAtPressureDirect(p, out sat)) || TrySaturationAtPressureNested(p, out sat);

    /// <summary>
    /// Saturation at p by Newton on (T, δ′, δ″) together: p(T, δ′) = p, p(T, δ″) = p and equal Gibbs energy,
    /// started from the table.
    /// </summary>
    private bool TrySaturationAtPressureDirect(double p, out SaturationPoint sat)
    {
        double t = EstimateTemperature(p);
        Estimate(t, out _, out double rl0, out double rv0);
        double dl = rl0 / _rhor, dv = rv0 / _rhor;
        for (int it = 0; it < 30; it++)
        {
            double tau = _tr / t;
            var rl = _eq.Residual(dl, tau);
            var rv = _eq.Residual(dv, tau);
            double rt = R * t, scale = _rhor / p;
            double f1 = dl * scale * rt * (1 + rl.D) - 1;
            double f2 = dv * scale * rt * (1 + rv.D) - 1;
            double f3 = Math.Log(dl / dv) + rl.A - rv.A + rl.D - rv.D;
            double kl = 1 + 2 * rl.D + rl.DD, kv = 1 + 2 * rv.D + rv.DD;
            double a1 = dl * scale * R * (1 + rl.D - rl.DT), b1 = scale * rt * kl;
            double a2 = dv * scale * R * (1 + rv.D - rv.DT), b2 = scale * rt * kv;
            double a3 = -(rl.T + rl.DT - rv.T - rv.DT) / t, c3 = kl / dl, e3 = -kv / dv;
            double den = a3 - c3 * a1 / b1 - e3 * a2 / b2;
            double dt = -(f3 - c3 * f1 / b1 - e3 * f2 / b2) / den;
            double ddl = -(f1 + a1 * dt) / b1;
            double ddv = -(f2 + a2 * dt) / b2;
            if (!double.IsFinite(dt) || !double.IsFinite(ddl) || !double.IsFinite(ddv))
            {
                break;
            }

            if (Math.Abs(dt) <= 1e-10 * t && Math.Abs(ddl) <= 1e-10 * dl && Math.Abs(ddv) <= 1e-10 * dv)
            {
                t += dt;
                sat = new SaturationPoint(t, p, (dl + ddl) * _rhor, (dv + ddv) * _rhor);
                return t >= Tt * (1 - 1e-9) && t < Tc && dl > dv;
            }

            double lambda = 1;
            while ((dv + lambda * ddv <= 0 || dl + lambda * ddl <= dv + lambda * ddv || t + lambda * dt >= Tc) && lambda > 1e-4)
            {
                lambda *= 0.5;
            }

            t += lambda * dt;
            dl += lambda * ddl;
            dv += lambda * ddv;
        }

        sat = default;
        return false;
    }

    private bool TrySaturationAtPressureNested(double p, out SaturationPoint sat)
    {
        double t = EstimateTemperature(p);
        t = Math.Min(Math.Max(t, Tt), Tc * (1 - 1e-12));
        Estimate(t, out _, out double rl, out double rv);
        double dl = rl / _rhor, dv = rv / _rhor;
        double lnTarget = Math.Log(p);
        double lo = Tt * (1 - 1e-9), hi = Tc;
        for (int it = 0; it < 40; it++)
        {
            if (!TrySaturationAtTemperature(t, dl, dv, out var s, out var rL, out var rV))
            {
                if (!TrySaturationAtTemperature(t, out s))
                {
                    sat = default;
                    return false;
                }

                double tau0 = _tr / t;
                rL = _eq.Residual(s.RhoLiquid / _rhor, tau0);
                rV = _eq.Residual(s.RhoVapour / _rhor, tau0);
            }

            dl = s.RhoLiquid / _rhor;
            dv = s.RhoVapour / _rhor;
            double f = Math.Log(s.P) - lnTarget;
            if (f > 0)
            {
                hi = t;
            }
            else
            {
                lo = t;
            }

            double ds = R * (rV.T - rL.T - (rV.A - rL.A) - Math.Log(dv / dl));
            double dvol = 1 / s.RhoVapour - 1 / s.RhoLiquid;
            double slope = ds / (dvol * s.P); // d ln p / dT
            double step = f / slope;
            double next = t - step;
            if (!(next > lo && next < hi))
            {
                next = 0.5 * (lo + hi);
            }

            if (Math.Abs(f) < 2e-15 || Math.Abs(next - t) < 1e-13 * t)
            {
                sat = s;
                return true;
            }

            t = next;
        }

        sat = default;
        return false;
    }

    /// <summary>
    /// Density at (T, p) on one branch: the liquid root lies in [ρ′, ρmax], the vapour root in (0, ρ″], above Tc the one
    /// root in (0, ρmax]. <paramref name="rhoLow"/> and <paramref name="rhoHigh"/> bound the branch; the residual is
    /// assumed negative at the low end and positive at the high end, which the solver confirms on the way.
    /// </summary>
    public bool TryDensity(double t, double p, double rhoLow, double rhoHigh, double guess, out double rho)
    {
        // Newton in x = ln ρ on f = p(ρ) − p, safeguarded by bisection on the bracket [ln ρlow, ln ρhigh].
        double tau = _tr / t;
        double rt = R * t;
        bool sawLow = rhoLow <= 0, sawHigh = false;
        double xlo = rhoLow > 0 ? Math.Log(rhoLow) : Math.Log(1e-14 * _rhor), xhi = Math.Log(rhoHigh);
        double x = guess > rhoLow && guess < rhoHigh ? Math.Log(guess) : 0.5 * (xlo + xhi);

        for (int it = 0; it < 100; it++)
        {
            double r = Math.Exp(x);
            var res = _eq.Residual(r / _rhor, tau);
            double pr = r * rt * (1 + res.D);
            double dpdx = r * rt * (1 + 2 * res.D + res.DD); // ρ·dp/dρ
            double f = pr - p;
            if (Math.Abs(f) <= 1e-15 * p)
            {
                rho = r;
                return true;
            }

            if (f < 0)
            {
                xlo = x;
                sawLow = true;
            }
            else
            {
                xhi = x;
                sawHigh = true;
            }

            double next = x - f / dpdx;
            if (dpdx > 0 && Math.Abs(next - x) < 1e-11)
            {
                // Quadratic convergence: the error after this step is of the order of its square.
                rho = Math.Exp(Math.Clamp(next, xlo, xhi));
                return true;
            }

            if (!(dpdx > 0 && next > xlo && next < xhi))
            {
                next = 0.5 * (xlo + xhi);
            }

            if (xhi - xlo <= 2e-15 * Math.Max(1, Math.Abs(x)) || next == x)
            {
                rho = Math.Exp(next);
                return Math.Abs(f) <= 1e-9 * p || (sawLow && sawHigh);
            }

            x = next;
        }

        rho = Math.Exp(x);
        return false;
    }

    /// <summary>
    /// The critical point of the equation: (∂p/∂ρ)_T = 0 and (∂²p/∂ρ²)_T = 0, by Newton from the coefficient file's
    /// value with central differences of k = 1 + 2δαʳ_δ + δ²αʳ_δδ; the file's value is kept if Newton does not settle.
    /// </summary>
    private (double T, double Rho) RefineCriticalPoint(double t0, double rho0)
    {
        double tau = _tr / t0, delta = rho0 / _rhor;
        double K(double d, double tt)
        {
            var r = _eq.Residual(d, tt);
            return (1 + 2 * r.D + r.DD) / d; // ∝ (∂p/∂ρ)_T / T
        }

        const double h = 1e-4;
        for (int it = 0; it < 30; it++)
        {
            double k0 = K(delta, tau);
            double kp = K(delta + h, tau), km = K(delta - h, tau);
            double k1 = (kp - km) / (2 * h); // ∂k/∂δ
            double kt = (K(delta, tau + h) - K(delta, tau - h)) / (2 * h);
            double k1t = ((K(delta + h, tau + h) - K(delta - h, tau + h)) - (K(delta + h, tau - h) - K(delta - h, tau - h))) / (4 * h * h);
            double k2 = (kp - 2 * k0 + km) / (h * h);
            // Newton on F = (k, ∂k/∂δ): J = [[∂k/∂δ, ∂k/∂τ], [∂²k/∂δ², ∂²k/∂δ∂τ]].
            double a11 = k1, a12 = kt, a21 = k2, a22 = k1t;
            double det = a11 * a22 - a12 * a21;
            double dd = -(k0 * a22 - a12 * k1) / det;
            double dt = -(a11 * k1 - a21 * k0) / det;
            if (!double.IsFinite(dd) || !double.IsFinite(dt))
            {
                return (t0, rho0);
            }

            delta += dd;
            tau += dt;
            if (Math.Abs(dd) < 1e-10 && Math.Abs(dt) < 1e-11)
            {
                double t = _tr / tau, rho = delta * _rhor;
                return Math.Abs(t - t0) < 1e-3 * t0 && Math.Abs(rho - rho0) < 0.05 * rho0 ? (t, rho) : (t0, rho0);
            }
        }

        return (t0, rho0);
    }

    private void BuildTable(double[] lnP, double[] lnL, double[] lnV, double[] kL)
    {
        double lnDc = Math.Log(RhoC / _rhor);
        lnP[0] = Math.Log(Pc);
        lnL[0] = lnDc;
        lnV[0] = lnDc;
        var ok = new bool[Nodes];
        ok[0] = true;

        // Start where the critical-scaling estimate is good enough for Newton, then continue to both ends.
        int start = (int)Math.Round(Math.Cbrt(0.04) / _du);
        start = Math.Clamp(start, 2, Nodes - 1);
        double ts = Tc * (1 - Math.Pow(start * _du, 3));
        double tred = 1 - ts / Tc;
        double dcL = RhoC / _rhor * (1 + 2.0 * Math.Pow(tred, 0.35));
        double dcV = RhoC / _rhor * Math.Max(0.02, 1 - 2.0 * Math.Pow(tred, 0.35) - 2 * tred);
        if (!TrySaturationAtTemperature(ts, dcL, dcV, out var s0, out _, out _))
        {
            throw new InvalidOperationException($"{Data.Fluid}: saturation could not be started at {ts} K.");
        }

        Store(start, s0);
        for (int i = start + 1; i < Nodes; i++)
        {
            Extrapolate(i, i - 1, i - 2);
        }

        for (int i = start - 1; i >= 1; i--)
        {
            Extrapolate(i, i + 1, i + 2);
        }

        // Nodes next to the critical point that Newton could not resolve: fill along the scaling law from the critical
        // point (these are starting values only).
        for (int i = 1; i < Nodes; i++)
        {
            if (!ok[i])
            {
                int j = i;
                while (j < Nodes && !ok[j])
                {
                    j++;
                }

                if (j == Nodes)
                {
                    throw new InvalidOperationException($"{Data.Fluid}: saturation table incomplete.");
                }

                for (int k = i; k < j; k++)
                {
                    double w = (double)(k - (i - 1)) / (j - (i - 1));
                    lnP[k] = lnP[i - 1] + w * (lnP[j] - lnP[i - 1]);
                    lnL[k] = lnL[i - 1] + w * (lnL[j] - lnL[i - 1]);
                    lnV[k] = lnV[i - 1] + w * (lnV[j] - lnV[i - 1]);
                    kL[k] = kL[i - 1] + w * (kL[j] - kL[i - 1]);
                }

                i = j;
            }
        }

        void Store(int i, SaturationPoint s)
        {
            lnP[i] = Math.Log(s.P);
            lnL[i] = Math.Log(s.RhoLiquid / _rhor);
            lnV[i] = Math.Log(s.RhoVapour / _rhor);
            var r = _eq.Residual(s.RhoLiquid / _rhor, _tr / s.T);
            kL[i] = 1 + 2 * r.D + r.DD;
            ok[i] = true;
        }

        void Extrapolate(int i, int a, int b)
        {
            double t = Tc * (1 - Math.Pow(i * _du, 3));
            if (i == Nodes - 1)
            {
                t = Tt;
            }

            double gl, gv;
            if (b >= 0 && b < Nodes && ok[a] && ok[b] && b != 0)
            {
                gl = 2 * lnL[a] - lnL[b];
                gv = 2 * lnV[a] - lnV[b];
            }
            else if (ok[a])
            {
                gl = lnL[a];
                gv = lnV[a];
            }
            else
            {
                return;
            }

            if (TrySaturationAtTemperature(t, Math.Exp(gl), Math.Exp(gv), out var s, out _, out _))
            {
                Store(i, s);
            }
        }
    }

    /// <summary>A natural cubic spline on a uniform grid starting at 0.</summary>
    private sealed class Spline
    {
        private readonly double[] _y;
        private readonly double[] _m;
        private readonly double _h;

        public Spline(double[] y, double h)
        {
            _y = y;
            _h = h;
            int n = y.Length;
            _m = new double[n];
            var c = new double[n];
            var d = new double[n];
            for (int i = 1; i < n - 1; i++)
            {
                double rhs = 6 * (y[i + 1] - 2 * y[i] + y[i - 1]) / (h * h);
                double denom = 4 - (i > 1 ? c[i - 1] : 0);
                c[i] = 1 / denom;
                d[i] = (rhs - (i > 1 ? d[i - 1] : 0)) / denom;
            }

            for (int i = n - 2; i >= 1; i--)
            {
                _m[i] = d[i] - c[i] * _m[i + 1];
            }
        }

        public double At(double u)
        {
            int n = _y.Length;
            int k = (int)(u / _h);
            k = Math.Clamp(k, 0, n - 2);
            double a = (k + 1) * _h - u, b = u - k * _h;
            return (_m[k] * a * a * a + _m[k + 1] * b * b * b) / (6 * _h)
                + (_y[k] / _h - _m[k] * _h / 6) * a + (_y[k + 1] / _h - _m[k + 1] * _h / 6) * b;
        }

        /// <summary>u with At(u) = value, for a decreasing spline (bisection then Newton-free refinement).</summary>
        public double InverseDecreasing(double value)
        {
            int lo = 0, hi = _y.Length - 1;
            if (value >= _y[0])
            {
                return 0;
            }

            if (value <= _y[hi])
            {
                return hi * _h;
            }

            while (hi - lo > 1)
            {
                int mid = (lo + hi) / 2;
                if (_y[mid] > value)
                {
                    lo = mid;
                }
                else
                {
                    hi = mid;
                }
            }

            double a = lo * _h, b = hi * _h;
            for (int i = 0; i < 40; i++)
            {
                double m = 0.5 * (a + b);
                if (At(m) > value)
                {
                    a = m;
                }
                else
                {
                    b = m;
                }
            }

            return 0.5 * (a + b);
        }
    }
}
