using System.Runtime.CompilerServices;

namespace NotebookCycles.Water;

/// <summary>
/// IAPWS-IF97 region 2 (vapour): the basic Gibbs equation (IAPWS R7-97(2012) eqs. 15 to 17, Tables 10 and 11), the
/// supplementary equation for the metastable-vapour region (eq. 18, Tables 16 and 17), the boundary B2bc
/// (eqs. 20 and 21) and the backward equations T(p,h) (eqs. 22 to 24, Tables 20 to 23) and T(p,s) (eqs. 25 to 27,
/// Tables 25 to 28). Release units: MPa, K, kJ/kg, kJ/(kg·K).
/// </summary>
internal static class Region2
{
    private static readonly int[] J0 = [0, 1, -5, -4, -3, -2, -1, 2, 3];
    private static readonly double[] N0 =
    [
        -0.96927686500217e1, 0.10086655968018e2, -0.56087911283020e-2, 0.71452738081455e-1, -0.40710498223928,
        0.14240819171444e1, -0.43839511319450e1, -0.28408632460772, 0.21268463753307e-1,
    ];

    // Metastable vapour: the ideal part differs only in n1 and n2 (R7-97(2012) Table 16).
    private static readonly double[] N0Meta =
    [
        -0.96937268393049e1, 0.10087275970006e2, -0.56087911283020e-2, 0.71452738081455e-1, -0.40710498223928,
        0.14240819171444e1, -0.43839511319450e1, -0.28408632460772, 0.21268463753307e-1,
    ];

    private static readonly int[] IR = [1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 5, 6, 6, 6, 7, 7, 7, 8, 8, 9, 10, 10, 10, 16, 16, 18, 20, 20, 20, 21, 22, 23, 24, 24, 24];
    private static readonly int[] JR = [0, 1, 2, 3, 6, 1, 2, 4, 7, 36, 0, 1, 3, 6, 35, 1, 2, 3, 7, 3, 16, 35, 0, 11, 25, 8, 36, 13, 4, 10, 14, 29, 50, 57, 20, 35, 48, 21, 53, 39, 26, 40, 58];
    private static readonly double[] NR =
    [
        -0.17731742473213e-2, -0.17834862292358e-1, -0.45996013696365e-1, -0.57581259083432e-1, -0.50325278727930e-1,
        -0.33032641670203e-4, -0.18948987516315e-3, -0.39392777243355e-2, -0.43797295650573e-1, -0.26674547914087e-4,
        0.20481737692309e-7, 0.43870667284435e-6, -0.32277677238570e-4, -0.15033924542148e-2, -0.40668253562649e-1,
        -0.78847309559367e-9, 0.12790717852285e-7, 0.48225372718507e-6, 0.22922076337661e-5, -0.16714766451061e-10,
        -0.21171472321355e-2, -0.23895741934104e2, -0.59059564324270e-17, -0.12621808899101e-5, -0.38946842435739e-1,
        0.11256211360459e-10, -0.82311340897998e1, 0.19809712802088e-7, 0.10406965210174e-18, -0.10234747095929e-12,
        -0.10018179379511e-8, -0.80882908646985e-10, 0.10693031879409, -0.33662250574171, 0.89185845355421e-24,
        0.30629316876232e-12, -0.42002467698208e-5, -0.59056029685639e-25, 0.37826947613457e-5, -0.12768608934681e-14,
        0.73087610595061e-28, 0.55414715350778e-16, -0.94369707241210e-6,
    ];

    private static readonly int[] IRMeta = [1, 1, 1, 1, 2, 2, 2, 3, 3, 4, 4, 5, 5];
    private static readonly int[] JRMeta = [0, 2, 5, 11, 1, 7, 16, 4, 16, 7, 10, 9, 10];
    private static readonly double[] NRMeta =
    [
        -0.73362260186506e-2, -0.88223831943146e-1, -0.72334555213245e-1, -0.40813178534455e-2, 0.20097803380207e-2,
        -0.53045921898642e-1, -0.76190409086970e-2, -0.63498037657313e-2, -0.86043093028588e-1, 0.75321581522770e-2,
        -0.79238375446139e-2, -0.22888160778447e-3, -0.26456501482810e-2,
    ];

    private static readonly TermTable Residual = new(IR, JR, NR);
    private static readonly TermTable ResidualMeta = new(IRMeta, JRMeta, NRMeta);

