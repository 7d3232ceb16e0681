using System.Text.Json;
using NotebookCycles.Properties;
using NotebookCycles.Sweeps;

namespace NotebookCycles.Cycles;

/// <summary>
/// The library's JSON writer for cycles, states, sweeps and optimum searches, for tools that collect several results
/// into one document (the command line's <c>--json</c>). SI units throughout; non-finite numbers are written as null.
/// Keys are documented in docs/cli.md.
/// </summary>
public static class RecordJson
{
    /// <summary>Writes a solved cycle as one JSON object (the same object as <see cref="CycleResult.ToJson"/>).</summary>
    public static void WriteCycle(Utf8JsonWriter json, CycleResult cycle)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(cycle);
        RecordExport.Write(json, cycle);
    }

    /// <summary>Writes one state as a JSON object: kind "state", label, model, T_K, p_Pa, v_m3_per_kg, u_J_per_kg, h_J_per_kg, s_J_per_kgK, x (null if single phase), phase.</summary>
    public static void WriteState(Utf8JsonWriter json, State state)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(state);
        var p = state.Point;
        json.WriteStartObject();
        json.WriteString("kind", "state");
        json.WriteString("label", state.Label);
        json.WriteString("model", state.Model.Name);
        RecordExport.Number(json, "T_K", p.T);
        RecordExport.Number(json, "p_Pa", p.P);
        RecordExport.Number(json, "v_m3_per_kg", p.V);
        RecordExport.Number(json, "u_J_per_kg", p.U);
        RecordExport.Number(json, "h_J_per_kg", p.H);
        RecordExport.Number(json, "s_J_per_kgK", p.S);
        RecordExport.Number(json, "x", p.X);
        json.WriteString("phase", p.Phase.ToString());
        json.WriteEndObject();
    }

    /// <summary>
    /// Writes a sweep as one JSON object: kind "sweep", title, parameter, second_parameter (null for one parameter) and
    /// points, each with x, y (null for one parameter), succeeded, failure and figures (the keys of
    /// <see cref="SweepResult.FigureColumns"/>, null when the point failed).
    /// </summary>
    public static void WriteSweep(Utf8JsonWriter json, SweepResult sweep)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(sweep);
        json.WriteStartObject();
        json.WriteString("kind", "sweep");
        WriteSweepBody(json, sweep);
        json.WriteEndObject();
    }

    /// <summary>
    /// Writes an optimum search as one JSON object: kind "optimum", parameter, value, tolerance, objective,
    /// constraint_active, evaluations, cycle (the cycle at the optimum) and scan (the coarse scan, as a sweep).
    /// </summary>
    public static void WriteOptimum(Utf8JsonWriter json, OptimumResult optimum)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(optimum);
        json.WriteStartObject();
        json.WriteString("kind", "optimum");
        json.WriteString("parameter", optimum.Parameter);
        RecordExport.Number(json, "value", optimum.Value);
        RecordExport.Number(json, "tolerance", optimum.Tolerance);
        RecordExport.Number(json, "objective", optimum.Objective);
        json.WriteBoolean("constraint_active", optimum.ConstraintActive);
        json.WriteNumber("evaluations", optimum.Evaluations);
        json.WritePropertyName("cycle");
        RecordExport.Write(json, optimum.Cycle);
        json.WriteStartObject("scan");
        json.WriteString("kind", "sweep");
        WriteSweepBody(json, optimum.Scan);
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteSweepBody(Utf8JsonWriter json, SweepResult sweep)
    {
        json.WriteString("title", sweep.Title);
        json.WriteString("parameter", sweep.XName);
        if (sweep.YName is null)
        {
            json.WriteNull("second_parameter");
        }
        else
        {
            json.WriteString("second_parameter", sweep.YName);
        }

        json.WriteStartArray("points");
        foreach (var point in sweep.Points)
        {
            json.WriteStartObject();
            RecordExport.Number(json, "x", point.X);
            RecordExport.Number(json, "y", point.Y);
            json.WriteBoolean("succeeded", point.Succeeded);
            if (point.FailureReason is null)
            {
                json.WriteNull("failure");
            }
            else
            {
                json.WriteString("failure", point.FailureReason);
            }

            if (point.Figures is { } f)
            {
                json.WriteStartObject("figures");
                foreach (var (name, get) in SweepResult.FigureColumns)
                {
                    RecordExport.Number(json, name, get(f));
                }

                json.WriteEndObject();
            }
            else
            {
                json.WriteNull("figures");
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
    }
}
