using System.Runtime.CompilerServices;

namespace NotebookCycles.Water;

/// <summary>
/// IAPWS-IF97 region 1 (compressed liquid): the basic Gibbs equation (IAPWS R7-97(2012) eq. 7, Table 2) and the
/// backward equations T(p,h) (eq. 11, Table 6) and T(p,s) (eq. 13, Table 8). Release units: MPa, K, kJ/kg, kJ/(kg·K).
/// </summary>
internal static class Region1
{
    private const double PStar = 16.53;
    private const double TStar = 1386.0;

    private static readonly int[] I = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32];
    private static readonly int[] J = [-2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31, -38, -39, -40, -41];
    private static readonly double[] N =
    [
        0.14632971213167, -0.84548187169114, -0.37563603672040e1, 0.33855169168385e1, -0.95791963387872,
        0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3, -0.60706301565874e-3,
        -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1, -0.52838357969930e-4, -0.47184321073267e-3,
        -0.30001780793026e-3, 0.47661393906987e-4, -0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4,
        -0.28270797985312e-5, -0.85205128120103e-9, -0.22425281908000e-5, -0.65171222895601e-6, -0.14341729937924e-12,
        -0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18, 0.14478307828521e-19,
        0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23, -0.93537087292458e-25,
    ];

    private static readonly int[] IT = [0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 2, 2, 3, 3, 4, 5, 6];
    private static readonly int[] JT = [0, 1, 2, 6, 22, 32, 0, 1, 2, 3, 4, 10, 32, 10, 32, 10, 32, 32, 32, 32];
    private static readonly double[] NT =
    [
        -0.23872489924521e3, 0.40421188637945e3, 0.11349746881718e3, -0.58457616048039e1, -0.15285482413140e-3,
        -0.10866707695377e-5, -0.13391744872602e2, 0.43211039183559e2, -0.54010067170506e2, 0.30535892203916e2,
        -0.65964749423638e1, 0.93965400878363e-2, 0.11573647505340e-6, -0.25858641282073e-4, -0.40644363084799e-8,
        0.66456186191635e-7, 0.80670734103027e-10, -0.93477771213947e-12, 0.58265442020601e-14, -0.15020185953503e-16,
    ];

    private static readonly int[] IS = [0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 4];
    private static readonly int[] JS = [0, 1, 2, 3, 11, 31, 0, 1, 2, 3, 12, 31, 0, 1, 2, 9, 31, 10, 32, 32];
    private static readonly double[] NS =
    [
        0.17478268058307e3, 0.34806930892873e2, 0.65292584978455e1, 0.33039981775489, -0.19281382923196e-6,
        -0.24909197244573e-22, -0.26107636489332, 0.22592965981586, -0.64256463395226e-1, 0.78876289270526e-2,
        0.35672110607366e-9, 0.17332496994895e-23, 0.56608900654837e-3, -0.32635483139717e-3, 0.44778286690632e-4,
        -0.51322156908507e-9, -0.42522657042207e-25, 0.26400441360689e-12, 0.78124600459723e-28, -0.30732199903668e-30,
    ];

    private static readonly TermTable Basic = new(I, J, N, 0, -41);
    private static readonly TermTable BackwardH = new(IT, JT, NT);
    private static readonly TermTable BackwardS = new(IS, JS, NS);

    /// <summary>Full property set at (T K, p MPa).</summary>
    public static Props Properties(double t, double p)
    {
        double pi = p / PStar;
        double tau = TStar / t;
        double a = 7.1 - pi;
        double b = tau - 1.222;
        Span<double> pa = stackalloc double[33];
        Span<double> pb = stackalloc double[59];
        Powers.Fill(a, 0, pa);
        Powers.Fill(b, -41, pb);
        TermSums.Derivatives(Basic, pa, pb, out double g, out double gi, out double gii, out double gj, out double gjj, out double gij);

        // Derivatives with respect to pi and tau: d/dpi = -(1/a) d/da, d/dtau = d/db.
        double invA = 1.0 / a, invB = 1.0 / b;
        double gPi = -gi * invA;
        double gPiPi = gii * invA * invA;
        double gTau = gj * invB;
        double gTauTau = gjj * invB * invB;
        double gPiTau = -gij * invA * invB;
        return Props.FromGibbs(t, p, pi, tau, g, gPi, gPiPi, gTau, gTauTau, gPiTau);
    }

    /// <summary>h (kJ/kg), s, cp (kJ/(kg·K)) and dcp/dT at (T K, p MPa): the τ-derivatives only, for a Halley step in T.</summary>
    public static void TemperatureDerivatives(double t, double p, out double h, out double s, out double cp, out double dcpdt)
    {
        double tau = TStar / t;
        double b = tau - 1.222;
        Span<double> pa = stackalloc double[33];
        Span<double> pb = stackalloc double[59];
        Powers.Fill(7.1 - p / PStar, 0, pa);
        Powers.Fill(b, -41, pb);
        TermSums.TauDerivatives(Basic, pa, pb, out double g, out double gj, out double gjj, out double gjjj);
        double gTau = gj / b, gTauTau = gjj / (b * b), gTauTauTau = gjjj / (b * b * b);
        h = Props.R * TStar * gTau;
        s = Props.R * (tau * gTau - g);
        cp = -Props.R * tau * tau * gTauTau;
        dcpdt = Props.R * tau / t * (2.0 * tau * gTauTau + tau * tau * gTauTauTau);
    }

    /// <summary>Backward equation T(p,h), eq. 11 (p MPa, h kJ/kg).</summary>
    public static double TemperaturePH(double p, double h)
    {
        double pi = p;
        double eta = h / 2500.0 + 1.0;
        Span<double> pp = stackalloc double[7];
        Span<double> pe = stackalloc double[33];
        Powers.Fill(pi, 0, pp);
        Powers.Fill(eta, 0, pe);
        return TermSums.Value(BackwardH, pp, pe);
    }

    /// <summary>Backward equation T(p,s), eq. 13 (p MPa, s kJ/(kg·K)).</summary>
    public static double TemperaturePS(double p, double s)
    {
        double sigma = s + 2.0;
        Span<double> pp = stackalloc double[5];
        Span<double> ps = stackalloc double[33];
        Powers.Fill(p, 0, pp);
        Powers.Fill(sigma, 0, ps);
        return TermSums.Value(BackwardS, pp, ps);
    }
}
