namespace NotebookCycles.Water.Backward;

/// <summary>
/// IAPWS SR2-01(2014), Revised Supplementary Release on Backward Equations for Pressure as a Function of Enthalpy
/// and Entropy p(h,s) for Regions 1 and 2 of IAPWS-IF97. Units as in the release: h in kJ/kg, s in kJ/(kg K),
/// p in MPa.
/// </summary>
/// <remarks>
/// The values are those of the backward polynomials, consistent with the forward equations to the release's
/// tolerances (not to machine precision): the model uses them as starting values and polishes with Newton steps on
/// the forward equation. Range checks use the bounding box of the region in the h-s plane, with corner values
/// computed from the IF97 forward equations (region 1: T = 273.15 K and 623.15 K, p = p_sat and 100 MPa;
/// region 2: the saturated-vapour line, the B23 line and T = 1073.15 K at p_sat(273.15 K)); whether a point inside
/// the box is really in the region is the caller's test.
/// Inputs outside a range, and NaN inputs, throw <see cref="ArgumentOutOfRangeException"/> naming the input,
/// its value and the range; nothing is clamped or extrapolated.
/// </remarks>
internal static class Sr201
{
    /// <summary>Lowest s of region 1: s(273.15 K, 100 MPa), kJ/(kg K).</summary>
    internal const double Region1SMin = -0.008582287093;

    /// <summary>Highest s of region 1: s'(623.15 K), kJ/(kg K).</summary>
    internal const double Region1SMax = 3.778281340;

    /// <summary>Lowest h of region 1: h'(273.15 K), kJ/kg.</summary>
    internal const double Region1HMin = -0.041587826;

    /// <summary>Highest h of region 1: h'(623.15 K), kJ/kg.</summary>
    internal const double Region1HMax = 1670.858218;

    /// <summary>Lowest s of region 2: the minimum of s along the B23 line, as SR4-04 states for TB23(h,s), kJ/(kg K).</summary>
    internal const double Region2SMin = 5.048096828;

    /// <summary>Highest s of region 2: s(1073.15 K, p_sat(273.15 K)), kJ/(kg K).</summary>
    internal const double Region2SMax = 11.921055069;

    /// <summary>Lowest h of region 2: h''(273.15 K), kJ/kg.</summary>
    internal const double Region2HMin = 2500.892618;

    /// <summary>Highest h of region 2: h(1073.15 K, p_sat(273.15 K)), kJ/kg.</summary>
    internal const double Region2HMax = 4160.660928;

    /// <summary>Entropy of the 2b/2c boundary used by the p(h,s) equations, kJ/(kg K).</summary>
    internal const double S2bc = 5.85;

    /// <summary>
    /// s''(4 MPa), kJ/(kg K) (from the IF97 forward equations): the 2a/2b boundary, the 4 MPa isobar, starts here on
    /// the saturated-vapour line; a region-2 state with lower s is above 4 MPa and so never in 2a.
    /// </summary>
    internal const double S2abStart = 6.069709160;

