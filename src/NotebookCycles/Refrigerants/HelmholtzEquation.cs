
namespace NotebookCycles.Refrigerants;

/// <summary>
/// The reduced residual Helmholtz energy αʳ(δ, τ) and its derivatives, each scaled by its own powers of δ and τ
/// (δ·αʳ_δ, δ²·αʳ_δδ, τ·αʳ_τ, τ²·αʳ_ττ, δτ·αʳ_δτ): the forms the property relations use.
/// </summary>
internal struct ResidualParts
{
    /// <summary>αʳ.</summary>
    public double A;

    /// <summary>δ·∂αʳ/∂δ.</summary>
    public double D;

    /// <summary>δ²·∂²αʳ/∂δ².</summary>
    public double DD;

    /// <summary>τ·∂αʳ/∂τ.</summary>
    public double T;

    /// <summary>τ²·∂²αʳ/∂τ².</summary>
    public double TT;

    /// <summary>δτ·∂²αʳ/∂δ∂τ.</summary>
    public double DT;
}

/// <summary>The reduced ideal-gas Helmholtz energy α°(δ, τ) and its τ-derivatives, scaled like <see cref="ResidualParts"/>.</summary>
internal struct IdealParts
{
    /// <summary>α° (includes ln δ).</summary>
    public double A;

    /// <summary>τ·∂α°/∂τ.</summary>
    public double T;

    /// <summary>τ²·∂²α°/∂τ².</summary>
    public double TT;
}

/// <summary>
/// A Helmholtz-energy equation of state α(δ, τ) = α°(δ, τ) + αʳ(δ, τ), δ = ρ/ρr, τ = Tr/T, stored as flat term arrays so
/// one evaluation allocates nothing. Term families (the coefficient files name them):
/// ideal part: lead ln δ + a₁ + a₂τ, a·ln τ, power Σ n·τ^t, Planck-Einstein Σ n·ln(1 − e^(−θτ));
/// residual part: power Σ n·δ^d·τ^t·e^(−δ^l) (no exponential for l = 0), Gaussian bell-shaped
/// Σ n·δ^d·τ^t·e^(−η(δ−ε)² − β(τ−γ)²), the associating terms of Gao et al. (2023)
/// Σ n·δ^d·τ^t·e^(−η(δ−ε)² + 1/(β(τ−γ)² + b)), and the non-analytic near-critical terms of Span and Wagner (1996)
/// Σ n·Δ^b·δ·ψ.
/// </summary>
internal sealed class HelmholtzEquation
{
    // Separable residual terms: n·exp(d·ln δ + t·ln τ + F(δ) + G(τ)).
    private readonly double[] _n;
    private readonly double[] _d;
    private readonly double[] _t;
    private readonly int[] _kind; // 0: power without exponential, 1: power with exp(-δ^l), 2: Gaussian, 3: associating
    private readonly int[] _l;
    private readonly double[] _eta;
    private readonly double[] _eps;
    private readonly double[] _beta;
    private readonly double[] _gamma;
    private readonly double[] _b;
    private readonly int[] _di;
    private readonly int[] _tIndex;
    private readonly double[] _uniqueT;
    private readonly int _powMax;

    // Non-analytic terms.
    private readonly double[] _naN;
    private readonly double[] _naA;
    private readonly double[] _naB;
    private readonly double[] _naBeta;
    private readonly double[] _naCapA;
    private readonly double[] _naCapB;
    private readonly double[] _naC;
    private readonly double[] _naD;

    // Ideal part.
    private readonly double _a1;
    private readonly double _a2;
    private readonly double _logTau;
    private readonly double[] _powN;
    private readonly double[] _powT;
    private readonly double[] _peN;
    private readonly double[] _peTheta;

