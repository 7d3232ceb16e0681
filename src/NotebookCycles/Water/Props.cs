using System.Runtime.CompilerServices;
using NotebookCycles.Properties;

namespace NotebookCycles.Water;

/// <summary>
/// One single-phase state in the release's units: T K, p MPa, v m³/kg, u and h kJ/kg, s, cp, cv kJ/(kg·K), w m/s.
/// </summary>
internal readonly struct Props
{
    /// <summary>Specific gas constant of the formulation, R = 0.461526 kJ/(kg·K) (IAPWS R7-97(2012) eq. 1).</summary>
    public const double R = 0.461526;

    public readonly double T;
    public readonly double P;
    public readonly double V;
    public readonly double U;
    public readonly double H;
    public readonly double S;
    public readonly double Cp;
    public readonly double Cv;
    public readonly double W;

    public Props(double t, double p, double v, double u, double h, double s, double cp, double cv, double w)
    {
        T = t;
        P = p;
        V = v;
        U = u;
        H = h;
        S = s;
        Cp = cp;
        Cv = cv;
        W = w;
    }

    /// <summary>Properties from the dimensionless Gibbs free energy γ(π, τ) and its derivatives (R7-97(2012) Tables 3, 12, 39).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Props FromGibbs(double t, double p, double pi, double tau, double g, double gPi, double gPiPi, double gTau, double gTauTau, double gPiTau)
    {
        double rt = R * t;
        double v = rt * pi * gPi / p * 1e-3;
        double h = rt * tau * gTau;
        double u = rt * (tau * gTau - pi * gPi);
        double s = R * (tau * gTau - g);
        double cp = -R * tau * tau * gTauTau;
        double c = gPi - tau * gPiTau;
        double cv = R * (-tau * tau * gTauTau + c * c / gPiPi);
        double w2 = 1e3 * rt * gPi * gPi / (c * c / (tau * tau * gTauTau) - gPiPi);
        return new Props(t, p, v, u, h, s, cp, cv, Math.Sqrt(w2));
    }

    /// <summary>The SI state point (Pa, J/kg, J/(kg·K)).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public StatePoint ToStatePoint(Phase phase) =>
        new(T, P * 1e6, V, U * 1e3, H * 1e3, S * 1e3, Cp * 1e3, Cv * 1e3, W, double.NaN, phase);
}
