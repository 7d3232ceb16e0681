using System.Globalization;
using System.Text;
using System.Text.Json;
using NotebookCycles.Properties;
using NotebookCycles.Units;

namespace NotebookCycles.Cycles;

/// <summary>The calculation record as Markdown and JSON, straight from the result's data.</summary>
internal static class RecordExport
{
    public static string Summary(CycleResult r)
    {
        var f = r.Figures;
        var text = new StringBuilder();
        text.Append(r.Title).Append(" (").Append(r.Kind == SystemKind.Closed ? "closed" : "steady flow").Append(", ").Append(r.Model.Name).Append("): ");
        text.Append("q_in = ").Append(SiText.Number(f.HeatIn / 1000)).Append(" kJ/kg, w_net = ").Append(SiText.Number(f.NetWork / 1000)).Append(" kJ/kg");
        if (!double.IsNaN(f.ThermalEfficiency))
        {
            text.Append(", η = ").Append(SiText.Number(f.ThermalEfficiency));
        }

        if (!double.IsNaN(f.CopCooling))
        {
            text.Append(", COP_cooling = ").Append(SiText.Number(f.CopCooling));
        }

        return text.ToString();
    }

    public static string ToMarkdown(CycleResult r)
    {
        var md = new StringBuilder();
        md.Append("# ").AppendLine(r.Title).AppendLine();
        md.Append("Property model: ").Append(r.Model.Name).Append(". ").AppendLine(r.Model.Citation).AppendLine();
        md.Append("System: ").AppendLine(r.Kind == SystemKind.Closed ? "closed (per unit mass; q − w = Δu)." : "steady flow (per unit mass of reference flow; q − w = Δh; kinetic and potential energy neglected).").AppendLine();
        md.AppendLine("## States").AppendLine();
        md.AppendLine("| State | T (K) | p (kPa) | v (m³/kg) | u (kJ/kg) | h (kJ/kg) | s (kJ/(kg·K)) | x | m |");
        md.AppendLine("|---|---|---|---|---|---|---|---|---|");
        for (int i = 0; i < r.States.Length; i++)
        {
            var p = r.States[i].Point;
            md.Append("| ").Append(r.States[i].Label)
              .Append(" | ").Append(SiText.Number(p.T))
              .Append(" | ").Append(SiText.Number(p.P / 1000))
              .Append(" | ").Append(SiText.Number(p.V))
              .Append(" | ").Append(SiText.Number(p.U / 1000))
              .Append(" | ").Append(SiText.Number(p.H / 1000))
              .Append(" | ").Append(SiText.Number(p.S / 1000))
              .Append(" | ").Append(double.IsNaN(p.X) ? "—" : SiText.Number(p.X))
              .Append(" | ").Append(SiText.Number(r.StateMassFractions[i]))
              .AppendLine(" |");
        }

        md.AppendLine().AppendLine("## Calculation record").AppendLine();
        foreach (var step in r.Steps)
        {
            md.Append("### Step ").Append(step.Index).Append(", ").Append(step.Name).Append(": ").AppendLine(step.Process).AppendLine();
            if (step.Assumptions.Length > 0)
            {
                md.Append("Assumptions: ").Append(string.Join("; ", step.Assumptions)).AppendLine(".").AppendLine();
            }

            foreach (var line in step.Lines)
            {
                md.Append("- ").AppendLine(line.ToString());
            }

            md.Append("- q = ").Append(SiText.Number(step.Q / 1000)).Append(" kJ/kg, w = ").Append(SiText.Number(step.W / 1000))
              .Append(" kJ/kg, Δs = ").Append(SiText.Number(step.DeltaS / 1000)).Append(" kJ/(kg·K), s_gen = ").Append(SiText.Number(step.EntropyGenerated / 1000)).Append(" kJ/(kg·K)");
            if (step.Q != 0)
            {
                md.Append(" (boundary at ").Append(SiText.Number(step.BoundaryTemperature)).Append(step.BoundaryTemperatureAssumed ? " K, assumed)" : " K)");
            }

            if (step.HeatIsInternal)
            {
                md.Append("; heat exchanged inside the cycle");
            }

            if (step.MassFraction != 1)
            {
                md.Append("; mass fraction ").Append(SiText.Number(step.MassFraction));
            }

            md.AppendLine();
            foreach (var w in step.Warnings)
            {
                md.Append("- **Warning:** ").AppendLine(w);
            }

            md.AppendLine();
        }

        md.AppendLine("## Figures of merit").AppendLine();
        foreach (var (name, value, unit) in Figures(r))
        {
            md.Append("- ").Append(name).Append(": ").Append(SiText.Number(value)).AppendLine(unit.Length > 0 ? " " + unit : "");
        }

        md.AppendLine().AppendLine("## Checks").AppendLine();
        foreach (var check in r.Checks)
        {
            md.Append("- ").Append(check.Passed ? "passed" : "FAILED").Append(": ").Append(check.Name).Append(" — ").AppendLine(check.Detail);
        }

        if (r.Warnings.Length > 0)
        {
            md.AppendLine().AppendLine("## Warnings").AppendLine();
            foreach (var w in r.Warnings)
            {
                md.Append("- ").AppendLine(w);
            }
        }

        md.AppendLine().Append("*").Append(CycleResult.Caution).AppendLine("*");
        return md.ToString();
    }