    internal HelmholtzEquation(HelmholtzTermSet terms)
    {
        int count = terms.Residual.Count;
        _n = new double[count];
        _d = new double[count];
        _t = new double[count];
        _kind = new int[count];
        _l = new int[count];
        _eta = new double[count];
        _eps = new double[count];
        _beta = new double[count];
        _gamma = new double[count];
        _b = new double[count];
        for (int i = 0; i < count; i++)
        {
            var r = terms.Residual[i];
            _n[i] = r.N;
            _d[i] = r.D;
            _t[i] = r.T;
            _kind[i] = r.Kind;
            _l[i] = r.L;
            _eta[i] = r.Eta;
            _eps[i] = r.Epsilon;
            _beta[i] = r.Beta;
            _gamma[i] = r.Gamma;
            _b[i] = r.B;
        }

        _di = new int[count];
        _tIndex = new int[count];
        var unique = new List<double>();
        for (int i = 0; i < count; i++)
        {
            if (_d[i] != Math.Round(_d[i]) || _d[i] < 0)
            {
                throw new InvalidOperationException($"Residual term {i + 1}: the density exponent d = {_d[i]} must be a non-negative integer.");
            }

            _di[i] = (int)_d[i];
            int k = unique.IndexOf(_t[i]);
            if (k < 0)
            {
                k = unique.Count;
                unique.Add(_t[i]);
            }

            _tIndex[i] = k;
            _powMax = Math.Max(_powMax, Math.Max(_di[i], _l[i]));
        }

        _uniqueT = [.. unique];

        int na = terms.NonAnalytic.Count;
        _naN = new double[na];
        _naA = new double[na];
        _naB = new double[na];
        _naBeta = new double[na];
        _naCapA = new double[na];
        _naCapB = new double[na];
        _naC = new double[na];
        _naD = new double[na];
        for (int i = 0; i < na; i++)
        {
            var t = terms.NonAnalytic[i];
            _naN[i] = t.N;
            _naA[i] = t.A;
            _naB[i] = t.B;
            _naBeta[i] = t.Beta;
            _naCapA[i] = t.CapA;
            _naCapB[i] = t.CapB;
            _naC[i] = t.C;
            _naD[i] = t.D;
        }

        _a1 = terms.A1;
        _a2 = terms.A2;
        _logTau = terms.LogTau;
        _powN = [.. terms.IdealPowerN];
        _powT = [.. terms.IdealPowerT];
        _peN = [.. terms.PlanckN];
        _peTheta = [.. terms.PlanckTheta];
    }

    /// <summary>Number of residual terms (all families).</summary>
    public int ResidualTermCount => _n.Length + _naN.Length;

    /// <summary>The ideal-gas part at (δ, τ).</summary>
    public IdealParts Ideal(double delta, double tau)
    {
        double lnTau = Math.Log(tau);
        double a = Math.Log(delta) + _a1 + _a2 * tau + _logTau * lnTau;
        double at = _a2 * tau + _logTau;
        double att = -_logTau;
        for (int i = 0; i < _powN.Length; i++)
        {
            double ti = _powT[i];
            double v = _powN[i] * Math.Exp(ti * lnTau);
            a += v;
            at += ti * v;
            att += ti * (ti - 1) * v;
        }

        for (int i = 0; i < _peN.Length; i++)
        {
            double x = _peTheta[i] * tau;
            double e = Math.Exp(-x);
            double one = 1 - e;
            a += _peN[i] * Math.Log(one);
            double q = x * e / one; // x/(e^x − 1)
            at += _peN[i] * q;
            att -= _peN[i] * q * q / e; // x²·e^x/(e^x − 1)²
        }

        return new IdealParts { A = a, T = at, TT = att };
    }

