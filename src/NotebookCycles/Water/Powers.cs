using System.Runtime.CompilerServices;

namespace NotebookCycles.Water;

/// <summary>Tables of consecutive integer powers, so the IF97 sums never call Math.Pow with an integer exponent.</summary>
internal static class Powers
{
    /// <summary>
    /// Fills <paramref name="table"/> with x^e for e = <paramref name="lowest"/>, lowest + 1, … (table[k] = x^(lowest + k)).
    /// <paramref name="lowest"/> must be ≤ 0 and the table must reach exponent 0; negative exponents are built from 1/x
    /// (x must then be non-zero). Four interleaved products keep the multiplication chain short.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Fill(double x, int lowest, Span<double> table)
    {
        int zero = -lowest;
        int n = table.Length;
        double x2 = x * x;
        double x4 = x2 * x2;
        double a0 = 1.0, a1 = x, a2 = x2, a3 = x2 * x;
        int k = zero;
        for (; k + 3 < n; k += 4)
        {
            table[k] = a0;
            table[k + 1] = a1;
            table[k + 2] = a2;
            table[k + 3] = a3;
            a0 *= x4;
            a1 *= x4;
            a2 *= x4;
            a3 *= x4;
        }

        if (k < n)
        {
            table[k] = a0;
        }

        if (k + 1 < n)
        {
            table[k + 1] = a1;
        }

        if (k + 2 < n)
        {
            table[k + 2] = a2;
        }

        if (zero == 0)
        {
            return;
        }

        double inv = 1.0 / x;
        double i2 = inv * inv;
        double i4 = i2 * i2;
        double b1 = inv, b2 = i2, b3 = i2 * inv, b4 = i4;
        k = zero - 1;
        for (; k - 3 >= 0; k -= 4)
        {
            table[k] = b1;
            table[k - 1] = b2;
            table[k - 2] = b3;
            table[k - 3] = b4;
            b1 *= i4;
            b2 *= i4;
            b3 *= i4;
            b4 *= i4;
        }

        if (k >= 0)
        {
            table[k] = b1;
        }

        if (k - 1 >= 0)
        {
            table[k - 1] = b2;
        }

        if (k - 2 >= 0)
        {
            table[k - 2] = b3;
        }
    }
}