    /// <summary>The figures that apply to the cycle, in display units (kJ/kg, K, kPa), for text exports.</summary>
    public static IEnumerable<(string Name, double Value, string Unit)> Figures(CycleResult r)
    {
        var f = r.Figures;
        yield return ("Heat in", f.HeatIn / 1000, "kJ/kg");
        yield return ("Heat out", f.HeatOut / 1000, "kJ/kg");
        yield return ("Net work", f.NetWork / 1000, "kJ/kg");
        if (!double.IsNaN(f.ThermalEfficiency))
        {
            yield return ("Thermal efficiency", f.ThermalEfficiency, "");
        }

        yield return ("Carnot efficiency between T_min and T_max", f.CarnotEfficiency, "");
        if (!double.IsNaN(f.MeanEffectivePressure))
        {
            yield return ("Mean effective pressure", f.MeanEffectivePressure / 1000, "kPa");
        }

        if (!double.IsNaN(f.BackWorkRatio))
        {
            yield return ("Back-work ratio", f.BackWorkRatio, "");
        }

        if (!double.IsNaN(f.HeatRate))
        {
            yield return ("Heat rate", f.HeatRate * 3600, "kJ/kWh");
        }

        if (!double.IsNaN(f.SpecificConsumption))
        {
            yield return ("Specific consumption", f.SpecificConsumption * 3.6e6, "kg/kWh");
        }

        if (!double.IsNaN(f.CopCooling))
        {
            yield return ("COP, cooling", f.CopCooling, "");
            yield return ("COP, heating", f.CopHeating, "");
        }

        yield return ("Exergy destroyed", f.ExergyDestroyed / 1000, "kJ/kg");
    }

