namespace NotebookCycles.Water;

/// <summary>
/// IAPWS-IF97 region 5 (high-temperature steam, 1073.15 K to 2273.15 K, p ≤ 50 MPa): the basic Gibbs equation
/// (IAPWS R7-97(2012) eqs. 32 to 34, Tables 37 and 38, with the 2007 revision of the residual part).
/// </summary>
internal static class Region5
{
    private static readonly int[] J0 = [0, 1, -3, -2, -1, 2];
    private static readonly double[] N0 = [-0.13179983674201e2, 0.68540841634434e1, -0.24805148933466e-1, 0.36901534980333, -0.31161318213925e1, -0.32961626538917];
    private static readonly int[] IR = [1, 1, 1, 2, 2, 3];
    private static readonly int[] JR = [1, 2, 3, 3, 9, 7];
    private static readonly double[] NR = [0.15736404855259e-2, 0.90153761673944e-3, -0.50270077677648e-2, 0.22440037409485e-5, -0.41163275453471e-5, 0.37919454822955e-7];

    /// <summary>Full property set at (T K, p MPa).</summary>
    public static Props Properties(double t, double p)
    {
        double pi = p;
        double tau = 1000.0 / t;
        Span<double> pt = stackalloc double[13];
        Powers.Fill(tau, -3, pt);
        double g0 = Math.Log(pi), g0t = 0, g0tt = 0;
        for (int k = 0; k < J0.Length; k++)
        {
            int jk = J0[k];
            double term = N0[k] * pt[jk + 3];
            g0 += term;
            g0t += jk * term;
            g0tt += jk * (jk - 1) * term;
        }

        g0t /= tau;
        g0tt /= tau * tau;
        double g = 0, gi = 0, gii = 0, gj = 0, gjj = 0, gij = 0;
        for (int k = 0; k < NR.Length; k++)
        {
            int ik = IR[k], jk = JR[k];
            double piI = ik == 1 ? pi : ik == 2 ? pi * pi : pi * pi * pi;
            double term = NR[k] * piI * pt[jk + 3];
            g += term;
            gi += ik * term;
            gii += ik * (ik - 1) * term;
            gj += jk * term;
            gjj += jk * (jk - 1) * term;
            gij += ik * jk * term;
        }

        double grPi = gi / pi;
        double grPiPi = gii / (pi * pi);
        double grTau = gj / tau;
        double grTauTau = gjj / (tau * tau);
        double grPiTau = gij / (pi * tau);
        double gTau = g0t + grTau;
        double gTauTau = g0tt + grTauTau;
        double rt = Props.R * t;
        double v = rt * (1.0 + pi * grPi) / p * 1e-3;
        double h = rt * tau * gTau;
        double u = rt * (tau * gTau - (1.0 + pi * grPi));
        double s = Props.R * (tau * gTau - (g0 + g));
        double cp = -Props.R * tau * tau * gTauTau;
        double c = 1.0 + pi * grPi - tau * pi * grPiTau;
        double cv = Props.R * (-tau * tau * gTauTau - c * c / (1.0 - pi * pi * grPiPi));
        double num = 1.0 + 2.0 * pi * grPi + pi * pi * grPi * grPi;
        double den = (1.0 - pi * pi * grPiPi) + c * c / (tau * tau * gTauTau);
        double w = Math.Sqrt(1e3 * rt * num / den);
        return new Props(t, p, v, u, h, s, cp, cv, w);
    }
}
