using Xunit;

namespace NotebookCycles.Cli.Tests;

public sealed class JupyterFactAttributeTests
{
    [Fact]
    public void Skips_only_outside_CI_and_only_when_a_tool_is_missing()
    {
        string? saved = Environment.GetEnvironmentVariable("CI");
        try
        {
            Environment.SetEnvironmentVariable("CI", "true");
            Assert.Null(new JupyterFactAttribute().Skip);

            Environment.SetEnvironmentVariable("CI", null);
            var missing = JupyterFactAttribute.Missing();
            string? skip = new JupyterFactAttribute().Skip;
            if (missing.Count == 0)
            {
                Assert.Null(skip);
            }
            else
            {
                Assert.NotNull(skip);
                foreach (string tool in missing)
                {
                    Assert.Contains(tool, skip, StringComparison.Ordinal);
                }
            }
        }
        finally
        {
            Environment.SetEnvironmentVariable("CI", saved);
        }
    }
}