    /// <summary>Full property set at (T K, p MPa) from the basic equation of region 2.</summary>
    public static Props Properties(double t, double p) => Evaluate(t, p, N0, Residual, 24, 58);

    /// <summary>Full property set at (T K, p MPa) from the metastable-vapour equation (eq. 18).</summary>
    public static Props MetastableProperties(double t, double p) => Evaluate(t, p, N0Meta, ResidualMeta, 5, 16);

    /// <summary>h (kJ/kg), s, cp (kJ/(kg·K)) and dcp/dT at (T K, p MPa) from the basic equation: τ-derivatives only, for a Halley step in T.</summary>
    public static void TemperatureDerivatives(double t, double p, out double h, out double s, out double cp, out double dcpdt)
    {
        double tau = 540.0 / t;
        Span<double> pt = stackalloc double[9];
        Powers.Fill(tau, -5, pt);
        double g0 = Math.Log(p), g0t = 0, g0tt = 0, g0ttt = 0;
        for (int k = 0; k < 9; k++)
        {
            int jk = J0[k];
            double term = N0[k] * pt[jk + 5];
            g0 += term;
            g0t += jk * term;
            g0tt += jk * (jk - 1) * term;
            g0ttt += jk * (jk - 1) * (jk - 2) * term;
        }

        double b = tau - 0.5;
        Span<double> pp = stackalloc double[25];
        Span<double> pb = stackalloc double[59];
        Powers.Fill(p, 0, pp);
        Powers.Fill(b, 0, pb);
        TermSums.TauDerivatives(Residual, pp, pb, out double g, out double gj, out double gjj, out double gjjj);
        double gTau = g0t / tau + gj / b;
        double gTauTau = g0tt / (tau * tau) + gjj / (b * b);
        double gTauTauTau = g0ttt / (tau * tau * tau) + gjjj / (b * b * b);
        h = Props.R * 540.0 * gTau;
        s = Props.R * (tau * gTau - (g0 + g));
        cp = -Props.R * tau * tau * gTauTau;
        dcpdt = Props.R * tau / t * (2.0 * tau * gTauTau + tau * tau * gTauTauTau);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Props Evaluate(double t, double p, double[] n0, TermTable residual, int maxI, int maxJ)
    {
        double pi = p;
        double tau = 540.0 / t;

        // Ideal-gas part: gamma0 = ln(pi) + sum n0 tau^J0, J0 in [-5, 3].
        Span<double> pt = stackalloc double[9];
        Powers.Fill(tau, -5, pt);
        double g0 = Math.Log(pi), g0t = 0, g0tt = 0;
        for (int k = 0; k < 9; k++)
        {
            int jk = J0[k];
            double term = n0[k] * pt[jk + 5];
            g0 += term;
            g0t += jk * term;
            g0tt += jk * (jk - 1) * term;
        }

        g0t /= tau;
        g0tt /= tau * tau;

        // Residual part: gammar = sum n pi^I (tau - 0.5)^J.
        double b = tau - 0.5;
        Span<double> pp = stackalloc double[25];
        Span<double> pb = stackalloc double[59];
        Powers.Fill(pi, 0, pp[..(maxI + 1)]);
        Powers.Fill(b, 0, pb[..(maxJ + 1)]);
        TermSums.Derivatives(residual, pp[..(maxI + 1)], pb[..(maxJ + 1)], out double g, out double gi, out double gii, out double gj, out double gjj, out double gij);

        double invPi = 1.0 / pi, invB = 1.0 / b;
        double grPi = gi * invPi;
        double grPiPi = gii * invPi * invPi;
        double grTau = gj * invB;
        double grTauTau = gjj * invB * invB;
        double grPiTau = gij * invPi * invB;

        // Combine; gamma0_pi = 1/pi, gamma0_pipi = -1/pi^2, gamma0_pitau = 0. The speed of sound uses the release's
        // residual form (Table 12), which keeps full precision at low pressure.
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

    // ---- Boundary B2bc (eqs. 20, 21) ----
    private const double Bc1 = 0.90584278514723e3;
    private const double Bc2 = -0.67955786399241;
    private const double Bc3 = 0.12809002730136e-3;
    private const double Bc4 = 0.26526571908428e4;
    private const double Bc5 = 0.45257578905948e1;

    /// <summary>Pressure (MPa) on the 2b/2c boundary at enthalpy h (kJ/kg), eq. 20.</summary>
    public static double PressureB2bc(double h) => Bc1 + Bc2 * h + Bc3 * h * h;

    /// <summary>Enthalpy (kJ/kg) on the 2b/2c boundary at pressure p (MPa), eq. 21.</summary>
    public static double EnthalpyB2bc(double p) => Bc4 + Math.Sqrt((p - Bc5) / Bc3);

    // ---- Backward T(p,h) ----
    private static readonly int[] IA = [0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 2, 3, 3, 4, 4, 4, 5, 5, 5, 6, 6, 7];
    private static readonly int[] JA = [0, 1, 2, 3, 7, 20, 0, 1, 2, 3, 7, 9, 11, 18, 44, 0, 2, 7, 36, 38, 40, 42, 44, 24, 44, 12, 32, 44, 32, 36, 42, 34, 44, 28];
    private static readonly double[] NA =
    [
        0.10898952318288e4, 0.84951654495535e3, -0.10781748091826e3, 0.33153654801263e2, -0.74232016790248e1,
        0.11765048724356e2, 0.18445749355790e1, -0.41792700549624e1, 0.62478196935812e1, -0.17344563108114e2,
        -0.20058176862096e3, 0.27196065473796e3, -0.45511318285818e3, 0.30919688604755e4, 0.25226640357872e6,
        -0.61707422868339e-2, -0.31078046629583, 0.11670873077107e2, 0.12812798404046e9, -0.98554909623276e9,
        0.28224546973002e10, -0.35948971410703e10, 0.17227349913197e10, -0.13551334240775e5, 0.12848734664650e8,
        0.13865724283226e1, 0.23598832556514e6, -0.13105236545054e8, 0.73999835474766e4, -0.55196697030060e6,
        0.37154085996233e7, 0.19127729239660e5, -0.41535164835634e6, -0.62459855192507e2,
    ];

    private static readonly int[] IB = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4, 4, 4, 5, 5, 5, 6, 7, 7, 9, 9];
    private static readonly int[] JB = [0, 1, 2, 12, 18, 24, 28, 40, 0, 2, 6, 12, 18, 24, 28, 40, 2, 8, 18, 40, 1, 2, 12, 24, 2, 12, 18, 24, 28, 40, 18, 24, 40, 28, 2, 28, 1, 40];
    private static readonly double[] NB =
    [
        0.14895041079516e4, 0.74307798314034e3, -0.97708318797837e2, 0.24742464705674e1, -0.63281320016026,
        0.11385952129658e1, -0.47811863648625, 0.85208123431544e-2, 0.93747147377932, 0.33593118604916e1,
        0.33809355601454e1, 0.16844539671904, 0.73875745236695, -0.47128737436186, 0.15020273139707,
        -0.21764114219750e-2, -0.21810755324761e-1, -0.10829784403677, -0.46333324635812e-1, 0.71280351959551e-4,
        0.11032831789999e-3, 0.18955248387902e-3, 0.30891541160537e-2, 0.13555504554949e-2, 0.28640237477456e-6,
        -0.10779857357512e-4, -0.76462712454814e-4, 0.14052392818316e-4, -0.31083814331434e-4, -0.10302738212103e-5,
        0.28217281635040e-6, 0.12704902271945e-5, 0.73803353468292e-7, -0.11030139238909e-7, -0.81456365207833e-13,
        -0.25180545682962e-10, -0.17565233969407e-17, 0.86934156344163e-14,
    ];

    private static readonly int[] IC = [-7, -7, -6, -6, -5, -5, -2, -2, -1, -1, 0, 0, 1, 1, 2, 6, 6, 6, 6, 6, 6, 6, 6];
    private static readonly int[] JC = [0, 4, 0, 2, 0, 2, 0, 1, 0, 2, 0, 1, 4, 8, 4, 0, 1, 4, 10, 12, 16, 20, 22];
    private static readonly double[] NC =
    [
        -0.32368398555242e13, 0.73263350902181e13, 0.35825089945447e12, -0.58340131851590e12, -0.10783068217470e11,
        0.20825544563171e11, 0.61074783564516e6, 0.85977722535580e6, -0.25745723604170e5, 0.31081088422714e5,
        0.12082315865936e4, 0.48219755109255e3, 0.37966001272486e1, -0.10842984880077e2, -0.45364172676660e-1,
        0.14559115658698e-12, 0.11261597407230e-11, -0.17804982240686e-10, 0.12324579690832e-6, -0.11606921130984e-5,
        0.27846367088554e-4, -0.59270038474176e-3, 0.12918582991878e-2,
    ];

    private static readonly TermTable TableA = new(IA, JA, NA);
    private static readonly TermTable TableB = new(IB, JB, NB);
    private static readonly TermTable TableC = new(IC, JC, NC, -7, 0);

    /// <summary>The subregion (2a = 1, 2b = 2, 2c = 3) of the backward equation T(p,h).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int SubregionPH(double p, double h) => p <= 4.0 ? 1 : (p <= 6.5467 || h >= EnthalpyB2bc(p) ? 2 : 3);

    /// <summary>Backward equation T(p,h) for region 2 (p MPa, h kJ/kg), subregion chosen by eq. 21 and p = 4 MPa.</summary>
    public static double TemperaturePH(double p, double h) => SubregionPH(p, h) switch
    {
        1 => SumPH(p, h / 2000.0 - 2.1, TableA, 0, 7, 44),
        2 => SumPH(p - 2.0, h / 2000.0 - 2.6, TableB, 0, 9, 40),
        _ => SumPH(p + 25.0, h / 2000.0 - 1.8, TableC, -7, 6, 22),
    };

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double SumPH(double a, double b, TermTable table, int minI, int maxI, int maxJ)
    {
        Span<double> pa = stackalloc double[14];
        Span<double> pb = stackalloc double[45];
        Powers.Fill(a, minI, pa[..(maxI - minI + 1)]);
        Powers.Fill(b, 0, pb[..(maxJ + 1)]);
        return TermSums.Value(table, pa, pb);
    }

    // ---- Backward T(p,s) ----
    // Subregion 2a: exponents of pi are quarters; stored here as integers in quarters (I * 4).
    private static readonly int[] IA4 = [-6, -6, -6, -6, -6, -6, -5, -5, -5, -4, -4, -4, -4, -4, -4, -3, -3, -2, -2, -2, -2, -1, -1, -1, -1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 5, 5, 6, 6];
    private static readonly int[] JAS = [-24, -23, -19, -13, -11, -10, -19, -15, -6, -26, -21, -17, -16, -9, -8, -15, -14, -26, -13, -9, -7, -27, -25, -11, -6, 1, 4, 8, 11, 0, 1, 5, 6, 10, 14, 16, 0, 4, 9, 17, 7, 18, 3, 15, 5, 18];
    private static readonly double[] NAS =
    [
        -0.39235983861984e6, 0.51526573827270e6, 0.40482443161048e5, -0.32193790923902e3, 0.96961424218694e2,
        -0.22867846371773e2, -0.44942914124357e6, -0.50118336020166e4, 0.35684463560015, 0.44235335848190e5,
        -0.13673388811708e5, 0.42163260207864e6, 0.22516925837475e5, 0.47442144865646e3, -0.14931130797647e3,
        -0.19781126320452e6, -0.23554399470760e5, -0.19070616302076e5, 0.55375669883164e5, 0.38293691437363e4,
        -0.60391860580567e3, 0.19363102620331e4, 0.42660643698610e4, -0.59780638872718e4, -0.70401463926862e3,
        0.33836784107553e3, 0.20862786635187e2, 0.33834172656196e-1, -0.43124428414893e-4, 0.16653791356412e3,
        -0.13986292055898e3, -0.78849547999872, 0.72132411753872e-1, -0.59754839398283e-2, -0.12141358953904e-4,
        0.23227096733871e-6, -0.10538463566194e2, 0.20718925496502e1, -0.72193155260427e-1, 0.20749887081120e-6,
        -0.18340657911379e-1, 0.29036272348696e-6, 0.21037527893619, 0.25681239729999e-3, -0.12799002933781e-1,
        -0.82198102652018e-5,
    ];

    private static readonly int[] IBS = [-6, -6, -5, -5, -4, -4, -4, -3, -3, -3, -3, -2, -2, -2, -2, -1, -1, -1, -1, -1, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 3, 3, 3, 4, 4, 5, 5, 5];
    private static readonly int[] JBS = [0, 11, 0, 11, 0, 1, 11, 0, 1, 11, 12, 0, 1, 6, 10, 0, 1, 5, 8, 9, 0, 1, 2, 4, 5, 6, 9, 0, 1, 2, 3, 7, 8, 0, 1, 5, 0, 1, 3, 0, 1, 0, 1, 2];
    private static readonly double[] NBS =
    [
        0.31687665083497e6, 0.20864175881858e2, -0.39859399803599e6, -0.21816058518877e2, 0.22369785194242e6,
        -0.27841703445817e4, 0.99207436071480e1, -0.75197512299157e5, 0.29708605951158e4, -0.34406878548526e1,
        0.38815564249115, 0.17511295085750e5, -0.14237112854449e4, 0.10943803364167e1, 0.89971619308495,
        -0.33759740098958e4, 0.47162885818355e3, -0.19188241993679e1, 0.41078580492196, -0.33465378172097,
        0.13870034777505e4, -0.40663326195838e3, 0.41727347159610e2, 0.21932549434532e1, -0.10320050009077e1,
        0.35882943516703, 0.52511453726066e-2, 0.12838916450705e2, -0.28642437219381e1, 0.56912683664855,
        -0.99962954584931e-1, -0.32632037778459e-2, 0.23320922576723e-3, -0.15334809857450, 0.29072288239902e-1,
        0.37534702741167e-3, 0.17296691702411e-2, -0.38556050844504e-3, -0.35017712292608e-4, -0.14566393631492e-4,
        0.56420857267269e-5, 0.41286150074605e-7, -0.20684671118824e-7, 0.16409393674725e-8,
    ];

    private static readonly int[] ICS = [-2, -2, -1, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 5, 5, 6, 6, 7, 7, 7, 7, 7];
    private static readonly int[] JCS = [0, 1, 0, 0, 1, 2, 3, 0, 1, 3, 4, 0, 1, 2, 0, 1, 5, 0, 1, 4, 0, 1, 2, 0, 1, 0, 1, 3, 4, 5];
    private static readonly double[] NCS =
    [
        0.90968501005365e3, 0.24045667088420e4, -0.59162326387130e3, 0.54145404128074e3, -0.27098308411192e3,
        0.97976525097926e3, -0.46966772959435e3, 0.14399274604723e2, -0.19104204230429e2, 0.53299167111971e1,
        -0.21252975375934e2, -0.31147334413760, 0.60334840894623, -0.42764839702509e-1, 0.58185597255259e-2,
        -0.14597008284753e-1, 0.56631175631027e-2, -0.76155864584577e-4, 0.22440342919332e-3, -0.12561095013413e-4,
        0.63323132660934e-6, -0.20541989675375e-5, 0.36405370390082e-7, -0.29759897789215e-8, 0.10136618529763e-7,
        0.59925719692351e-11, -0.20677870105164e-10, -0.20874278181886e-10, 0.10162166825089e-9, -0.16429828281347e-9,
    ];

    private static readonly TermTable TableAS = new(IA4, JAS, NAS, -6, -27);
    private static readonly TermTable TableBS = new(IBS, JBS, NBS, -6, 0);
    private static readonly TermTable TableCS = new(ICS, JCS, NCS, -2, 0);

    /// <summary>The subregion (2a = 1, 2b = 2, 2c = 3) of the backward equation T(p,s): p = 4 MPa and s = 5.85 kJ/(kg·K).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int SubregionPS(double p, double s) => p <= 4.0 ? 1 : (s >= 5.85 ? 2 : 3);

    /// <summary>Backward equation T(p,s) for region 2 (p MPa, s kJ/(kg·K)).</summary>
    public static double TemperaturePS(double p, double s)
    {
        switch (SubregionPS(p, s))
        {
            case 1:
            {
                // pi^(I) with I in quarters from -1.5 to 1.5: powers of pi^(1/4).
                double q = Math.Sqrt(Math.Sqrt(p));
                Span<double> pq = stackalloc double[13];
                Powers.Fill(q, -6, pq);
                Span<double> ps = stackalloc double[46];
                Powers.Fill(s / 2.0 - 2.0, -27, ps);
                return TermSums.Value(TableAS, pq, ps);
            }

            case 2:
                return SumPS(p, 10.0 - s / 0.7853, TableBS, -6, 5, 12);
            default:
                return SumPS(p, 2.0 - s / 2.9251, TableCS, -2, 7, 5);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double SumPS(double pi, double b, TermTable table, int minI, int maxI, int maxJ)
    {
        Span<double> pa = stackalloc double[12];
        Span<double> pb = stackalloc double[13];
        Powers.Fill(pi, minI, pa[..(maxI - minI + 1)]);
        Powers.Fill(b, 0, pb[..(maxJ + 1)]);
        return TermSums.Value(table, pa, pb);
    }
}
