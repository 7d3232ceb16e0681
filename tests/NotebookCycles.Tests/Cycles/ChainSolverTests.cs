using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Water;
using UnitsNet;
using Xunit;

namespace NotebookCycles.Tests.Cycles;

/// <summary>The second-law round-off allowance of the chain solver.</summary>
public sealed class ChainSolverTests
{
    private static double Scale(Step s) => Math.Max(Math.Max(Math.Abs(s.DeltaS), s.Q == 0 ? 0 : Math.Abs(s.Q / s.BoundaryTemperature)), 1.0);

    [Theory]
    [InlineData(8.0)]
    [InlineData(10.0)]
    [InlineData(100.0)]
    public void A_Rankine_condenser_on_IF97_passes_within_the_saturation_consistency_allowance(double condenserKilopascals)
    {
        // IF97's regions 1 and 2 meet its saturation equation only approximately, so condensing between saturated
        // states gives an s_gen of about 1e-6 relative, of either sign (measured; see IapwsIf97.ConsistencyTolerance).
        var cycle = SteamPlantCycles.Rankine(IapwsIf97.Default, Pressure.FromMegapascals(12), Pressure.FromKilopascals(condenserKilopascals),
            new RankineOptions { TurbineInletTemperature = Temperature.FromDegreesCelsius(540) });
        var condenser = cycle.Steps[^1];
        var check = cycle.Checks.Single(c => c.Kind == CheckKind.SecondLaw && ReferenceEquals(c.Step, condenser));
        Assert.Equal(IapwsIf97.Default.ConsistencyTolerance * Scale(condenser), check.Tolerance, 12);
        Assert.True(Math.Abs(condenser.EntropyGenerated) < 1e-5 * Scale(condenser), $"s_gen = {condenser.EntropyGenerated} J/(kg·K)");
        Assert.True(Math.Abs(condenser.EntropyGenerated) > 0, "the inconsistency this allowance covers is real");
    }

    [Fact]
    public void Models_without_a_saturation_line_keep_the_tight_allowance()
    {
        var cycle = AirStandardCycles.Otto(IdealGas.DryAir, Temperature.FromKelvins(300), Pressure.FromKilopascals(100), 8, heatAdded: SpecificEnergy.FromKilojoulesPerKilogram(1800));
        foreach (var check in cycle.Checks.Where(c => c.Kind == CheckKind.SecondLaw))
        {
            Assert.Equal(1e-9 * Scale(check.Step!), check.Tolerance, 15);
        }
    }
}
