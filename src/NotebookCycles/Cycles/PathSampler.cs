using NotebookCycles.Properties;

namespace NotebookCycles.Cycles;

/// <summary>Intermediate states along a step's real path, from its law and the property model.</summary>
internal static class PathSampler
{
    public static IReadOnlyList<StatePoint> Sample(Step step, int count)
    {
        StatePoint a = step.From.Point, b = step.To.Point;
        IPropertyModel model = step.To.Model;
        if (step.Law == PathLaw.Undefined || !ReferenceEquals(step.From.Model, model))
        {
            return [a, b];
        }

        var points = new StatePoint[count];
        points[0] = a;
        points[count - 1] = b;
        try
        {
            for (int i = 1; i < count - 1; i++)
            {
                double f = (double)i / (count - 1);
                points[i] = step.Law switch
                {
                    PathLaw.Isentropic => model.FromPS(Geometric(a.P, b.P, f), a.S),
                    PathLaw.Polytropic => Polytropic(model, a, Geometric(a.P, b.P, f), step.PolytropicExponent),
                    PathLaw.Isothermal => model.FromTS(a.T, Linear(a.S, b.S, f)),
                    PathLaw.ConstantVolume => model.FromTV(Linear(a.T, b.T, f), a.V),
                    PathLaw.ConstantPressure => model.FromPH(Linear(a.P, b.P, f), Linear(a.H, b.H, f)),
                    PathLaw.Isenthalpic => model.FromPH(Geometric(a.P, b.P, f), a.H),
                    _ => Interpolate(a, b, f),
                };
            }
        }
        catch (PropertyModelException)
        {
            // A path that leaves the model's range between valid end states (rare): draw the straight line instead.
            return [a, b];
        }

        return points;
    }

    private static StatePoint Polytropic(IPropertyModel model, StatePoint a, double p, double n) =>
        model.FromPV(p, a.V * Math.Pow(a.P / p, 1.0 / n));

    private static double Linear(double x0, double x1, double f) => x0 + (x1 - x0) * f;

    private static double Geometric(double x0, double x1, double f) => x0 * Math.Pow(x1 / x0, f);

    private static StatePoint Interpolate(StatePoint a, StatePoint b, double f) =>
        new(Linear(a.T, b.T, f), Linear(a.P, b.P, f), Linear(a.V, b.V, f), Linear(a.U, b.U, f), Linear(a.H, b.H, f), Linear(a.S, b.S, f), double.NaN, double.NaN, double.NaN, double.NaN, b.Phase);
}
