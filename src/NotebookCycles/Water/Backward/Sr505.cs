namespace NotebookCycles.Water.Backward;

/// <summary>
/// IAPWS SR5-05(2016), Revised Supplementary Release on Backward Equations for Specific Volume as a Function of
/// Pressure and Temperature v(p,T) for Region 3 of IAPWS-IF97: the 20 subregions 3a to 3t, the auxiliary
/// near-critical subregions 3u to 3z, and the subregion-boundary equations. Units as in the release: p in MPa,
/// T in K, v in m³/kg.
/// </summary>
/// <remarks>
/// Valid in region 3 of IAPWS-IF97: p from p_sat(623.15 K) = 16.529164253 MPa to 100 MPa and T from 623.15 K to
/// T_B23(p). The subregion test needs two equations of IAPWS-IF97 itself, the saturation-temperature equation
/// (R7-97 Eq. 31) and the B23 temperature equation (R7-97 Eq. 6, used for the range check); both come from the
/// forward model (<see cref="Region4.SaturationTemperature"/>, <see cref="Region3.TemperatureB23"/>).
/// Inputs outside a range, and NaN inputs, throw <see cref="ArgumentOutOfRangeException"/> naming the input,
/// its value and the range; nothing is clamped or extrapolated.
/// </remarks>
internal static partial class Sr505
{
    /// <summary>Lowest pressure of region 3, p_sat(623.15 K), MPa.</summary>
    internal const double PMin = Sr303.Region3PMin;

    /// <summary>Highest pressure of region 3, MPa.</summary>
    internal const double PMax = 100;

    /// <summary>Lowest temperature of region 3, K.</summary>
    internal const double TMin = 623.15;

    /// <summary>Pressure p_3cd below which the c/t split follows the saturation line (SR5-05), MPa.</summary>
    internal const double P3cd = 19.00881189173929;

    /// <summary>p_sat(643.15 K) from IF97 Eq. 30, MPa.</summary>
    internal const double PSat643 = 21.04336731897525;

    /// <summary>Critical pressure, MPa.</summary>
    internal const double PCritical = 22.064;

    // Logarithmic boundaries, T/1 K = Σ n (ln π)^I with π = p/1 MPa, I = 0, 1, 2, −1, −2.
    private static readonly double[] NAb = [0.154793642129415e4, -0.187661219490113e3, 0.213144632222113e2, -0.191887498864292e4, 0.918419702359447e3];
    private static readonly double[] NOp = [0.969461372400213e3, -0.332500170441278e3, 0.642859598466067e2, 0.773845935768222e3, -0.152313732937084e4];
    private static readonly double[] NWx = [0.728052609145380e1, 0.973505869861952e2, 0.147370491183191e2, 0.329196213998375e3, 0.873371668682417e3];

    // Polynomial boundaries, T/1 K = Σ n π^I with I = 0, 1, 2, ... .
    private static readonly double[] NCd = [0.585276966696349e3, 0.278233532206915e1, -0.127283549295878e-1, 0.159090746562729e-3];
    private static readonly double[] NGh = [-0.249284240900418e5, 0.428143584791546e4, -0.269029173140130e3, 0.751608051114157e1, -0.787105249910383e-1];
    private static readonly double[] NIj = [0.584814781649163e3, -0.616179320924617, 0.260763050899562, -0.587071076864459e-2, 0.515308185433082e-4];
    private static readonly double[] NJk = [0.617229772068439e3, -0.770600270141675e1, 0.697072596851896, -0.157391839848015e-1, 0.137897492684194e-3];
    private static readonly double[] NMn = [0.535339483742384e3, 0.761978122720128e1, -0.158365725441648, 0.192871054508108e-2];
    private static readonly double[] NQu = [0.565603648239126e3, 0.529062258221222e1, -0.102020639611016, 0.122240301070145e-2];
    private static readonly double[] NRx = [0.584561202520006e3, -0.102961025163669e1, 0.243293362700452, -0.294905044740799e-2];
    private static readonly double[] NUv = [0.528199646263062e3, 0.890579602135307e1, -0.222814134903755, 0.286791682263697e-2];

    /// <summary>Boundary 3a/3b, T_3ab(p) (SR5-05 Eq. 2, logarithmic form), K.</summary>
    /// <param name="p">Pressure, MPa; the release uses it from 25 MPa to 100 MPa, evaluated here over region 3.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3ab(double p) => Logarithmic(NAb, CheckP("SR5-05 T3ab(p)", p));

    /// <summary>Boundary 3c/3d, T_3cd(p) (SR5-05 Eq. 1), K; used from p_3cd = 19.00881189 MPa to 40 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3cd(double p) => Polynomial(NCd, CheckP("SR5-05 T3cd(p)", p));

    /// <summary>Boundary 3e/3f, T_3ef(p) = 3.727888004·(p − 22.064) + 647.096 (SR5-05 Eq. 3, a straight line), K.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3ef(double p) => 3.727888004 * (CheckP("SR5-05 T3ef(p)", p) - 22.064) + 647.096;

