using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace NotebookCycles.Cli;

/// <summary>One number that moved beyond the tolerance.</summary>
/// <param name="Mime">Where: the output's MIME type ("text/plain"), "stream" or "error".</param>
/// <param name="Before">The stored value.</param>
/// <param name="After">The value of the re-run.</param>
/// <param name="Context">The stored text around the number.</param>
public sealed record NumberChange(string Mime, double Before, double After, string Context);

/// <summary>How one code cell compared.</summary>
/// <param name="Cell">The cell's number.</param>
/// <param name="Status">Unchanged, changed or failed.</param>
/// <param name="Numbers">Numbers that moved beyond the tolerance (text/plain first).</param>
/// <param name="TextChanges">Descriptions of text that differs apart from numbers.</param>
public sealed record CellComparison(int Cell, CellStatus Status, IReadOnlyList<NumberChange> Numbers, IReadOnlyList<string> TextChanges);

/// <summary>The outcome of comparing a cell.</summary>
public enum CellStatus
{
    /// <summary>Every output matches.</summary>
    Unchanged,

    /// <summary>Some output differs.</summary>
    Changed,

    /// <summary>The cell failed on the re-run.</summary>
    Failed,
}

/// <summary>
/// Compares stored notebook outputs with re-executed ones: numbers within a relative tolerance, the text around
/// them exactly after normalising volatile parts (dates and times, GUIDs and other generated ids, the run stamp).
/// </summary>
public static partial class OutputComparison
{
    /// <summary>Compares one cell's outputs.</summary>
    public static CellComparison Compare(int cell, JsonArray stored, JsonArray rerun, double tolerance)
    {
        ArgumentNullException.ThrowIfNull(stored);
        ArgumentNullException.ThrowIfNull(rerun);
        var before = Flatten(stored);
        var after = Flatten(rerun);
        var numbers = new List<NumberChange>();
        var text = new List<string>();
        var keys = before.Keys.Union(after.Keys).OrderBy(k => k.StartsWith("text/plain", StringComparison.Ordinal) ? 0 : k.StartsWith("stream", StringComparison.Ordinal) ? 1 : 2).ThenBy(k => k, StringComparer.Ordinal);
        foreach (string key in keys)
        {
            if (!before.TryGetValue(key, out string? b))
            {
                text.Add($"{Where(key)}: new output in the re-run");
                continue;
            }

            if (!after.TryGetValue(key, out string? a))
            {
                text.Add($"{Where(key)}: stored output missing from the re-run");
                continue;
            }

            CompareText(Where(key), b, a, tolerance, numbers, text);
        }

        var status = numbers.Count == 0 && text.Count == 0 ? CellStatus.Unchanged : CellStatus.Changed;
        return new CellComparison(cell, status, numbers, text);
    }

    /// <summary>Replaces the volatile parts of an output's text by fixed markers.</summary>
    public static string Normalise(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        string t = text.Replace("\r\n", "\n", StringComparison.Ordinal);
        t = IsoTimestamp().Replace(t, "<time>");
        t = ClockTime().Replace(t, "<time>");
        t = Guid().Replace(t, "<id>");
        t = LongHex().Replace(t, "<id>");
        t = GeneratedId().Replace(t, "$1=\"<id>\"");
        return t;
    }

    private static void CompareText(string mime, string before, string after, double tolerance, List<NumberChange> numbers, List<string> text)
    {
        string b = Normalise(before), a = Normalise(after);
        if (b == a)
        {
            return;
        }

        var bn = NumberPattern().Matches(b);
        var an = NumberPattern().Matches(a);
        string bSkeleton = NumberPattern().Replace(b, "#"), aSkeleton = NumberPattern().Replace(a, "#");
        if (bSkeleton != aSkeleton || bn.Count != an.Count)
        {
            text.Add($"{mime}: text differs near \"{Snippet(b, FirstDifference(bSkeleton, aSkeleton), bSkeleton)}\"");
            return;
        }

        bool anyNumber = false;
        for (int i = 0; i < bn.Count; i++)
        {
            double x = Parse(bn[i].Value), y = Parse(an[i].Value);
            if (Same(x, y, tolerance))
            {
                continue;
            }

            anyNumber = true;
            if (numbers.Count(n => n.Mime == mime) < 8)
            {
                numbers.Add(new NumberChange(mime, x, y, Context(b, bn[i].Index, bn[i].Length)));
            }
        }

        _ = anyNumber;
    }

