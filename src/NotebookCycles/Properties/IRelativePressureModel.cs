namespace NotebookCycles.Properties;

/// <summary>
/// An ideal gas whose isentropes can be checked against a printed gas table: relative pressure pr(T) and relative
/// volume vr(T), so that p2/p1 = pr2/pr1 and v2/v1 = vr2/vr1 along an isentrope. Only ratios are meaningful.
/// </summary>
public interface IRelativePressureModel
{
    /// <summary>Relative pressure at temperature (K).</summary>
    double RelativePressure(double temperature);

    /// <summary>Relative volume at temperature (K).</summary>
    double RelativeVolume(double temperature);
}