    /// <summary>Boundary 3g/3h, T_3gh(p) (SR5-05 Eq. 1), K; used from 22.5 MPa to 25 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3gh(double p) => Polynomial(NGh, CheckP("SR5-05 T3gh(p)", p));

    /// <summary>Boundary 3i/3j, T_3ij(p) (SR5-05 Eq. 1), K; used from 22.5 MPa to 25 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3ij(double p) => Polynomial(NIj, CheckP("SR5-05 T3ij(p)", p));

    /// <summary>Boundary 3j/3k, T_3jk(p) (SR5-05 Eq. 1), K; used from p_sat(643.15 K) to 25 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3jk(double p) => Polynomial(NJk, CheckP("SR5-05 T3jk(p)", p));

    /// <summary>Boundary 3m/3n, T_3mn(p) (SR5-05 Eq. 1), K; used from 22.5 MPa to 23 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3mn(double p) => Polynomial(NMn, CheckP("SR5-05 T3mn(p)", p));

    /// <summary>Boundary 3o/3p, T_3op(p) (SR5-05 Eq. 2, logarithmic form), K; used from 22.5 MPa to 23 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3op(double p) => Logarithmic(NOp, CheckP("SR5-05 T3op(p)", p));

    /// <summary>Boundary 3q/3u, T_3qu(p) (SR5-05 Eq. 1), K; used from p_sat(643.15 K) to 22.5 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3qu(double p) => Polynomial(NQu, CheckP("SR5-05 T3qu(p)", p));

    /// <summary>Boundary 3r/3x, T_3rx(p) (SR5-05 Eq. 1), K; used from p_sat(643.15 K) to 22.5 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3rx(double p) => Polynomial(NRx, CheckP("SR5-05 T3rx(p)", p));

    /// <summary>Auxiliary boundary 3u/3v, T_3uv(p) (SR5-05 Eq. 1), K; used from 21.93161551 MPa to 22.5 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3uv(double p) => Polynomial(NUv, CheckP("SR5-05 T3uv(p)", p));

    /// <summary>Auxiliary boundary 3w/3x, T_3wx(p) (SR5-05 Eq. 2, logarithmic form), K; used from 21.90096265 MPa to 22.5 MPa.</summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <returns>Temperature on the boundary, K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p outside 16.529164253 MPa to 100 MPa.</exception>
    public static double T3wx(double p) => Logarithmic(NWx, CheckP("SR5-05 T3wx(p)", p));

    /// <summary>
    /// The subregion of region 3 ('a' to 'z') whose v(p,T) equation applies at (p, T), by SR5-05 Table 2 and, for
    /// the near-critical part (p_sat(643.15 K) &lt; p ≤ 22.5 MPa, T_3qu(p) &lt; T ≤ T_3rx(p)), Table 10. A state
    /// exactly on the saturation line below p_c is given the liquid-side subregion (T ≤ T_sat(p)).
    /// </summary>
    /// <param name="p">Pressure, MPa, 16.529164253 to 100.</param>
    /// <param name="t">Temperature, K, 623.15 to T_B23(p).</param>
    /// <returns>The subregion letter.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p or T outside region 3.</exception>
    public static char Subregion(double p, double t)
    {
        CheckPT("SR5-05 subregion(p,T)", p, t);
        return Select(p, t);
    }

    /// <summary>
    /// Backward equation v(p,T) of region 3 (SR5-05 Eqs. 4 and 5), m³/kg, with the subregion chosen by
    /// <see cref="Subregion"/>. Valid in region 3 of IAPWS-IF97: p from 16.529164253 MPa to 100 MPa, T from
    /// 623.15 K to T_B23(p). The release's accuracy is lower very close to the critical point (within the 3y and 3z
    /// ranges); the model polishes the value with the forward equation.
    /// </summary>
    /// <param name="p">Pressure, MPa.</param>
    /// <param name="t">Temperature, K.</param>
    /// <returns>Specific volume, m³/kg.</returns>
    /// <exception cref="ArgumentOutOfRangeException">p or T outside region 3.</exception>
    public static double V3PT(double p, double t)
    {
        CheckPT("SR5-05 v3(p,T)", p, t);
        return VSubregion(Select(p, t), p, t);
    }

    /// <summary>
    /// The v(p,T) equation of one named subregion without the subregion test, m³/kg (for tests and for callers that
    /// already know the subregion, such as saturated states approached from one side).
    /// </summary>
    /// <param name="subregion">'a' to 'z'.</param>
    /// <param name="p">Pressure, MPa.</param>
    /// <param name="t">Temperature, K.</param>
    /// <returns>Specific volume, m³/kg.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The letter is not 'a' to 'z'.</exception>
    internal static double VSubregion(char subregion, double p, double t)
    {
        if (subregion < 'a' || subregion > 'z')
        {
            throw new ArgumentOutOfRangeException(nameof(subregion), subregion, "SR5-05 v3(p,T): subregion must be a letter from 'a' to 'z'.");
        }

        VolumeEquation eq = Equations[subregion - 'a'];
        double x = p / eq.PStar - eq.A;
        double y = t / eq.TStar - eq.B;
        if (eq.E == 0)
        {
            return eq.VStar * Math.Exp(Series.Sum(eq.N, eq.I, eq.J, x, y));
        }

        double xc = eq.C == 1 ? x : Math.Sqrt(x);
        double yd = eq.D == 1 ? y : Math.Sqrt(Math.Sqrt(y));
        double sum = Series.Sum(eq.N, eq.I, eq.J, xc, yd);
        if (eq.E == 4)
        {
            double sq = sum * sum;
            return eq.VStar * sq * sq;
        }

        return eq.VStar * sum;
    }

