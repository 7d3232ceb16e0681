using System.Text;

namespace NotebookCycles.Cli;

/// <summary>Writes outputs atomically: a temporary file in the same folder, then a rename over the target.</summary>
public static class AtomicFile
{
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>Writes <paramref name="text"/> (UTF-8, no byte-order mark) to <paramref name="path"/>; a reader never sees a half-written file.</summary>
    public static void WriteAllText(string path, string text)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        ArgumentNullException.ThrowIfNull(text);
        string full = Path.GetFullPath(path);
        string? folder = Path.GetDirectoryName(full);
        if (folder is null)
        {
            throw new CliException($"cannot write {path}: it has no folder.");
        }

        try
        {
            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new CliException($"cannot create the folder {folder}: {e.Message}", ExitCodes.UsageOrInput, e);
        }

        string temp = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Environment.ProcessId.ToString(System.Globalization.CultureInfo.InvariantCulture) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                var bytes = Utf8NoBom.GetBytes(text);
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            throw new CliException($"cannot write {path}: {e.Message}", ExitCodes.UsageOrInput, e);
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }
    }
}
