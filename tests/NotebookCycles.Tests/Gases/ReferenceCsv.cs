using System.Globalization;

namespace NotebookCycles.Tests.Gases;

/// <summary>Reads the published reference tables in ReferenceData/ (comment lines start with '#', then one header line).</summary>
internal static class ReferenceCsv
{
    public static List<string[]> Rows(string file)
    {
        var rows = new List<string[]>();
        bool header = false;
        foreach (string line in File.ReadLines(Path.Combine(AppContext.BaseDirectory, "ReferenceData", file)))
        {
            if (line.Length == 0 || line[0] == '#')
            {
                continue;
            }

            if (!header)
            {
                header = true;
                continue;
            }

            rows.Add(line.Split(','));
        }

        return rows;
    }

    public static double D(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}
