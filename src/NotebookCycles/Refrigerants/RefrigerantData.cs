using System.Globalization;
using System.Reflection;
using System.Text.Json;
using System.Text.RegularExpressions;

namespace NotebookCycles.Refrigerants;

/// <summary>The constants, terms, citation and reference-state offsets of one equation, read from its embedded coefficient file.</summary>
internal sealed partial class RefrigerantData
{
    private RefrigerantData()
    {
    }

    public required string Key { get; init; }

    public required string Fluid { get; init; }

    public required string ChemicalName { get; init; }

    public required string Citation { get; init; }

    public required string ShortSource { get; init; }

    public required double MolarMass { get; init; }

    public required double MolarGasConstant { get; init; }

    public required double ReducingTemperature { get; init; }

    public required double ReducingDensity { get; init; }

    public required double TripleTemperature { get; init; }

    public required double MaximumTemperature { get; init; }

    public required double MaximumPressure { get; init; }

    public required double CriticalTemperature { get; init; }

    public required double CriticalDensity { get; init; }

    public required double CriticalPressure { get; init; }

    public required double PublishedCriticalTemperature { get; init; }

    public required double PublishedCriticalPressure { get; init; }

    public required double DeltaMax { get; init; }

    public required string RawReferenceDescription { get; init; }

    public required Dictionary<ReferenceState, (double Dh, double Ds)> Offsets { get; init; }

    public required HelmholtzTermSet Terms { get; init; }

    /// <summary>Reads the embedded file <c>{key}.json</c>.</summary>
    public static RefrigerantData Load(string key)
    {
        var assembly = typeof(RefrigerantData).Assembly;
        using var stream = assembly.GetManifestResourceStream("NotebookCycles.Refrigerants.Data." + key + ".json")
            ?? throw new InvalidOperationException($"The coefficient file {key}.json is not embedded.");
        using var doc = JsonDocument.Parse(stream);
        var root = doc.RootElement;
        var c = root.GetProperty("constants");
        var eq = root.GetProperty("equation");
        var crit = root.GetProperty("critical_point_of_equation_computed");
        double molarMass = c.GetProperty("M_kg_per_mol").GetDouble();
        double rhoRed = c.TryGetProperty("rho_reducing_kg_per_m3", out var rk) ? rk.GetDouble() : c.GetProperty("rho_reducing_mol_per_m3").GetDouble() * molarMass;
        string range = eq.GetProperty("range").GetString() ?? "";
        double tMax = double.Parse(TemperatureEnd().Match(range).Groups[1].Value, CultureInfo.InvariantCulture);
        var pm = PressureEnd().Match(range);
        double pMax = double.Parse(pm.Groups[1].Value, CultureInfo.InvariantCulture) * 1e6;

        var terms = new HelmholtzTermSet();
        foreach (var a in root.GetProperty("alpha0").EnumerateArray())
        {
            switch (a.GetProperty("type").GetString())
            {
                case "lead":
                    terms.A1 = a.GetProperty("a1").GetDouble();
                    terms.A2 = a.GetProperty("a2").GetDouble();
                    break;
                case "logtau":
                    terms.LogTau = a.GetProperty("a").GetDouble();
                    break;
                case "power":
                    terms.IdealPowerN.AddRange(Doubles(a, "n"));
                    terms.IdealPowerT.AddRange(Doubles(a, "t"));
                    break;
                case "planck_einstein":
                    terms.PlanckN.AddRange(Doubles(a, "n"));
                    terms.PlanckTheta.AddRange(Doubles(a, "theta"));
                    break;
                case var other:
                    throw new InvalidOperationException($"{key}.json: unknown ideal-gas term type '{other}'.");
            }
        }

        foreach (var a in root.GetProperty("alphar").EnumerateArray())
        {
            string type = a.GetProperty("type").GetString() ?? "";
            var n = Doubles(a, "n");
            switch (type)
            {
                case "power":
                    {
                        var d = Doubles(a, "d");
                        var t = Doubles(a, "t");
                        var l = Doubles(a, "l");
                        for (int i = 0; i < n.Length; i++)
                        {
                            int li = (int)l[i];
                            terms.Residual.Add(new ResidualTerm(li == 0 ? 0 : 1, n[i], d[i], t[i], li, 0, 0, 0, 0, 0));
                        }

                        break;
                    }

                case "gaussian":
                case "gao_assoc":
                    {
                        var d = Doubles(a, "d");
                        var t = Doubles(a, "t");
                        var eta = Doubles(a, "eta");
                        var beta = Doubles(a, "beta");
                        var gamma = Doubles(a, "gamma");
                        var eps = Doubles(a, "epsilon");
                        double[] b = type == "gao_assoc" ? Doubles(a, "b") : new double[n.Length];
                        for (int i = 0; i < n.Length; i++)
                        {
                            terms.Residual.Add(new ResidualTerm(type == "gaussian" ? 2 : 3, n[i], d[i], t[i], 0, eta[i], eps[i], beta[i], gamma[i], b[i]));
                        }

                        break;
                    }

                case "nonanalytic":
                    {
                        var aa = Doubles(a, "a");
                        var bb = Doubles(a, "b");
                        var beta = Doubles(a, "beta");
                        var capA = Doubles(a, "A");
                        var capB = Doubles(a, "B");
                        var cc = Doubles(a, "C");
                        var dd = Doubles(a, "D");
                        for (int i = 0; i < n.Length; i++)
                        {
                            terms.NonAnalytic.Add(new NonAnalyticTerm(n[i], aa[i], bb[i], beta[i], capA[i], capB[i], cc[i], dd[i]));
                        }

                        break;
                    }

                default:
                    throw new InvalidOperationException($"{key}.json: unknown residual term type '{type}'.");
            }
        }

        var offsets = new Dictionary<ReferenceState, (double, double)> { [ReferenceState.Equation] = (0, 0) };
        var refs = root.GetProperty("reference_states");
        foreach (var (name, state) in new[] { ("IIR", ReferenceState.Iir), ("ASHRAE", ReferenceState.Ashrae), ("NBP", ReferenceState.NormalBoilingPoint) })
        {
            if (refs.TryGetProperty(name, out var r) && r.GetProperty("available").GetBoolean())
            {
                offsets[state] = (r.GetProperty("dh_kJ_per_kg").GetDouble() * 1000, r.GetProperty("ds_kJ_per_kgK").GetDouble() * 1000);
            }
        }

        string authors = eq.GetProperty("authors").GetString() ?? "";
        int year = eq.GetProperty("year").GetInt32();
        string doi = eq.TryGetProperty("doi", out var doiElement) && doiElement.ValueKind == JsonValueKind.String ? ", doi:" + doiElement.GetString() : "";
        string volume = eq.TryGetProperty("volume", out var v) ? " " + v.ToString() : "";
        string pages = eq.TryGetProperty("pages", out var p) ? ", " + p.GetString() : "";
        string citation = $"{authors}, \"{eq.GetProperty("title").GetString()}\", {eq.GetProperty("journal").GetString()}{volume}{pages} ({year}){doi}";
        string[] names = authors.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);
        static string Surname(string name) => name.Split(' ')[^1];
        string shortSource = names.Length switch
        {
            1 => $"{Surname(names[0])} ({year})",
            2 => $"{Surname(names[0])} & {Surname(names[1])} ({year})",
            _ => $"{Surname(names[0])} et al. ({year})",
        };

