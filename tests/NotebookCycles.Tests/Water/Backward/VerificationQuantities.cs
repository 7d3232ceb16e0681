using NotebookCycles.Water.Backward;

namespace NotebookCycles.Tests.Water.Backward;

/// <summary>
/// Maps each quantity string of the verification file (for example "p = p2c(h,s), subregion 2c") to the function
/// that computes it and, where the quantity names a subregion, to the selector that must pick it.
/// </summary>
internal static class VerificationQuantities
{
    /// <summary>Relative tolerance the file's header prescribes for the supplementary releases.</summary>
    public const double RelativeTolerance = 1e-9;

    /// <summary>The computation for one quantity.</summary>
    /// <param name="Compute">Evaluates the quantity from the row's inputs, in the file's units.</param>
    /// <param name="Select">The subregion selector for these inputs, or null when the quantity names no subregion.</param>
    /// <param name="ExpectedSubregion">The subregion letter the release names ('a' for "3a"), or null.</param>
    public sealed record Mapping(Func<ParsedInputs, double> Compute, Func<ParsedInputs, char>? Select, char? ExpectedSubregion);

    /// <summary>The function part of a quantity, e.g. "p2c(h,s)" from "p = p2c(h,s), subregion 2c".</summary>
    public static (string Name, string Args) FunctionOf(string quantity)
    {
        int eq = quantity.IndexOf('=', StringComparison.Ordinal);
        int open = quantity.IndexOf('(', eq + 1);
        int close = quantity.IndexOf(')', open + 1);
        if (eq < 0 || open < 0 || close < 0)
        {
            throw new FormatException($"Cannot read the function of quantity '{quantity}'.");
        }

        return (quantity[(eq + 1)..open].Trim(), quantity[(open + 1)..close].Replace(" ", "", StringComparison.Ordinal));
    }

    public static Mapping For(string quantity)
    {
        var (name, args) = FunctionOf(quantity);
        switch (name, args)
        {
            case ("p1", "h,s"):
                return new(x => Sr201.P1HS(x["h"], x["s"]), null, null);
            case ("p2a" or "p2b" or "p2c", "h,s"):
                return new(x => Sr201.P2HS(x["h"], x["s"]), x => Sr201.Subregion2(x["h"], x["s"]), name[^1]);
            case ("hB2ab", "s"):
                return new(x => Sr201.H2ab(x["s"]), null, null);
            case ("hB3ab", "p"):
                return new(x => Sr303.H3ab(x["p"]), null, null);
            case ("T3a" or "T3b", "p,h"):
                return new(x => Sr303.T3PH(x["p"], x["h"]), x => Sr303.SubregionPH(x["p"], x["h"]), name[^1]);
            case ("v3a" or "v3b", "p,h"):
                return new(x => Sr303.V3PH(x["p"], x["h"]), x => Sr303.SubregionPH(x["p"], x["h"]), name[^1]);
            case ("T3a" or "T3b", "p,s"):
                return new(x => Sr303.T3PS(x["p"], x["s"]), x => Sr303.SubregionPS(x["p"], x["s"]), name[^1]);
            case ("v3a" or "v3b", "p,s"):
                return new(x => Sr303.V3PS(x["p"], x["s"]), x => Sr303.SubregionPS(x["p"], x["s"]), name[^1]);
            case ("p3sat", "h"):
                return new(x => Sr303.P3satH(x["h"]), null, null);
            case ("p3sat", "s"):
                return new(x => Sr303.P3satS(x["s"]), null, null);
            case ("p3a" or "p3b", "h,s"):
                return new(x => Sr404.P3HS(x["h"], x["s"]), x => Sr404.SubregionHS(x["h"], x["s"]), name[^1]);
            case ("h'1", "s"):
                return new(x => Sr404.HSatLiquid1(x["s"]), null, null);
            case ("h'3a", "s"):
                return new(x => Sr404.HSatLiquid3a(x["s"]), null, null);
            case ("h''2ab", "s"):
                return new(x => Sr404.HSatVapour2ab(x["s"]), null, null);
            case ("h''2c3b", "s"):
                return new(x => Sr404.HSatVapour2c3b(x["s"]), null, null);
            case ("hB13", "s"):
                return new(x => Sr404.HB13(x["s"]), null, null);
            case ("TB23", "h,s"):
                return new(x => Sr404.TB23(x["h"], x["s"]), null, null);
            case ("Tsat", "h,s"):
                return new(x => Sr404.TsatHS(x["h"], x["s"]), null, null);
            case ("T3ab", "p"):
                return new(x => Sr505.T3ab(x["p"]), null, null);
            case ("T3cd", "p"):
                return new(x => Sr505.T3cd(x["p"]), null, null);
            case ("T3ef", "p"):
                return new(x => Sr505.T3ef(x["p"]), null, null);
            case ("T3gh", "p"):
                return new(x => Sr505.T3gh(x["p"]), null, null);
            case ("T3ij", "p"):
                return new(x => Sr505.T3ij(x["p"]), null, null);
            case ("T3jk", "p"):
                return new(x => Sr505.T3jk(x["p"]), null, null);
            case ("T3mn", "p"):
                return new(x => Sr505.T3mn(x["p"]), null, null);
            case ("T3op", "p"):
                return new(x => Sr505.T3op(x["p"]), null, null);
            case ("T3qu", "p"):
                return new(x => Sr505.T3qu(x["p"]), null, null);
            case ("T3rx", "p"):
                return new(x => Sr505.T3rx(x["p"]), null, null);
            case ("T3uv", "p"):
                return new(x => Sr505.T3uv(x["p"]), null, null);
            case ("T3wx", "p"):
                return new(x => Sr505.T3wx(x["p"]), null, null);
            default:
                if (name.Length == 3 && name[0] == 'v' && name[1] == '3' && name[2] is >= 'a' and <= 'z' && args == "p,T")
                {
                    return new(x => Sr505.V3PT(x["p"], x["T"]), x => Sr505.Subregion(x["p"], x["T"]), name[2]);
                }

                throw new NotSupportedException($"No function is mapped to quantity '{quantity}'.");
        }
    }

    /// <summary>Relative deviation |computed − expected| / |expected|.</summary>
    public static double RelativeError(double computed, double expected) => Math.Abs(computed - expected) / Math.Abs(expected);

    /// <summary>Evaluates one row and returns its relative error against the file's value.</summary>
    public static double ErrorOf(VerificationRow row)
    {
        var inputs = new ParsedInputs(row.Inputs);
        return RelativeError(For(row.Quantity).Compute(inputs), row.Value);
    }
}
