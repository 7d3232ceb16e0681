using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;
using NotebookCycles.Interactive;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

/// <summary>Tests that touch the global formatter registry run one at a time.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class FormatterRegistry
{
    /// <summary>The collection's name.</summary>
    public const string Name = "Formatter registry";
}

/// <summary>A real composite kernel with a C# kernel, as a notebook host builds it.</summary>
internal sealed class KernelSession : IDisposable
{
    public KernelSession()
    {
        Formatter.ResetToDefault();
        NotebookCyclesDisplay.Reset();
        Kernel = new CompositeKernel { new CSharpKernel().UseKernelHelpers() };
        Kernel.DefaultKernelName = "csharp";
    }

    public CompositeKernel Kernel { get; }

    /// <summary>The extension.dib shipped in the package (copied beside the test assembly).</summary>
    public static FileInfo ExtensionDocument
    {
        get
        {
            var file = new FileInfo(Path.Combine(AppContext.BaseDirectory, "extension.dib"));
            Assert.True(file.Exists, $"extension.dib was not copied to {AppContext.BaseDirectory}");
            return file;
        }
    }

    /// <summary>References the built assemblies (as the package does) and runs the shipped extension.dib.</summary>
    public async Task<KernelCommandResult> LoadExtensionAsync()
    {
        foreach (var name in new[] { "NotebookCycles.dll", "NotebookCycles.Rendering.dll", "NotebookCycles.Interactive.dll" })
        {
            await SubmitAsync($"#r \"{Path.Combine(AppContext.BaseDirectory, name)}\"");
        }

        var parent = new SubmitCode("#!csharp\n// load the NotebookCycles extension");
        KernelCommandResult? result = null;
        var events = new List<KernelEvent>();
        using (Kernel.KernelEvents.Subscribe(events.Add))
        {
            await Kernel.LoadAndRunInteractiveDocument(ExtensionDocument, parent);
        }

        var failed = events.OfType<CommandFailed>().FirstOrDefault();
        Assert.True(failed is null, failed?.Message);
        Events = events;
        return result!;
    }

    /// <summary>The events seen while loading the extension.</summary>
    public List<KernelEvent> Events { get; private set; } = [];

    public async Task<KernelCommandResult> SubmitAsync(string code)
    {
        var result = await Kernel.SendAsync(new SubmitCode(code));
        var failed = result.Events.OfType<CommandFailed>().FirstOrDefault();
        Assert.True(failed is null, $"Submission failed: {failed?.Message}\n{code}");
        return result;
    }

    /// <summary>The text/html of the value a submission returns.</summary>
    public async Task<string> HtmlOfAsync(string code) => (await FormattedAsync(code, HtmlFormatter.MimeType));

    public async Task<string> FormattedAsync(string code, string mimeType)
    {
        var result = await SubmitAsync(code);
        var value = result.Events.OfType<ReturnValueProduced>().SingleOrDefault();
        Assert.True(value is not null, "The submission returned no value: " + code);
        var formatted = value!.FormattedValues.FirstOrDefault(f => f.MimeType == mimeType);
        Assert.True(formatted is not null, $"No {mimeType} among {string.Join(", ", value.FormattedValues.Select(f => f.MimeType))}");
        return formatted!.Value;
    }

    public void Dispose()
    {
        Kernel.Dispose();
        Formatter.ResetToDefault();
        NotebookCyclesDisplay.Reset();
    }
}
