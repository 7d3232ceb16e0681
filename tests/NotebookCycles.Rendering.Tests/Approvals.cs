using System.Runtime.CompilerServices;
using System.Text;
using Xunit;

namespace NotebookCycles.Rendering.Tests;

/// <summary>
/// Approved-file checks: the output is compared byte for byte with Approved/NAME.approved.EXT next to the tests. A
/// mismatch (or a missing approved file) writes Approved/NAME.received.EXT and fails; to accept a change, review the
/// received file and rename it to .approved.
/// </summary>
internal static class Approvals
{
    public static void Verify(string name, string extension, string actual, [CallerFilePath] string callerFile = "")
    {
        string folder = Path.Combine(Path.GetDirectoryName(callerFile)!, "Approved");
        string approved = Path.Combine(folder, name + ".approved." + extension);
        string received = Path.Combine(folder, name + ".received." + extension);
        string normalised = actual.Replace("\r\n", "\n", StringComparison.Ordinal);
        if (File.Exists(approved) && File.ReadAllText(approved, Encoding.UTF8).Replace("\r\n", "\n", StringComparison.Ordinal) == normalised)
        {
            if (File.Exists(received))
            {
                File.Delete(received);
            }

            return;
        }

        Directory.CreateDirectory(folder);
        File.WriteAllText(received, normalised, new UTF8Encoding(false));
        Assert.Fail(File.Exists(approved)
            ? $"{name}.{extension} differs from its approved file; the new output is in {received}. Review it and rename it to .approved to accept."
            : $"{name}.{extension} has no approved file yet; the output is in {received}. Review it and rename it to .approved to accept.");
    }
}
