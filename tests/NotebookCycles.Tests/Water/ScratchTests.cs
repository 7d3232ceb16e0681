using NotebookCycles.Water;
using Xunit;
using Xunit.Abstractions;

namespace NotebookCycles.Tests.Water;

public sealed class ScratchTests(ITestOutputHelper output)
{
    [Fact]
    public void Scan()
    {
        var steam = IapwsIf97.Default;
        foreach (var (t, p) in IapwsIf97RoundTripTests.Grid(2))
        {
            if (p < 611.213) continue;
            var st = steam.FromTP(t, p);
            double a = Region2.TemperaturePH(p * 1e-6, st.H * 1e-3) - t;
            double b = Region2.TemperaturePS(p * 1e-6, st.S * 1e-3) - t;
            if (Math.Abs(a) > 0.008 || Math.Abs(b) > 0.008)
            {
                output.WriteLine($"R2 T={t} p={p * 1e-6} dTh={a} dTs={b} sub={Region2.SubregionPH(p * 1e-6, st.H * 1e-3)}/{Region2.SubregionPS(p * 1e-6, st.S * 1e-3)}");
            }
        }
    }
}
