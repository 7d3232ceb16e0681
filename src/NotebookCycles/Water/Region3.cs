namespace NotebookCycles.Water;

/// <summary>
/// IAPWS-IF97 region 3 (near-critical): the basic Helmholtz equation f(ρ,T) (IAPWS R7-97(2012) eq. 28, Table 30),
/// and the boundary B23 (eqs. 5 and 6, Table 1). Release units: MPa, K, kJ/kg, kJ/(kg·K), kg/m³.
/// </summary>
internal static class Region3
{
    /// <summary>Critical temperature, K (R7-97(2012) eq. 3).</summary>
    public const double Tc = 647.096;

    /// <summary>Critical pressure, MPa (eq. 4).</summary>
    public const double Pc = 22.064;

    /// <summary>Critical density, kg/m³ (eq. 5).</summary>
    public const double RhoC = 322.0;

    private const double N1 = 0.10658070028513e1;
    private static readonly int[] I = [0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 4, 5, 5, 5, 6, 6, 6, 7, 8, 9, 9, 10, 10, 11];
    private static readonly int[] J = [0, 1, 2, 7, 10, 12, 23, 2, 6, 15, 17, 0, 2, 6, 7, 22, 26, 0, 2, 4, 16, 26, 0, 2, 4, 26, 1, 3, 26, 0, 2, 26, 2, 26, 2, 26, 0, 1, 26];
    private static readonly double[] N =
    [
        -0.15732845290239e2, 0.20944396974307e2, -0.76867707878716e1, 0.26185947787954e1, -0.28080781148620e1,
        0.12053369696517e1, -0.84566812812502e-2, -0.12654315477714e1, -0.11524407806681e1, 0.88521043984318,
        -0.64207765181607, 0.38493460186671, -0.85214708824206, 0.48972281541877e1, -0.30502617256965e1,
        0.39420536879154e-1, 0.12558408424308, -0.27999329698710, 0.13899799569460e1, -0.20189915023570e1,
        -0.82147637173963e-2, -0.47596035734923, 0.43984074473500e-1, -0.44476435428739, 0.90572070719733,
        0.70522450087967, 0.10770512626332, -0.32913623258954, -0.50871062041158, -0.22175400873096e-1,
        0.94260751665092e-1, 0.16436278447961, -0.13503372241348e-1, -0.14834345352472e-1, 0.57922953628084e-3,
        0.32308904703711e-2, 0.80964802996215e-4, -0.16557679795037e-3, -0.44923899061815e-4,
    ];

    private static readonly TermTable Terms = new(I, J, N);

    /// <summary>The dimensionless Helmholtz sums at (ρ, T): φ, δφ_δ, δ²φ_δδ, τφ_τ, τ²φ_ττ, δτφ_δτ.</summary>
    public static void Sums(double rho, double t, out double phi, out double dPd, out double d2Pdd, out double tPt, out double t2Ptt, out double dtPdt)
    {
        double delta = rho / RhoC;
        double tau = Tc / t;
        Span<double> pd = stackalloc double[12];
        Span<double> pt = stackalloc double[27];
        Powers.Fill(delta, 0, pd);
        Powers.Fill(tau, 0, pt);
        TermSums.Derivatives(Terms, pd, pt, out double f, out double fi, out double fii, out double fj, out double fjj, out double fij);
        phi = N1 * Math.Log(delta) + f;
        dPd = N1 + fi;
        d2Pdd = -N1 + fii;
        tPt = fj;
        t2Ptt = fjj;
        dtPdt = fij;
    }

    /// <summary>Pressure (MPa) at (ρ kg/m³, T K) and its density derivative (MPa·m³/kg).</summary>
    public static double Pressure(double rho, double t, out double dpdrho)
    {
        Sums(rho, t, out _, out double dPd, out double d2Pdd, out _, out _, out _);
        double rt = Props.R * t;
        dpdrho = rt * (2 * dPd + d2Pdd) * 1e-3;
        return rho * rt * dPd * 1e-3;
    }

    /// <summary>Full property set at (ρ kg/m³, T K).</summary>
    public static Props Properties(double rho, double t)
    {
        Sums(rho, t, out double phi, out double dPd, out double d2Pdd, out double tPt, out double t2Ptt, out double dtPdt);
        double rt = Props.R * t;
        double p = rho * rt * dPd * 1e-3;
        double u = rt * tPt;
        double h = rt * (tPt + dPd);
        double s = Props.R * (tPt - phi);
        double cv = -Props.R * t2Ptt;
        double c = dPd - dtPdt;
        double cp = Props.R * (-t2Ptt + c * c / (2 * dPd + d2Pdd));
        double w2 = 1e3 * rt * (2 * dPd + d2Pdd - c * c / t2Ptt);
        return new Props(t, p, 1.0 / rho, u, h, s, cp, cv, Math.Sqrt(w2));
    }

    // ---- Boundary B23 (eqs. 5, 6) ----
    private const double B1 = 0.34805185628969e3;
    private const double B2 = -0.11671859879975e1;
    private const double B3 = 0.10192970039326e-2;
    private const double B4 = 0.57254459862746e3;
    private const double B5 = 0.13918839778870e2;

    /// <summary>Pressure (MPa) on the region 2/3 boundary at T (K), eq. 5.</summary>
    public static double PressureB23(double t) => B1 + B2 * t + B3 * t * t;

    /// <summary>Temperature (K) on the region 2/3 boundary at p (MPa), eq. 6.</summary>
    public static double TemperatureB23(double p) => B4 + Math.Sqrt((p - B5) / B3);
}