    /// <summary>True when two numbers agree within the relative tolerance (or both are below 1e-300 in magnitude).</summary>
    public static bool Same(double x, double y, double tolerance)
    {
        if (x == y)
        {
            return true;
        }

        double scale = Math.Max(Math.Abs(x), Math.Abs(y));
        return Math.Abs(x - y) <= tolerance * scale || scale < 1e-300;
    }

    private static Dictionary<string, string> Flatten(JsonArray outputs)
    {
        var map = new Dictionary<string, string>(StringComparer.Ordinal);
        for (int i = 0; i < outputs.Count; i++)
        {
            if (outputs[i] is not JsonObject o)
            {
                continue;
            }

            string index = i.ToString(CultureInfo.InvariantCulture);
            switch ((string?)o["output_type"])
            {
                case "display_data" or "execute_result":
                    if (o["data"] is JsonObject data)
                    {
                        foreach (var (mime, value) in data)
                        {
                            map[mime + "#" + index] = Notebook.JoinText(value);
                        }
                    }

                    break;
                case "stream":
                    map["stream:" + ((string?)o["name"] ?? "stdout") + "#" + index] = Notebook.JoinText(o["text"]);
                    break;
                case "error":
                    map["error#" + index] = ((string?)o["ename"] ?? "") + ": " + ((string?)o["evalue"] ?? "");
                    break;
            }
        }

        return map;
    }

    private static string Where(string key)
    {
        int hash = key.LastIndexOf('#');
        int index = int.Parse(key[(hash + 1)..], CultureInfo.InvariantCulture);
        return "output " + (index + 1).ToString(CultureInfo.InvariantCulture) + " " + key[..hash];
    }

    private static double Parse(string s) => double.Parse(s.Replace('−', '-'), NumberStyles.Float, CultureInfo.InvariantCulture);

    private static int FirstDifference(string x, string y)
    {
        int n = Math.Min(x.Length, y.Length);
        for (int i = 0; i < n; i++)
        {
            if (x[i] != y[i])
            {
                return i;
            }
        }

        return n;
    }

    private static string Snippet(string original, int skeletonIndex, string skeleton)
    {
        int from = Math.Max(0, skeletonIndex - 30);
        int to = Math.Min(skeleton.Length, skeletonIndex + 30);
        _ = original;
        return OneLine(skeleton[from..to]);
    }

    private static string Context(string text, int index, int length)
    {
        int from = Math.Max(0, index - 40);
        int to = Math.Min(text.Length, index + length + 10);
        return OneLine(text[from..to]);
    }

    private static string OneLine(string s)
    {
        var sb = new StringBuilder(s.Length);
        bool space = false;
        foreach (char c in s)
        {
            if (char.IsWhiteSpace(c))
            {
                if (!space)
                {
                    sb.Append(' ');
                }

                space = true;
            }
            else
            {
                sb.Append(c);
                space = false;
            }
        }

        return sb.ToString().Trim();
    }

    [GeneratedRegex(@"(?<![\w.#])[-−]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?(?![\w])")]
    private static partial Regex NumberPattern();

    [GeneratedRegex(@"\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?(?:Z|[+-]\d{2}:?\d{2}| UTC)?")]
    private static partial Regex IsoTimestamp();

    [GeneratedRegex(@"\b\d{1,2}:\d{2}:\d{2}(?:\.\d+)?\b")]
    private static partial Regex ClockTime();

    [GeneratedRegex(@"\b[0-9a-fA-F]{8}-[0-9a-fA-F]{4}-[0-9a-fA-F]{4}-[0-9a-fA-F]{4}-[0-9a-fA-F]{12}\b")]
    private static partial Regex Guid();

    [GeneratedRegex(@"\b[0-9a-fA-F]{24,}\b")]
    private static partial Regex LongHex();

    [GeneratedRegex(@"\b(id|for|aria-labelledby|aria-describedby|clip-path|marker-end|marker-start)=""[^""]*[0-9a-f]{6,}[^""]*""")]
    private static partial Regex GeneratedId();
}
