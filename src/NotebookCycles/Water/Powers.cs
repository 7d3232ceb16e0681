using System.Runtime.CompilerServices;

namespace NotebookCycles.Water;

/// <summary>Tables of consecutive integer powers, so the IF97 sums never call Math.Pow with an integer exponent.</summary>
internal static class Powers
{
    /// <summary>
    /// Fills <paramref name="table"/> with x^e for e = <paramref name="lowest"/>, lowest + 1, … (table[k] = x^(lowest + k)).
    /// Negative exponents are built from 1/x. x must be non-zero when <paramref name="lowest"/> is negative.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Fill(double x, int lowest, Span<double> table)
    {
        int zero = -lowest;
        if (zero >= 0 && zero < table.Length)
        {
            table[zero] = 1.0;
            double up = 1.0;
            for (int k = zero + 1; k < table.Length; k++)
            {
                up *= x;
                table[k] = up;
            }

            double inv = 1.0 / x;
            double down = 1.0;
            for (int k = zero - 1; k >= 0; k--)
            {
                down *= inv;
                table[k] = down;
            }

            return;
        }

        // The table does not contain the exponent 0 (not used by the release's tables, kept for completeness).
        double first = Math.Pow(x, lowest);
        table[0] = first;
        for (int k = 1; k < table.Length; k++)
        {
            table[k] = table[k - 1] * x;
        }
    }
}