    /// <summary>
    /// The residual part and its scaled derivatives at (δ, τ). The powers δ^d (integer d) come from one table of
    /// products, τ^t from one exponential per distinct t, e^(−δ^l) from one exponential per distinct l; only the
    /// Gaussian, associating and non-analytic terms take an exponential each.
    /// </summary>
    public ResidualParts Residual(double delta, double tau)
    {
        double lnTau = Math.Log(tau);
        double[] uniqueT = _uniqueT;
        Span<double> tauPow = stackalloc double[uniqueT.Length];
        for (int k = 0; k < uniqueT.Length; k++)
        {
            double tk = uniqueT[k];
            tauPow[k] = tk == 0 ? 1 : tk == 1 ? tau : Math.Exp(tk * lnTau);
        }

        int powMax = _powMax;
        Span<double> deltaPow = stackalloc double[powMax + 1];
        Span<double> expL = stackalloc double[powMax + 1];
        deltaPow[0] = 1;
        for (int k = 1; k <= powMax; k++)
        {
            deltaPow[k] = deltaPow[k - 1] * delta;
            expL[k] = double.NaN;
        }

        double a = 0, ad = 0, add = 0, at = 0, att = 0, adt = 0;
        double[] n = _n, t = _t;
        int[] kind = _kind, di = _di, tIndex = _tIndex, ls = _l;
        for (int i = 0; i < n.Length; i++)
        {
            int dInt = di[i];
            double dd = dInt, ti = t[i];
            double v = n[i] * deltaPow[dInt] * tauPow[tIndex[i]];
            double df = 0, ddf = 0, dg = 0, ddg = 0; // δ·F', δ²·F'', τ·G', τ²·G''
            switch (kind[i])
            {
                case 1:
                    {
                        int l = ls[i];
                        double dl = deltaPow[l];
                        double e = expL[l];
                        if (double.IsNaN(e))
                        {
                            e = Math.Exp(-dl);
                            expL[l] = e;
                        }

                        v *= e;
                        df = -l * dl;
                        ddf = -l * (l - 1) * dl;
                        break;
                    }

                case 2:
                case 3:
                    {
                        double x = delta - _eps[i];
                        double eta = _eta[i];
                        double f = -eta * x * x;
                        df = -2 * eta * x * delta;
                        ddf = -2 * eta * delta * delta;
                        double y = tau - _gamma[i];
                        double beta = _beta[i];
                        double g;
                        if (kind[i] == 2)
                        {
                            g = -beta * y * y;
                            dg = -2 * beta * y * tau;
                            ddg = -2 * beta * tau * tau;
                        }
                        else
                        {
                            double q = beta * y * y + _b[i];
                            g = 1 / q;
                            double q2 = q * q;
                            dg = -2 * beta * y / q2 * tau;
                            ddg = (-2 * beta / q2 + 8 * beta * beta * y * y / (q2 * q)) * tau * tau;
                        }

                        v *= Math.Exp(f + g);
                        break;
                    }
            }

            double pd = dd + df; // δ·D'/D
            double pt = ti + dg; // τ·T'/T
            a += v;
            ad += v * pd;
            add += v * (pd * pd - dd + ddf);
            at += v * pt;
            att += v * (pt * pt - ti + ddg);
            adt += v * pd * pt;
        }

        if (_naN.Length > 0)
        {
            AddNonAnalytic(delta, tau, ref a, ref ad, ref add, ref at, ref att, ref adt);
        }

        return new ResidualParts { A = a, D = ad, DD = add, T = at, TT = att, DT = adt };
    }