    private static char Select(double p, double t)
    {
        if (p > 40)
        {
            return t <= T3abUnchecked(p) ? 'a' : 'b';
        }

        if (p > 25)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            if (t <= T3abUnchecked(p))
            {
                return 'd';
            }

            return t <= T3efUnchecked(p) ? 'e' : 'f';
        }

        if (p > 23.5)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            if (t <= Polynomial(NGh, p))
            {
                return 'g';
            }

            if (t <= T3efUnchecked(p))
            {
                return 'h';
            }

            if (t <= Polynomial(NIj, p))
            {
                return 'i';
            }

            return t <= Polynomial(NJk, p) ? 'j' : 'k';
        }

        if (p > 23)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            if (t <= Polynomial(NGh, p))
            {
                return 'l';
            }

            if (t <= T3efUnchecked(p))
            {
                return 'h';
            }

            if (t <= Polynomial(NIj, p))
            {
                return 'i';
            }

            return t <= Polynomial(NJk, p) ? 'j' : 'k';
        }

        if (p > 22.5)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            if (t <= Polynomial(NGh, p))
            {
                return 'l';
            }

            if (t <= Polynomial(NMn, p))
            {
                return 'm';
            }

            if (t <= T3efUnchecked(p))
            {
                return 'n';
            }

            if (t <= Logarithmic(NOp, p))
            {
                return 'o';
            }

            if (t <= Polynomial(NIj, p))
            {
                return 'p';
            }

            return t <= Polynomial(NJk, p) ? 'j' : 'k';
        }

        if (p > PSat643)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            if (t <= Polynomial(NQu, p))
            {
                return 'q';
            }

            if (t <= Polynomial(NRx, p))
            {
                return NearCritical(p, t);
            }

            return t <= Polynomial(NJk, p) ? 'r' : 'k';
        }

        if (p > 20.5)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            if (t <= Region4.SaturationTemperature(p))
            {
                return 's';
            }

            return t <= Polynomial(NJk, p) ? 'r' : 'k';
        }

        if (p > P3cd)
        {
            if (t <= Polynomial(NCd, p))
            {
                return 'c';
            }

            return t <= Region4.SaturationTemperature(p) ? 's' : 't';
        }

        return t <= Region4.SaturationTemperature(p) ? 'c' : 't';
    }

    // SR5-05 Table 10: p_sat(643.15 K) < p ≤ 22.5 MPa and T_3qu(p) < T ≤ T_3rx(p).
    private static char NearCritical(double p, double t)
    {
        if (p > 22.11)
        {
            if (t <= Polynomial(NUv, p))
            {
                return 'u';
            }

            if (t <= T3efUnchecked(p))
            {
                return 'v';
            }

            return t <= Logarithmic(NWx, p) ? 'w' : 'x';
        }

        if (p > PCritical)
        {
            if (t <= Polynomial(NUv, p))
            {
                return 'u';
            }

            if (t <= T3efUnchecked(p))
            {
                return 'y';
            }

            return t <= Logarithmic(NWx, p) ? 'z' : 'x';
        }

        if (t <= Region4.SaturationTemperature(p))
        {
            if (p <= 21.93161551)
            {
                return 'u';
            }

            return t <= Polynomial(NUv, p) ? 'u' : 'y';
        }

        if (p <= 21.90096265)
        {
            return 'x';
        }

        return t <= Logarithmic(NWx, p) ? 'z' : 'x';
    }

    private static double T3abUnchecked(double p) => Logarithmic(NAb, p);

    private static double T3efUnchecked(double p) => 3.727888004 * (p - 22.064) + 647.096;

    private static double Logarithmic(double[] n, double p)
    {
        double l = Math.Log(p);
        return n[0] + l * (n[1] + l * n[2]) + (n[3] + n[4] / l) / l;
    }

    private static double Polynomial(double[] n, double p)
    {
        double sum = 0;
        for (int k = n.Length - 1; k >= 0; k--)
        {
            sum = sum * p + n[k];
        }

        return sum;
    }

    private static double CheckP(string equation, double p)
    {
        RangeGuard.Require(equation, nameof(p), p, PMin, PMax, "MPa", "pressure range of IF97 region 3");
        return p;
    }

    private static void CheckPT(string equation, double p, double t)
    {
        RangeGuard.Require(equation, nameof(p), p, PMin, PMax, "MPa", "pressure range of IF97 region 3");
        RangeGuard.Require(equation, "T", t, TMin, Region3.TemperatureB23(p), "K", "623.15 K to T_B23(p) of IF97 region 3");
    }
}
