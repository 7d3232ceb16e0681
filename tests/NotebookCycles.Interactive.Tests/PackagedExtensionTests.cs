using System.Diagnostics;
using System.Globalization;
using System.Runtime.CompilerServices;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;
using Microsoft.DotNet.Interactive.PackageManagement;
using NotebookCycles.Interactive;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

/// <summary>
/// The NuGet package end to end: packed to a temporary feed, restored by a kernel with the NuGet loader through
/// <c>#i</c> and <c>#r "nuget:"</c>, its interactive-extensions/dotnet/extension.dib run as a notebook host runs it.
/// </summary>
[Collection(FormatterRegistry.Name)]
public sealed class PackagedExtensionTests
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    [Fact]
    public async Task The_packed_extension_loads_through_nuget_and_formats_cycles()
    {
        // A stable version of its own per run, so no earlier copy in the NuGet cache stands in for this build, and the
        // reference can name no version at all, as a user writes it.
        string version = "0.1.0." + ((long)(DateTime.UtcNow - new DateTime(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc)).TotalSeconds).ToString(CultureInfo.InvariantCulture);
        string feed = Path.Combine(Path.GetTempPath(), "nbc-feed-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(feed);
        try
        {
            Pack(feed, version);
            Assert.True(File.Exists(Path.Combine(feed, $"NotebookCycles.Interactive.{version}.nupkg")));

            Formatter.ResetToDefault();
            NotebookCyclesDisplay.Reset();
            using var kernel = new CompositeKernel();
            var csharp = new CSharpKernel().UseKernelHelpers().UseNugetDirective(LoadExtensionsAsync, forceRestore: false);
            kernel.Add(csharp);
            kernel.DefaultKernelName = csharp.Name;

            await Submit(kernel, $"#i \"nuget: {feed}\"");
            var seen = new List<KernelEvent>();
            using (kernel.KernelEvents.Subscribe(seen.Add))
            {
                await Submit(kernel, "#r \"nuget: NotebookCycles.Interactive\"");
            }

            Assert.Contains(seen.OfType<PackageAdded>(), e => e.PackageReference.PackageName == "NotebookCycles.Interactive" && e.PackageReference.PackageVersion == version);

            // The package's extension.dib ran: it said what it loaded.
            Assert.Contains(seen.OfType<DisplayEvent>().SelectMany(e => e.FormattedValues), f => f.Value.Contains("NotebookCycles loaded", StringComparison.Ordinal));

            var result = await Submit(kernel, "AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram())");
            var html = result.Events.OfType<ReturnValueProduced>().Single().FormattedValues.Single(f => f.MimeType == HtmlFormatter.MimeType).Value;
            Assert.Contains("<div class=\"nbc nbc-cycle\">", html, StringComparison.Ordinal);
            Assert.Equal(8, html.Split("<path class=\"nbc-step ").Length - 1);
        }
        finally
        {
            Formatter.ResetToDefault();
            NotebookCyclesDisplay.Reset();
            TryDelete(feed);
            TryDelete(Path.Combine(NuGetCache(), "notebookcycles.interactive", version));
        }
    }

    /// <summary>What a notebook host does after a restore: reference the packages' assemblies, then run each package's interactive-extensions/dotnet/extension.dib.</summary>
    private static async Task LoadExtensionsAsync(CSharpKernel kernel, IReadOnlyList<ResolvedPackageReference> packages)
    {
        kernel.AddAssemblyReferences(packages.SelectMany(p => p.AssemblyPaths));
        foreach (var package in packages)
        {
            var dib = new FileInfo(Path.Combine(package.PackageRoot, "interactive-extensions", "dotnet", "extension.dib"));
            if (dib.Exists)
            {
                await kernel.RootKernel.LoadAndRunInteractiveDocument(dib, KernelInvocationContext.Current!.Command);
            }
        }
    }

    private static async Task<KernelCommandResult> Submit(Kernel kernel, string code)
    {
        var result = await kernel.SendAsync(new Microsoft.DotNet.Interactive.Commands.SubmitCode(code));
        var failed = result.Events.OfType<CommandFailed>().FirstOrDefault();
        Assert.True(failed is null, $"Submission failed: {failed?.Message}\n{code}");
        return result;
    }

    private static void Pack(string feed, string version, [CallerFilePath] string here = "")
    {
        string project = Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "src", "NotebookCycles.Interactive", "NotebookCycles.Interactive.csproj"));
        var info = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var arg in new[] { "pack", project, "-c", Configuration, "--no-build", "-o", feed, "-p:PackageVersion=" + version, "-p:BuildProjectReferences=false", "-nologo" })
        {
            info.ArgumentList.Add(arg);
        }

        using var process = Process.Start(info)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(300_000), "dotnet pack did not finish within 300 s");
        process.WaitForExit();
        Assert.True(process.ExitCode == 0, $"dotnet pack failed ({process.ExitCode}):\n{stdout.Result}\n{stderr.Result}");
    }

    private static string NuGetCache() =>
        Environment.GetEnvironmentVariable("NUGET_PACKAGES") is { Length: > 0 } custom ? custom : Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".nuget", "packages");

    private static void TryDelete(string folder)
    {
        try
        {
            if (Directory.Exists(folder))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
        catch (IOException)
        {
            // Left for the temporary folder's own clean-up.
        }
        catch (UnauthorizedAccessException)
        {
            // Same.
        }
    }
}