    private void AddNonAnalytic(double delta, double tau, ref double a, ref double ad, ref double add, ref double at, ref double att, ref double adt)
    {
        // Span and Wagner (1996), Table 32: the derivatives of Δ^b and ψ. At δ = 1 exactly some of the intermediate powers
        // are singular while their products are not: step off by 1e-12 relative (far below any printed digit).
        double dm1 = delta - 1;
        if (Math.Abs(dm1) < 1e-12)
        {
            dm1 = dm1 < 0 ? -1e-12 : 1e-12;
            delta = 1 + dm1;
        }

        double sq = dm1 * dm1;
        double tm1 = tau - 1;
        for (int i = 0; i < _naN.Length; i++)
        {
            double n = _naN[i], ai = _naA[i], bi = _naB[i], beta = _naBeta[i], capA = _naCapA[i], capB = _naCapB[i], c = _naC[i], dd = _naD[i];
            double psi = Math.Exp(-c * sq - dd * tm1 * tm1);
            double psiD = -2 * c * dm1 * psi;
            double psiDD = (2 * c * sq - 1) * 2 * c * psi;
            double psiT = -2 * dd * tm1 * psi;
            double psiTT = (2 * dd * tm1 * tm1 - 1) * 2 * dd * psi;
            double psiDT = 4 * c * dd * dm1 * tm1 * psi;

            double inv2b = 1 / (2 * beta);
            double sqPow = Math.Pow(sq, inv2b);          // ((δ−1)²)^(1/(2β))
            double sqPowM1 = sqPow / sq;                  // ((δ−1)²)^(1/(2β)−1)
            double sqA = Math.Pow(sq, ai);                // ((δ−1)²)^a
            double theta = -tm1 + capA * sqPow;
            double delta2 = theta * theta + capB * sqA;   // Δ
            // ∂Δ/∂δ = (δ−1)·brace
            double brace = capA * theta * (2 / beta) * sqPowM1 + 2 * capB * ai * sqA / sq;
            double dDelta = dm1 * brace;
            double ddDelta = brace + sq * (4 * capB * ai * (ai - 1) * sqA / (sq * sq)
                + 2 * capA * capA / (beta * beta) * sqPowM1 * sqPowM1
                + capA * theta * 4 / beta * (inv2b - 1) * sqPowM1 / sq);

            double db1 = Math.Pow(delta2, bi - 1);       // Δ^(b−1)
            double db = db1 * delta2;                     // Δ^b
            double db2 = db1 / delta2;                    // Δ^(b−2)
            double dbD = bi * db1 * dDelta;
            double dbDD = bi * (db1 * ddDelta + (bi - 1) * db2 * dDelta * dDelta);
            double dbT = -2 * theta * bi * db1;
            double dbTT = 2 * bi * db1 + 4 * theta * theta * bi * (bi - 1) * db2;
            double dbDT = -capA * bi * (2 / beta) * db1 * dm1 * sqPowM1 - 2 * theta * bi * (bi - 1) * db2 * dDelta;

            double phi = n * db * delta * psi;
            double phiD = n * (db * (psi + delta * psiD) + dbD * delta * psi);
            double phiDD = n * (db * (2 * psiD + delta * psiDD) + 2 * dbD * (psi + delta * psiD) + dbDD * delta * psi);
            double phiT = n * delta * (dbT * psi + db * psiT);
            double phiTT = n * delta * (dbTT * psi + 2 * dbT * psiT + db * psiTT);
            double phiDT = n * (db * (psiT + delta * psiDT) + delta * dbD * psiT + dbT * (psi + delta * psiD) + dbDT * delta * psi);

            a += phi;
            ad += delta * phiD;
            add += delta * delta * phiDD;
            at += tau * phiT;
            att += tau * tau * phiTT;
            adt += delta * tau * phiDT;
        }
    }
}

/// <summary>One separable residual term as read from a coefficient file.</summary>
internal readonly record struct ResidualTerm(int Kind, double N, double D, double T, int L, double Eta, double Epsilon, double Beta, double Gamma, double B);

/// <summary>One non-analytic term of Span and Wagner (1996).</summary>
internal readonly record struct NonAnalyticTerm(double N, double A, double B, double Beta, double CapA, double CapB, double C, double D);

/// <summary>All terms of one equation, as read from its coefficient file.</summary>
internal sealed class HelmholtzTermSet
{
    public double A1 { get; set; }

    public double A2 { get; set; }

    public double LogTau { get; set; }

    public List<double> IdealPowerN { get; } = [];

    public List<double> IdealPowerT { get; } = [];

    public List<double> PlanckN { get; } = [];

    public List<double> PlanckTheta { get; } = [];

    public List<ResidualTerm> Residual { get; } = [];

    public List<NonAnalyticTerm> NonAnalytic { get; } = [];
}
