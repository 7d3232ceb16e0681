using System.Text;

namespace NotebookCycles.Cli.Tests;

/// <summary>Runs the command line in-process and captures what it prints.</summary>
internal static class Cli
{
    public static (int Exit, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter(new StringBuilder(), System.Globalization.CultureInfo.InvariantCulture);
        var stderr = new StringWriter(new StringBuilder(), System.Globalization.CultureInfo.InvariantCulture);
        int exit = Program.Run(args, stdout, stderr);
        return (exit, stdout.ToString(), stderr.ToString());
    }

    /// <summary>A fresh temporary folder, deleted when disposed.</summary>
    public sealed class TempFolder : IDisposable
    {
        public TempFolder()
        {
            Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "nbcycles-test-" + Guid.NewGuid().ToString("N"));
            Directory.CreateDirectory(Path);
        }

        public string Path { get; }

        public string File(string name) => System.IO.Path.Combine(Path, name);

        public void Dispose()
        {
            try
            {
                Directory.Delete(Path, recursive: true);
            }
            catch (IOException)
            {
            }
        }
    }

    /// <summary>The repository root (the folder holding NotebookCycles.sln).</summary>
    public static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !System.IO.File.Exists(System.IO.Path.Combine(dir.FullName, "NotebookCycles.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("NotebookCycles.sln not found above " + AppContext.BaseDirectory);
    }

    /// <summary>A small memo notebook in the .ipynb format, with a package cell, Markdown, a cycle, a state and printed text.</summary>
    public static string SmallNotebook(string cycleCode = "AirStandardCycles.Otto(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), 8, heatAdded: 1800.KilojoulesPerKilogram())") => $$$"""
        {
         "cells": [
          {"cell_type": "markdown", "metadata": {}, "source": ["# Small memo\n", "\n", "Purpose: **check** the runner.\n", "\n", "| a | b |\n", "|---|---|\n", "| 1 | 2 |"]},
          {"cell_type": "code", "execution_count": null, "metadata": {"tags": ["nbcycles-packages"]}, "outputs": [], "source": ["#r \"nuget: NotebookCycles.Interactive, 0.1.0\""]},
          {"cell_type": "code", "execution_count": null, "metadata": {}, "outputs": [], "source": ["var otto = {{{cycleCode.Replace("\"", "\\\"", StringComparison.Ordinal)}}};\n", "otto"]},
          {"cell_type": "code", "execution_count": null, "metadata": {}, "outputs": [], "source": ["display(otto[\"3\"]);\n", "Console.WriteLine($\"eta = {otto.Figures.ThermalEfficiency:F6}\");"]}
         ],
         "metadata": {"kernelspec": {"display_name": ".NET (C#)", "language": "C#", "name": ".net-csharp"}, "language_info": {"name": "C#"}},
         "nbformat": 4,
         "nbformat_minor": 5
        }
        """;
}
