using System.Globalization;
using System.Text;
using System.Text.Json;
using NotebookCycles.Gases;
using NotebookCycles.Properties;
using NotebookCycles.Units;
using NotebookCycles.Water;
using Spectre.Console;

namespace NotebookCycles.Cli;

/// <summary><c>nbcycles state</c>: one state of a property model from two inputs with units.</summary>
public static class StateCommand
{
    /// <summary>The model names the command knows (any NASA Glenn species name, such as N2 or CO2, and any refrigerant name also work).</summary>
    public static IReadOnlyList<string> ModelNames { get; } = ["air", "cold-air", "water", "steam", "<refrigerant, e.g. R134a, R32, R1234yf, R744, R717, R290>", "<gas species, e.g. N2, CO2, H2O>"];

    /// <summary>The property model for a name; an unknown name raises <see cref="CliException"/> listing the known ones.</summary>
    public static IPropertyModel Model(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        switch (name.Trim().ToLowerInvariant())
        {
            case "air":
            case "dry-air":
                return IdealGas.DryAir;
            case "cold-air":
            case "cold-air-standard":
                return ColdAirStandard.Air;
            case "water":
            case "steam":
                return IapwsIf97.Default;
        }

        if (GasSpecies.Contains(name.Trim()))
        {
            return IdealGas.Species(name.Trim());
        }

        try
        {
            return Refrigerants.Refrigerant.Get(name);
        }
        catch (ArgumentException)
        {
            throw new CliException($"unknown model '{name}': use air, cold-air, water (or steam), a refrigerant ({string.Join(", ", Refrigerants.Refrigerant.Names)}), or a gas species name such as N2, O2, CO2, H2O.");
        }
    }

    /// <summary>Solves the state from two "property=value unit" inputs.</summary>
    public static (IPropertyModel Model, StatePoint Point) Solve(string model, IReadOnlyList<string> inputs)
    {
        ArgumentNullException.ThrowIfNull(inputs);
        var m = Model(model);
        if (inputs.Count != 2)
        {
            throw new CliException($"a state needs exactly two inputs (e.g. T=1200K p=20bar); {inputs.Count.ToString(CultureInfo.InvariantCulture)} given.");
        }

        var a = QuantityText.Parse(inputs[0]);
        var b = QuantityText.Parse(inputs[1]);
        if (a.Property == b.Property)
        {
            throw new CliException($"both inputs give {a.Property.Symbol()}: a state needs two different properties.");
        }

        try
        {
            return (m, m.Solve(a.Property, a.Value, b.Property, b.Value));
        }
        catch (PropertyModelException e)
        {
            throw new CliException(e.Message, ExitCodes.UsageOrInput, e);
        }
        catch (Numerics.NonConvergenceException e)
        {
            throw new CliException($"{m.Name}: no state found for {a}, {b}: {e.Message}", ExitCodes.UsageOrInput, e);
        }
    }

    /// <summary>Runs the command; returns the exit code.</summary>
    public static int Execute(string model, IReadOnlyList<string> inputs, bool json, TextWriter stdout)
    {
        ArgumentNullException.ThrowIfNull(stdout);
        var (m, p) = Solve(model, inputs);
        if (json)
        {
            stdout.Write(Json(m, p));
            return ExitCodes.Success;
        }

        var console = Terminal.For(stdout);
        console.MarkupLine($"[bold]{Markup.Escape(m.Name)}[/] — {Markup.Escape(p.Phase.ToString())}");
        var table = new Table().AddColumn("property").AddColumn(new TableColumn("value").RightAligned()).AddColumn("unit");
        table.Border = TableBorder.Simple;
        table.AddRow("T", SiText.Number(p.T), "K");
        table.AddRow("p", SiText.Number(p.P / 1000), "kPa");
        table.AddRow("v", SiText.Number(p.V), "m³/kg");
        table.AddRow("u", SiText.Number(p.U / 1000), "kJ/kg");
        table.AddRow("h", SiText.Number(p.H / 1000), "kJ/kg");
        table.AddRow("s", SiText.Number(p.S / 1000), "kJ/(kg·K)");
        table.AddRow("x", double.IsNaN(p.X) ? "—" : SiText.Number(p.X), "");
        if (double.IsFinite(p.Cp))
        {
            table.AddRow("cp", SiText.Number(p.Cp / 1000), "kJ/(kg·K)");
        }

        if (double.IsFinite(p.W) && p.W > 0)
        {
            table.AddRow("w (speed of sound)", SiText.Number(p.W), "m/s");
        }

        console.Write(table);
        return ExitCodes.Success;
    }

    /// <summary>The state as JSON: model, T_K, p_kPa, v_m3_per_kg, u_kJ_per_kg, h_kJ_per_kg, s_kJ_per_kgK, x (null if single phase), phase.</summary>
    public static string Json(IPropertyModel model, StatePoint p)
    {
        ArgumentNullException.ThrowIfNull(model);
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            json.WriteStartObject();
            json.WriteString("model", model.Name);
            json.WriteNumber("T_K", p.T);
            json.WriteNumber("p_kPa", p.P / 1000);
            json.WriteNumber("v_m3_per_kg", p.V);
            json.WriteNumber("u_kJ_per_kg", p.U / 1000);
            json.WriteNumber("h_kJ_per_kg", p.H / 1000);
            json.WriteNumber("s_kJ_per_kgK", p.S / 1000);
            if (double.IsNaN(p.X))
            {
                json.WriteNull("x");
            }
            else
            {
                json.WriteNumber("x", p.X);
            }

            json.WriteString("phase", p.Phase.ToString());
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }
}