    public static string ToJson(CycleResult r)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            Write(json, r);
        }

        return Encoding.UTF8.GetString(stream.ToArray());
    }

    /// <summary>Writes one cycle as a JSON object (SI units).</summary>
    public static void Write(Utf8JsonWriter json, CycleResult r)
    {
        json.WriteStartObject();
        json.WriteString("kind", "cycle");
        json.WriteString("title", r.Title);
        json.WriteString("system", r.Kind == SystemKind.Closed ? "closed" : "steady-flow");
        json.WriteString("model", r.Model.Name);
        json.WriteString("citation", r.Model.Citation);
        json.WriteStartArray("states");
        for (int i = 0; i < r.States.Length; i++)
        {
            WriteState(json, r.States[i], r.StateMassFractions[i]);
        }

        json.WriteEndArray();
        json.WriteStartArray("steps");
        foreach (var s in r.Steps)
        {
            json.WriteStartObject();
            json.WriteNumber("index", s.Index);
            json.WriteString("from", s.From.Label);
            json.WriteString("to", s.To.Label);
            json.WriteString("process", s.Process);
            Number(json, "q_J_per_kg", s.Q);
            Number(json, "w_J_per_kg", s.W);
            Number(json, "delta_s_J_per_kgK", s.DeltaS);
            Number(json, "s_gen_J_per_kgK", s.EntropyGenerated);
            Number(json, "boundary_T_K", s.BoundaryTemperature);
            json.WriteBoolean("boundary_T_assumed", s.BoundaryTemperatureAssumed);
            json.WriteBoolean("heat_internal", s.HeatIsInternal);
            Number(json, "mass_fraction", s.MassFraction);
            Number(json, "exergy_destroyed_J_per_kg", r.ExergyDestroyed(s));
            json.WriteStartArray("record");
            foreach (var line in s.Lines)
            {
                json.WriteStringValue(line.ToString());
            }

            json.WriteEndArray();
            json.WriteStartArray("assumptions");
            foreach (var a in s.Assumptions)
            {
                json.WriteStringValue(a);
            }

            json.WriteEndArray();
            json.WriteStartArray("warnings");
            foreach (var w in s.Warnings)
            {
                json.WriteStringValue(w);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        var f = r.Figures;
        json.WriteStartObject("figures");
        Number(json, "heat_in_J_per_kg", f.HeatIn);
        Number(json, "heat_out_J_per_kg", f.HeatOut);
        Number(json, "net_work_J_per_kg", f.NetWork);
        Number(json, "thermal_efficiency", f.ThermalEfficiency);
        Number(json, "carnot_efficiency", f.CarnotEfficiency);
        Number(json, "mean_effective_pressure_Pa", f.MeanEffectivePressure);
        Number(json, "back_work_ratio", f.BackWorkRatio);
        Number(json, "heat_rate_J_per_J", f.HeatRate);
        Number(json, "specific_consumption_kg_per_J", f.SpecificConsumption);
        Number(json, "cop_cooling", f.CopCooling);
        Number(json, "cop_heating", f.CopHeating);
        Number(json, "exergy_destroyed_J_per_kg", f.ExergyDestroyed);
        Number(json, "max_temperature_K", f.MaximumTemperature);
        Number(json, "min_temperature_K", f.MinimumTemperature);
        Number(json, "max_pressure_Pa", f.MaximumPressure);
        json.WriteEndObject();
        json.WriteStartArray("checks");
        foreach (var c in r.Checks)
        {
            json.WriteStartObject();
            json.WriteString("name", c.Name);
            json.WriteBoolean("passed", c.Passed);
            json.WriteString("detail", c.Detail);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("warnings");
        foreach (var w in r.Warnings)
        {
            json.WriteStringValue(w);
        }

        json.WriteEndArray();
        json.WriteString("caution", CycleResult.Caution);
        json.WriteEndObject();
    }

    /// <summary>Writes one state as a JSON object (SI units), the keys the CLI documents.</summary>
    public static void WriteState(Utf8JsonWriter json, State s, double massFraction = 1)
    {
        var p = s.Point;
        json.WriteStartObject();
        json.WriteString("label", s.Label);
        Number(json, "T_K", p.T);
        Number(json, "p_Pa", p.P);
        Number(json, "v_m3_per_kg", p.V);
        Number(json, "u_J_per_kg", p.U);
        Number(json, "h_J_per_kg", p.H);
        Number(json, "s_J_per_kgK", p.S);
        if (double.IsNaN(p.X))
        {
            json.WriteNull("x");
        }
        else
        {
            json.WriteNumber("x", p.X);
        }

        json.WriteString("phase", p.Phase.ToString());
        Number(json, "mass_fraction", massFraction);
        json.WriteEndObject();
    }

    /// <summary>A finite number, or null for NaN and infinities (JSON has no NaN).</summary>
    internal static void Number(Utf8JsonWriter json, string name, double value)
    {
        if (double.IsFinite(value))
        {
            json.WriteNumber(name, value);
        }
        else
        {
            json.WriteNull(name);
        }
    }
}
