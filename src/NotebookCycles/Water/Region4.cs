using System.Runtime.CompilerServices;

namespace NotebookCycles.Water;

/// <summary>
/// IAPWS-IF97 region 4 (saturation line): the saturation-pressure equation (IAPWS R7-97(2012) eq. 30) and the
/// saturation-temperature equation (eq. 31), Table 34. Valid 273.15 K ≤ T ≤ 647.096 K, i.e. 611.213 Pa ≤ p ≤ 22.064 MPa.
/// </summary>
internal static class Region4
{
    private const double N1 = 0.11670521452767e4;
    private const double N2 = -0.72421316703206e6;
    private const double N3 = -0.17073846940092e2;
    private const double N4 = 0.12020824702470e5;
    private const double N5 = -0.32325550322333e7;
    private const double N6 = 0.14915108613530e2;
    private const double N7 = -0.48232657361591e4;
    private const double N8 = 0.40511340542057e6;
    private const double N9 = -0.23855557567849;
    private const double N10 = 0.65017534844798e3;

    /// <summary>Saturation pressure (MPa) at T (K), eq. 30.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double SaturationPressure(double t)
    {
        double theta = t + N9 / (t - N10);
        double a = theta * theta + N1 * theta + N2;
        double b = N3 * theta * theta + N4 * theta + N5;
        double c = N6 * theta * theta + N7 * theta + N8;
        double x = 2.0 * c / (-b + Math.Sqrt(b * b - 4.0 * a * c));
        x *= x;
        return x * x;
    }

    /// <summary>Saturation temperature (K) at p (MPa), eq. 31.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double SaturationTemperature(double p)
    {
        double beta = Math.Sqrt(Math.Sqrt(p));
        double e = beta * beta + N3 * beta + N6;
        double f = N1 * beta * beta + N4 * beta + N7;
        double g = N2 * beta * beta + N5 * beta + N8;
        double d = 2.0 * g / (-f - Math.Sqrt(f * f - 4.0 * e * g));
        double sum = N10 + d;
        return 0.5 * (sum - Math.Sqrt(sum * sum - 4.0 * (N9 + N10 * d)));
    }
}
