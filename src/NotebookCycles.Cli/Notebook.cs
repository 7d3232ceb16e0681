using System.Text.Json;
using System.Text.Json.Nodes;
using Microsoft.DotNet.Interactive.Documents;

namespace NotebookCycles.Cli;

/// <summary>What a notebook cell holds.</summary>
public enum CellKind
{
    /// <summary>Code to execute.</summary>
    Code,

    /// <summary>Markdown text.</summary>
    Markdown,

    /// <summary>Raw text, passed through.</summary>
    Raw,
}

/// <summary>One cell of a notebook: its kind, language, source and the outputs stored with it (Jupyter nbformat 4 output objects).</summary>
public sealed class NotebookCell
{
    internal NotebookCell(int number, CellKind kind, string language, string source, IReadOnlyList<string> tags, JsonArray outputs, JsonObject node)
    {
        Number = number;
        Kind = kind;
        Language = language;
        Source = source;
        Tags = tags;
        Outputs = outputs;
        Node = node;
    }

    /// <summary>The cell's number in the notebook, from 1, counting every cell.</summary>
    public int Number { get; }

    /// <summary>Code, Markdown or raw.</summary>
    public CellKind Kind { get; }

    /// <summary>The kernel language of a code cell ("csharp"), "markdown" or "raw".</summary>
    public string Language { get; }

    /// <summary>The cell's text.</summary>
    public string Source { get; }

    /// <summary>The cell's tags (metadata.tags).</summary>
    public IReadOnlyList<string> Tags { get; }

    /// <summary>The outputs stored in the file (nbformat 4 output objects; empty for a .dib file without outputs).</summary>
    public JsonArray Outputs { get; }

    internal JsonObject Node { get; }
}

/// <summary>
/// A notebook read from a Jupyter .ipynb file (nbformat 4) or a .NET Interactive .dib file. The .ipynb JSON is kept
/// whole so an executed copy keeps every metadata field; only outputs and execution counts are replaced.
/// </summary>
public sealed class Notebook
{
    /// <summary>The tag that marks a cell as the package-loading cell (also recognised by its content: only #r/#i nuget directives).</summary>
    public const string PackagesTag = "nbcycles-packages";

    private Notebook(string path, JsonObject root, IReadOnlyList<NotebookCell> cells)
    {
        Path = path;
        Root = root;
        Cells = cells;
    }

    /// <summary>The file the notebook was read from.</summary>
    public string Path { get; }

    /// <summary>The cells in order.</summary>
    public IReadOnlyList<NotebookCell> Cells { get; }

    internal JsonObject Root { get; }

