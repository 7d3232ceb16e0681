namespace NotebookCycles.Water.Backward;

/// <summary>
/// Evaluates the polynomial sums the IAPWS supplementary releases are written in: Σ nᵢ·xᴵⁱ·yᴶⁱ with integer exponents.
/// Allocation-free; the coefficient arrays are the callers' static tables.
/// </summary>
internal static class Series
{
    /// <summary>Σ nᵢ·x^Iᵢ·y^Jᵢ over all i. A zero base with a negative exponent gives an infinity, as the formula does.</summary>
    public static double Sum(double[] n, int[] i, int[] j, double x, double y)
    {
        double sum = 0;
        for (int k = 0; k < n.Length; k++)
        {
            sum += n[k] * Power(x, i[k]) * Power(y, j[k]);
        }

        return sum;
    }

    /// <summary>x raised to an integer power by repeated squaring (exact sign for negative x).</summary>
    public static double Power(double x, int e)
    {
        if (e == 0)
        {
            return 1;
        }

        bool invert = e < 0;
        uint m = invert ? (uint)(-e) : (uint)e;
        double result = 1;
        double b = x;
        while (m != 0)
        {
            if ((m & 1) != 0)
            {
                result *= b;
            }

            m >>= 1;
            if (m != 0)
            {
                b *= b;
            }
        }

        return invert ? 1 / result : result;
    }
}
