using NotebookCycles.Gases;
using Xunit;

namespace NotebookCycles.Tests.Gases;

public sealed class InverseTableTests
{
    [Fact]
    public void Solves_at_every_node_value_and_between()
    {
        // f(T) = T³ + 1e4·ln T: increasing with a closed-form derivative (test function, no source needed).
        InverseTable table = InverseTable.Create(new Cubic(), 200, 6000);
        var f = new Cubic();
        int cells = 256;
        double step = (table.ValueMax - table.ValueMin) / cells;
        for (int j = 0; j <= 2 * cells; j++)
        {
            f.Target = Math.Min(table.ValueMax, table.ValueMin + j * step / 2);
            double t = table.Solve(ref f);
            Assert.InRange(t, 200, 6000);
            double value = f.Evaluate(t, out _) + f.Target;
            Assert.True(Math.Abs(value / f.Target - 1) <= 1e-13, // T³ triples the 1e-14 step tolerance
                $"node {j}: T = {t}, residual {value / f.Target - 1:E2}");
        }
    }

    [Fact]
    public void Dry_air_enthalpy_inverts_exactly_at_the_table_nodes()
    {
        // h values exactly on the 257 table nodes and at both range ends: the cell edges must still bracket the root.
        IdealGasMixture air = IdealGas.DryAir;
        double min = air.EnthalpyRange.Minimum, max = air.EnthalpyRange.Maximum;
        for (int j = 0; j <= 256; j++)
        {
            double h = j == 256 ? max : min + j * (max - min) / 256;
            double t = air.TemperatureFromEnthalpy(h);
            Assert.True(Math.Abs(air.Enthalpy(t) / h - 1) <= 1e-14, $"node {j}: h = {h}, T = {t}");
        }
    }

    [Fact]
    public void Rejects_a_function_that_does_not_increase()
    {
        Assert.Throws<InvalidOperationException>(() => InverseTable.Create(new Falling(), 200, 6000));
    }

    private struct Cubic : ITemperatureFunction
    {
        public double Target { get; set; }

        public readonly double Evaluate(double x, out double derivative)
        {
            derivative = 3 * x * x + 1e4 / x;
            return x * x * x + 1e4 * Math.Log(x) - Target;
        }
    }

    private struct Falling : ITemperatureFunction
    {
        public double Target { get; set; }

        public readonly double Evaluate(double x, out double derivative)
        {
            derivative = -1;
            return -x - Target;
        }
    }
}