    /// <summary>Reads a .ipynb or .dib file; a missing or malformed file raises <see cref="CliException"/> with one clear line.</summary>
    public static Notebook Load(string path)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        if (!File.Exists(path))
        {
            throw new CliException($"notebook not found: {path}");
        }

        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new CliException($"cannot read {path}: {e.Message}", ExitCodes.UsageOrInput, e);
        }

        string ext = System.IO.Path.GetExtension(path).ToLowerInvariant();
        return ext switch
        {
            ".ipynb" => ParseIpynb(path, text),
            ".dib" => ParseDib(path, text),
            _ => throw new CliException($"{path}: not a notebook (expected a .ipynb or .dib file)."),
        };
    }

    /// <summary>Parses nbformat 4 JSON text.</summary>
    public static Notebook ParseIpynb(string path, string text)
    {
        JsonNode? node;
        try
        {
            node = JsonNode.Parse(text, documentOptions: new JsonDocumentOptions { AllowTrailingCommas = true });
        }
        catch (JsonException e)
        {
            throw new CliException($"{path}: malformed notebook: not valid JSON ({FirstLine(e.Message)})", ExitCodes.UsageOrInput, e);
        }

        if (node is not JsonObject root || root["cells"] is not JsonArray cells)
        {
            throw new CliException($"{path}: malformed notebook: no \"cells\" array at the top level (expected Jupyter nbformat 4).");
        }

        if (root["nbformat"] is JsonValue v && v.TryGetValue(out int major) && major < 4)
        {
            throw new CliException($"{path}: malformed notebook: nbformat {major} is not supported (expected 4).");
        }

        string defaultLanguage = DefaultLanguage(root);
        var list = new List<NotebookCell>();
        for (int i = 0; i < cells.Count; i++)
        {
            if (cells[i] is not JsonObject cell)
            {
                throw new CliException($"{path}: malformed notebook: cell {i + 1} is not a JSON object.");
            }

            string type = cell["cell_type"] is JsonValue t && t.TryGetValue(out string? s) ? s : "";
            var kind = type switch
            {
                "code" => CellKind.Code,
                "markdown" => CellKind.Markdown,
                "raw" => CellKind.Raw,
                _ => throw new CliException($"{path}: malformed notebook: cell {i + 1} has cell_type \"{type}\" (expected code, markdown or raw)."),
            };
            string source = JoinText(cell["source"], path, i + 1, "source");
            var tags = new List<string>();
            if (cell["metadata"]?["tags"] is JsonArray tagArray)
            {
                foreach (var tag in tagArray)
                {
                    if (tag is JsonValue tv && tv.TryGetValue(out string? tagText))
                    {
                        tags.Add(tagText);
                    }
                }
            }

            string language = kind switch
            {
                CellKind.Markdown => "markdown",
                CellKind.Raw => "raw",
                _ => CellLanguage(cell) ?? defaultLanguage,
            };
            if (kind == CellKind.Code && TryMagicLanguage(source, out string magic, out string rest))
            {
                language = magic;
                if (magic == "markdown")
                {
                    kind = CellKind.Markdown;
                }

                source = rest;
            }

            var outputs = cell["outputs"] as JsonArray ?? [];
            list.Add(new NotebookCell(i + 1, kind, language, source, tags, outputs, cell));
        }

        return new Notebook(path, root, list);
    }

    /// <summary>Parses a .dib file (cells separated by #!csharp, #!markdown… lines).</summary>
    public static Notebook ParseDib(string path, string text)
    {
        InteractiveDocument document;
        try
        {
            document = CodeSubmission.Parse(text, new KernelInfoCollection { new KernelInfo("csharp", "C#", ["c#", "C#"]), new KernelInfo("markdown", "Markdown", ["md"]), new KernelInfo("fsharp", "F#", ["f#", "F#"]) });
        }
        catch (Exception e) when (e is FormatException or ArgumentException or InvalidOperationException)
        {
            throw new CliException($"{path}: malformed notebook: {FirstLine(e.Message)}", ExitCodes.UsageOrInput, e);
        }

        var root = NewIpynbRoot();
        var cells = (JsonArray)root["cells"]!;
        var list = new List<NotebookCell>();
        int n = 0;
        foreach (var element in document.Elements)
        {
            string language = string.IsNullOrEmpty(element.KernelName) ? "csharp" : element.KernelName;
            var kind = language == "markdown" ? CellKind.Markdown : CellKind.Code;
            if (kind == CellKind.Code && string.IsNullOrWhiteSpace(element.Contents))
            {
                continue;
            }

            var cell = kind == CellKind.Markdown
                ? new JsonObject { ["cell_type"] = "markdown", ["metadata"] = new JsonObject(), ["source"] = SplitLines(element.Contents) }
                : new JsonObject
                {
                    ["cell_type"] = "code",
                    ["execution_count"] = null,
                    ["metadata"] = new JsonObject { ["dotnet_interactive"] = new JsonObject { ["language"] = language }, ["polyglot_notebook"] = new JsonObject { ["kernelName"] = language } },
                    ["outputs"] = new JsonArray(),
                    ["source"] = SplitLines(element.Contents),
                };
            cells.Add(cell);
            list.Add(new NotebookCell(++n, kind, kind == CellKind.Markdown ? "markdown" : language, element.Contents, [], kind == CellKind.Code ? (JsonArray)cell["outputs"]! : [], cell));
        }

        return new Notebook(path, root, list);
    }

    /// <summary>True when the cell only loads packages (#r "nuget:…", #i "nuget:…", comments), or carries the <see cref="PackagesTag"/> tag.</summary>
    public static bool IsPackageCell(NotebookCell cell)
    {
        ArgumentNullException.ThrowIfNull(cell);
        if (cell.Kind != CellKind.Code)
        {
            return false;
        }

        if (cell.Tags.Contains(PackagesTag))
        {
            return true;
        }

        bool any = false;
        foreach (var raw in cell.Source.Split('\n'))
        {
            string line = raw.Trim();
            if (line.Length == 0 || line.StartsWith("//", StringComparison.Ordinal))
            {
                continue;
            }

            if (line.StartsWith("#r \"nuget:", StringComparison.OrdinalIgnoreCase) || line.StartsWith("#i \"nuget:", StringComparison.OrdinalIgnoreCase))
            {
                any = true;
                continue;
            }

            return false;
        }

        return any;
    }

    /// <summary>The notebook as nbformat 4 JSON with the given outputs and execution counts per code cell (by cell number).</summary>
    public string ToIpynb(IReadOnlyDictionary<int, (JsonArray Outputs, int? ExecutionCount)> executed)
    {
        ArgumentNullException.ThrowIfNull(executed);
        var root = (JsonObject)Root.DeepClone();
        var cells = (JsonArray)root["cells"]!;
        if (root["metadata"] is not JsonObject meta)
        {
            meta = new JsonObject();
            root["metadata"] = meta;
        }

        meta["kernelspec"] ??= new JsonObject { ["display_name"] = ".NET (C#)", ["language"] = "C#", ["name"] = ".net-csharp" };
        meta["language_info"] ??= new JsonObject { ["name"] = "C#" };
        bool needsIds = (root["nbformat"] is JsonValue major && major.TryGetValue(out int mj) && mj > 4)
            || (root["nbformat"] is JsonValue m4 && m4.TryGetValue(out int four) && four == 4 && root["nbformat_minor"] is JsonValue minor && minor.TryGetValue(out int mn) && mn >= 5);
        for (int i = 0; i < Cells.Count; i++)
        {
            var cell = Cells[i];
            if (needsIds && cells[i] is JsonObject withId && withId["id"] is null)
            {
                // nbformat 4.5 requires a cell id; a stable one keeps re-runs from changing the file.
                withId["id"] = "cell-" + cell.Number.ToString(System.Globalization.CultureInfo.InvariantCulture);
            }

            if (cell.Kind == CellKind.Code && executed.TryGetValue(cell.Number, out var result))
            {
                var node = (JsonObject)cells[i]!;
                node["outputs"] = result.Outputs.DeepClone();
                node["execution_count"] = result.ExecutionCount;
            }
        }

        return root.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }) + "\n";
    }

    /// <summary>Joins nbformat multi-line text (a string or an array of strings).</summary>
    public static string JoinText(JsonNode? node, string path = "", int cell = 0, string field = "text")
    {
        switch (node)
        {
            case null:
                return "";
            case JsonValue value when value.TryGetValue(out string? s):
                return s;
            case JsonArray array:
                var text = new System.Text.StringBuilder();
                foreach (var part in array)
                {
                    if (part is JsonValue pv && pv.TryGetValue(out string? ps))
                    {
                        text.Append(ps);
                    }
                    else
                    {
                        throw new CliException($"{path}: malformed notebook: cell {cell} has a {field} line that is not a string.");
                    }
                }

                return text.ToString();
            default:
                throw new CliException($"{path}: malformed notebook: cell {cell} has a {field} that is neither a string nor a list of strings.");
        }
    }

    /// <summary>Splits text into nbformat lines (each keeps its newline but the last).</summary>
    public static JsonArray SplitLines(string text)
    {
        var array = new JsonArray();
        int start = 0;
        for (int i = 0; i < text.Length; i++)
        {
            if (text[i] == '\n')
            {
                array.Add(text[start..(i + 1)]);
                start = i + 1;
            }
        }

        if (start < text.Length)
        {
            array.Add(text[start..]);
        }

        return array;
    }

    private static JsonObject NewIpynbRoot() => new()
    {
        ["cells"] = new JsonArray(),
        ["metadata"] = new JsonObject
        {
            ["kernelspec"] = new JsonObject { ["display_name"] = ".NET (C#)", ["language"] = "C#", ["name"] = ".net-csharp" },
            ["language_info"] = new JsonObject { ["name"] = "C#" },
            ["polyglot_notebook"] = new JsonObject { ["kernelInfo"] = new JsonObject { ["defaultKernelName"] = "csharp" } },
        },
        ["nbformat"] = 4,
        ["nbformat_minor"] = 5,
    };

    private static string DefaultLanguage(JsonObject root)
    {
        if (root["metadata"]?["polyglot_notebook"]?["kernelInfo"]?["defaultKernelName"] is JsonValue d && d.TryGetValue(out string? dk))
        {
            return Normalise(dk);
        }

        if (root["metadata"]?["kernelspec"]?["language"] is JsonValue l && l.TryGetValue(out string? lang))
        {
            return Normalise(lang);
        }

        return "csharp";
    }

    private static string? CellLanguage(JsonObject cell)
    {
        if (cell["metadata"]?["polyglot_notebook"]?["kernelName"] is JsonValue k && k.TryGetValue(out string? kernel))
        {
            return Normalise(kernel);
        }

        if (cell["metadata"]?["dotnet_interactive"]?["language"] is JsonValue l && l.TryGetValue(out string? lang))
        {
            return Normalise(lang);
        }

        return null;
    }

    private static bool TryMagicLanguage(string source, out string language, out string rest)
    {
        language = "";
        rest = source;
        string trimmed = source.TrimStart();
        if (!trimmed.StartsWith("#!", StringComparison.Ordinal))
        {
            return false;
        }

        int end = trimmed.IndexOf('\n');
        string word = (end < 0 ? trimmed[2..] : trimmed[2..end]).Trim();
        string normalised = Normalise(word);
        if (normalised is not ("csharp" or "fsharp" or "markdown" or "pwsh" or "javascript" or "html" or "sql" or "kql" or "mermaid" or "value"))
        {
            return false;
        }

        language = normalised;
        rest = end < 0 ? "" : trimmed[(end + 1)..];
        return true;
    }

    private static string Normalise(string language) => language.Trim().ToLowerInvariant() switch
    {
        "c#" or "csharp" or "cs" => "csharp",
        "f#" or "fsharp" or "fs" => "fsharp",
        "md" or "markdown" => "markdown",
        "powershell" or "pwsh" => "pwsh",
        "js" or "javascript" => "javascript",
        var other => other,
    };

    private static string FirstLine(string message)
    {
        int i = message.IndexOf('\n');
        return (i < 0 ? message : message[..i]).Trim();
    }
}
