using Xunit;

namespace NotebookCycles.Cli.Tests;

public sealed class AtomicFileTests
{
    [Fact]
    public void Replaces_the_file_whole_and_leaves_no_temporary_file()
    {
        using var dir = new Cli.TempFolder();
        string path = dir.File("sub/memo.html");
        AtomicFile.WriteAllText(path, "first");
        AtomicFile.WriteAllText(path, "second");
        Assert.Equal("second", File.ReadAllText(path));
        Assert.Single(Directory.GetFiles(Path.GetDirectoryName(path)!));
    }

    [Fact]
    public void A_target_that_cannot_be_written_gives_a_cli_error_and_keeps_the_old_content()
    {
        using var dir = new Cli.TempFolder();
        string target = dir.File("memo.html");
        Directory.CreateDirectory(target); // a folder where the file should go: the rename fails
        var e = Assert.Throws<CliException>(() => AtomicFile.WriteAllText(target, "new"));
        Assert.Contains("cannot write", e.Message, StringComparison.Ordinal);
        Assert.True(Directory.Exists(target));
        Assert.Empty(Directory.GetFiles(dir.Path));
    }
}
