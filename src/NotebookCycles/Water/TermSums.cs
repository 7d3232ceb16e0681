using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NotebookCycles.Water;

/// <summary>
/// One table of IF97 terms n·a^I·b^J, prepared once: table indices into the power tables (exponent minus the
/// table's lowest exponent) and the exponents as doubles for the derivative weights.
/// </summary>
internal sealed class TermTable
{
    public readonly double[] N;
    public readonly int[] IndexA;
    public readonly int[] IndexB;
    public readonly double[] ExpA;
    public readonly double[] ExpB;

    public TermTable(int[] i, int[] j, double[] n, int lowestA = 0, int lowestB = 0)
    {
        if (i.Length != n.Length || j.Length != n.Length)
        {
            throw new ArgumentException("Coefficient tables of unequal length.");
        }

        N = n;
        IndexA = new int[n.Length];
        IndexB = new int[n.Length];
        ExpA = new double[n.Length];
        ExpB = new double[n.Length];
        for (int k = 0; k < n.Length; k++)
        {
            IndexA[k] = i[k] - lowestA;
            IndexB[k] = j[k] - lowestB;
            ExpA[k] = i[k];
            ExpB[k] = j[k];
        }
    }

    public int Count => N.Length;
}

/// <summary>The sums over a <see cref="TermTable"/>, without bounds checks (the indices are fixed at construction).</summary>
internal static class TermSums
{
    /// <summary>
    /// Σt, ΣI·t, ΣI(I−1)·t, ΣJ·t, ΣJ(J−1)·t, ΣIJ·t with t = n·a^I·b^J, from power tables of a and b.
    /// The tables must hold every exponent the term table indexes.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Derivatives(TermTable table, ReadOnlySpan<double> powA, ReadOnlySpan<double> powB, out double g, out double gi, out double gii, out double gj, out double gjj, out double gij)
    {
        ref double rn = ref MemoryMarshal.GetArrayDataReference(table.N);
        ref int ria = ref MemoryMarshal.GetArrayDataReference(table.IndexA);
        ref int rib = ref MemoryMarshal.GetArrayDataReference(table.IndexB);
        ref double rea = ref MemoryMarshal.GetArrayDataReference(table.ExpA);
        ref double reb = ref MemoryMarshal.GetArrayDataReference(table.ExpB);
        ref double ra = ref MemoryMarshal.GetReference(powA);
        ref double rb = ref MemoryMarshal.GetReference(powB);
        double s0 = 0, si = 0, sii = 0, sj = 0, sjj = 0, sij = 0;
        int count = table.N.Length;
        for (int k = 0; k < count; k++)
        {
            double t = Unsafe.Add(ref rn, k) * Unsafe.Add(ref ra, Unsafe.Add(ref ria, k)) * Unsafe.Add(ref rb, Unsafe.Add(ref rib, k));
            double ei = Unsafe.Add(ref rea, k);
            double ej = Unsafe.Add(ref reb, k);
            double it = ei * t;
            double jt = ej * t;
            s0 += t;
            si += it;
            sj += jt;
            sii = Math.FusedMultiplyAdd(ei, it, sii);
            sjj = Math.FusedMultiplyAdd(ej, jt, sjj);
            sij = Math.FusedMultiplyAdd(ei, jt, sij);
        }

        g = s0;
        gi = si;
        gii = sii - si;
        gj = sj;
        gjj = sjj - sj;
        gij = sij;
    }

    /// <summary>Σt, ΣJ·t, ΣJ(J−1)·t, ΣJ(J−1)(J−2)·t with t = n·a^I·b^J: the sums for h, s, cp and dcp/dT.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void TauDerivatives(TermTable table, ReadOnlySpan<double> powA, ReadOnlySpan<double> powB, out double g, out double gj, out double gjj, out double gjjj)
    {
        ref double rn = ref MemoryMarshal.GetArrayDataReference(table.N);
        ref int ria = ref MemoryMarshal.GetArrayDataReference(table.IndexA);
        ref int rib = ref MemoryMarshal.GetArrayDataReference(table.IndexB);
        ref double reb = ref MemoryMarshal.GetArrayDataReference(table.ExpB);
        ref double ra = ref MemoryMarshal.GetReference(powA);
        ref double rb = ref MemoryMarshal.GetReference(powB);
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
        int count = table.N.Length;
        for (int k = 0; k < count; k++)
        {
            double t = Unsafe.Add(ref rn, k) * Unsafe.Add(ref ra, Unsafe.Add(ref ria, k)) * Unsafe.Add(ref rb, Unsafe.Add(ref rib, k));
            double ej = Unsafe.Add(ref reb, k);
            double t1 = ej * t;
            double t2 = (ej - 1.0) * t1;
            s0 += t;
            s1 += t1;
            s2 += t2;
            s3 = Math.FusedMultiplyAdd(ej - 2.0, t2, s3);
        }

        g = s0;
        gj = s1;
        gjj = s2;
        gjjj = s3;
    }

    /// <summary>Σ n·a^I·b^J from power tables of a and b.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Value(TermTable table, ReadOnlySpan<double> powA, ReadOnlySpan<double> powB)
    {
        ref double rn = ref MemoryMarshal.GetArrayDataReference(table.N);
        ref int ria = ref MemoryMarshal.GetArrayDataReference(table.IndexA);
        ref int rib = ref MemoryMarshal.GetArrayDataReference(table.IndexB);
        ref double ra = ref MemoryMarshal.GetReference(powA);
        ref double rb = ref MemoryMarshal.GetReference(powB);
        double s0 = 0, s1 = 0;
        int count = table.N.Length;
        int k = 0;
        for (; k + 1 < count; k += 2)
        {
            s0 = Math.FusedMultiplyAdd(Unsafe.Add(ref rn, k) * Unsafe.Add(ref ra, Unsafe.Add(ref ria, k)), Unsafe.Add(ref rb, Unsafe.Add(ref rib, k)), s0);
            s1 = Math.FusedMultiplyAdd(Unsafe.Add(ref rn, k + 1) * Unsafe.Add(ref ra, Unsafe.Add(ref ria, k + 1)), Unsafe.Add(ref rb, Unsafe.Add(ref rib, k + 1)), s1);
        }

        if (k < count)
        {
            s0 = Math.FusedMultiplyAdd(Unsafe.Add(ref rn, k) * Unsafe.Add(ref ra, Unsafe.Add(ref ria, k)), Unsafe.Add(ref rb, Unsafe.Add(ref rib, k)), s0);
        }

        return s0 + s1;
    }
}
