using System.Globalization;
using System.Text;
using System.Text.Json;
using NotebookCycles.Cycles;
using NotebookCycles.Properties;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Cli;

/// <summary>
/// The machine-readable record of a run: every cycle, state, sweep, optimum and comparison the notebook displayed,
/// in SI units, written with the core's <see cref="RecordJson"/> writer. Keys are documented in docs/cli.md.
/// </summary>
public static class CaptureJson
{
    /// <summary>The format's version, written as "format".</summary>
    public const string Format = "nbcycles-run/1";

    /// <summary>The JSON document of <paramref name="run"/>.</summary>
    public static string Render(RunResult run)
    {
        ArgumentNullException.ThrowIfNull(run);
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            json.WriteStartObject();
            json.WriteString("format", Format);
            json.WriteString("notebook", Path.GetFileName(run.Notebook.Path));
            json.WriteString("run_utc", run.Started.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture));
            json.WriteString("library_version", MemoHtml.LibraryVersion);
            json.WriteString("units", "SI (K, Pa, m3/kg, J/kg, J/(kg K))");
            json.WriteStartArray("values");
            foreach (var captured in run.Values)
            {
                json.WriteStartObject();
                json.WriteNumber("cell", captured.Cell);
                json.WritePropertyName("value");
                WriteValue(json, captured.Value);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    private static void WriteValue(Utf8JsonWriter json, object value)
    {
        switch (value)
        {
            case CycleResult cycle:
                RecordJson.WriteCycle(json, cycle);
                break;
            case State state:
                RecordJson.WriteState(json, state);
                break;
            case SweepResult sweep:
                RecordJson.WriteSweep(json, sweep);
                break;
            case OptimumResult optimum:
                RecordJson.WriteOptimum(json, optimum);
                break;
            case Rendering.CalculationRecord record:
                RecordJson.WriteCycle(json, record.Cycle);
                break;
            case Cycles.CycleComparison comparison:
                json.WriteStartObject();
                json.WriteString("kind", "comparison");
                json.WriteString("title", comparison.Title);
                json.WriteStartArray("cycles");
                foreach (var (name, c) in comparison.Variants)
                {
                    json.WriteStartObject();
                    json.WriteString("variant", name);
                    json.WritePropertyName("cycle");
                    RecordJson.WriteCycle(json, c);
                    json.WriteEndObject();
                }

                json.WriteEndArray();
                json.WriteEndObject();
                break;
            default:
                json.WriteStartObject();
                json.WriteString("kind", "other");
                json.WriteString("type", value.GetType().FullName);
                json.WriteEndObject();
                break;
        }
    }
}