    // Region 1, Eq. 1: p/p* = Σ n (η + 0.05)^I (σ + 0.05)^J, η = h/3400, σ = s/7.6, p* = 100 MPa.
    private static readonly int[] I1 = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 3, 4, 4, 5];
    private static readonly int[] J1 = [0, 1, 2, 4, 5, 6, 8, 14, 0, 1, 4, 6, 0, 1, 10, 4, 1, 4, 0];
    private static readonly double[] N1 =
    [
        -0.691997014660582, -0.183612548787560e2, -0.928332409297335e1, 0.659639569909906e2,
        -0.162060388912024e2, 0.450620017338667e3, 0.854680678224170e3, 0.607523214001162e4,
        0.326487682621856e2, -0.269408844582931e2, -0.319947848334300e3, -0.928354307043320e3,
        0.303634537455249e2, -0.650540422444146e2, -0.430991316516130e4, -0.747512324096068e3,
        0.730000345529245e3, 0.114284032569021e4, -0.436407041874559e3,
    ];

    // Subregion 2a, Eq. 3: (p/4)^(1/4) = Σ n (η − 0.5)^I (σ − 1.2)^J, η = h/4200, σ = s/12.
    private static readonly int[] I2a = [0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 3, 3, 3, 3, 3, 4, 5, 5, 6, 7];
    private static readonly int[] J2a = [1, 3, 6, 16, 20, 22, 0, 1, 2, 3, 5, 6, 10, 16, 20, 22, 3, 16, 20, 0, 2, 3, 6, 16, 16, 3, 16, 3, 1];
    private static readonly double[] N2a =
    [
        -0.182575361923032e-1, -0.125229548799536, 0.592290437320145, 0.604769706185122e1,
        0.238624965444474e3, -0.298639090222922e3, 0.512250813040750e-1, -0.437266515606486,
        0.413336902999504, -0.516468254574773e1, -0.557014838445711e1, 0.128555037824478e2,
        0.114144108953290e2, -0.119504225652714e3, -0.284777985961560e4, 0.431757846408006e4,
        0.112894040802650e1, 0.197409186206319e4, 0.151612444706087e4, 0.141324451421235e-1,
        0.585501282219601, -0.297258075863012e1, 0.594567314847319e1, -0.623656565798905e4,
        0.965986235133332e4, 0.681500934948134e1, -0.633207286824489e4, -0.558919224465760e1,
        0.400645798472063e-1,
    ];

    // Subregion 2b, Eq. 4: (p/100)^(1/4) = Σ n (η − 0.6)^I (σ − 1.01)^J, η = h/4100, σ = s/7.9.
    private static readonly int[] I2b = [0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 3, 3, 3, 3, 4, 4, 5, 5, 6, 6, 6, 7, 7, 8, 8, 8, 8, 12, 14];
    private static readonly int[] J2b = [0, 1, 2, 4, 8, 0, 1, 2, 3, 5, 12, 1, 6, 18, 0, 1, 7, 12, 1, 16, 1, 12, 1, 8, 18, 1, 16, 1, 3, 14, 18, 10, 16];
    private static readonly double[] N2b =
    [
        0.801496989929495e-1, -0.543862807146111, 0.337455597421283, 0.890555451157450e1,
        0.313840736431485e3, 0.797367065977789, -0.121616973556240e1, 0.872803386937477e1,
        -0.169769781757602e2, -0.186552827328416e3, 0.951159274344237e5, -0.189168510120494e2,
        -0.433407037194840e4, 0.543212633012715e9, 0.144793408386013, 0.128024559637516e3,
        -0.672309534071268e5, 0.336972380095287e8, -0.586634196762720e3, -0.221403224769889e11,
        0.171606668708389e4, -0.570817595806302e9, -0.312109693178482e4, -0.207841384633010e7,
        0.305605946157786e13, 0.322157004314333e4, 0.326810259797295e12, -0.144104158934487e4,
        0.410694867802691e3, 0.109077066873024e12, -0.247964654258893e14, 0.188801906865134e10,
        -0.123651009018773e15,
    ];

    // Subregion 2c, Eq. 5: (p/100)^(1/4) = Σ n (η − 0.7)^I (σ − 1.1)^J, η = h/3500, σ = s/5.9.
    private static readonly int[] I2c = [0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 5, 5, 5, 5, 6, 6, 10, 12, 16];
    private static readonly int[] J2c = [0, 1, 2, 3, 4, 8, 0, 2, 5, 8, 14, 2, 3, 7, 10, 18, 0, 5, 8, 16, 18, 18, 1, 4, 6, 14, 8, 18, 7, 7, 10];
    private static readonly double[] N2c =
    [
        0.112225607199012, -0.339005953606712e1, -0.320503911730094e2, -0.197597305104900e3,
        -0.407693861553446e3, 0.132943775222331e5, 0.170846839774007e1, 0.373694198142245e2,
        0.358144365815434e4, 0.423014446424664e6, -0.751071025760063e9, 0.523446127607898e2,
        -0.228351290812417e3, -0.960652417056937e6, -0.807059292526074e8, 0.162698017225669e13,
        0.772465073604171, 0.463929973837746e5, -0.137317885134128e8, 0.170470392630512e13,
        -0.251104628187308e14, 0.317748830835520e14, 0.538685623675312e2, -0.553089094625169e5,
        -0.102861522421405e7, 0.204249418756234e13, 0.273918446626977e9, -0.263963146312685e16,
        -0.107890854108088e10, -0.296492620980124e11, -0.111754907323424e16,
    ];

    /// <summary>
    /// Backward equation p(h,s) of region 1 (SR2-01 Eq. 1), MPa. Valid in region 1 of IAPWS-IF97
    /// (273.15 K ≤ T ≤ 623.15 K, p_sat(T) ≤ p ≤ 100 MPa); checked here: h from −0.041587826 to 1670.858218 kJ/kg and
    /// s from −0.008582287093 to 3.778281340 kJ/(kg K), the region's bounding box. NaN inputs throw.
    /// </summary>
    /// <param name="h">Specific enthalpy, kJ/kg.</param>
    /// <param name="s">Specific entropy, kJ/(kg K).</param>
    /// <returns>Pressure, MPa.</returns>
    /// <exception cref="ArgumentOutOfRangeException">h or s outside the bounding box of region 1.</exception>
    public static double P1HS(double h, double s)
    {
        RangeGuard.Require("SR2-01 p1(h,s)", nameof(h), h, Region1HMin, Region1HMax, "kJ/kg", "bounding box of IF97 region 1");
        RangeGuard.Require("SR2-01 p1(h,s)", nameof(s), s, Region1SMin, Region1SMax, "kJ/(kg K)", "bounding box of IF97 region 1");
        return 100 * Series.Sum(N1, I1, J1, h / 3400 + 0.05, s / 7.6 + 0.05);
    }

    /// <summary>
    /// Boundary between subregions 2a and 2b for the p(h,s) equations (SR2-01 Eq. 2), kJ/kg:
    /// h_2ab(s) = n1 + n2·s + n3·s² + n4·s³. A state of region 2 with h ≤ h_2ab(s) lies in 2a. The release defines it
    /// along p = 4 MPa, from s''(4 MPa) = 6.069709160 to s(1073.15 K, 4 MPa) = 7.852340400 kJ/(kg K) (values from the IF97 forward
    /// equations); it is
    /// evaluated here for any s of region 2 (5.048096828 to 11.921055069 kJ/(kg K)), as the subregion test needs it.
    /// </summary>
    /// <param name="s">Specific entropy, kJ/(kg K).</param>
    /// <returns>Specific enthalpy on the 2a/2b boundary, kJ/kg.</returns>
    /// <exception cref="ArgumentOutOfRangeException">s outside the region-2 entropy range.</exception>
    public static double H2ab(double s)
    {
        RangeGuard.Require("SR2-01 h2ab(s)", nameof(s), s, Region2SMin, Region2SMax, "kJ/(kg K)", "entropy range of IF97 region 2");
        return -0.349898083432139e4 + s * (0.257560716905876e4 + s * (-0.421073558227969e3 + s * 0.276349063799944e2));
    }

    /// <summary>
    /// Backward equation p(h,s) of region 2 (SR2-01 Eqs. 3 to 5), MPa, choosing the subregion as the release does:
    /// 2a if h ≤ h_2ab(s) (the 4 MPa isobar, which exists only for s ≥ s''(4 MPa) = 6.069709160 kJ/(kg K));
    /// otherwise 2b if s ≥ 5.85 kJ/(kg K) (the 2b/2c boundary of the p(h,s) equations), else 2c.
    /// Valid in region 2 of IAPWS-IF97 (T ≤ 1073.15 K, p ≤ 100 MPa); checked here: h from 2500.892618 to
    /// 4160.660928 kJ/kg and s from 5.048096828 to 11.921055069 kJ/(kg K), the region's bounding box.
    /// </summary>
    /// <param name="h">Specific enthalpy, kJ/kg.</param>
    /// <param name="s">Specific entropy, kJ/(kg K).</param>
    /// <returns>Pressure, MPa.</returns>
    /// <exception cref="ArgumentOutOfRangeException">h or s outside the bounding box of region 2.</exception>
    public static double P2HS(double h, double s) => Subregion2(h, s) switch
    {
        'a' => P2aHS(h, s),
        'b' => P2bHS(h, s),
        _ => P2cHS(h, s),
    };

    /// <summary>The subregion of region 2 ('a', 'b' or 'c') that <see cref="P2HS"/> uses for (h, s).</summary>
    /// <param name="h">Specific enthalpy, kJ/kg.</param>
    /// <param name="s">Specific entropy, kJ/(kg K).</param>
    /// <returns>'a', 'b' or 'c'.</returns>
    /// <exception cref="ArgumentOutOfRangeException">h or s outside the bounding box of region 2.</exception>
    public static char Subregion2(double h, double s)
    {
        RangeGuard.Require("SR2-01 p2(h,s)", nameof(h), h, Region2HMin, Region2HMax, "kJ/kg", "bounding box of IF97 region 2");
        RangeGuard.Require("SR2-01 p2(h,s)", nameof(s), s, Region2SMin, Region2SMax, "kJ/(kg K)", "bounding box of IF97 region 2");
        if (s >= S2abStart && h <= H2ab(s))
        {
            return 'a';
        }

        return s >= S2bc ? 'b' : 'c';
    }

    /// <summary>Subregion 2a equation (SR2-01 Eq. 3) without the subregion test, MPa.</summary>
    internal static double P2aHS(double h, double s)
    {
        double root = Series.Sum(N2a, I2a, J2a, h / 4200 - 0.5, s / 12 - 1.2);
        double sq = root * root;
        return 4 * sq * sq;
    }

    /// <summary>Subregion 2b equation (SR2-01 Eq. 4) without the subregion test, MPa.</summary>
    internal static double P2bHS(double h, double s)
    {
        double root = Series.Sum(N2b, I2b, J2b, h / 4100 - 0.6, s / 7.9 - 1.01);
        double sq = root * root;
        return 100 * sq * sq;
    }

    /// <summary>Subregion 2c equation (SR2-01 Eq. 5) without the subregion test, MPa.</summary>
    internal static double P2cHS(double h, double s)
    {
        double root = Series.Sum(N2c, I2c, J2c, h / 3500 - 0.7, s / 5.9 - 1.1);
        double sq = root * root;
        return 100 * sq * sq;
    }
}