        return new RefrigerantData
        {
            Key = key,
            Fluid = root.GetProperty("fluid").GetString() ?? key,
            ChemicalName = root.GetProperty("name").GetString() ?? key,
            Citation = citation,
            ShortSource = shortSource,
            MolarMass = molarMass,
            MolarGasConstant = c.GetProperty("R_J_per_mol_K").GetDouble(),
            ReducingTemperature = c.GetProperty("T_reducing_K").GetDouble(),
            ReducingDensity = rhoRed,
            TripleTemperature = c.GetProperty("Ttriple_K").GetDouble(),
            MaximumTemperature = tMax,
            MaximumPressure = pMax,
            CriticalTemperature = crit.GetProperty("Tc_K").GetDouble(),
            CriticalDensity = crit.GetProperty("rhoc_kg_per_m3").GetDouble(),
            CriticalPressure = crit.GetProperty("pc_Pa").GetDouble(),
            PublishedCriticalTemperature = c.GetProperty("Tc_K").GetDouble(),
            PublishedCriticalPressure = c.GetProperty("pc_Pa_published").GetDouble(),
            DeltaMax = c.GetProperty("delta_max_scan").GetDouble(),
            RawReferenceDescription = root.GetProperty("usual_reference_state").GetString() ?? "",
            Offsets = offsets,
            Terms = terms,
        };
    }

    private static double[] Doubles(JsonElement e, string name)
    {
        var array = e.GetProperty(name);
        var result = new double[array.GetArrayLength()];
        int i = 0;
        foreach (var x in array.EnumerateArray())
        {
            result[i++] = x.GetDouble();
        }

        return result;
    }

    [GeneratedRegex(@"to (\d+(?:\.\d+)?) K")]
    private static partial Regex TemperatureEnd();

    [GeneratedRegex(@"(?:p <=|to) (\d+(?:\.\d+)?) MPa")]
    private static partial Regex PressureEnd();
}
